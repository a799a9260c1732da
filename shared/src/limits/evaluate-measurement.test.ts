import { describe, expect, it } from 'vitest';
import { CHAMBER_CODES, type MeasurementContext } from '../checklist/types.js';
import type { Quantity } from '../units/index.js';
import { LimitError, applicableLimits, evaluateMeasurement } from './evaluate-measurement.js';
import {
  LIMITS,
  LOW_AIR_WARNING_LIMIT_PSI,
  LOW_AIR_WARNING_OTHER_TEXT_PSI,
  POWER_LASH_16_LIMIT_IN,
  POWER_LASH_16_OTHER_TEXT_IN,
  TYPE_36_STROKE_LIMIT_IN,
  TIRE_PRESSURE_TOLERANCE_PSI,
  TYPE_36_STROKE_OTHER_TEXT_IN,
} from './limits-table.js';

const verdictOf = (quantity: Quantity, value: number, unit: string, context: MeasurementContext) =>
  evaluateMeasurement(quantity, value, unit, context).verdict;

describe('tread depth', () => {
  it('rejects a tread depth below 4/32 on a steer tire', () => {
    // 49 CFR 393.75(b)
    const result = evaluateMeasurement('tread_depth', 3, 'in/32', { axle: 'steer' });
    expect(result.verdict).toBe('out_of_limit');
    expect(result.limit).toBe(4);
    expect(result.unit).toBe('in/32');
    expect(result.source).toBe('49 CFR 393.75(b)');
  });
  it('passes exactly 4/32 on a steer tire, as near the limit', () => {
    // 49 CFR 393.75(b): "at least"; near_limit within one 32nd is our own practice.
    expect(verdictOf('tread_depth', 4, 'in/32', { axle: 'steer' })).toBe('near_limit');
    expect(verdictOf('tread_depth', 5, 'in/32', { axle: 'steer' })).toBe('near_limit');
    expect(verdictOf('tread_depth', 6, 'in/32', { axle: 'steer' })).toBe('ok');
  });
  it('passes 2/32 and rejects less on drive, tag and trailer tires', () => {
    // 49 CFR 393.75(c)
    for (const axle of ['drive', 'tag', 'trailer'] as const) {
      expect(verdictOf('tread_depth', 2, 'in/32', { axle })).toBe('near_limit');
      expect(verdictOf('tread_depth', 1.9, 'in/32', { axle })).toBe('out_of_limit');
      expect(evaluateMeasurement('tread_depth', 2, 'in/32', { axle }).source).toBe('49 CFR 393.75(c)');
    }
  });
  it('judges millimetres through toCanonical, the limit itself still passing', () => {
    // 49 CFR 393.75(b); 4/32 in = 3.175 mm exactly (1 in = 25.4 mm).
    expect(verdictOf('tread_depth', 3.175, 'mm', { axle: 'steer' })).toBe('near_limit');
    expect(verdictOf('tread_depth', 3.1, 'mm', { axle: 'steer' })).toBe('out_of_limit');
    expect(verdictOf('tread_depth', 0.25, 'in', { axle: 'steer' })).toBe('ok');
  });
});

describe('brake lining', () => {
  it('applies the 393.47(d) figures by axle and brake type', () => {
    // 49 CFR 393.47(d)
    const cases: [MeasurementContext, number][] = [
      [{ axle: 'steer', brake: 'air_drum', shoe: 'continuous_strip' }, 3 / 16],
      [{ axle: 'steer', brake: 'air_drum', shoe: 'two_pad' }, 1 / 4],
      [{ axle: 'steer', brake: 'air_drum' }, 1 / 4],
      [{ axle: 'steer', brake: 'air_disc' }, 1 / 8],
      [{ axle: 'drive', brake: 'air_drum' }, 1 / 4],
      [{ axle: 'trailer', brake: 'air_disc' }, 1 / 8],
      [{ axle: 'tag', brake: 'hydraulic' }, 1 / 16],
    ];
    for (const [context, limit] of cases) {
      expect(evaluateMeasurement('lining_thickness', limit, 'in', context).verdict).toBe('near_limit');
      expect(evaluateMeasurement('lining_thickness', limit - 0.01, 'in', context).verdict).toBe('out_of_limit');
      expect(evaluateMeasurement('lining_thickness', limit + 0.1, 'in', context).verdict).toBe('ok');
      expect(evaluateMeasurement('lining_thickness', limit, 'in', context).source).toMatch(/^49 CFR 393\.47\(d\)/);
    }
  });
  it('rejects a hydraulic steer lining of exactly 1/16 in', () => {
    // 49 CFR 393.47(d): steering axle, hydraulic, fails at 1/16 in "or less".
    const result = evaluateMeasurement('lining_thickness', 1 / 16, 'in', { axle: 'steer', brake: 'hydraulic' });
    expect(result.verdict).toBe('out_of_limit');
    expect(result.say).toMatch(/at the limit/);
    expect(verdictOf('lining_thickness', 0.07, 'in', { axle: 'steer', brake: 'hydraulic' })).toBe('near_limit');
  });
});

describe('push-rod stroke', () => {
  // 49 CFR 393.47(e), clamp-type chambers, "not greater than".
  const table: [(typeof CHAMBER_CODES)[number], number][] = [
    ['type-6', 1.25],
    ['type-9', 1.375],
    ['type-12', 1.375],
    ['type-12-long', 1.75],
    ['type-16', 1.75],
    ['type-16-long', 2],
    ['type-20', 1.75],
    ['type-20-long', 2],
    ['type-20-long-3in', 2.5],
    ['type-24', 1.75],
    ['type-24-long', 2],
    ['type-24-long-3in', 2.5],
    ['type-30', 2],
    ['type-30-long', 2.5],
  ];
  it.each(table)('passes the %s limit of %d in itself and rejects more (49 CFR 393.47(e))', (chamber, limit) => {
    expect(evaluateMeasurement('pushrod_stroke', limit, 'in', { chamber }).verdict).toBe('near_limit');
    expect(evaluateMeasurement('pushrod_stroke', limit + 1 / 16, 'in', { chamber }).verdict).toBe('out_of_limit');
    expect(evaluateMeasurement('pushrod_stroke', limit - 0.25, 'in', { chamber }).verdict).toBe('ok');
    expect(evaluateMeasurement('pushrod_stroke', limit, 'in', { chamber }).limit).toBe(limit);
  });
  it('marks a stroke within 1/8 in of the limit as near, our own practice', () => {
    // 49 CFR 393.47(e): type 30 long stroke 2-1/2 in; the 1/8 in margin is our practice.
    expect(verdictOf('pushrod_stroke', 2.375, 'in', { chamber: 'type-30-long' })).toBe('near_limit');
    expect(verdictOf('pushrod_stroke', 2.37, 'in', { chamber: 'type-30-long' })).toBe('ok');
  });
  it('uses 2-1/4 in for type 36: the 2012 text, not the 2021 text of 2-1/2 in', () => {
    // 49 CFR 393.47(e): 2012 text 2-1/4 in, 2021 text 2-1/2 in (conflict); we pick the stricter.
    expect(TYPE_36_STROKE_LIMIT_IN).toBe(2.25);
    expect(TYPE_36_STROKE_OTHER_TEXT_IN).toBe(2.5);
    expect(verdictOf('pushrod_stroke', 2.25, 'in', { chamber: 'type-36' })).toBe('near_limit');
    expect(verdictOf('pushrod_stroke', 2.5, 'in', { chamber: 'type-36' })).toBe('out_of_limit');
    expect(evaluateMeasurement('pushrod_stroke', 2, 'in', { chamber: 'type-36' }).source).toMatch(
      /2021 text says 2-1\/2/,
    );
  });
  it('has a stroke row for every chamber code', () => {
    for (const chamber of CHAMBER_CODES) {
      expect(applicableLimits('pushrod_stroke', { chamber })).toHaveLength(1);
    }
  });
  it('refuses a push-rod stroke on a hydraulic brake', () => {
    expect(() => evaluateMeasurement('pushrod_stroke', 1, 'in', { chamber: 'type-30', brake: 'hydraulic' })).toThrow(
      /hydraulic brake has no push rod/,
    );
  });
});

describe('steering lash', () => {
  // 49 CFR 393.209(b) table, "shall not exceed".
  const table: [number, 'manual' | 'power', number][] = [
    [16, 'manual', 2],
    [14, 'manual', 2],
    [18, 'manual', 2.25],
    [19, 'manual', 2.375],
    [20, 'manual', 2.5],
    [21, 'manual', 2.625],
    [22, 'manual', 2.75],
    [16, 'power', 4.25],
    [18, 'power', 4.75],
    [19, 'power', 5],
    [20, 'power', 5.25],
    [21, 'power', 5.5],
    [22, 'power', 5.75],
  ];
  it.each(table)(
    'on a %d in wheel with %s steering passes %d in and rejects more (49 CFR 393.209(b))',
    (wheelDiameterIn, steering, limit) => {
      const context = { wheelDiameterIn, steering };
      expect(evaluateMeasurement('steering_lash', limit, 'in', context).verdict).toBe('near_limit');
      expect(evaluateMeasurement('steering_lash', limit + 0.01, 'in', context).verdict).toBe('out_of_limit');
      expect(evaluateMeasurement('steering_lash', limit - 0.5, 'in', context).verdict).toBe('ok');
    },
  );
  it('uses the rim-travel formula for diameters not in the table', () => {
    // 49 CFR 393.209(b)(2): pi x diameter x 14 (manual) or 30 (power) degrees / 360.
    const manual17 = evaluateMeasurement('steering_lash', 1, 'in', { wheelDiameterIn: 17, steering: 'manual' });
    expect(manual17.limit).toBeCloseTo((Math.PI * 17 * 14) / 360, 3);
    expect(manual17.source).toMatch(/393\.209\(b\)\(2\)/);
    const power24 = evaluateMeasurement('steering_lash', 7, 'in', { wheelDiameterIn: 24, steering: 'power' });
    expect(power24.limit).toBeCloseTo((Math.PI * 24 * 30) / 360, 3);
    expect(power24.verdict).toBe('out_of_limit');
  });
  it('uses 4-1/4 in for power steering at 16 in, not the Part 396 appendix 4-1/2 in', () => {
    // 49 CFR 393.209(b) says 4-1/4 in; the Part 396 appendix says 4-1/2 in (conflict); we pick 393.209.
    expect(POWER_LASH_16_LIMIT_IN).toBe(4.25);
    expect(POWER_LASH_16_OTHER_TEXT_IN).toBe(4.5);
    const context = { wheelDiameterIn: 16, steering: 'power' as const };
    expect(verdictOf('steering_lash', 4.25, 'in', context)).toBe('near_limit');
    expect(verdictOf('steering_lash', 4.5, 'in', context)).toBe('out_of_limit');
  });
});

describe('tire pressure', () => {
  const context = { specPsi: 100, sidewallMaxPsi: 110 };
  it("rejects a pressure more than the gauge tolerance below the vehicle's cold spec", () => {
    // 49 CFR 393.75(i): not below the pressure the load needs, i.e. the vehicle's spec; the 3 psi
    // tolerance under it is common practice, not a published figure.
    expect(TIRE_PRESSURE_TOLERANCE_PSI).toBe(3);
    const result = evaluateMeasurement('tire_pressure', 95, 'psi', context);
    expect(result.verdict).toBe('out_of_limit');
    expect(result.limit).toBe(100);
    expect(result.source).toMatch(/393\.75\(i\)/);
    expect(result.say).toBe(
      'Tire pressure 95 psi: under the spec of 100 psi. Out of limit; fill it to spec and check it again.',
    );
    expect(verdictOf('tire_pressure', 96.9, 'psi', context)).toBe('out_of_limit');
  });
  it('takes the spec as the target: at or above it up to the sidewall maximum is ok, with no near warning', () => {
    // 49 CFR 393.75(i): the spec is what the load needs; the tire maker's sidewall marking caps it.
    expect(verdictOf('tire_pressure', 100, 'psi', context)).toBe('ok');
    expect(verdictOf('tire_pressure', 105, 'psi', context)).toBe('ok');
    expect(verdictOf('tire_pressure', 110, 'psi', context)).toBe('ok');
    expect(evaluateMeasurement('tire_pressure', 100, 'psi', context).say).toBe(
      'Tire pressure 100 psi: meets the spec of 100 psi.',
    );
  });
  it('calls a pressure within 3 psi under spec near the limit, not a defect: top it up when you can', () => {
    // 49 CFR 393.75(i) for the spec; the 3 psi gauge tolerance is common practice, not a published figure.
    for (const psi of [99, 98, 97]) expect(verdictOf('tire_pressure', psi, 'psi', context)).toBe('near_limit');
    const result = evaluateMeasurement('tire_pressure', 97, 'psi', context);
    expect(result.limit).toBe(100);
    expect(result.say).toBe(
      'Tire pressure 97 psi: a little under the spec of 100 psi. Not a defect; top it up when you can.',
    );
    expect(evaluateMeasurement('tire_pressure', 97, 'psi', context, 'es').say).toMatch(/rellénela cuando pueda/);
  });
  it('rejects a pressure over the sidewall maximum', () => {
    // The tire maker's sidewall marking.
    const result = evaluateMeasurement('tire_pressure', 112, 'psi', context);
    expect(result.verdict).toBe('out_of_limit');
    expect(result.limit).toBe(110);
  });
  it('converts kPa and bar to psi', () => {
    // 1 psi = 6.894757 kPa (NIST SP 811); 49 CFR 393.75(i) against the 100 psi spec.
    expect(verdictOf('tire_pressure', 724, 'kPa', context)).toBe('ok');
    expect(verdictOf('tire_pressure', 676, 'kPa', context)).toBe('near_limit');
    expect(verdictOf('tire_pressure', 6.2, 'bar', context)).toBe('out_of_limit');
  });
  it('rejects duals more than 5 psi apart, as common practice', () => {
    // Common practice (2003 federal roadside survey): a dual pair within 5 psi.
    const far = evaluateMeasurement('tire_pressure', 106, 'psi', { ...context, dualMatePsi: 100 });
    expect(far.verdict).toBe('out_of_limit');
    expect(far.limit).toBe(5);
    expect(far.source).toMatch(/Common practice/);
    expect(far.say).toMatch(/Difference between the duals 6 psi/);
    expect(verdictOf('tire_pressure', 105, 'psi', { ...context, dualMatePsi: 100 })).toBe('near_limit');
    expect(verdictOf('tire_pressure', 106, 'psi', { ...context, dualMatePsi: 104 })).toBe('ok');
  });
});

describe('slack adjuster angle', () => {
  it('passes about 90 degrees and rejects far from it, as common practice', () => {
    // Common practice: about 90 degrees with the brakes applied (CDL manual, section 5), taken as 80 to 100.
    expect(verdictOf('slack_angle', 90, 'deg', {})).toBe('ok');
    expect(verdictOf('slack_angle', 82, 'deg', {})).toBe('near_limit');
    expect(verdictOf('slack_angle', 110, 'deg', {})).toBe('out_of_limit');
    expect(evaluateMeasurement('slack_angle', 90, 'deg', {}).basis).toBe('common_practice');
  });
});

describe('air system', () => {
  it('uses 60 psi for the low-air warning, not the modernised test 55 psi', () => {
    // FMVSS 121 S5.1.5 says 60 psi; the modernised CDL test says 55 psi (conflict); we pick FMVSS 121.
    expect(LOW_AIR_WARNING_LIMIT_PSI).toBe(60);
    expect(LOW_AIR_WARNING_OTHER_TEXT_PSI).toBe(55);
    const context = { check: 'low_air_warning' as const };
    expect(verdictOf('air_pressure', 60, 'psi', context)).toBe('near_limit');
    expect(verdictOf('air_pressure', 55, 'psi', context)).toBe('out_of_limit');
    expect(verdictOf('air_pressure', 65, 'psi', context)).toBe('ok');
  });
  it('needs governor cut-in at 100 psi or more', () => {
    // FMVSS 121 S5.1.1.1
    expect(verdictOf('air_pressure', 100, 'psi', { check: 'governor_cut_in' })).toBe('near_limit');
    expect(verdictOf('air_pressure', 95, 'psi', { check: 'governor_cut_in' })).toBe('out_of_limit');
    expect(verdictOf('air_pressure', 110, 'psi', { check: 'governor_cut_in' })).toBe('ok');
  });
  it('expects governor cut-out between about 120 and 140 psi', () => {
    // CDL manual, section 5 (maker's spec governs).
    expect(verdictOf('air_pressure', 125, 'psi', { check: 'governor_cut_out' })).toBe('ok');
    expect(verdictOf('air_pressure', 115, 'psi', { check: 'governor_cut_out' })).toBe('out_of_limit');
    expect(verdictOf('air_pressure', 145, 'psi', { check: 'governor_cut_out' })).toBe('out_of_limit');
  });
  it('expects the spring brakes to set between 20 and 45 psi', () => {
    // CDL manual, section 5 (maker's spec governs).
    expect(verdictOf('air_pressure', 35, 'psi', { check: 'spring_brake' })).toBe('ok');
    expect(verdictOf('air_pressure', 15, 'psi', { check: 'spring_brake' })).toBe('out_of_limit');
    expect(verdictOf('air_pressure', 50, 'psi', { check: 'spring_brake' })).toBe('out_of_limit');
  });
  it('needs released leakage under 2 psi/min single and under 3 combination', () => {
    // CDL manual, section 5: "under", so the figure itself fails.
    expect(verdictOf('leak_rate', 1, 'psi/min', { brakesApplied: false, vehicle: 'single' })).toBe('ok');
    expect(verdictOf('leak_rate', 2, 'psi/min', { brakesApplied: false, vehicle: 'single' })).toBe('out_of_limit');
    expect(verdictOf('leak_rate', 2, 'psi/min', { brakesApplied: false, vehicle: 'combination' })).toBe('ok');
    expect(verdictOf('leak_rate', 3, 'psi/min', { brakesApplied: false, vehicle: 'combination' })).toBe('out_of_limit');
  });
  it('allows applied leakage up to 3 psi/min single and 4 combination', () => {
    // CDL manual, section 5: "more than" is too much, so the figure itself passes.
    expect(verdictOf('leak_rate', 3, 'psi/min', { brakesApplied: true, vehicle: 'single' })).toBe('near_limit');
    expect(verdictOf('leak_rate', 3.5, 'psi/min', { brakesApplied: true, vehicle: 'single' })).toBe('out_of_limit');
    expect(verdictOf('leak_rate', 4, 'psi/min', { brakesApplied: true, vehicle: 'combination' })).toBe('near_limit');
    expect(verdictOf('leak_rate', 4.5, 'psi/min', { brakesApplied: true, vehicle: 'combination' })).toBe(
      'out_of_limit',
    );
  });
});

describe('what is said', () => {
  it('says the verdict in Spanish with a decimal comma', () => {
    // 49 CFR 393.47(e): type 30 long stroke 2-1/2 in.
    const result = evaluateMeasurement('pushrod_stroke', 2.75, 'in', { chamber: 'type-30-long' }, 'es');
    expect(result.say).toBe(
      'Carrera del vástago 2,75 pulgadas: por encima del máximo de 2,5 pulgadas. Fuera de límite.',
    );
    expect(result.caution).toMatch(/no reemplaza su criterio/);
  });
  it('carries the safety caution in English by default', () => {
    const result = evaluateMeasurement('tread_depth', 10, 'in/32', { axle: 'drive' });
    expect(result.say).toBe('Tread depth 10 thirty-seconds: meets the minimum of 2 thirty-seconds.');
    expect(result.caution).toMatch(/does not replace your judgement/);
  });
  it('names the air check in what it says', () => {
    expect(evaluateMeasurement('air_pressure', 50, 'psi', { check: 'low_air_warning' }).say).toMatch(
      /^Low-air warning 50 psi: below/,
    );
  });
});

describe('bad input', () => {
  const expectCode = (fn: () => unknown, code: string, message: RegExp) => {
    try {
      fn();
    } catch (error) {
      expect(error).toBeInstanceOf(LimitError);
      expect((error as LimitError).code).toBe(code);
      expect((error as LimitError).message).toMatch(message);
      return;
    }
    throw new Error('expected a LimitError');
  };
  it('refuses an unknown quantity', () => {
    expectCode(
      () => evaluateMeasurement('tyre_depth' as Quantity, 3, 'in/32', {}),
      'unknown_quantity',
      /Unknown quantity "tyre_depth"/,
    );
  });
  it('refuses a unit of the wrong kind and an unknown unit', () => {
    expectCode(() => evaluateMeasurement('tread_depth', 3, 'psi', { axle: 'steer' }), 'wrong_unit', /use in\/32/);
    expectCode(
      () => evaluateMeasurement('tread_depth', 3, 'furlongs', { axle: 'steer' }),
      'unknown_unit',
      /Unknown unit/,
    );
  });
  it('refuses missing context the quantity needs', () => {
    expectCode(() => evaluateMeasurement('tread_depth', 3, 'in/32', {}), 'missing_context', /"axle"/);
    expectCode(
      () => evaluateMeasurement('steering_lash', 3, 'in', { steering: 'power' }),
      'missing_context',
      /"wheelDiameterIn"/,
    );
    expectCode(
      () => evaluateMeasurement('leak_rate', 1, 'psi/min', { vehicle: 'single' }),
      'missing_context',
      /"brakesApplied"/,
    );
    expectCode(() => evaluateMeasurement('air_pressure', 100, 'psi', {}), 'missing_context', /"check"/);
  });
  it('refuses context values outside their lists', () => {
    const wrong = { axle: 'front' } as unknown as MeasurementContext;
    expectCode(
      () => evaluateMeasurement('tread_depth', 3, 'in/32', wrong),
      'invalid_context',
      /steer, drive, tag, trailer/,
    );
    const badChamber = { chamber: 'type-36-long' } as unknown as MeasurementContext;
    expectCode(() => evaluateMeasurement('pushrod_stroke', 2, 'in', badChamber), 'invalid_context', /chamber/);
  });
  it('refuses non-finite and implausible values', () => {
    expectCode(
      () => evaluateMeasurement('tread_depth', Number.NaN, 'in/32', { axle: 'steer' }),
      'invalid_value',
      /finite/,
    );
    expectCode(
      () => evaluateMeasurement('tread_depth', Infinity, 'in/32', { axle: 'steer' }),
      'invalid_value',
      /finite/,
    );
    expectCode(() => evaluateMeasurement('tread_depth', -1, 'in/32', { axle: 'steer' }), 'invalid_value', /plausible/);
  });
});

describe('the limits table', () => {
  it('gives every row a source and a unique id', () => {
    const ids = new Set<string>();
    for (const row of LIMITS) {
      expect(row.source.length).toBeGreaterThan(5);
      expect(ids.has(row.id)).toBe(false);
      ids.add(row.id);
    }
  });
  it('marks rows from common practice as such in their source', () => {
    for (const row of LIMITS.filter((r) => r.basis === 'common_practice')) {
      expect(row.source).toMatch(/Common practice/);
    }
  });
});
