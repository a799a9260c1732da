import { describe, expect, it } from 'vitest';
import { LOCALES } from '../../checklist/index.js';
import { interpretStopAnswer } from '../interpret-stop-answer.js';
import { interpretUtterance } from '../interpret-utterance.js';
import {
  CORPUS,
  corpusStopItems,
  isProblemTakenAsPass,
  isStopProblemTakenAsPass,
  meetsStopWant,
  meetsWant,
  STOP_CORPUS,
} from './corpus.js';

describe('interpreter corpus', () => {
  for (const locale of LOCALES) {
    it(`understands at least 99 % of the ${locale} corpus and never takes a problem as a pass`, () => {
      const entries = CORPUS[locale];
      const misses: string[] = [];
      const unsafe: string[] = [];
      for (const entry of entries) {
        const got = interpretUtterance(entry.alternatives, entry.expect, locale);
        const said = entry.alternatives.map((a) => a.transcript).join(' || ');
        if (!meetsWant(got, entry.want))
          misses.push(`${said} => wanted ${JSON.stringify(entry.want)}, got ${JSON.stringify(got)}`);
        if (isProblemTakenAsPass(got, entry.want)) unsafe.push(said);
      }
      const rate = (entries.length - misses.length) / entries.length;
      console.log(
        `${locale}: ${entries.length - misses.length}/${entries.length} correct (${(rate * 100).toFixed(1)} %)`,
      );
      for (const miss of misses) console.log(`  miss: ${miss}`);
      expect(unsafe).toEqual([]);
      expect(rate).toBeGreaterThanOrEqual(0.99);
    });
  }

  for (const locale of LOCALES) {
    it(`understands at least 99 % of the ${locale} stop answers and never passes a described problem`, () => {
      const entries = STOP_CORPUS[locale];
      const misses: string[] = [];
      const unsafe: string[] = [];
      for (const entry of entries) {
        const got = interpretStopAnswer(entry.alternatives, corpusStopItems(locale, entry.stop), locale);
        const said = `${entry.stop}: ${entry.alternatives.map((a) => a.transcript).join(' || ')}`;
        if (!meetsStopWant(got, entry.want))
          misses.push(`${said} => wanted ${JSON.stringify(entry.want)}, got ${JSON.stringify(got)}`);
        if (isStopProblemTakenAsPass(got, entry.want)) unsafe.push(said);
      }
      const rate = (entries.length - misses.length) / entries.length;
      console.log(
        `${locale} stops: ${entries.length - misses.length}/${entries.length} correct (${(rate * 100).toFixed(1)} %)`,
      );
      for (const miss of misses) console.log(`  miss: ${miss}`);
      expect(unsafe).toEqual([]);
      expect(rate).toBeGreaterThanOrEqual(0.99);
    });
  }

  it('has stop answers of every kind in both languages', () => {
    for (const locale of LOCALES) {
      expect(STOP_CORPUS[locale].length).toBeGreaterThanOrEqual(50);
      const kinds = new Set(
        STOP_CORPUS[locale].map((e) => (e.want.kind === 'stop' ? (e.want.marks[0]?.answer ?? 'pass') : e.want.kind)),
      );
      expect([...kinds].sort()).toEqual([
        'command',
        'defect',
        'fixed',
        'measurement',
        'not_applicable',
        'pass',
        'unclear',
        'which',
      ]);
    }
  });

  it('is large enough and covers every kind of answer', () => {
    expect(CORPUS.en.length).toBeGreaterThanOrEqual(250);
    expect(CORPUS.es.length).toBeGreaterThanOrEqual(200);
    const kinds = new Set(
      [...CORPUS.en, ...CORPUS.es].map((e) => (e.want.kind === 'answer' ? e.want.answer : e.want.kind)),
    );
    expect([...kinds].sort()).toEqual([
      'command',
      'defect',
      'fixed',
      'measurement',
      'no_gauge',
      'not_applicable',
      'pass',
      'unclear',
    ]);
  });
});
