import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { noise } from './corpus/noise.js';
import { buildChecklist, type Checklist, type Locale } from '../checklist/index.js';
import { sampleCombination } from '../testing.js';
import { interpretStopAnswer, itemsNamedIn } from './interpret-stop-answer.js';
import { measurementToWords } from '../numbers/index.js';
import type { Alternative, StopInterpretation, StopItemRef } from './types.js';

// Recogniser hypotheses, each with its confidence.
const hypotheses = (...heard: [string, number][]): Alternative[] =>
  heard.map(([transcript, confidence]) => ({ transcript, confidence }));

const wheel: StopItemRef[] = [
  {
    key: 'tire.inflation',
    names: ['tire pressure', 'tire inflation', 'flat', 'pressure', 'inflation', 'air'],
    expects: { type: 'measure', quantity: 'tire_pressure' },
  },
  { key: 'tire.condition', names: ['tire', 'tire condition', 'sidewall', 'valve stem'], expects: { type: 'check' } },
  {
    key: 'tire.tread',
    names: ['tread', 'tread depth', 'groove'],
    expects: { type: 'measure', quantity: 'tread_depth' },
  },
  { key: 'rim', names: ['rim', 'wheel rim'], expects: { type: 'check' } },
  { key: 'lugs', names: ['lug nuts', 'lug nut', 'lugs', 'studs'], expects: { type: 'check' } },
  { key: 'hub', names: ['hub', 'hub seal', 'hubcap', 'seal'], expects: { type: 'check' } },
];

const duals: StopItemRef[] = [
  { key: 'outer.condition', names: ['outer tire', 'tire', 'outside tire'], expects: { type: 'check' } },
  {
    key: 'outer.tread',
    names: ['outer tread', 'tread'],
    expects: { type: 'measure', quantity: 'tread_depth' },
  },
  { key: 'inner.condition', names: ['inner tire', 'tire', 'inside tire'], expects: { type: 'check' } },
  {
    key: 'inner.tread',
    names: ['inner tread', 'tread'],
    expects: { type: 'measure', quantity: 'tread_depth' },
  },
  { key: 'hub', names: ['hub', 'hub seal'], expects: { type: 'check' } },
];

const brake: StopItemRef[] = [
  { key: 'chamber', names: ['chamber', 'brake chamber', 'brake can'], expects: { type: 'check' } },
  { key: 'air.lines', names: ['air lines', 'air line', 'air hose', 'hoses', 'hose'], expects: { type: 'check' } },
  { key: 'slack', names: ['slack adjuster', 'slack', 'push rod', 'pushrod'], expects: { type: 'check' } },
  { key: 'stroke', names: ['stroke', 'pushrod stroke'], expects: { type: 'measure', quantity: 'pushrod_stroke' } },
  {
    key: 'lining',
    names: ['lining', 'linings', 'shoes', 'drum'],
    expects: { type: 'measure', quantity: 'lining_thickness' },
  },
];

const rueda: StopItemRef[] = [
  {
    key: 'tire.inflation',
    names: ['presión de la llanta', 'llanta ponchada', 'presión', 'inflado', 'aire'],
    expects: { type: 'measure', quantity: 'tire_pressure' },
  },
  { key: 'tire.condition', names: ['llanta', 'costado', 'válvula'], expects: { type: 'check' } },
  { key: 'tire.tread', names: ['dibujo', 'piso'], expects: { type: 'measure', quantity: 'tread_depth' } },
  { key: 'rim', names: ['rin', 'rines'], expects: { type: 'check' } },
  { key: 'lugs', names: ['tuercas', 'tuerca', 'birlos', 'birlo'], expects: { type: 'check' } },
  { key: 'hub', names: ['maza', 'sello de la maza', 'retén'], expects: { type: 'check' } },
];

const at = (items: readonly StopItemRef[], text: string, locale: Locale = 'en'): StopInterpretation =>
  interpretStopAnswer([{ transcript: text }], items, locale);

describe('interpretStopAnswer', () => {
  it('passes every item of the stop on good', () => {
    for (const text of ['good', 'all good', 'looks good', 'everything looks good', 'no leaks, cracks or cuts'])
      expect(at(wheel, text), text).toMatchObject({ kind: 'stop', marks: [] });
    for (const text of ['bien', 'todo bien', 'se ve bien', 'sin fugas ni grietas'])
      expect(at(rueda, text, 'es'), text).toMatchObject({ kind: 'stop', marks: [] });
  });

  it('marks the item named after good except, with the driver’s words, and passes the rest', () => {
    expect(at(wheel, 'good except the hub is leaking')).toEqual({
      kind: 'stop',
      marks: [{ itemKey: 'hub', answer: 'defect', detail: 'hub is leaking' }],
      heard: 'good except the hub is leaking',
    });
    expect(at(wheel, "All good, but the hub's leaking.")).toMatchObject({
      marks: [{ itemKey: 'hub', answer: 'defect', detail: "hub's leaking" }],
    });
    expect(at(wheel, 'good except the hub')).toMatchObject({ marks: [{ itemKey: 'hub', detail: 'hub' }] });
    expect(at(rueda, 'todo bien excepto la maza que está goteando', 'es')).toMatchObject({
      marks: [{ itemKey: 'hub', answer: 'defect', detail: 'maza que está goteando' }],
    });
  });

  it('marks a defect described without a good word', () => {
    expect(at(brake, 'defect, chafed air line')).toMatchObject({
      kind: 'stop',
      marks: [{ itemKey: 'air.lines', answer: 'defect', detail: 'chafed air line' }],
    });
    expect(at(brake, 'defect, air line')).toMatchObject({ marks: [{ itemKey: 'air.lines', detail: 'air line' }] });
    expect(at(wheel, 'the hub is leaking')).toMatchObject({ marks: [{ itemKey: 'hub', detail: 'hub is leaking' }] });
    expect(at(wheel, 'No, the hub is leaking')).toMatchObject({ marks: [{ itemKey: 'hub' }] });
    expect(at(wheel, 'two lug nuts are loose')).toMatchObject({
      marks: [{ itemKey: 'lugs', answer: 'defect', detail: 'two lug nuts are loose' }],
    });
    expect(at(rueda, 'defecto, rin doblado', 'es')).toMatchObject({
      marks: [{ itemKey: 'rim', detail: 'rin doblado' }],
    });
  });

  it('marks every exception said in one answer', () => {
    expect(at(wheel, "good except the hub's leaking and a lug nut is loose")).toMatchObject({
      kind: 'stop',
      marks: [
        { itemKey: 'hub', answer: 'defect', detail: "hub's leaking" },
        { itemKey: 'lugs', answer: 'defect', detail: 'lug nut is loose' },
      ],
    });
    expect(at(rueda, 'bien pero la maza tiene fuga y una tuerca está floja', 'es')).toMatchObject({
      marks: [
        { itemKey: 'hub', detail: 'maza tiene fuga' },
        { itemKey: 'lugs', detail: 'tuerca está floja' },
      ],
    });
    // More words about the item just named stay with it, a value among them.
    expect(at(wheel, 'the hub is leaking and it is loose')).toMatchObject({
      marks: [{ itemKey: 'hub', detail: 'hub is leaking and it is loose' }],
    });
    expect(at(duals, 'the inner tire is cut, five thirty-seconds')).toMatchObject({
      marks: [
        { itemKey: 'inner.condition', answer: 'defect' },
        { itemKey: 'inner.tread', answer: 'measurement' },
      ],
    });
    expect(at(duals, 'the outer tire is cut, five thirty-seconds')).toMatchObject({
      marks: [
        { itemKey: 'outer.condition', answer: 'defect' },
        { itemKey: 'outer.tread', answer: 'measurement' },
      ],
    });
  });

  it('asks which item when a problem names none or names words several items share', () => {
    expect(at(duals, 'good except the tire is cut')).toEqual({
      kind: 'which',
      detail: 'tire is cut',
      candidates: ['outer.condition', 'inner.condition'],
      heard: 'good except the tire is cut',
    });
    expect(at(wheel, 'good but something is leaking')).toMatchObject({
      kind: 'which',
      detail: 'something is leaking',
      candidates: [],
    });
    expect(at(wheel, 'defect')).toMatchObject({ kind: 'which', candidates: [] });
    expect(at(duals, 'good except the outer tire is cut')).toMatchObject({
      kind: 'stop',
      marks: [{ itemKey: 'outer.condition', detail: 'outer tire is cut' }],
    });
  });

  it('puts a reading on the item whose quantity it fits, the first one not marked where several do', () => {
    expect(at(wheel, 'good, ten thirty-seconds')).toMatchObject({
      kind: 'stop',
      marks: [{ itemKey: 'tire.tread', answer: 'measurement', measurement: { quantity: 'tread_depth', value: 10 } }],
    });
    expect(at(wheel, 'one hundred psi')).toMatchObject({
      marks: [{ itemKey: 'tire.inflation', measurement: { quantity: 'tire_pressure', value: 100 } }],
    });
    expect(at(wheel, 'good, one ten')).toMatchObject({ marks: [{ itemKey: 'tire.inflation' }] });
    expect(at(duals, 'eight thirty-seconds and nine thirty-seconds')).toMatchObject({
      marks: [
        { itemKey: 'outer.tread', measurement: { value: 8 } },
        { itemKey: 'inner.tread', measurement: { value: 9 } },
      ],
    });
    expect(at(duals, 'inner tread six thirty-seconds')).toMatchObject({
      marks: [{ itemKey: 'inner.tread', measurement: { value: 6 } }],
    });
    expect(at(brake, 'good, an inch and a half')).toMatchObject({
      marks: [{ itemKey: 'stroke', measurement: { quantity: 'pushrod_stroke', value: 1.5 } }],
    });
    expect(at(brake, 'good, a quarter inch')).toMatchObject({
      marks: [{ itemKey: 'lining', measurement: { quantity: 'lining_thickness', value: 0.25 } }],
    });
    expect(at(rueda, 'bien, ciento diez libras', 'es')).toMatchObject({
      marks: [{ itemKey: 'tire.inflation', measurement: { value: 110 } }],
    });
  });

  it('asks for the item when a value fits two quantities, and takes a self-correction’s last value', () => {
    expect(at(brake, 'good, three quarters of an inch')).toMatchObject({ kind: 'unclear', reason: 'item_needed' });
    expect(at(duals, 'siete, digo ocho', 'es')).toMatchObject({
      marks: [{ itemKey: 'outer.tread', measurement: { value: 8 } }],
    });
    expect(at(wheel, 'one ten, no, one twelve')).toMatchObject({ marks: [{ measurement: { value: 112 } }] });
    expect(at(wheel, 'ninety thirty-seconds')).toMatchObject({ kind: 'unclear', reason: 'implausible' });
  });

  it('marks an item said not to apply, and asks which when none is named', () => {
    expect(at(wheel, 'good, hubcap n/a')).toMatchObject({
      kind: 'stop',
      marks: [{ itemKey: 'hub', answer: 'not_applicable' }],
    });
    expect(at(rueda, 'rin no aplica', 'es')).toMatchObject({ marks: [{ itemKey: 'rim', answer: 'not_applicable' }] });
    expect(at(wheel, 'n/a')).toMatchObject({ kind: 'unclear', reason: 'item_needed' });
  });

  it('hears the commands, one by one among them', () => {
    const heard: [string, Locale, string][] = [
      ['one by one', 'en', 'one_by_one'],
      ['item by item', 'en', 'one_by_one'],
      ['uno por uno', 'es', 'one_by_one'],
      ['de uno en uno', 'es', 'one_by_one'],
      ['repeat', 'en', 'repeat'],
      ['back up one', 'en', 'back'],
      ['skip', 'en', 'skip'],
      ['pause', 'en', 'pause'],
      ['go on', 'en', 'resume'],
      ['note', 'en', 'note'],
      ['end note', 'en', 'end_note'],
      ['help', 'en', 'help'],
      ['where am I', 'en', 'where'],
      ['finish inspection', 'en', 'finish'],
      ['atrás uno', 'es', 'back'],
      ['sigue', 'es', 'resume'],
    ];
    for (const [text, locale, command] of heard)
      expect(at(locale === 'en' ? wheel : rueda, text, locale), text).toMatchObject({ kind: 'command', command });
    expect(at(wheel, 'in spanish')).toMatchObject({ kind: 'command', command: 'language', locale: 'es' });
  });

  it('hears a fix, reading its new value in the quantity it fits', () => {
    expect(at(wheel, 'fixed')).toEqual({ kind: 'fixed', action: '', heard: 'fixed' });
    expect(at(wheel, 'corrected, added air, now one ten')).toMatchObject({
      kind: 'fixed',
      action: 'added air',
      measurement: { quantity: 'tire_pressure', value: 110 },
    });
    expect(at(rueda, 'corregido, le puse aire, ahora ciento diez', 'es')).toMatchObject({
      action: 'le puse aire',
      measurement: { value: 110 },
    });
    expect(at(wheel, 'tightened the lug nuts')).toMatchObject({ kind: 'fixed', action: 'tightened the lug nuts' });
  });

  it('never passes on hedged or negated praise', () => {
    const said: [string, Locale][] = [
      ["I wouldn't say it's good", 'en'],
      ['not too good', 'en'],
      ['not so good', 'en'],
      ["it's not great", 'en'],
      ['could be better', 'en'],
      ['probably fine', 'en'],
      ['good, no', 'en'],
      ['no está muy bien', 'es'],
      ['no diría que está bien', 'es'],
      ['no tan bien', 'es'],
      ['creo que sí', 'es'],
    ];
    for (const [text, locale] of said) {
      const got = at(locale === 'en' ? wheel : rueda, text, locale);
      expect(got.kind === 'stop' && got.marks.length === 0, text).toBe(false);
      expect(['which', 'unclear'], text).toContain(got.kind);
    }
  });

  it('finds hesitations, half sentences and noise unclear', () => {
    expect(at(wheel, 'um')).toMatchObject({ kind: 'unclear', reason: 'filler' });
    expect(at(rueda, 'este', 'es')).toMatchObject({ kind: 'unclear', reason: 'filler' });
    expect(at(wheel, '')).toMatchObject({ kind: 'unclear', reason: 'empty' });
    expect(at(wheel, 'good but')).toMatchObject({ kind: 'unclear', reason: 'incomplete' });
    expect(at(wheel, 'the hub')).toMatchObject({ kind: 'unclear', reason: 'incomplete' });
    expect(at(wheel, 'purple monkey dishwasher')).toMatchObject({ kind: 'unclear', reason: 'not_understood' });
    expect(interpretStopAnswer([], wheel, 'en')).toEqual({ kind: 'unclear', reason: 'empty' });
  });

  it('never passes a stop on noise', () => {
    fc.assert(
      fc.property(noise, ([text, locale]) => {
        const got = at(locale === 'en' ? wheel : rueda, text, locale);
        expect(got.kind === 'stop' && got.marks.length === 0).toBe(false);
      }),
    );
  });

  it('finds hypotheses that disagree between a pass and a problem unclear', () => {
    const got = interpretStopAnswer(hypotheses(['good', 0.8], ['hub leaking', 0.4]), wheel, 'en');
    expect(got).toMatchObject({ kind: 'unclear', reason: 'disagreement' });
    expect(interpretStopAnswer(hypotheses(['all good', 0.8], ['all could', 0.4]), wheel, 'en')).toMatchObject({
      kind: 'stop',
      marks: [],
    });
  });
});

// Every stop of the demo pre-trip as the checklist builds it, with the names it gives its items.
describe('itemsNamedIn', () => {
  it('names the item a short reply points at', () => {
    expect(itemsNamedIn('the hub', wheel, 'en')).toEqual(['hub']);
    expect(itemsNamedIn('the outer tire', duals, 'en')).toEqual(['outer.condition']);
  });

  it('names every item a shared word fits, and none for words that name nothing', () => {
    expect(itemsNamedIn('tire', duals, 'en')).toEqual(['outer.condition', 'inner.condition']);
    expect(itemsNamedIn('no idea', wheel, 'en')).toEqual([]);
  });
});

function stopsOf(checklist: Checklist): StopItemRef[][] {
  return checklist.stops.map((stop) =>
    checklist.items
      .filter((item) => stop.itemKeys.includes(item.key))
      .map((item) => ({ key: item.key, names: item.names, expects: item.expects })),
  );
}

const TYPICAL = {
  tread_depth: [8, 'in/32'],
  tire_pressure: [105, 'psi'],
  air_pressure: [120, 'psi'],
  pushrod_stroke: [1.5, 'in'],
  lining_thickness: [0.25, 'in'],
  steering_lash: [2, 'in'],
  slack_angle: [90, 'deg'],
  leak_rate: [2, 'psi/min'],
} as const;

describe('interpretStopAnswer on every stop of the demo tractor and trailer pre-trip', () => {
  for (const locale of ['en', 'es'] as const) {
    const stops = stopsOf(buildChecklist(sampleCombination(), 'pre_trip', locale));
    const good = locale === 'en' ? 'good' : 'bien';

    it(`passes every stop on "${good}" in ${locale}`, () => {
      for (const items of stops) expect(at(items, good, locale)).toMatchObject({ kind: 'stop', marks: [] });
    });

    it(`ties a defect said with any name of an item to that item, or asks which, in ${locale}`, () => {
      for (const items of stops) {
        for (const item of items) {
          for (const name of item.names) {
            const text = locale === 'en' ? `good except the ${name} is damaged` : `todo bien excepto ${name} dañado`;
            const got = at(items, text, locale);
            const tied = got.kind === 'stop' && got.marks.some((m) => m.itemKey === item.key && m.answer === 'defect');
            const asked = got.kind === 'which' && got.candidates.includes(item.key);
            expect(tied || asked, `${text} => ${JSON.stringify(got)}`).toBe(true);
          }
        }
      }
    });

    it(`tells a tread depth from a tire pressure at every wheel end in ${locale}`, () => {
      const wheels = stops.filter((items) =>
        ['tread_depth', 'tire_pressure'].every((q) =>
          items.some((i) => i.expects.type === 'measure' && i.expects.quantity === q),
        ),
      );
      expect(wheels.length).toBeGreaterThan(0);
      const treads = Array.from({ length: 20 }, (_, i) => measurementToWords(i + 1, 'in/32', locale));
      const pressures = [80, 95, 100, 105, 110, 120].map((psi) => measurementToWords(psi, 'psi', locale));
      const gaugeStyle =
        locale === 'en' ? ['one ten', 'one oh five', 'ninety five'] : ['ciento diez', 'noventa y cinco'];
      for (const items of wheels) {
        for (const said of treads)
          expect(at(items, said, locale), said).toMatchObject({
            marks: [{ measurement: { quantity: 'tread_depth' } }],
          });
        for (const said of [...pressures, ...gaugeStyle])
          expect(at(items, said, locale), said).toMatchObject({
            marks: [{ measurement: { quantity: 'tire_pressure' } }],
          });
      }
    });

    it(`puts a typical reading on an item of its quantity in ${locale}`, () => {
      for (const items of stops) {
        const quantities = new Set(items.flatMap((i) => (i.expects.type === 'measure' ? [i.expects.quantity] : [])));
        for (const quantity of quantities) {
          const [value, unit] = TYPICAL[quantity];
          const text = `${good}, ${measurementToWords(value, unit, locale)}`;
          const got = at(items, text, locale);
          expect(got, text).toMatchObject({
            kind: 'stop',
            marks: [{ answer: 'measurement', measurement: { quantity } }],
          });
        }
      }
    });
  }
});
