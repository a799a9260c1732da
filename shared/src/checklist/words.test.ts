import { describe, expect, it } from 'vitest';
import { fillTemplate, formatMeasure, verdictWords } from './measure-words.js';
import { checklistWords } from './words.js';

// Lists of words a driver may say (an item's names, the words for an outer or inner tire): each
// language has as many as it uses, so they are compared as whole lists, not entry by entry.
const SPOKEN_LISTS = /^(items\.[\w.]+\.names|stops\.duals\.\w+)$/;

// Every string of a words file with its path, to compare the two languages leaf by leaf.
function leaves(value: unknown, path = ''): Map<string, string> {
  const out = new Map<string, string>();
  if (typeof value === 'string') {
    out.set(path, value);
  } else if (Array.isArray(value) && SPOKEN_LISTS.test(path)) {
    out.set(path, value.join(' | '));
  } else if (Array.isArray(value)) {
    value.forEach((entry, index) => leaves(entry, `${path}[${index}]`).forEach((v, k) => out.set(k, v)));
  } else if (value && typeof value === 'object') {
    for (const [key, entry] of Object.entries(value))
      leaves(entry, path ? `${path}.${key}` : key).forEach((v, k) => out.set(k, v));
  }
  return out;
}

const placeholders = (text: string) => [...new Set([...text.matchAll(/\{(\w+)\}/g)].map((m) => m[1]))].sort();

describe('checklist words', () => {
  const en = leaves({ ...checklistWords('en'), ...verdictWords('en') });
  const es = leaves({ ...checklistWords('es'), ...verdictWords('es') });

  it('has the same texts in Spanish as in English, none empty', () => {
    expect([...es.keys()].sort()).toEqual([...en.keys()].sort());
    for (const [path, text] of [...en, ...es]) {
      expect(text.trim(), path).not.toBe('');
    }
  });

  it('uses the same placeholders in both languages', () => {
    for (const [path, text] of en) {
      expect(placeholders(es.get(path) ?? ''), path).toEqual(placeholders(text));
    }
  });

  it('gives every item a name and words to point at it, in each language its own', () => {
    for (const locale of ['en', 'es'] as const) {
      for (const [id, item] of Object.entries(checklistWords(locale).items)) {
        expect(item.name.trim(), `${locale} ${id}`).not.toBe('');
        expect(item.names.length, `${locale} ${id}`).toBeGreaterThan(0);
        for (const name of item.names) expect(name, `${locale} ${id}`).toMatch(/^[^A-Z]*\S$/);
      }
    }
  });

  it('translates the item titles and prompts', () => {
    const items = [...en.keys()].filter((path) => path.startsWith('items.') && !path.endsWith('.short'));
    const same = items.filter((path) => en.get(path) === es.get(path));
    expect(same).toEqual([]);
  });
});

describe('fillTemplate', () => {
  it('fills placeholders and tidies the gap an empty one leaves', () => {
    expect(
      fillTemplate('{unit}, axle {axle}, {side} {dual} {part}', {
        unit: 'Tractor',
        axle: 1,
        side: 'left',
        dual: '',
        part: 'tire',
      }),
    ).toBe('Tractor, axle 1, left tire');
  });
  it('throws on a placeholder without a value', () => {
    expect(() => fillTemplate('{position}. Check {thing}.', { position: 'Cab' })).toThrow(/thing/);
  });
});

describe('formatMeasure', () => {
  it('says units in words with singular and plural', () => {
    expect(formatMeasure(1, 'in', 'en')).toBe('1 inch');
    expect(formatMeasure(2.5, 'in', 'en')).toBe('2.5 inches');
    expect(formatMeasure(2.5, 'in', 'es')).toBe('2,5 pulgadas');
    expect(formatMeasure(4, 'in/32', 'es')).toBe('4 treintaidosavos');
  });
});
