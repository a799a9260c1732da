import { describe, expect, it } from 'vitest';
import {
  RETENTION_DEFAULT_MONTHS,
  RETENTION_MIN_MONTHS,
  RetentionError,
  checkRetentionMonths,
  retentionCutoff,
} from './retention.js';

describe('record retention (49 CFR 396.11(a)(4): three months)', () => {
  it('defaults to and never goes below three months', () => {
    expect(RETENTION_MIN_MONTHS).toBe(3);
    expect(RETENTION_DEFAULT_MONTHS).toBe(3);
    expect(() => checkRetentionMonths(2)).toThrow(RetentionError);
    expect(() => checkRetentionMonths(2)).toThrow(/at least 3 months.*396\.11\(a\)\(4\)/);
    expect(() => checkRetentionMonths(3)).not.toThrow();
    expect(() => checkRetentionMonths(24)).not.toThrow();
  });

  it('refuses fractions and more than ten years', () => {
    expect(() => checkRetentionMonths(3.5)).toThrow(/whole number/);
    expect(() => checkRetentionMonths(121)).toThrow(/at most 120/);
  });

  it('counts calendar months back in UTC', () => {
    expect(retentionCutoff(new Date('2026-12-02T01:00:00.000Z'), 3).toISOString()).toBe('2026-09-02T01:00:00.000Z');
    expect(retentionCutoff(new Date('2026-02-15T00:00:00.000Z'), 3).toISOString()).toBe('2025-11-15T00:00:00.000Z');
  });

  it('falls back to the last day of a shorter month, never later than the true count', () => {
    expect(retentionCutoff(new Date('2026-05-31T12:00:00.000Z'), 3).toISOString()).toBe('2026-02-28T12:00:00.000Z');
  });
});
