import { describe, expect, it } from 'vitest';
import { UnitError, parseUnit, toCanonical } from './units.js';

describe('toCanonical', () => {
  it('turns millimetres of tread into 32nds of an inch', () => {
    // 1 in = 25.4 mm exactly, so 3.175 mm is 4/32 in.
    expect(toCanonical('tread_depth', 3.175, 'mm')).toBeCloseTo(4, 6);
  });
  it('turns fractions of an inch into 32nds', () => {
    expect(toCanonical('tread_depth', 0.125, 'in')).toBeCloseTo(4, 6);
    expect(toCanonical('tread_depth', 3, 'in/16')).toBeCloseTo(6, 6);
  });
  it('turns kPa and bar into psi', () => {
    // 1 psi = 6.894757 kPa (NIST SP 811).
    expect(toCanonical('tire_pressure', 689.4757, 'kPa')).toBeCloseTo(100, 4);
    expect(toCanonical('air_pressure', 6.894757, 'bar')).toBeCloseTo(100, 4);
  });
  it('keeps a canonical value as it is', () => {
    expect(toCanonical('pushrod_stroke', 1.75, 'in')).toBe(1.75);
    expect(toCanonical('leak_rate', 2, 'psi/min')).toBe(2);
  });
  it('refuses a unit of the wrong kind, naming the right one', () => {
    expect(() => toCanonical('tread_depth', 100, 'psi')).toThrow(UnitError);
    expect(() => toCanonical('tread_depth', 100, 'psi')).toThrow(/in\/32/);
  });
  it('refuses an unknown unit', () => {
    expect(() => toCanonical('tire_pressure', 1, 'furlongs')).toThrow(/Unknown unit/);
  });
  it('reads spoken unit names', () => {
    expect(parseUnit('Millimeters')).toBe('mm');
    expect(parseUnit('32nds')).toBe('in/32');
    expect(parseUnit('KPA')).toBe('kPa');
  });
});
