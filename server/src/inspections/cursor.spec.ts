import { ApiValidationException } from '../common/api-validation.exception';
import { decodeCursor, encodeCursor, type ListCursor } from './cursor';

const ID = '0b6f3c1e-4a5d-4f7e-9c2b-8d1e2f3a4b5c';

describe('list cursor', () => {
  it('gives back the position it was made from', () => {
    const position: ListCursor = {
      sort: 'submittedAt',
      order: 'asc',
      at: '2026-11-30T05:40:00.123456Z',
      id: ID,
    };
    expect(decodeCursor(encodeCursor(position), 'submittedAt', 'asc')).toEqual(position);
  });

  it('refuses a cursor made for another sort order', () => {
    const text = encodeCursor({ sort: 'startedAt', order: 'desc', at: '2026-11-30T05:40:00Z', id: ID });
    expect(() => decodeCursor(text, 'startedAt', 'asc')).toThrow(/another sort order/);
  });

  it.each([
    ['not base64 JSON', 'not-a-cursor'],
    ['a JSON object', Buffer.from('{"a":1}').toString('base64url')],
    [
      'an id that is not a UUID',
      Buffer.from('["startedAt","desc","2026-11-30T05:40:00.000Z","1; DROP TABLE x"]').toString('base64url'),
    ],
    ['a time that is not a time', Buffer.from(`["startedAt","desc","yesterday","${ID}"]`).toString('base64url')],
    [
      'an impossible date (February 31st)',
      Buffer.from(`["startedAt","desc","2026-02-31T05:40:00.000Z","${ID}"]`).toString('base64url'),
    ],
    ['an hour past 23', Buffer.from(`["startedAt","desc","2026-11-30T24:00:00Z","${ID}"]`).toString('base64url')],
    [
      'a time with an injected clause',
      Buffer.from(`["startedAt","desc","2026-11-30T05:40:00Z') OR (1=1","${ID}"]`).toString('base64url'),
    ],
    ['an unknown sort', Buffer.from(`["odometer","desc","2026-11-30T05:40:00.000Z","${ID}"]`).toString('base64url')],
  ])('refuses %s with a 400 naming the cursor', (_what, text) => {
    expect(() => decodeCursor(text, 'startedAt', 'desc')).toThrow(ApiValidationException);
    try {
      decodeCursor(text, 'startedAt', 'desc');
    } catch (error) {
      expect((error as ApiValidationException).fields).toEqual([
        { field: 'cursor', message: expect.any(String) as string },
      ]);
    }
  });
});
