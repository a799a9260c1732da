import { describe, expect, it } from 'vitest';
import { buildChecklist } from '../checklist/index.js';
import { sampleCombination } from '../testing.js';
import { benchNarration, runNarrationBench } from './narration.bench.js';
import { scoreNarration } from './score-narration.js';

describe('narration benchmark', () => {
  it('narrates about 300 segments over 15 minutes that name nearly every generated item', () => {
    const checklist = buildChecklist(sampleCombination(), 'practice', 'en');
    const segments = benchNarration(checklist);
    expect(segments).toHaveLength(300);
    expect(segments[segments.length - 1]!.endMs).toBeLessThanOrEqual(15 * 60 * 1000);
    const score = scoreNarration(segments, checklist);
    // Every item is said once, in route order, with its position.
    expect(score.overall.namedFraction).toBeGreaterThan(0.95);
    expect(score.outOfOrder).toEqual([]);
  });

  it('names nearly every item of the Spanish checklist from its own words', () => {
    const checklist = buildChecklist(sampleCombination(), 'practice', 'es');
    const score = scoreNarration(benchNarration(checklist), checklist);
    expect(score.overall.namedFraction).toBeGreaterThan(0.95);
  });

  it('reports percentiles in milliseconds against the 100 ms goal', () => {
    const [result] = runNarrationBench(5);
    expect(result).toMatchObject({ unit: 'ms', goal: 100 });
    expect(result!.p50).toBeGreaterThan(0);
    expect(result!.p50).toBeLessThanOrEqual(result!.p95);
    expect(result!.p95).toBeLessThanOrEqual(result!.p99);
  });
});
