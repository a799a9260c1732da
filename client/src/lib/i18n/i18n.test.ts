import { describe, expect, it } from 'vitest';
import enCore from './en/core.json';
import enScreens from './en/screens.json';
import esCore from './es/core.json';
import esScreens from './es/screens.json';

const en = { ...enCore, ...enScreens };
const es = { ...esCore, ...esScreens };

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

  it('keeps each section in one part only, the same part in both languages', () => {
    expect(Object.keys(enCore).filter((key) => key in enScreens)).toEqual([]);
    expect(Object.keys(esCore).sort()).toEqual(Object.keys(enCore).sort());
    expect(Object.keys(esScreens).sort()).toEqual(Object.keys(enScreens).sort());
  });
});
