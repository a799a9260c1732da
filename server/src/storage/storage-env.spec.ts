import { Logger } from '@nestjs/common';
import { resolve } from 'node:path';
import { validateEnv } from '../config/env.validation';

const DATABASE_URL = 'postgres://postgres@127.0.0.1:54400/yardcall';
const S3 = {
  S3_ENDPOINT: 'http://127.0.0.1:9000',
  S3_BUCKET: 'yardcall-notes',
  S3_ACCESS_KEY_ID: 'key',
  S3_SECRET_ACCESS_KEY: 'secret',
};

beforeAll(() => {
  jest.spyOn(Logger.prototype, 'warn').mockImplementation(() => undefined);
  jest.spyOn(Logger.prototype, 'log').mockImplementation(() => undefined);
});

describe('storage settings in the environment', () => {
  it('keeps files in .data/objects at the repository root by default', () => {
    expect(validateEnv({ DATABASE_URL }).STORAGE).toEqual({
      driver: 'local',
      dir: resolve(__dirname, '..', '..', '..', '.data', 'objects'),
    });
  });

  it('uses STORAGE_DIR, made absolute', () => {
    expect(validateEnv({ DATABASE_URL, STORAGE_DIR: 'some/where' }).STORAGE).toEqual({
      driver: 'local',
      dir: resolve('some/where'),
    });
  });

  it('switches to the S3-compatible store when the S3 variables are set, region defaulting to us-east-1', () => {
    expect(validateEnv({ DATABASE_URL, ...S3 }).STORAGE).toEqual({
      driver: 's3',
      endpoint: 'http://127.0.0.1:9000',
      bucket: 'yardcall-notes',
      region: 'us-east-1',
      accessKeyId: 'key',
      secretAccessKey: 'secret',
    });
    expect(validateEnv({ DATABASE_URL, ...S3, S3_REGION: 'eu-west-1' }).STORAGE).toMatchObject({ region: 'eu-west-1' });
  });

  it.each([
    [{ S3_BUCKET: 'yardcall-notes' }, 'S3_ENDPOINT, S3_ACCESS_KEY_ID, S3_SECRET_ACCESS_KEY are not set'],
    [{ ...S3, S3_SECRET_ACCESS_KEY: '' }, 'S3_SECRET_ACCESS_KEY is not set'],
    [{ ...S3, S3_ENDPOINT: 'ftp://store' }, 'S3_ENDPOINT must start with http:// or https://'],
    [{ ...S3, S3_BUCKET: 'Bad_Bucket' }, 'S3_BUCKET must be 3 to 63 lowercase letters'],
  ])('refuses an incomplete or wrong S3 setting %j with a sentence naming the variable', (extra, message) => {
    expect(() => validateEnv({ DATABASE_URL, ...extra })).toThrow(message);
  });
});
