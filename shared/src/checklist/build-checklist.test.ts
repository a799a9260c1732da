import { describe, expect, it } from 'vitest';
import { evaluateMeasurement } from '../limits/index.js';
import { CANONICAL_UNITS } from '../units/index.js';
import type { VehicleInput } from '../vehicle/index.js';
import { ChecklistError, buildChecklist } from './build-checklist.js';
import { chamberCode } from './chamber-code.js';
import { sampleCombination, sampleTractor, sampleTrailer } from './fixtures.js';
import { ZONE_KEYS, type ChecklistItem } from './types.js';

const preTrip = () => buildChecklist(sampleCombination(), 'pre_trip', 'en');
const byKey = (items: ChecklistItem[], key: string) => {
  const item = items.find((candidate) => candidate.key === key);
  if (!item) throw new Error(`no item ${key}`);
  return item;
};

describe('buildChecklist for the sample tractor and trailer', () => {
  it('walks the zones in route order, each zone in one stretch', () => {
    const checklist = preTrip();
    expect(checklist.zones.map((zone) => zone.key)).toEqual([...ZONE_KEYS]);
    const zoneSequence = checklist.items.map((item) => item.zone).filter((zone, i, all) => zone !== all[i - 1]);
    expect(zoneSequence).toEqual([...ZONE_KEYS]);
  });

  it('walks the left side front to back and the right side back to front', () => {
    const { items } = preTrip();
    const axlesOn = (zone: string) =>
      items.filter((item) => item.zone === zone && item.position).map((item) => item.position?.axleIndex ?? -1);
    const left = axlesOn('left_side');
    const right = axlesOn('right_side');
    expect(left).toEqual([...left].sort((a, b) => a - b));
    expect(right).toEqual([...right].sort((a, b) => b - a));
    expect(new Set(left)).toEqual(new Set([0, 1, 2]));
  });

  it('gives unique keys that name the wheel end', () => {
    const { items } = preTrip();
    expect(new Set(items.map((item) => item.key)).size).toBe(items.length);
    const tread = byKey(items, 'u2.axle2.right.outer.tire.tread');
    expect(tread.positionLabel).toBe('Trailer, axle 2, right outer tire');
    expect(tread.expects).toEqual({ type: 'measure', quantity: 'tread_depth' });
    expect(tread.limitContext).toEqual({ axle: 'trailer' });
    expect(tread.position).toEqual({ unitIndex: 1, axleIndex: 1, side: 'right', dual: 'outer' });
    expect(tread.safety).toBe(true);
    expect(tread.points[0]).toBe('tread depth at least 2 thirty-seconds in every major groove');
  });

  it('puts the steer tire limit of 4/32 in its points', () => {
    // 49 CFR 393.75(b): steer tires at least 4/32 in.
    const steer = byKey(preTrip().items, 'u1.axle1.left.tire.tread');
    expect(steer.positionLabel).toBe('Tractor, axle 1, left tire');
    expect(steer.limitContext).toEqual({ axle: 'steer' });
    expect(steer.points[0]).toMatch(/at least 4 thirty-seconds/);
  });

  it('gives each air brake its chamber, lines, slack adjuster, stroke and lining', () => {
    const { items } = preTrip();
    const slack = byKey(items, 'u1.axle2.left.brake.slack');
    expect(slack.points).toEqual(['not broken', 'not loose', 'not missing', 'push rod under 1 inch of free play']);
    expect(slack.expects).toEqual({ type: 'check' });
    const stroke = byKey(items, 'u1.axle1.right.brake.stroke');
    expect(stroke.limitContext).toEqual({ axle: 'steer', brake: 'air_drum', chamber: 'type-20-long' });
    // 49 CFR 393.47(e): type 20 long stroke, 2 in.
    expect(stroke.points[0]).toBe('push-rod stroke not more than 2 inches with the brakes applied');
    expect(byKey(items, 'u2.axle1.left.brake.lining').limitContext).toEqual({ axle: 'trailer', brake: 'air_drum' });
    expect(byKey(items, 'u1.axle3.left.brake.chamber').category).toBe('brakes');
  });

  it("takes tire pressure context from the axle's tire spec", () => {
    const inflation = byKey(preTrip().items, 'u1.axle2.left.inner.tire.inflation');
    expect(inflation.limitContext).toEqual({ axle: 'drive', specPsi: 100, sidewallMaxPsi: 105 });
    expect(inflation.points[0]).toBe('properly inflated, at 100 psi or more');
  });

  it('measures steering lash with the wheel diameter and steering type of the vehicle', () => {
    const lash = byKey(preTrip().items, 'u1.steering.lash');
    expect(lash.zone).toBe('cab');
    expect(lash.limitContext).toEqual({ axle: 'steer', wheelDiameterIn: 20, steering: 'power' });
    // 49 CFR 393.209(b): 20 in power steering, 5-1/4 in.
    expect(lash.points[0]).toBe('free play at the rim not more than 5.25 inches');
  });

  it('measures the air checks with their check and the combination', () => {
    const { items } = preTrip();
    expect(byKey(items, 'u1.air.governor_cut_in').limitContext).toEqual({ check: 'governor_cut_in' });
    expect(byKey(items, 'u1.air.governor_cut_out').expects).toEqual({ type: 'measure', quantity: 'air_pressure' });
    expect(byKey(items, 'u1.air.low_air_warning').limitContext).toEqual({ check: 'low_air_warning' });
    expect(byKey(items, 'u1.air.spring_brakes').limitContext).toEqual({ check: 'spring_brake' });
    expect(byKey(items, 'u1.air.leak_released').limitContext).toEqual({ brakesApplied: false, vehicle: 'combination' });
    expect(byKey(items, 'u1.air.leak_applied').limitContext).toEqual({ brakesApplied: true, vehicle: 'combination' });
    const alone = buildChecklist([sampleTractor()], 'pre_trip', 'en');
    expect(byKey(alone.items, 'u1.air.leak_released').limitContext?.vehicle).toBe('single');
    // CDL manual section 5: released, single vehicle, under 2 psi/min.
    expect(byKey(alone.items, 'u1.air.leak_released').points[1]).toBe('air loss under 2 psi per minute');
  });

  it('judges every measurement item with its own limit context', () => {
    const measured = preTrip().items.filter((item) => item.expects.type === 'measure');
    expect(measured.length).toBeGreaterThan(50);
    for (const item of measured) {
      if (item.expects.type !== 'measure') continue;
      const result = evaluateMeasurement(item.expects.quantity, 1, unitFor(item), item.limitContext ?? {});
      expect(['ok', 'near_limit', 'out_of_limit']).toContain(result.verdict);
    }
  });

  it('lists the lamps of 393.11 for a tractor and for a trailer', () => {
    // 49 CFR 393.11, Table 1.
    const { items } = preTrip();
    const lamps = (unitIndex: number) =>
      new Set(
        items
          .filter((i) => i.unitIndex === unitIndex && i.category === 'lights')
          .map((i) => i.key.replace(/^u\d\.((left|right|rear)\.)?/, '')),
      );
    const lightsKeys = (...names: string[]): unknown => expect.arrayContaining(names.map((name) => `lights.${name}`));
    // Both units carry these.
    const sideAndRear = ['side_markers', 'side_reflectors', 'tail', 'stop', 'rear_turn', 'rear_reflectors', 'plate'];
    const tractor = [...lamps(0)];
    expect(tractor).toEqual(
      lightsKeys('headlamps', 'front_turn', 'front_clearance', 'hazard', ...sideAndRear, 'backup'),
    );
    const trailer = [...lamps(1)];
    expect(trailer).toEqual(lightsKeys('front_clearance', 'rear_clearance', ...sideAndRear, 'conspicuity'));
    expect(trailer).not.toContain('lights.headlamps');
  });

  it('checks the coupling with the fifth wheel, lines and landing gear', () => {
    const coupling = preTrip().items.filter((item) => item.zone === 'coupling');
    expect(coupling.map((item) => item.key)).toEqual([
      'u2.coupling.air_lines',
      'u2.coupling.electrical',
      'u2.coupling.mounting',
      'u2.coupling.slider',
      'u2.coupling.gap',
      'u2.coupling.kingpin',
      'u2.coupling.jaws',
      'u2.coupling.release_arm',
      'u2.coupling.landing_gear',
    ]);
    expect(coupling.every((item) => item.safety && item.category === 'coupling')).toBe(true);
  });

  it('carries the emergency equipment of 393.95 and the in-cab checks', () => {
    const { items } = preTrip();
    // 49 CFR 393.95(a), (b), (f).
    expect(byKey(items, 'u1.emergency.extinguisher').points).toContain('rated 5 B:C or more');
    expect(byKey(items, 'u1.emergency.triangles').points).toEqual(['three reflective warning triangles']);
    for (const key of [
      'u1.cab.gauges',
      'u1.cab.wipers',
      'u1.cab.horn',
      'u1.cab.heater',
      'u1.cab.seat_belt',
      'u1.emergency.fuses',
    ]) {
      expect(byKey(items, key).zone).toBe('cab');
    }
  });

  it('fills every placeholder in English and Spanish', () => {
    for (const locale of ['en', 'es'] as const) {
      for (const item of buildChecklist(sampleCombination(), 'pre_trip', locale).items) {
        for (const text of [item.title, item.positionLabel, item.prompt, item.shortPrompt, ...item.points]) {
          expect(text).not.toMatch(/[{}]|\s{2}|undefined/);
          expect(text.length).toBeGreaterThan(1);
        }
      }
    }
  });

  it('says positions in Spanish with Spanish word order', () => {
    const es = buildChecklist(sampleCombination(), 'pre_trip', 'es');
    expect(byKey(es.items, 'u2.axle2.right.outer.tire.tread').positionLabel).toBe(
      'Remolque, eje 2, llanta exterior derecha',
    );
    expect(byKey(es.items, 'u1.axle1.left.brake.slack').positionLabel).toBe('Tractor, eje 1, freno izquierdo');
    expect(byKey(es.items, 'u1.axle2.left.brake.slack').points).toContain(
      'el vástago tiene menos de 1 pulgada de juego',
    );
    expect(es.zones[0]?.title).toBe('Frente y compartimiento del motor');
  });
});

function unitFor(item: ChecklistItem): string {
  if (item.expects.type !== 'measure') return 'in';
  return CANONICAL_UNITS[item.expects.quantity];
}

describe('buildChecklist by inspection kind', () => {
  it('covers in a post-trip every part 396.11(a)(1) names, in fewer items than pre-trip', () => {
    // 49 CFR 396.11(a)(1): service brakes incl. trailer brake connections, parking brake, steering, lights and
    // reflectors, tires, horn, wipers, rear-vision mirrors, coupling devices, wheels and rims, emergency equipment.
    const post = buildChecklist(sampleCombination(), 'post_trip', 'en').items;
    const keys = new Set(post.map((item) => item.key));
    const categories = new Set(post.map((item) => item.category));
    for (const category of [
      'brakes',
      'steering',
      'lights',
      'tires',
      'horn',
      'windshield',
      'mirrors',
      'coupling',
      'wheels',
      'emergency',
    ] as const) {
      expect(categories.has(category)).toBe(true);
    }
    expect(keys.has('u2.coupling.air_lines')).toBe(true);
    expect(keys.has('u1.air.parking_brake')).toBe(true);
    expect(keys.has('u1.cab.wipers')).toBe(true);
    expect(keys.has('u1.axle2.left.outer.rim')).toBe(true);
    expect(keys.has('u1.lights.rear_reflectors')).toBe(true);
    expect(post.length).toBeLessThan(preTrip().items.length);
  });

  it('keeps an en-route check short: tires, wheels, lights, coupling and how the brakes felt', () => {
    const route = buildChecklist(sampleCombination(), 'en_route', 'en').items;
    expect(new Set(route.map((item) => item.category))).toEqual(
      new Set(['tires', 'wheels', 'lights', 'coupling', 'brakes']),
    );
    expect(route.filter((item) => item.category === 'brakes').map((item) => item.key)).toEqual(['u1.cab.brakes_feel']);
    expect(route.length).toBeLessThan(buildChecklist(sampleCombination(), 'post_trip', 'en').items.length);
  });

  it('gives a practice walk-around the pre-trip content', () => {
    const practice = buildChecklist(sampleCombination(), 'practice', 'en');
    expect(practice.kind).toBe('practice');
    expect(practice.items).toEqual(preTrip().items);
  });
});

describe('buildChecklist for other vehicles', () => {
  const hydraulicTruck: VehicleInput = {
    unitNumber: '812',
    kind: 'straight_truck',
    vin: '1JRST0812NX000812',
    plate: 'JRF 812',
    config: {
      steering: { wheelDiameterIn: 18, type: 'manual' },
      axles: [
        {
          position: 'steer',
          tires: 'single',
          brake: 'hydraulic',
          tire: { size: '245/70R19.5', coldInflationPsi: 95, sidewallMaxPsi: 110 },
        },
        {
          position: 'drive',
          tires: 'dual',
          brake: 'hydraulic',
          tire: { size: '245/70R19.5', coldInflationPsi: 85, sidewallMaxPsi: 110 },
        },
      ],
    },
  };

  it('gives a hydraulic-brake truck brake pedal checks instead of air-brake checks', () => {
    const checklist = buildChecklist([hydraulicTruck], 'pre_trip', 'en');
    expect(checklist.zones.map((zone) => zone.key)).toEqual(['front', 'cab', 'left_side', 'rear', 'right_side']);
    const keys = new Set(checklist.items.map((item) => item.key));
    expect(keys.has('u1.cab.parking_brake')).toBe(true);
    expect(keys.has('u1.axle2.left.brake.hydraulic_lines')).toBe(true);
    expect(keys.has('u1.axle2.left.brake.slack')).toBe(false);
    expect(keys.has('u1.engine.power_steering_fluid')).toBe(false);
    // From memory of 393.11 Table 1: trucks 80 in or wider carry rear clearance lamps.
    expect(keys.has('u1.lights.rear_clearance')).toBe(true);
    expect(keys.has('u1.cargo_doors')).toBe(true);
    expect(byKey(checklist.items, 'u1.axle1.left.brake.lining').limitContext).toEqual({
      axle: 'steer',
      brake: 'hydraulic',
    });
  });

  it('checks the emergency exits of a bus', () => {
    const bus: VehicleInput = { ...hydraulicTruck, kind: 'bus' };
    expect(buildChecklist([bus], 'pre_trip', 'en').items.some((item) => item.key === 'u1.cab.emergency_exits')).toBe(
      true,
    );
  });

  it('numbers two trailers of a double', () => {
    const checklist = buildChecklist([sampleTractor(), sampleTrailer(), sampleTrailer()], 'pre_trip', 'en');
    expect(byKey(checklist.items, 'u3.axle1.left.outer.tire.tread').positionLabel).toBe(
      'Trailer 2, axle 1, left outer tire',
    );
    expect(byKey(checklist.items, 'u3.coupling.jaws').positionLabel).toBe('Trailer 2, coupling');
  });

  it('builds a trailer on its own with no coupling or cab', () => {
    const checklist = buildChecklist([sampleTrailer()], 'pre_trip', 'en');
    expect(checklist.zones.map((zone) => zone.key)).toEqual(['trailer']);
  });
});

describe('buildChecklist refuses bad input', () => {
  it('refuses no vehicles, a power unit behind a trailer and an invalid configuration', () => {
    expect(() => buildChecklist([], 'pre_trip', 'en')).toThrow(ChecklistError);
    expect(() => buildChecklist([sampleTrailer(), sampleTractor()], 'pre_trip', 'en')).toThrow(
      /only the first vehicle/,
    );
    const broken = sampleTractor();
    broken.config.axles = [];
    expect(() => buildChecklist([broken], 'pre_trip', 'en')).toThrow(/1 to 6 axles/);
  });
  it('refuses an unknown kind or locale', () => {
    expect(() => buildChecklist(sampleCombination(), 'annual' as never, 'en')).toThrow(/Unknown inspection kind/);
    expect(() => buildChecklist(sampleCombination(), 'pre_trip', 'fr' as never)).toThrow(/Unknown locale/);
  });
});

describe('chamberCode', () => {
  it('names standard, long and 3 in rated stroke chambers', () => {
    expect(chamberCode({ size: 30, stroke: 'long' })).toBe('type-30-long');
    expect(chamberCode({ size: 24, stroke: 'standard' })).toBe('type-24');
    expect(chamberCode({ size: 24, stroke: 'long', ratedStroke3In: true })).toBe('type-24-long-3in');
  });
  it('refuses a chamber 393.47(e) does not list', () => {
    expect(() => chamberCode({ size: 36, stroke: 'long' })).toThrow(/type-36-long/);
  });
});
