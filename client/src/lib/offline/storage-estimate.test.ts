import { describe, expect, it } from 'vitest';
import { estimateStorageRoom } from './storage-estimate';

const MB = 1024 * 1024;
const storage = (usage: number | undefined, quota: number | undefined) => ({
  estimate: () => Promise.resolve({ usage, quota }),
});

describe('estimateStorageRoom', () => {
  it('says storage is short with less than 50 MB left', async () => {
    expect(await estimateStorageRoom(storage(200 * MB, 240 * MB))).toMatchObject({ short: true });
  });

  it('says storage is short past 90 % of the quota even with room in bytes', async () => {
    expect(await estimateStorageRoom(storage(9_500 * MB, 10_000 * MB))).toMatchObject({ short: true });
  });

  it('says nothing is short with plenty of room', async () => {
    expect(await estimateStorageRoom(storage(20 * MB, 2_000 * MB))).toEqual({
      usageBytes: 20 * MB,
      quotaBytes: 2_000 * MB,
      short: false,
    });
  });

  it('answers null where the browser cannot tell', async () => {
    expect(await estimateStorageRoom(undefined)).toBeNull();
    expect(await estimateStorageRoom(storage(undefined, undefined))).toBeNull();
    expect(await estimateStorageRoom({ estimate: () => Promise.reject(new Error('denied')) })).toBeNull();
  });
});
