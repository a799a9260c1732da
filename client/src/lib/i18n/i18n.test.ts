import { describe, expect, it } from 'vitest';
import enCore from './en/core.json';
import enDriver from './en/driver.json';
import enFinish from './en/finish.json';
import enScreens from './en/screens.json';
import esCore from './es/core.json';
import esDriver from './es/driver.json';
import esFinish from './es/finish.json';
import esScreens from './es/screens.json';

const enParts = [enCore, enDriver, enFinish, enScreens];
const esParts = [esCore, esDriver, esFinish, esScreens];

function keysOf(value: unknown, prefix = ''): string[] {
  if (typeof value !== 'object' || value === null) return [prefix];
  return Object.entries(value).flatMap(([key, child]) => keysOf(child, prefix ? `${prefix}.${key}` : key));
}

const en = { keys: () => enParts.flatMap((part) => keysOf(part)) };
const es = { keys: () => esParts.flatMap((part) => keysOf(part)) };

// Spanish may add plural forms English lacks (_many), never miss one English has.
describe('UI strings', () => {
  it('has a Spanish string for every English one', () => {
    const spanish = new Set(es.keys());
    expect(en.keys().filter((key) => !spanish.has(key))).toEqual([]);
  });

  it('has no Spanish string English lacks, apart from plural forms', () => {
    const english = new Set(en.keys());
    expect(es.keys().filter((key) => !english.has(key) && !key.endsWith('_many'))).toEqual([]);
  });

  it('keeps each string in one part only, the same part in both languages', () => {
    const all = en.keys();
    expect(all.filter((key, index) => all.indexOf(key) !== index)).toEqual([]);
    enParts.forEach((part, index) => {
      const plain = (keys: string[]) => keys.map((key) => key.replace(/_(one|other|many)$/, '')).sort();
      expect([...new Set(plain(keysOf(esParts[index])))]).toEqual([...new Set(plain(keysOf(part)))]);
    });
  });
});
