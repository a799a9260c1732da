import { describe, expect, it } from 'vitest';
import en from './en.json';
import es from './es.json';

function keysOf(value: unknown, prefix = ''): string[] {
  if (typeof value !== 'object' || value === null) return [prefix];
  return Object.entries(value).flatMap(([key, child]) => keysOf(child, prefix ? `${prefix}.${key}` : key));
}

// Spanish may add plural forms English lacks (_many), never miss one English has.
describe('UI strings', () => {
  it('has a Spanish string for every English one', () => {
    const spanish = new Set(keysOf(es));
    expect(keysOf(en).filter((key) => !spanish.has(key))).toEqual([]);
  });

  it('has no Spanish string English lacks, apart from plural forms', () => {
    const english = new Set(keysOf(en));
    expect(keysOf(es).filter((key) => !english.has(key) && !key.endsWith('_many'))).toEqual([]);
  });
});
