import { ApiValidationException } from '../common/api-validation.exception';
import { decodeCursor, encodeCursor } from './cursor';

describe('list cursor', () => {
  it('gives back the position it was made from', () => {
    const position = { startedAt: new Date('2026-11-30T05:40:00.123Z'), id: '0b6f3c1e-4a5d-4f7e-9c2b-8d1e2f3a4b5c' };
    expect(decodeCursor(encodeCursor(position))).toEqual(position);
  });

  it.each([
    ['not base64 JSON', 'not-a-cursor'],
    ['a JSON object', Buffer.from('{"a":1}').toString('base64url')],
    ['an id that is not a UUID', Buffer.from('["2026-11-30T05:40:00.000Z","1; DROP TABLE x"]').toString('base64url')],
    [
      'a time that is not a time',
      Buffer.from('["yesterday","0b6f3c1e-4a5d-4f7e-9c2b-8d1e2f3a4b5c"]').toString('base64url'),
    ],
  ])('refuses %s with a 400 naming the cursor', (_what, text) => {
    expect(() => decodeCursor(text)).toThrow(ApiValidationException);
    try {
      decodeCursor(text);
    } catch (error) {
      expect((error as ApiValidationException).fields).toEqual([
        { field: 'cursor', message: expect.any(String) as string },
      ]);
    }
  });
});
