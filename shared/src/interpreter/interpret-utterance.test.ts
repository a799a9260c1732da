import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import type { Expectation, Locale } from '../checklist/index.js';
import { QUANTITIES, type Quantity } from '../units/index.js';
import { interpretFix, interpretUtterance } from './interpret-utterance.js';
import { interpretConfirmation } from './interpret-confirmation.js';
import { noise } from './corpus/noise.js';
import { measurementToWords } from '../numbers/index.js';
import { confirmOutOfLimitPrompt, readBackMeasurement, unclearPrompt } from './read-back.js';
import { UNCLEAR_REASONS, type Alternative, type Interpretation, type SpokenMeasurement } from './types.js';

const check: Expectation = { type: 'check' };
const measure = (quantity: Quantity): Expectation => ({ type: 'measure', quantity });
const say = (text: string, expectation: Expectation = check, locale: Locale = 'en'): Interpretation =>
  interpretUtterance([{ transcript: text }], expectation, locale);
// Recogniser hypotheses, each with its confidence.
const hypotheses = (...heard: [string, number][]): Alternative[] =>
  heard.map(([transcript, confidence]) => ({ transcript, confidence }));
// A tread depth said in 32nds, as the interpreter returns it.
const treadIn32 = (value: number): SpokenMeasurement => ({
  quantity: 'tread_depth',
  value,
  unit: 'in/32',
  said: { value, unit: 'in/32' },
});

describe('interpretUtterance', () => {
  it('takes the many ways of saying fine as a pass', () => {
    for (const text of ['good', 'looks good', 'checks out', 'yep', 'no problems', 'good to go']) {
      expect(say(text)).toMatchObject({ kind: 'answer', answer: 'pass' });
    }
    for (const text of ['bien', 'todo bien', 'está bien', 'correcto', 'sin problemas']) {
      expect(say(text, check, 'es')).toMatchObject({ kind: 'answer', answer: 'pass' });
    }
  });

  it('takes a negated problem as a pass', () => {
    expect(say('no leaks')).toMatchObject({ answer: 'pass' });
    expect(say('nothing loose')).toMatchObject({ answer: 'pass' });
    expect(say('sin fugas', check, 'es')).toMatchObject({ answer: 'pass' });
    expect(say('nada suelto', check, 'es')).toMatchObject({ answer: 'pass' });
  });

  it('never takes a negated good word as a pass', () => {
    for (const text of ['not good', 'not okay', 'no not good', 'isnt right'])
      expect(say(text)).not.toMatchObject({ answer: 'pass' });
    expect(say('no está bien', check, 'es')).not.toMatchObject({ answer: 'pass' });
  });

  it('reports a defect with what was said about it, even next to a good word', () => {
    expect(say('defect cracked lens')).toEqual({
      kind: 'answer',
      answer: 'defect',
      detail: 'cracked lens',
      heard: 'defect cracked lens',
    });
    expect(say('good except the lens is cracked')).toMatchObject({ answer: 'defect', detail: 'the lens is cracked' });
    expect(say('tiene una fuga', check, 'es')).toMatchObject({ answer: 'defect', detail: 'tiene una fuga' });
  });

  it('treats a no before a pause as an answer, not a negation', () => {
    expect(say('no, it is leaking')).toMatchObject({ answer: 'defect' });
    expect(say('no, está roto', check, 'es')).toMatchObject({ answer: 'defect' });
    expect(say('no está roto', check, 'es')).toMatchObject({ answer: 'pass' });
  });

  it('finds hesitations, hedges and half sentences unclear', () => {
    expect(say('um')).toMatchObject({ kind: 'unclear', reason: 'filler' });
    expect(say('este pues', check, 'es')).toMatchObject({ kind: 'unclear', reason: 'filler' });
    expect(say('good but')).toMatchObject({ kind: 'unclear', reason: 'incomplete' });
    expect(say('probably fine')).toMatchObject({ kind: 'unclear', reason: 'hedged' });
    expect(say('the lens is')).toMatchObject({ kind: 'unclear' });
    expect(say('')).toMatchObject({ kind: 'unclear', reason: 'empty' });
  });

  it('hears commands, including a language switch in either language', () => {
    expect(say('okay repeat that please')).toMatchObject({ kind: 'command', command: 'repeat' });
    expect(say('go back')).toMatchObject({ command: 'back' });
    expect(say('stop recording')).toMatchObject({ command: 'end_note' });
    expect(say('en español')).toEqual({ kind: 'command', command: 'language', locale: 'es', heard: 'en español' });
    expect(say('cambiar a inglés', check, 'es')).toMatchObject({ command: 'language', locale: 'en' });
  });

  it('reads measurements in words, digits, fractions and gauge style into canonical units', () => {
    expect(say('for thirty seconds', measure('tread_depth'))).toMatchObject({
      measurement: { value: 4, unit: 'in/32' },
    });
    expect(say("tread's at six", measure('tread_depth'))).toMatchObject({ measurement: { value: 6 } });
    expect(say('one ten', measure('tire_pressure'))).toMatchObject({ measurement: { value: 110, unit: 'psi' } });
    expect(say('7 bar', measure('tire_pressure'))).toMatchObject({ measurement: { value: 101.5264 } });
    expect(say('one and three quarter inches', measure('pushrod_stroke'))).toMatchObject({
      measurement: { value: 1.75, unit: 'in' },
    });
    expect(say('dos pulgadas', measure('steering_lash'), 'es')).toMatchObject({ measurement: { value: 2 } });
    expect(say('cinco de 32', measure('tread_depth'), 'es')).toMatchObject({ measurement: { value: 5 } });
    expect(say('two psi a minute', measure('leak_rate'))).toMatchObject({ measurement: { value: 2, unit: 'psi/min' } });
  });

  it('finds a value far outside the sensible range unclear', () => {
    expect(say('90/32', measure('tread_depth'))).toMatchObject({ kind: 'unclear', reason: 'implausible' });
    expect(say('ten degrees', measure('steering_lash'))).toMatchObject({ kind: 'unclear', reason: 'unit_mismatch' });
  });

  it('takes good on a measured item as a pass checked without a reading, and wants good or defect on a check item', () => {
    expect(say('good', measure('tread_depth'))).toEqual({ kind: 'answer', answer: 'pass', heard: 'good' });
    expect(say('todo bien', measure('tire_pressure'), 'es')).toMatchObject({ kind: 'answer', answer: 'pass' });
    expect(say('one ten')).toMatchObject({ kind: 'unclear', reason: 'number_for_check' });
    expect(say('no aplica', measure('tread_depth'), 'es')).toMatchObject({ answer: 'not_applicable' });
  });

  it('finds hypotheses that disagree between a pass and a problem unclear', () => {
    const got = interpretUtterance(hypotheses(['looks good', 0.8], ['looks cut', 0.3]), check, 'en');
    expect(got).toMatchObject({ kind: 'unclear', reason: 'disagreement' });
  });

  it('keeps the best value unless a close hypothesis hears another', () => {
    const far = hypotheses(['five thirty seconds', 0.9], ['nine thirty seconds', 0.3]);
    expect(interpretUtterance(far, measure('tread_depth'), 'en')).toMatchObject({ measurement: { value: 5 } });
    const close = hypotheses(['five thirty seconds', 0.6], ['nine thirty seconds', 0.55]);
    expect(interpretUtterance(close, measure('tread_depth'), 'en')).toMatchObject({
      kind: 'unclear',
      reason: 'disagreement',
    });
  });

  it('never answers pass to noise', () => {
    fc.assert(
      fc.property(noise, ([text, locale]) => {
        const got = interpretUtterance([{ transcript: text }], measure('tread_depth'), locale);
        expect(got.kind === 'answer' && got.answer === 'pass').toBe(false);
      }),
    );
  });
});

describe('interpretUtterance: what a driver says at a measured check', () => {
  it('hears that there is no gauge only where a reading is asked for', () => {
    for (const text of ['no gauge', "don't have a gauge", 'good, no gauge', 'I do not have a gauge', 'no gauge today'])
      expect(say(text, measure('tire_pressure'))).toMatchObject({ kind: 'no_gauge' });
    for (const text of ['no tengo manómetro', 'no tengo medidor', 'sin manómetro'])
      expect(say(text, measure('tread_depth'), 'es')).toMatchObject({ kind: 'no_gauge' });
    // On a check item the gauge itself may be what is missing.
    expect(say('no gauge')).toMatchObject({ kind: 'answer', answer: 'defect' });
    expect(say('no gauge but the sidewall is cut', measure('tread_depth'))).toMatchObject({ answer: 'defect' });
    expect(say('no gauge, about a hundred', measure('tire_pressure'))).toMatchObject({ measurement: { value: 100 } });
  });

  it('takes the last value after a word that takes one back', () => {
    expect(say('a little over a quarter, say five sixteenths', measure('tread_depth'))).toMatchObject({
      kind: 'measurement',
      measurement: { value: 10, unit: 'in/32', said: { value: 0.3125, unit: 'in' } },
    });
    expect(say('one ten, no, one twelve', measure('tire_pressure'))).toMatchObject({ measurement: { value: 112 } });
    expect(say('five, I mean six', measure('tread_depth'))).toMatchObject({ measurement: { value: 6 } });
    expect(say('seis, digo siete treintaidosavos', measure('tread_depth'), 'es')).toMatchObject({
      measurement: { value: 7 },
    });
    expect(say('ciento diez, perdón, ciento cinco', measure('tire_pressure'), 'es')).toMatchObject({
      measurement: { value: 105 },
    });
  });

  it('keeps two values without a correcting word unclear', () => {
    expect(say('five, six', measure('tread_depth'))).toMatchObject({ kind: 'unclear', reason: 'several_values' });
    expect(say('seis o siete', measure('tread_depth'), 'es')).toMatchObject({ reason: 'several_values' });
    // "No" with no value after it takes nothing back.
    expect(say('one ten no leaks', measure('tire_pressure'))).toMatchObject({ measurement: { value: 110 } });
  });
});

describe('interpretUtterance: hedged or negated praise', () => {
  const hedged = {
    en: [
      "I wouldn't say it's good",
      'not too good',
      'not so good',
      "it's not great",
      'could be better',
      "I don't think it's good",
      'not exactly fine',
      'far from good',
    ],
    es: [
      'no está muy bien',
      'no diría que está bien',
      'no tan bien',
      'no creo que esté bien',
      'no del todo bien',
      'yo no diría que está bien',
    ],
  } as const;
  for (const locale of ['en', 'es'] as const) {
    it(`is never a pass in ${locale}`, () => {
      for (const text of hedged[locale]) {
        for (const expectation of [check, measure('tread_depth')]) {
          const got = say(text, expectation, locale);
          expect(got.kind === 'unclear' || (got.kind === 'answer' && got.answer === 'defect'), text).toBe(true);
        }
      }
    });
  }
});

describe('interpretUtterance: commands', () => {
  it('hears back, resume, repeat and one by one in the ways drivers say them', () => {
    const heard: [string, Locale, string][] = [
      ['back up one', 'en', 'back'],
      ['go back one', 'en', 'back'],
      ['previous', 'en', 'back'],
      ['atrás uno', 'es', 'back'],
      ['regresa uno', 'es', 'back'],
      ['go on', 'en', 'resume'],
      ['continue', 'en', 'resume'],
      ['carry on', 'en', 'resume'],
      ['sigue', 'es', 'resume'],
      ['continúa', 'es', 'resume'],
      ['say again', 'en', 'repeat'],
      ['come again', 'en', 'repeat'],
      ['otra vez', 'es', 'repeat'],
      ['repite', 'es', 'repeat'],
      ['one by one', 'en', 'one_by_one'],
      ['item by item', 'en', 'one_by_one'],
      ['uno por uno', 'es', 'one_by_one'],
      ['de uno en uno', 'es', 'one_by_one'],
    ];
    for (const [text, locale, command] of heard) {
      expect(say(text, check, locale), text).toMatchObject({ kind: 'command', command });
      expect(say(text, measure('tread_depth'), locale), text).toMatchObject({ kind: 'command', command });
    }
  });

  it('keeps a hesitation alone unclear and a tread separation a defect', () => {
    for (const [text, locale] of [
      ['um', 'en'],
      ['uh', 'en'],
      ['este', 'es'],
      ['eh', 'es'],
    ] as const)
      expect(say(text, check, locale)).toMatchObject({ kind: 'unclear', reason: 'filler' });
    expect(say('tread separation')).toMatchObject({ answer: 'defect' });
  });
});

describe('fixed on the spot', () => {
  it('hears a fix with what was done, without the word that announced it', () => {
    expect(say('fixed')).toEqual({ kind: 'fixed', action: '', heard: 'fixed' });
    expect(say('fixed it')).toMatchObject({ kind: 'fixed', action: '' });
    expect(say('corrected, added air', measure('tire_pressure'))).toMatchObject({ kind: 'fixed', action: 'added air' });
    expect(say('replaced the bulb')).toMatchObject({ kind: 'fixed', action: 'replaced the bulb' });
    expect(say('okay, I tightened the lug nuts')).toMatchObject({ kind: 'fixed', action: 'tightened the lug nuts' });
    expect(say('arreglado', check, 'es')).toMatchObject({ kind: 'fixed', action: '' });
    expect(say('corregido, le puse aire', measure('tire_pressure'), 'es')).toMatchObject({
      kind: 'fixed',
      action: 'le puse aire',
    });
    expect(say('cambié el foco', check, 'es')).toMatchObject({ kind: 'fixed', action: 'cambié el foco' });
    // Praise after the fix is not what was done.
    expect(say('fixed it, good now')).toMatchObject({ kind: 'fixed', action: '' });
    expect(say('replaced the bulb, works now')).toMatchObject({ kind: 'fixed', action: 'replaced the bulb' });
  });

  it("reads the new reading in the item's quantity", () => {
    expect(say('corrected, added air, now one ten', measure('tire_pressure'))).toMatchObject({
      kind: 'fixed',
      action: 'added air',
      measurement: { quantity: 'tire_pressure', value: 110 },
    });
    expect(say('le puse aire, ahora ciento diez', measure('tire_pressure'), 'es')).toMatchObject({
      action: 'le puse aire',
      measurement: { value: 110 },
    });
    expect(say('aired it up to one ten', measure('tire_pressure'))).toMatchObject({
      action: 'aired it up',
      measurement: { value: 110 },
    });
    expect(say('added air, one ten, no, one fifteen', measure('tire_pressure'))).toMatchObject({
      measurement: { value: 115 },
    });
    // A check item has no reading: the number is part of what was done.
    expect(say('tightened two lug nuts')).toEqual({
      kind: 'fixed',
      action: 'tightened two lug nuts',
      heard: 'tightened two lug nuts',
    });
  });

  it('takes a fix that did not happen as a defect and a hedged one as unclear', () => {
    for (const text of ['not fixed', "couldn't fix it", "I didn't fix it"])
      expect(say(text)).toMatchObject({ kind: 'answer', answer: 'defect' });
    expect(say('no lo pude arreglar', check, 'es')).toMatchObject({ answer: 'defect' });
    expect(say('fixed, probably')).toMatchObject({ kind: 'unclear', reason: 'hedged' });
  });

  it('is offered to the voice loop after a defect as interpretFix', () => {
    expect(interpretFix([{ transcript: 'added air, now one twelve' }], 'tire_pressure', 'en')).toMatchObject({
      kind: 'fixed',
      action: 'added air',
      measurement: { value: 112 },
    });
    expect(interpretFix([{ transcript: 'fixed' }], undefined, 'en')).toMatchObject({ kind: 'fixed' });
    expect(interpretFix([{ transcript: 'still leaking' }], undefined, 'en')).toBeUndefined();
    expect(interpretFix([{ transcript: 'good' }], 'tire_pressure', 'en')).toBeUndefined();
    expect(interpretFix([], undefined, 'en')).toBeUndefined();
  });
});

const SAMPLES: Record<Quantity, number[]> = {
  tread_depth: [0, 1, 2, 4, 5, 11, 32],
  tire_pressure: [0, 85, 105, 110, 125],
  air_pressure: [55, 60, 100, 120, 135],
  lining_thickness: [0.0625, 0.125, 0.1875, 0.25, 0.5, 0.75],
  pushrod_stroke: [1, 1.25, 1.375, 1.75, 2, 2.5],
  steering_lash: [0.5, 2, 2.25, 2.375, 4.25, 5.75],
  slack_angle: [45, 90, 100],
  leak_rate: [0, 1, 2, 3.5],
};

describe('read-backs', () => {
  it('says the value the way the trade says it', () => {
    const m = treadIn32(5);
    expect(readBackMeasurement(m, 'en')).toBe('Five thirty-seconds. Is that right?');
    expect(readBackMeasurement(m, 'es')).toBe('Cinco treintaidosavos. ¿Es correcto?');
    expect(measurementToWords(1.75, 'in', 'en')).toBe('one and three quarter inches');
    expect(measurementToWords(1.75, 'in', 'es')).toBe('una pulgada y tres cuartos');
    expect(measurementToWords(4, 'mm', 'en')).toBe('four millimetres');
  });

  for (const locale of ['en', 'es'] as const) {
    it(`reads back every quantity in ${locale} in words that are heard as the same value`, () => {
      for (const quantity of QUANTITIES) {
        for (const value of SAMPLES[quantity]) {
          const heard = say(measurementToWords(value, canonical(quantity), locale), measure(quantity), locale);
          expect(heard, `${quantity} ${value}`).toMatchObject({ kind: 'measurement', measurement: { value } });
        }
      }
    });
  }

  it('asks to confirm an out-of-limit value with the limit in the sentence', () => {
    const m = treadIn32(2);
    const prompt = confirmOutOfLimitPrompt(m, 'A steer tire needs at least 4/32.', 'en');
    expect(prompt).toContain('two thirty-seconds');
    expect(prompt).toContain('A steer tire needs at least 4/32.');
  });

  it('has a re-ask sentence for every unclear reason in both languages', () => {
    for (const reason of UNCLEAR_REASONS) {
      expect(unclearPrompt(reason, 'en')).toMatch(/\w/);
      expect(unclearPrompt(reason, 'es')).toMatch(/\w/);
    }
  });
});

function canonical(quantity: Quantity): 'in/32' | 'psi' | 'in' | 'deg' | 'psi/min' {
  const units = {
    tread_depth: 'in/32',
    tire_pressure: 'psi',
    air_pressure: 'psi',
    lining_thickness: 'in',
    pushrod_stroke: 'in',
    steering_lash: 'in',
    slack_angle: 'deg',
    leak_rate: 'psi/min',
  } as const;
  return units[quantity];
}

describe('interpretConfirmation', () => {
  const pending = treadIn32(2);

  it('confirms on yes and corrects on no, with the new value when said', () => {
    expect(interpretConfirmation([{ transcript: 'yes' }], 'en', pending)).toMatchObject({ kind: 'confirm' });
    expect(interpretConfirmation([{ transcript: 'sí, correcto' }], 'es', pending)).toMatchObject({ kind: 'confirm' });
    expect(interpretConfirmation([{ transcript: 'no' }], 'en', pending)).toEqual({ kind: 'correct', heard: 'no' });
    expect(interpretConfirmation([{ transcript: 'no its six' }], 'en', pending)).toMatchObject({
      kind: 'correct',
      measurement: { value: 6 },
    });
    expect(interpretConfirmation([{ transcript: 'seis' }], 'es', pending)).toMatchObject({
      kind: 'correct',
      measurement: { value: 6 },
    });
  });

  it('confirms when the same value is said again and is unclear otherwise', () => {
    expect(interpretConfirmation([{ transcript: 'yes two thirty seconds' }], 'en', pending)).toMatchObject({
      kind: 'confirm',
    });
    expect(interpretConfirmation([{ transcript: 'um' }], 'en', pending)).toMatchObject({ kind: 'unclear' });
    expect(interpretConfirmation(hypotheses(['yes', 0.6], ['no', 0.5]), 'en', pending)).toMatchObject({
      kind: 'unclear',
      reason: 'disagreement',
    });
  });
});
