import { describe, expect, it } from 'vitest';
import { buildChecklist } from './build-checklist.js';
import { sampleCombination, sampleTractor } from './fixtures.js';
import { INSPECTION_KINDS, type Checklist, type ChecklistStop } from './types.js';
import { checklistWords } from './words.js';

const preTrip = (locale: 'en' | 'es' = 'en') => buildChecklist(sampleCombination(), 'pre_trip', locale);
const words = (text: string) => text.split(/\s+/).filter(Boolean).length;
const stopOf = (checklist: Checklist, key: string): ChecklistStop => {
  const stop = checklist.stops.find((candidate) => candidate.key === key);
  if (!stop) throw new Error(`no stop ${key}`);
  return stop;
};

function expectStopsCoverItemsInOrder(checklist: Checklist): void {
  // Stops laid end to end give the items in walk order: every item in exactly one stop, each stop contiguous.
  expect(checklist.stops.flatMap((stop) => stop.itemKeys)).toEqual(checklist.items.map((item) => item.key));
  expect(new Set(checklist.stops.map((stop) => stop.key)).size).toBe(checklist.stops.length);
  const stopKeyOf = new Map(checklist.stops.flatMap((stop) => stop.itemKeys.map((key) => [key, stop.key])));
  for (const item of checklist.items) expect(item.stopKey, item.key).toBe(stopKeyOf.get(item.key));
  for (const stop of checklist.stops) {
    expect(stop.itemKeys.length, stop.key).toBeGreaterThan(0);
    for (const item of checklist.items.filter((candidate) => stop.itemKeys.includes(candidate.key))) {
      expect(item.zone, item.key).toBe(stop.zone);
      expect(item.unitIndex, item.key).toBe(stop.unitIndex);
    }
  }
}

describe('checklist stops for the demo tractor and trailer pre-trip', () => {
  it('puts every item in exactly one stop, stops contiguous and in walk order', () => {
    const checklist = preTrip();
    expect(checklist.items).toHaveLength(281);
    expectStopsCoverItemsInOrder(checklist);
  });

  it('walks 60 stops with a short prompt each: at most 14 words, 600 in all', () => {
    const checklist = preTrip();
    expect(checklist.stops).toHaveLength(60);
    for (const stop of checklist.stops) expect(words(stop.prompt), stop.prompt).toBeLessThanOrEqual(14);
    const total = checklist.stops.reduce((sum, stop) => sum + words(stop.prompt), 0);
    expect(total).toBeLessThanOrEqual(600);
    // One prompt per stop instead of one per item: far fewer words than the items' own prompts.
    expect(total).toBeLessThan(checklist.items.reduce((sum, item) => sum + words(item.prompt), 0) / 3);
  });

  it('groups a wheel end into wheel, brake and suspension, position said once', () => {
    const checklist = preTrip();
    const wheel = stopOf(checklist, 'u1.axle1.left.wheel');
    expect(wheel.label).toBe('Tractor, axle 1, left wheel');
    expect(wheel.prompt).toBe('Axle 1, left wheel: tire inflation, condition, tread, rim, lug nuts and hub.');
    expect(wheel.shortPrompt).toBe('Axle 1, left wheel?');
    expect(wheel.itemKeys).toEqual([
      'u1.axle1.left.tire.inflation',
      'u1.axle1.left.tire.condition',
      'u1.axle1.left.tire.tread',
      'u1.axle1.left.rim',
      'u1.axle1.left.lugs',
      'u1.axle1.left.hub',
    ]);
    const duals = stopOf(checklist, 'u2.axle2.left.wheel');
    expect(duals.prompt).toBe(
      "Axle 2, left duals: tires' inflation, condition, tread, rims, lug nuts, hub and spacing.",
    );
    expect(duals.itemKeys).toHaveLength(11);
    const brake = stopOf(checklist, 'u1.axle3.left.brake');
    expect(brake.prompt).toBe('Axle 3, left brake: chamber, air lines, slack adjuster, push-rod stroke and lining.');
    expect(brake.shortPrompt).toBe('Axle 3, left brake?');
    expect(stopOf(checklist, 'u1.axle3.left.suspension').itemKeys).toEqual([
      'u1.axle3.left.suspension.springs',
      'u1.axle3.left.suspension.mounts',
      'u1.axle3.left.suspension.ubolts',
      'u1.axle3.left.suspension.air_bags',
      'u1.axle3.left.suspension.shocks',
    ]);
  });

  it('says the unit only when the unit or the zone changes', () => {
    const { stops } = preTrip();
    stops.forEach((stop, index) => {
      const previous = stops[index - 1];
      const changed = !previous || previous.unitIndex !== stop.unitIndex || previous.zone !== stop.zone;
      const unit = stop.unitIndex === 0 ? 'Tractor' : 'Trailer';
      expect(stop.prompt.startsWith(`${unit}, `), stop.prompt).toBe(changed);
    });
    expect(stopOf(preTrip(), 'u1.engine').prompt).toBe(
      'Tractor, engine compartment: oil, coolant, power-steering fluid, belts, hoses and wiring.',
    );
    expect(stopOf(preTrip(), 'u2.coupling_lines').prompt).toBe(
      'Trailer, coupling lines: air lines and electrical line.',
    );
  });

  it('keeps the trade checks together: cab, air-brake tests, coupling and the trailer', () => {
    const checklist = preTrip();
    const keys = (stop: string) => stopOf(checklist, stop).itemKeys;
    expect(keys('u1.steering_wheel')).toEqual(['u1.steering.lash']);
    expect(keys('u1.emergency')).toEqual(['u1.emergency.extinguisher', 'u1.emergency.triangles', 'u1.emergency.fuses']);
    expect(keys('u1.air_leakage')).toEqual(['u1.air.leak_released', 'u1.air.leak_applied']);
    expect(keys('u1.fanning_down')).toEqual(['u1.air.low_air_warning', 'u1.air.spring_brakes']);
    expect(keys('u1.compressor')).toEqual(['u1.air.build_up', 'u1.air.governor_cut_out', 'u1.air.governor_cut_in']);
    expect(keys('u1.brake_tests')).toEqual(['u1.air.parking_brake', 'u1.air.service_brake']);
    expect(keys('u1.left.tank')).toEqual(['u1.left.fuel_tank', 'u1.left.battery_box']);
    expect(keys('u1.underneath')).toEqual(['u1.drive_shaft', 'u1.exhaust', 'u1.frame']);
    expect(keys('u2.fifth_wheel')).toHaveLength(6);
    expect(keys('u2.rear_lamps')).toContain('u2.rear.lights.conspicuity');
    expect(keys('u2.trailer_front')).toEqual(['u2.lights.front_clearance', 'u2.header']);
    expect(keys('u2.left.side')).toEqual([
      'u2.left.lights.side_markers',
      'u2.left.lights.side_reflectors',
      'u2.left.lights.conspicuity',
    ]);
  });

  it('never names a checklist group with an acronym', () => {
    for (const locale of ['en', 'es'] as const) {
      for (const stop of preTrip(locale).stops) {
        expect(stop.prompt, stop.key).not.toMatch(/\b[A-Z]{2,}\b/);
        expect(stop.prompt, stop.key).not.toMatch(/[{}]|\s{2}|undefined/);
      }
    }
  });
});

describe('item names inside a stop', () => {
  const namesAt = (stop: ChecklistStop, checklist: Checklist, word: string) =>
    checklist.items.filter((item) => stop.itemKeys.includes(item.key) && item.names.includes(word)).map((i) => i.key);

  it('lets "outer tire" and "inner rim" point at one item, and "tire" at both tires of a pair', () => {
    const checklist = preTrip();
    const duals = stopOf(checklist, 'u1.axle2.left.wheel');
    expect(namesAt(duals, checklist, 'outer tire')).toEqual(['u1.axle2.left.outer.tire.condition']);
    expect(namesAt(duals, checklist, 'inside tire')).toEqual(['u1.axle2.left.inner.tire.condition']);
    expect(namesAt(duals, checklist, 'inner rim')).toEqual(['u1.axle2.left.inner.rim']);
    expect(namesAt(duals, checklist, 'tire')).toEqual([
      'u1.axle2.left.outer.tire.condition',
      'u1.axle2.left.inner.tire.condition',
    ]);
    expect(namesAt(duals, checklist, 'hub')).toEqual(['u1.axle2.left.hub']);
    const outer = checklist.items.find((item) => item.key === 'u1.axle2.left.outer.tire.inflation');
    expect(outer?.name).toBe('outer tire inflation');
  });

  it('gives a single tire its plain names and no outer or inner', () => {
    const checklist = preTrip();
    const inflation = checklist.items.find((item) => item.key === 'u1.axle1.left.tire.inflation');
    expect(inflation?.name).toBe('tire inflation');
    expect(inflation?.names).toContain('tire pressure');
    expect(inflation?.names.some((name) => /outer|inner/.test(name))).toBe(false);
  });

  it('names the items in Spanish with Spanish words', () => {
    const checklist = preTrip('es');
    const duals = stopOf(checklist, 'u1.axle2.left.wheel');
    expect(namesAt(duals, checklist, 'llanta exterior')).toEqual(['u1.axle2.left.outer.tire.condition']);
    expect(namesAt(duals, checklist, 'rin de adentro')).toEqual(['u1.axle2.left.inner.rim']);
    expect(namesAt(duals, checklist, 'maza')).toEqual(['u1.axle2.left.hub']);
  });
});

describe('stops in every language and inspection kind', () => {
  it('keeps stop keys and their items the same in English and Spanish', () => {
    const en = preTrip('en');
    const es = preTrip('es');
    expect(es.stops.map((stop) => [stop.key, stop.itemKeys])).toEqual(
      en.stops.map((stop) => [stop.key, stop.itemKeys]),
    );
    expect(es.items.map((item) => item.stopKey)).toEqual(en.items.map((item) => item.stopKey));
  });

  it('has every stop template in Spanish, said in Spanish', () => {
    const en = checklistWords('en').stops.kinds;
    const es = checklistWords('es').stops.kinds;
    expect(Object.keys(es).sort()).toEqual(Object.keys(en).sort());
    for (const [kind, template] of Object.entries(en)) {
      const spanish = es[kind as keyof typeof es];
      expect(Object.keys(spanish.list).sort(), kind).toEqual(Object.keys(template.list).sort());
      expect(spanish.place, kind).not.toBe(template.place);
    }
    const stop = stopOf(preTrip('es'), 'u1.axle3.left.brake');
    expect(stop.prompt).toBe('Eje 3, freno izquierdo: cámara, líneas de aire, ajustador, carrera y balatas.');
    expect(stop.shortPrompt).toBe('¿Eje 3, freno izquierdo?');
    expect(stopOf(preTrip('es'), 'u1.front_lamps').prompt).toBe(
      'Luces delanteras: faros, direccionales, luces de gálibo e intermitentes.',
    );
  });

  it('gives post-trip, en-route and practice walk-arounds their stops', () => {
    for (const kind of INSPECTION_KINDS) {
      for (const locale of ['en', 'es'] as const) {
        const checklist = buildChecklist(sampleCombination(), kind, locale);
        expectStopsCoverItemsInOrder(checklist);
      }
    }
    const route = buildChecklist(sampleCombination(), 'en_route', 'en');
    // En route only what can change on the road: no tread, rim or dual spacing at the wheel.
    expect(stopOf(route, 'u1.axle1.left.wheel').prompt).toBe(
      'Axle 1, left wheel: tire inflation, condition, lug nuts and hub.',
    );
    expect(stopOf(route, 'u1.brakes_feel').prompt).toBe('Tractor, brakes on the road: firm and even, no pulling?');
  });

  it('gives a tractor alone the same tractor stops as with its trailer', () => {
    const alone = buildChecklist([sampleTractor()], 'pre_trip', 'en');
    expectStopsCoverItemsInOrder(alone);
    expect(alone.stops.map((stop) => stop.key)).toEqual(
      preTrip()
        .stops.filter((stop) => stop.unitIndex === 0)
        .map((stop) => stop.key),
    );
  });
});
