import { BoundedCache } from './bounded-cache';

describe('BoundedCache', () => {
  it('drops the oldest entry once full, and keeps every entry when one is written again', () => {
    const cache = new BoundedCache<string, number>(2);
    cache.set('a', 1);
    cache.set('b', 2);
    cache.set('b', 3);
    expect([cache.get('a'), cache.get('b')]).toEqual([1, 3]);
    expect(cache.set('c', 4)).toBe(4);
    expect([cache.has('a'), cache.get('b'), cache.get('c')]).toEqual([false, 3, 4]);
  });
});
