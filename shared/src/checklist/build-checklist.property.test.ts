import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { evaluateMeasurement } from '../limits/index.js';
import { CANONICAL_UNITS } from '../units/index.js';
import {
  BRAKE_TYPES,
  CHAMBER_SIZES,
  CHAMBER_STROKES,
  STEERING_TYPES,
  isAirBraked,
  validateVehicleConfig,
  type AxleConfig,
  type AxlePosition,
} from '../vehicle/index.js';
import { buildChecklist } from './build-checklist.js';
import { listedChamberCode } from './chamber-code.js';
import { INSPECTION_KINDS, type ChecklistVehicle } from './types.js';

const axleArb = (position: AxlePosition): fc.Arbitrary<AxleConfig> =>
  fc
    .record({
      tires:
        position === 'steer' ? fc.constant('single' as const) : fc.constantFrom('single' as const, 'dual' as const),
      brake: fc.constantFrom(...BRAKE_TYPES),
      size: fc.constantFrom(...CHAMBER_SIZES),
      stroke: fc.constantFrom(...CHAMBER_STROKES),
      rated3: fc.boolean(),
      cold: fc.integer({ min: 20, max: 150 }),
      extra: fc.integer({ min: 0, max: 50 }),
    })
    .map(({ tires, brake, size, stroke, rated3, cold, extra }) => {
      const axle: AxleConfig = {
        position,
        tires,
        brake,
        tire: { size: '11R22.5', coldInflationPsi: cold, sidewallMaxPsi: cold + extra },
      };
      if (isAirBraked(brake)) {
        const long = stroke === 'long' && size !== 36;
        axle.chamber = { size, stroke: long ? 'long' : 'standard' };
        if (rated3 && long && (size === 20 || size === 24)) axle.chamber.ratedStroke3In = true;
      }
      return axle;
    });

const powerUnitArb: fc.Arbitrary<ChecklistVehicle> = fc
  .record({
    kind: fc.constantFrom('tractor' as const, 'straight_truck' as const, 'bus' as const),
    steer: axleArb('steer'),
    rest: fc.array(fc.constantFrom<AxlePosition>('drive', 'tag').chain(axleArb), { maxLength: 4 }),
    diameter: fc.integer({ min: 12, max: 26 }),
    steering: fc.constantFrom(...STEERING_TYPES),
  })
  .map(({ kind, steer, rest, diameter, steering }) => ({
    unitNumber: 'P1',
    kind,
    config: { axles: [steer, ...rest], steering: { wheelDiameterIn: diameter, type: steering } },
  }));

const trailerArb: fc.Arbitrary<ChecklistVehicle> = fc
  .array(axleArb('trailer'), { minLength: 1, maxLength: 4 })
  .map((axles) => ({ unitNumber: 'T1', kind: 'trailer' as const, config: { axles } }));

const combinationArb = fc
  .oneof(
    fc.tuple(powerUnitArb, fc.array(trailerArb, { maxLength: 2 })).map(([power, trailers]) => [power, ...trailers]),
    trailerArb.map((trailer) => [trailer]),
  )
  .filter((vehicles) => vehicles.every((v) => validateVehicleConfig(v.kind, v.config).length === 0));

describe('buildChecklist on random valid vehicles', () => {
  it('gives every wheel end its tire, rim, lug-nut and hub items, and every air brake its brake items', () => {
    fc.assert(
      fc.property(combinationArb, (vehicles) => {
        const items = new Map(buildChecklist(vehicles, 'pre_trip', 'en').items.map((item) => [item.key, item]));
        const keys = new Set(items.keys());
        vehicles.forEach((vehicle, u) => {
          vehicle.config.axles.forEach((axle, a) => {
            for (const side of ['left', 'right']) {
              const base = `u${u + 1}.axle${a + 1}.${side}`;
              const tires = axle.tires === 'dual' ? [`${base}.outer`, `${base}.inner`] : [base];
              for (const tire of tires) {
                for (const suffix of ['tire.inflation', 'tire.condition', 'tire.tread', 'rim']) {
                  expect(keys.has(`${tire}.${suffix}`), `${tire}.${suffix}`).toBe(true);
                }
              }
              expect(keys.has(`${base}.lugs`)).toBe(true);
              expect(keys.has(`${base}.hub`)).toBe(true);
              expect(keys.has(`${base}.duals`)).toBe(axle.tires === 'dual');
              const brakeItems = ['brake.chamber', 'brake.hoses', 'brake.slack', 'brake.stroke', 'brake.lining'];
              for (const suffix of brakeItems) {
                expect(keys.has(`${base}.${suffix}`), `${base}.${suffix}`).toBe(
                  isAirBraked(axle.brake) || suffix === 'brake.lining',
                );
              }
              // A measured stroke exactly where 393.47(e) lists the chamber; otherwise a check.
              const stroke = items.get(`${base}.brake.stroke`);
              if (stroke && axle.chamber) {
                expect(stroke.expects.type).toBe(listedChamberCode(axle.chamber) ? 'measure' : 'check');
              }
            }
          });
        });
      }),
      { numRuns: 150 },
    );
  });

  it('gives unique keys, the same on every build and in every locale', () => {
    fc.assert(
      fc.property(combinationArb, fc.constantFrom(...INSPECTION_KINDS), (vehicles, kind) => {
        const first = buildChecklist(vehicles, kind, 'en').items.map((item) => item.key);
        expect(new Set(first).size).toBe(first.length);
        expect(buildChecklist(structuredClone(vehicles), kind, 'en').items.map((item) => item.key)).toEqual(first);
        expect(buildChecklist(vehicles, kind, 'es').items.map((item) => item.key)).toEqual(first);
      }),
      { numRuns: 100 },
    );
  });

  it('groups every item into one contiguous stop, the same stops in every locale', () => {
    fc.assert(
      fc.property(combinationArb, fc.constantFrom(...INSPECTION_KINDS), (vehicles, kind) => {
        const en = buildChecklist(vehicles, kind, 'en');
        expect(en.stops.flatMap((stop) => stop.itemKeys)).toEqual(en.items.map((item) => item.key));
        expect(new Set(en.stops.map((stop) => stop.key)).size).toBe(en.stops.length);
        const es = buildChecklist(vehicles, kind, 'es');
        expect(es.stops.map((stop) => stop.key)).toEqual(en.stops.map((stop) => stop.key));
        for (const stop of [...en.stops, ...es.stops]) expect(stop.prompt).not.toMatch(/[{}]|\s{2}|undefined/);
      }),
      { numRuns: 100 },
    );
  });

  it('judges every measurement item with the context it carries', () => {
    fc.assert(
      fc.property(combinationArb, (vehicles) => {
        for (const item of buildChecklist(vehicles, 'pre_trip', 'en').items) {
          if (item.expects.type !== 'measure') continue;
          expect(item.limitContext).toBeDefined();
          const unit = CANONICAL_UNITS[item.expects.quantity];
          expect(() =>
            evaluateMeasurement(
              item.expects.type === 'measure' ? item.expects.quantity : 'tread_depth',
              1,
              unit,
              item.limitContext ?? {},
            ),
          ).not.toThrow();
        }
      }),
      { numRuns: 100 },
    );
  });

  it('keeps post-trip and en-route items a subset of the pre-trip walk-around', () => {
    fc.assert(
      fc.property(combinationArb, (vehicles) => {
        const pre = new Set(buildChecklist(vehicles, 'pre_trip', 'en').items.map((item) => item.key));
        for (const item of buildChecklist(vehicles, 'post_trip', 'en').items) expect(pre.has(item.key)).toBe(true);
        for (const item of buildChecklist(vehicles, 'en_route', 'en').items) {
          expect(pre.has(item.key) || item.key.endsWith('cab.brakes_feel')).toBe(true);
        }
      }),
      { numRuns: 60 },
    );
  });
});
