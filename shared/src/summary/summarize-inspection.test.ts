import { describe, expect, it } from 'vitest';
import { buildChecklist, type Checklist, type ChecklistItem, type ItemResult } from '../checklist/index.js';
import { handItem, sampleCombination, stopPerItem, threeZoneChecklist } from '../testing.js';
import { RUSHED_RULE, summarizeInspection } from './summarize-inspection.js';

// An invented three-zone tractor walk-around.
const checklistItems: ChecklistItem[] = [
  handItem('front.headlights', 'front'),
  handItem('front.steer.left.tread', 'front', {
    category: 'tires',
    safety: true,
    expects: { type: 'measure', quantity: 'tread_depth' },
    position: { unitIndex: 0, axleIndex: 0, side: 'left' },
  }),
  handItem('left.mudflap', 'left', { category: 'body' }),
  handItem('left.slack', 'left', { category: 'brakes', safety: true }),
  handItem('cab.horn', 'cab', { category: 'horn' }),
];
const checklist = threeZoneChecklist(checklistItems);

const START = Date.parse('2026-03-02T06:00:00.000Z');
const at = (seconds: number): string => new Date(START + seconds * 1000).toISOString();

function answered(itemKey: string, seconds: number, overrides: Partial<ItemResult> = {}): ItemResult {
  return { itemKey, answer: 'pass', answeredAt: at(seconds), ...overrides };
}

const allPass: ItemResult[] = [
  answered('front.headlights', 20),
  answered('front.steer.left.tread', 50, {
    measurement: { quantity: 'tread_depth', value: 8, unit: 'in/32' },
    verdict: 'ok',
  }),
  answered('left.mudflap', 90),
  answered('left.slack', 130),
  answered('cab.horn', 200),
];

function withResult(results: ItemResult[], replacement: ItemResult): ItemResult[] {
  return results.map((result) => (result.itemKey === replacement.itemKey ? replacement : result));
}

describe('summarizeInspection: defects and driving', () => {
  it('lets a vehicle with no defects be driven', () => {
    const summary = summarizeInspection(checklist, allPass);
    expect(summary.defects).toEqual([]);
    expect(summary.mayBeDriven).toBe(true);
    expect(summary.drivingBlockedBy).toEqual([]);
  });

  it('lists a reported defect with its item, detail and safety flag', () => {
    const results = withResult(allPass, answered('left.slack', 130, { answer: 'defect', detail: 'bent adjuster arm' }));
    const [defect] = summarizeInspection(checklist, results).defects;
    expect(defect).toMatchObject({
      itemKey: 'left.slack',
      zone: 'left',
      category: 'brakes',
      safety: true,
      reasons: ['reported'],
      detail: 'bent adjuster arm',
      blocksDriving: true,
      cleared: false,
    });
  });

  it('blocks driving on a safety defect until it is certified repaired', () => {
    const results = withResult(allPass, answered('left.slack', 130, { answer: 'defect' }));
    expect(summarizeInspection(checklist, results).mayBeDriven).toBe(false);
    expect(summarizeInspection(checklist, results).drivingBlockedBy).toEqual(['left.slack']);
    const repaired = summarizeInspection(checklist, results, {
      certifications: [{ itemKey: 'left.slack', action: 'repaired' }],
    });
    expect(repaired.mayBeDriven).toBe(true);
    expect(repaired.defects[0]).toMatchObject({ certification: 'repaired', cleared: true });
  });

  it('clears a safety defect with a no-repair-needed certification', () => {
    const results = withResult(allPass, answered('left.slack', 130, { answer: 'defect' }));
    const summary = summarizeInspection(checklist, results, {
      certifications: [{ itemKey: 'left.slack', action: 'no_repair_needed' }],
    });
    expect(summary.mayBeDriven).toBe(true);
  });

  it('does not clear a safety defect with a deferral', () => {
    const results = withResult(allPass, answered('left.slack', 130, { answer: 'defect' }));
    const summary = summarizeInspection(checklist, results, {
      certifications: [{ itemKey: 'left.slack', action: 'deferred' }],
    });
    expect(summary.mayBeDriven).toBe(false);
    expect(summary.defects[0]).toMatchObject({ certification: 'deferred', cleared: false, blocksDriving: true });
  });

  it('lets a deferral clear a defect that does not affect safety', () => {
    const results = withResult(allPass, answered('left.mudflap', 90, { answer: 'defect', detail: 'torn' }));
    expect(summarizeInspection(checklist, results).mayBeDriven).toBe(true);
    const deferred = summarizeInspection(checklist, results, {
      certifications: [{ itemKey: 'left.mudflap', action: 'deferred' }],
    });
    expect(deferred.defects[0]).toMatchObject({ blocksDriving: false, cleared: true });
  });

  it('takes the last certification given for an item', () => {
    const results = withResult(allPass, answered('left.slack', 130, { answer: 'defect' }));
    const summary = summarizeInspection(checklist, results, {
      certifications: [
        { itemKey: 'left.slack', action: 'deferred' },
        { itemKey: 'left.slack', action: 'repaired' },
      ],
    });
    expect(summary.mayBeDriven).toBe(true);
  });

  it('counts an out-of-limit measurement as a defect that blocks driving, even on a pass answer', () => {
    // 49 CFR 393.75(b): steer tires need at least 4/32 in; the verdict comes evaluated from the server.
    const results = withResult(
      allPass,
      answered('front.steer.left.tread', 50, {
        measurement: { quantity: 'tread_depth', value: 3, unit: 'in/32' },
        verdict: 'out_of_limit',
      }),
    );
    const summary = summarizeInspection(checklist, results);
    expect(summary.defects).toHaveLength(1);
    expect(summary.defects[0]).toMatchObject({
      itemKey: 'front.steer.left.tread',
      reasons: ['out_of_limit'],
      measurement: { value: 3, unit: 'in/32' },
      blocksDriving: true,
    });
    expect(summary.mayBeDriven).toBe(false);
  });

  it('blocks driving on an out-of-limit measurement of an item not flagged as safety', () => {
    const list: Checklist = { ...checklist, items: checklist.items.map((i) => ({ ...i, safety: false })) };
    const results = withResult(allPass, answered('front.steer.left.tread', 50, { verdict: 'out_of_limit' }));
    expect(summarizeInspection(list, results).mayBeDriven).toBe(false);
  });

  it('does not count a near-limit measurement as a defect', () => {
    const results = withResult(allPass, answered('front.steer.left.tread', 50, { verdict: 'near_limit' }));
    expect(summarizeInspection(checklist, results).defects).toEqual([]);
  });

  it('gives both reasons when a defect answer is also out of limit', () => {
    const results = withResult(
      allPass,
      answered('front.steer.left.tread', 50, { answer: 'defect', verdict: 'out_of_limit' }),
    );
    expect(summarizeInspection(checklist, results).defects[0]?.reasons).toEqual(['reported', 'out_of_limit']);
  });

  it('uses the latest answer when an item was answered twice', () => {
    const results = [...allPass, answered('left.slack', 140, { answer: 'defect' })];
    expect(summarizeInspection(checklist, results).drivingBlockedBy).toEqual(['left.slack']);
    const corrected = [
      answered('left.slack', 140, { answer: 'defect' }),
      ...allPass.map((r) => ({ ...r, answeredAt: at(150) })),
    ];
    expect(summarizeInspection(checklist, corrected).defects).toEqual([]);
  });
});

describe('summarizeInspection: gaps and timing', () => {
  it('lists unanswered items in checklist order with their safety flag', () => {
    const results = allPass.filter((r) => r.itemKey !== 'left.slack' && r.itemKey !== 'front.headlights');
    const summary = summarizeInspection(checklist, results);
    expect(summary.unanswered.map((u) => u.itemKey)).toEqual(['front.headlights', 'left.slack']);
    expect(summary.unansweredSafetyCount).toBe(1);
    expect(summary.answeredCount).toBe(3);
  });

  it('counts a not-applicable answer as answered', () => {
    const results = withResult(allPass, answered('cab.horn', 200, { answer: 'not_applicable' }));
    expect(summarizeInspection(checklist, results).unanswered).toEqual([]);
  });

  it('lists results for items not on the checklist instead of dropping them silently', () => {
    const summary = summarizeInspection(checklist, [...allPass, answered('trailer.kingpin', 210)]);
    expect(summary.unknownItemKeys).toEqual(['trailer.kingpin']);
    expect(summary.answeredCount).toBe(5);
  });

  it('credits each zone with the time since the answer before, starting from the given start', () => {
    const summary = summarizeInspection(checklist, allPass, { startedAt: at(0) });
    expect(summary.zones.map((z) => [z.zone, z.durationMs])).toEqual([
      ['front', 50_000],
      ['left', 80_000],
      ['cab', 70_000],
    ]);
    expect(summary.totalDurationMs).toBe(200_000);
    expect(summary.zones[0]).toMatchObject({
      itemCount: 2,
      answeredCount: 2,
      firstAnsweredAt: at(20),
      lastAnsweredAt: at(50),
    });
  });

  it('measures from the first answer when no start time is given', () => {
    const summary = summarizeInspection(checklist, allPass);
    expect(summary.totalDurationMs).toBe(180_000);
    expect(summary.startedAt).toBe(at(20));
    expect(summary.finishedAt).toBe(at(200));
    expect(summary.zones[0]?.durationMs).toBe(30_000);
  });

  it('reports an unvisited zone with no time and no answers', () => {
    const summary = summarizeInspection(
      checklist,
      allPass.filter((r) => !r.itemKey.startsWith('cab.')),
    );
    expect(summary.zones[2]).toEqual({
      zone: 'cab',
      title: 'In the cab',
      itemCount: 1,
      answeredCount: 0,
      durationMs: 0,
    });
  });
});

describe('summarizeInspection: rushed walk-around (our own practice)', () => {
  // A checklist of count items in one zone.
  function oneZone(count: number): Checklist {
    const items = Array.from({ length: count }, (_, i) => handItem(`zone.item${i}`, 'zone'));
    return {
      kind: 'pre_trip',
      locale: 'en',
      zones: [{ key: 'zone', title: 'Zone' }],
      stops: stopPerItem(items),
      items,
    };
  }

  // Twenty items in one zone, answered every gapSeconds after the start.
  function evenlyPaced(gapSeconds: number, count = 20): { list: Checklist; results: ItemResult[] } {
    const list = oneZone(count);
    const { items } = list;
    const results = items.map((it, i) => answered(it.key, (i + 1) * gapSeconds));
    return { list, results };
  }

  it('flags answers coming faster than the median-gap threshold', () => {
    const { list, results } = evenlyPaced(4.9);
    const summary = summarizeInspection(list, results, { startedAt: at(0) });
    expect(summary.rushed.rushed).toBe(true);
    expect(summary.rushed.reasons).toContain('median_gap');
    expect(summary.rushed.medianGapMs).toBeCloseTo(4900, 0);
  });

  it('does not flag a median gap exactly at the threshold', () => {
    const { list, results } = evenlyPaced(RUSHED_RULE.minMedianGapMs / 1000);
    const summary = summarizeInspection(list, results, { startedAt: at(0) });
    expect(summary.rushed.medianGapMs).toBe(RUSHED_RULE.minMedianGapMs);
    expect(summary.rushed.reasons).not.toContain('median_gap');
  });

  it('flags a walk-around shorter than the minimum for its answered stops though its median gap is fine', () => {
    // Nine answers 1.5 s apart, then eleven at the median-gap threshold: the median is fine, the whole is too short.
    const list = oneZone(20);
    const { items } = list;
    const gaps = [...Array.from({ length: 9 }, () => 1.5), ...Array.from({ length: 11 }, () => 5)];
    let t = 0;
    const results = items.map((it, i) => answered(it.key, (t += gaps[i]!)));
    const summary = summarizeInspection(list, results, { startedAt: at(0) });
    expect(summary.rushed.medianGapMs).toBe(5000);
    expect(summary.rushed.answeredStopCount).toBe(20);
    expect(summary.totalDurationMs).toBeLessThan(20 * RUSHED_RULE.minMsPerStop);
    expect(summary.rushed.reasons).toEqual(['total_duration']);
  });

  it('does not flag a walk-around that took exactly the minimum for its answered stops', () => {
    const { list, results } = evenlyPaced(RUSHED_RULE.minMsPerStop / 1000);
    const summary = summarizeInspection(list, results, { startedAt: at(0) });
    expect(summary.rushed.minimumDurationMs).toBe(20 * RUSHED_RULE.minMsPerStop);
    expect(summary.totalDurationMs).toBe(summary.rushed.minimumDurationMs);
    expect(summary.rushed.rushed).toBe(false);
  });

  it('does not judge pace on fewer answered stops than the rule needs', () => {
    const { list, results } = evenlyPaced(1, RUSHED_RULE.minAnswers - 1);
    const summary = summarizeInspection(list, results, { startedAt: at(0) });
    expect(summary.rushed.answeredStopCount).toBe(RUSHED_RULE.minAnswers - 1);
    expect(summary.rushed.rushed).toBe(false);
    expect(
      summarizeInspection(oneZone(RUSHED_RULE.minAnswers), evenlyPaced(1, RUSHED_RULE.minAnswers).results, {
        startedAt: at(0),
      }).rushed.rushed,
    ).toBe(true);
  });

  it('accepts a stricter rule from the caller', () => {
    const { list, results } = evenlyPaced(8);
    const summary = summarizeInspection(list, results, { startedAt: at(0), rushedRule: { minMedianGapMs: 9000 } });
    expect(summary.rushed.reasons).toEqual(['median_gap']);
  });
});

describe('summarizeInspection: rushed, judged per stop on a tractor and 2-axle trailer (our own practice)', () => {
  // The invented demo combination: 281 items at 60 stops.
  const combination = buildChecklist(sampleCombination(), 'pre_trip', 'en');
  // Every stop answered at once, secondsPerStop after the one before.
  const byStop = (secondsPerStop: number, stops = combination.stops): ItemResult[] =>
    stops.flatMap((stop, n) => stop.itemKeys.map((key) => answered(key, (n + 1) * secondsPerStop)));

  it('does not flag a walk-around answered stop by stop at the common pace of about 15 s a stop', () => {
    expect([combination.items.length, combination.stops.length]).toEqual([281, 60]);
    const summary = summarizeInspection(combination, byStop(15), { startedAt: at(0) });
    expect(summary.totalDurationMs).toBe(15 * 60_000);
    expect(summary.rushed).toMatchObject({ rushed: false, reasons: [], medianGapMs: 15_000, answeredStopCount: 60 });
  });

  it('does not flag a quick but careful pace of 8 s a stop', () => {
    const summary = summarizeInspection(combination, byStop(8), { startedAt: at(0) });
    // 8 minutes is under 1.8 s an item: judged per item, this walk-around would look rushed.
    expect(summary.totalDurationMs).toBe(8 * 60_000);
    expect(summary.rushed.rushed).toBe(false);
  });

  it('flags a walk-around at 3 s a stop on both counts', () => {
    const summary = summarizeInspection(combination, byStop(3), { startedAt: at(0) });
    expect(summary.rushed).toMatchObject({
      rushed: true,
      reasons: ['median_gap', 'total_duration'],
      medianGapMs: 3000,
      totalDurationMs: 180_000,
      answeredStopCount: 60,
      minimumDurationMs: 60 * RUSHED_RULE.minMsPerStop,
    });
  });

  it('counts only the stops with an answer, and a stop answered in two parts once', () => {
    // The first 20 stops at 6 s a stop; then a reading at the fifth stop 5 s later.
    const partial = byStop(6, combination.stops.slice(0, 20));
    const reading = combination.stops[4]!.itemKeys[0]!;
    const results = [...partial, answered(reading, 125)];
    const summary = summarizeInspection(combination, results, { startedAt: at(0) });
    expect(summary.rushed.answeredStopCount).toBe(20);
    expect(summary.rushed.minimumDurationMs).toBe(20 * RUSHED_RULE.minMsPerStop);
    // 125 s over 20 stops is under the minimum of 150 s.
    expect(summary.rushed.reasons).toEqual(['total_duration']);
  });
});

describe('summarizeInspection: fixed on the spot', () => {
  // A steer tire's pressure and a tail lamp, as a driver fixes them at the air line and with a spare bulb.
  const pressureItem = handItem('front.steer.left.pressure', 'front', {
    category: 'tires',
    safety: true,
    expects: { type: 'measure', quantity: 'tire_pressure' },
    limitContext: { axle: 'steer', specPsi: 110, sidewallMaxPsi: 120 },
  });
  const items = [pressureItem, handItem('left.tail', 'left'), handItem('cab.horn', 'cab', { category: 'horn' })];
  const list = threeZoneChecklist(items);
  const low = { quantity: 'tire_pressure', value: 95, unit: 'psi' } as const;
  const lowDefect = (fixed?: ItemResult['fixed']): ItemResult =>
    answered(pressureItem.key, 10, {
      answer: 'defect',
      measurement: low,
      verdict: 'out_of_limit',
      detail: 'low',
      ...(fixed ? { fixed } : {}),
    });
  const rest = [answered('left.tail', 40), answered('cab.horn', 60)];

  it('lists a defect fixed with a reading back within its limit as fixed on the spot, not as an open defect', () => {
    const fixed = {
      action: 'added air',
      measurement: { quantity: 'tire_pressure', value: 110, unit: 'psi' },
      verdict: 'ok',
      heard: 'fixed, added air, now one ten',
      at: at(30),
    } as const;
    const summary = summarizeInspection(list, [lowDefect(fixed), ...rest]);
    expect(summary.defects).toEqual([]);
    expect(summary.safetyDefectCount).toBe(0);
    expect(summary.mayBeDriven).toBe(true);
    expect(summary.fixedOnTheSpot).toEqual([
      {
        itemKey: pressureItem.key,
        zone: 'front',
        title: pressureItem.title,
        positionLabel: pressureItem.positionLabel,
        category: 'tires',
        safety: true,
        reasons: ['reported', 'out_of_limit'],
        detail: 'low',
        measurement: low,
        verdict: 'out_of_limit',
        answeredAt: at(10),
        action: 'added air',
        newMeasurement: fixed.measurement,
        newVerdict: 'ok',
        fixedAt: at(30),
        heard: 'fixed, added air, now one ten',
      },
    ]);
  });

  it('takes a fix with no reading to take, such as a replaced bulb', () => {
    const results = [
      answered(pressureItem.key, 10, { measurement: { ...low, value: 112 }, verdict: 'ok' }),
      answered('left.tail', 40, {
        answer: 'defect',
        detail: 'bulb out',
        fixed: { action: 'replaced the bulb', at: at(50) },
      }),
      answered('cab.horn', 60),
    ];
    const summary = summarizeInspection(list, results);
    expect(summary.defects).toEqual([]);
    expect(summary.fixedOnTheSpot.map((fix) => [fix.itemKey, fix.action, fix.newMeasurement])).toEqual([
      ['left.tail', 'replaced the bulb', undefined],
    ]);
  });

  it('leaves the defect open and blocking when the new reading is still out of limit', () => {
    const fixed = {
      action: 'added air',
      measurement: { quantity: 'tire_pressure', value: 100, unit: 'psi' },
      verdict: 'out_of_limit',
      at: at(30),
    } as const;
    const summary = summarizeInspection(list, [lowDefect(fixed), ...rest]);
    expect(summary.fixedOnTheSpot).toEqual([]);
    expect(summary.defects).toHaveLength(1);
    expect(summary.defects[0]).toMatchObject({ itemKey: pressureItem.key, blocksDriving: true, failedFix: fixed });
    expect(summary.mayBeDriven).toBe(false);
  });

  it('does not trust a new reading that was never judged to clear a defect', () => {
    const fixed = {
      action: 'added air',
      measurement: { quantity: 'tire_pressure', value: 110, unit: 'psi' },
      at: at(30),
    } as const;
    const summary = summarizeInspection(list, [lowDefect(fixed), ...rest]);
    expect(summary.fixedOnTheSpot).toEqual([]);
    expect(summary.drivingBlockedBy).toEqual([pressureItem.key]);
  });

  it('does not take "fixed" without a new reading on a value found out of limit', () => {
    const summary = summarizeInspection(list, [lowDefect({ action: 'added air', at: at(30) }), ...rest]);
    expect(summary.fixedOnTheSpot).toEqual([]);
    expect(summary.drivingBlockedBy).toEqual([pressureItem.key]);
  });

  it('ignores a fix on an item that was passed', () => {
    const summary = summarizeInspection(list, [
      answered(pressureItem.key, 10, { fixed: { action: 'added air', at: at(20) } }),
      ...rest,
    ]);
    expect(summary.fixedOnTheSpot).toEqual([]);
    expect(summary.defects).toEqual([]);
  });
});

describe('summarizeInspection: measured checks passed without a reading', () => {
  const measured = (key: string, quantity: 'tread_depth' | 'tire_pressure') =>
    handItem(key, 'front', { category: 'tires', safety: true, expects: { type: 'measure', quantity } });
  const items = [
    measured('steer.tread', 'tread_depth'),
    measured('steer.pressure', 'tire_pressure'),
    measured('drive.pressure', 'tire_pressure'),
    measured('drive.tread', 'tread_depth'),
    handItem('front.headlights', 'front'),
  ];
  const list = threeZoneChecklist(items);

  it('counts passes by eye apart from required readings with no gauge, and neither for a number or a plain check', () => {
    const summary = summarizeInspection(list, [
      answered('steer.tread', 10, { noReading: 'visual' }),
      answered('steer.pressure', 10, { noReading: 'no_gauge' }),
      answered('drive.pressure', 20, {
        measurement: { quantity: 'tire_pressure', value: 100, unit: 'psi' },
        verdict: 'ok',
      }),
      answered('drive.tread', 20, { noReading: 'visual' }),
      answered('front.headlights', 30),
    ]);
    expect(summary.checkedWithoutReading.map((entry) => entry.itemKey)).toEqual(['steer.tread', 'drive.tread']);
    expect(summary.checkedWithoutReading[0]).toMatchObject({ title: 'steer.tread', safety: true, reason: 'visual' });
    expect(summary.noGauge.map((entry) => [entry.itemKey, entry.reason])).toEqual([['steer.pressure', 'no_gauge']]);
    expect(summary.defects).toEqual([]);
  });

  it('counts a measured check passed with no number and no reason as checked without a reading', () => {
    const summary = summarizeInspection(list, [answered('steer.tread', 10)]);
    expect(summary.checkedWithoutReading.map((entry) => entry.itemKey)).toEqual(['steer.tread']);
    expect(summary.noGauge).toEqual([]);
  });

  it('does not count a defect or an unanswered item as checked without a reading', () => {
    const summary = summarizeInspection(list, [answered('steer.tread', 10, { answer: 'defect', detail: 'cut' })]);
    expect(summary.checkedWithoutReading).toEqual([]);
  });
});

describe('summarizeInspection: one answer for a whole stop', () => {
  it('times the gaps between answers, not between the items one answer covered', () => {
    // Twelve stops of five items, each stop answered at once every 10 s: not rushed, though most items share a time.
    const items = Array.from({ length: 60 }, (_, i) => handItem(`zone.stop${Math.floor(i / 5)}.item${i % 5}`, 'zone'));
    for (const entry of items) entry.stopKey = entry.key.replace(/\.item\d$/, '');
    const stops = Array.from({ length: 12 }, (_, n) => ({
      key: `zone.stop${n}`,
      zone: 'zone',
      unitIndex: 0,
      label: `Stop ${n}`,
      prompt: `Stop ${n}.`,
      shortPrompt: `Stop ${n}?`,
      itemKeys: items.slice(n * 5, n * 5 + 5).map((entry) => entry.key),
    }));
    const list: Checklist = { ...checklist, zones: [{ key: 'zone', title: 'Zone' }], stops, items };
    const results = items.map((entry, i) => answered(entry.key, (Math.floor(i / 5) + 1) * 10));
    const summary = summarizeInspection(list, results, { startedAt: at(0) });
    expect(summary.rushed.medianGapMs).toBe(10_000);
    expect(summary.rushed.answeredStopCount).toBe(12);
    expect(summary.rushed.rushed).toBe(false);
    expect(summary.zones[0]?.durationMs).toBe(120_000);
  });
});
