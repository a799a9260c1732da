import { describe, expect, it } from 'vitest';
import { measure, percentile } from './measure.js';

describe('benchmark timing', () => {
  it('takes the nearest-rank percentile of sorted timings', () => {
    const sorted = Array.from({ length: 100 }, (_, i) => i + 1);
    expect(percentile(sorted, 50)).toBe(50);
    expect(percentile(sorted, 95)).toBe(95);
    expect(percentile(sorted, 99)).toBe(99);
    expect(percentile([7], 99)).toBe(7);
    expect(percentile([], 50)).toBeNaN();
  });

  it('runs warm-up runs untimed first, then the measured runs, numbering them in order', () => {
    const seen: number[] = [];
    const result = measure('count', 1, 4, (run) => seen.push(run), { warmUpRuns: 2 });
    expect(seen).toEqual([0, 1, 2, 3, 4, 5]);
    expect(result).toMatchObject({ name: 'count', unit: 'ms', goal: 1 });
    expect(result.p50).toBeLessThanOrEqual(result.p95);
    expect(result.p95).toBeLessThanOrEqual(result.p99);
  });
});
