import { describe, expect, it } from 'vitest';
import { buildChecklist } from './build-checklist.js';
import { sampleCombination } from './fixtures.js';
import { isReadingRequired } from './required-readings.js';
import { READING_RULES, type ChecklistItem, type ReadingRule } from './types.js';

const { items } = buildChecklist(sampleCombination(), 'pre_trip', 'en');
const required = (rules: readonly ReadingRule[]) =>
  items.filter((item) => isReadingRequired(item, rules)).map((item) => item.key);
const byKey = (key: string): ChecklistItem => {
  const item = items.find((candidate) => candidate.key === key);
  if (!item) throw new Error(`no item ${key}`);
  return item;
};

describe('isReadingRequired', () => {
  it('requires no reading when the organisation sets no rule', () => {
    expect(required([])).toEqual([]);
  });

  it('requires steer tread depth on the steer axle only', () => {
    expect(required(['steer_tread_depth'])).toEqual(['u1.axle1.left.tire.tread', 'u1.axle1.right.tire.tread']);
  });

  it('requires tread depth on every tire with the tread-depth rule', () => {
    const keys = required(['tread_depth']);
    // 2 steer tires, then 4 on each of the 4 dual axles (2 drive, 2 trailer).
    expect(keys).toHaveLength(2 + 4 * 4);
    expect(keys.every((key) => key.endsWith('.tire.tread'))).toBe(true);
  });

  it('requires every tire pressure with the tire-pressure rule, and nothing else', () => {
    const keys = required(['tire_pressure']);
    expect(keys).toHaveLength(18);
    expect(keys.every((key) => key.endsWith('.tire.inflation'))).toBe(true);
  });

  it('requires stroke, lining and steering-wheel play each by its own rule', () => {
    expect(required(['pushrod_stroke']).every((key) => key.endsWith('.brake.stroke'))).toBe(true);
    expect(required(['pushrod_stroke'])).toHaveLength(10);
    expect(required(['lining_thickness'])).toHaveLength(10);
    expect(required(['steering_lash'])).toEqual(['u1.steering.lash']);
  });

  it('requires the air-brake checks that take a reading, not the build-up time or the brake tests', () => {
    expect(required(['air_brake_test'])).toEqual([
      'u1.air.leak_released',
      'u1.air.leak_applied',
      'u1.air.low_air_warning',
      'u1.air.spring_brakes',
      'u1.air.governor_cut_out',
      'u1.air.governor_cut_in',
    ]);
  });

  it('never requires a number for a check that takes none', () => {
    expect(isReadingRequired(byKey('u1.axle1.left.hub'), READING_RULES)).toBe(false);
    expect(isReadingRequired(byKey('u1.air.build_up'), READING_RULES)).toBe(false);
    expect(
      items.filter((item) => isReadingRequired(item, READING_RULES)).every((i) => i.expects.type === 'measure'),
    ).toBe(true);
  });

  it('takes several rules together', () => {
    expect(required(['steer_tread_depth', 'steering_lash'])).toEqual([
      'u1.steering.lash',
      'u1.axle1.left.tire.tread',
      'u1.axle1.right.tire.tread',
    ]);
  });
});
