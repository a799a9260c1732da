import { describe, expect, it } from 'vitest';
import { callsPerSecond, measure, percentile, singleFigure, timingFigure } from './measure.js';

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

  it('turns timings taken elsewhere, in any order, into percentiles rounded to hundredths', () => {
    const timings = [3.456, 1, 2.5, 10.004];
    expect(timingFigure('loop', timings, 50)).toEqual({
      name: 'loop',
      unit: 'ms',
      p50: 2.5,
      p95: 10,
      p99: 10,
      goal: 50,
    });
    expect(timings).toEqual([3.456, 1, 2.5, 10.004]);
  });

  it('reports a value measured once at every percentile', () => {
    expect(singleFigure('size', 'KB', 148.2, 150)).toEqual({
      name: 'size',
      unit: 'KB',
      p50: 148.2,
      p95: 148.2,
      p99: 148.2,
      goal: 150,
    });
  });

  it('counts the calls a second of timings taken one after another', () => {
    expect(callsPerSecond([2, 3, 5])).toBe(300);
  });
});
