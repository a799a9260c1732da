import { describe, expect, it } from 'vitest';
import { buildChecklist, type ChecklistItem, type ItemResult } from '../checklist/index.js';
import { RUSHED_RULE, summarizeInspection } from '../summary/index.js';
import { handItem, sampleCombination, threeZoneChecklist } from '../testing.js';
import { RECURRING_RULE, findRecurringDefects, rushedFlag, walkedRoute, type EarlierDefect } from './index.js';
import { itemKeyOnUnit } from './recurring.js';

// An invented three-zone tractor walk-around.
const checklistItems: ChecklistItem[] = [
  handItem('u0.front.a', 'front'),
  handItem('u0.front.b', 'front'),
  handItem('u0.left.a', 'left'),
  handItem('u0.left.b', 'left'),
  handItem('u0.cab.a', 'cab'),
];
const checklist = threeZoneChecklist(checklistItems);

const START = '2026-11-30T06:00:00.000Z';
function at(seconds: number): string {
  return new Date(Date.parse(START) + seconds * 1000).toISOString();
}
function answer(itemKey: string, seconds: number): ItemResult {
  return { itemKey, answer: 'pass', answeredAt: at(seconds) };
}

describe('walkedRoute: the route as zones in the order walked', () => {
  it('lists zones in the order answered with first and last times and the seconds credited', () => {
    const route = walkedRoute(
      checklist,
      [answer('u0.left.a', 40), answer('u0.front.a', 10), answer('u0.front.b', 25), answer('u0.left.b', 70)],
      { startedAt: START },
    );
    expect(route).toEqual([
      { zone: 'front', title: 'Front', firstAnsweredAt: at(10), lastAnsweredAt: at(25), seconds: 25, answerCount: 2 },
      {
        zone: 'left',
        title: 'Left side',
        firstAnsweredAt: at(40),
        lastAnsweredAt: at(70),
        seconds: 45,
        answerCount: 2,
      },
    ]);
  });

  it('starts a new visit when the driver goes back to a zone, and the visits add up to the whole walk', () => {
    const route = walkedRoute(
      checklist,
      [answer('u0.front.a', 5), answer('u0.left.a', 20), answer('u0.front.b', 30), answer('u0.cab.a', 60)],
      { startedAt: START },
    );
    expect(route.map((v) => v.zone)).toEqual(['front', 'left', 'front', 'cab']);
    expect(route.map((v) => v.seconds)).toEqual([5, 15, 10, 30]);
    expect(route.reduce((sum, v) => sum + v.seconds, 0)).toBe(60);
  });

  it('takes the latest answer of an item and ignores unknown items and unreadable times', () => {
    const route = walkedRoute(checklist, [
      answer('u0.front.a', 5),
      answer('u0.front.a', 50),
      answer('u9.nowhere', 7),
      { itemKey: 'u0.left.a', answer: 'pass', answeredAt: 'yesterday' },
      answer('u0.cab.a', 30),
    ]);
    expect(route.map((v) => v.zone)).toEqual(['cab', 'front']);
    // Without a start, the first answer is credited nothing.
    expect(route.map((v) => v.seconds)).toEqual([0, 20]);
  });

  it('is empty with no answers', () => {
    expect(walkedRoute(checklist, [])).toEqual([]);
  });
});

describe('rushedFlag: why the summary flagged a walk-around (rule in ../summary, our own practice)', () => {
  // The invented tractor and 2-axle trailer: 281 items at 60 stops, each stop answered at once.
  const combination = buildChecklist(sampleCombination(), 'pre_trip', 'en');
  const byStop = (secondsPerStop: number): ItemResult[] =>
    combination.stops.flatMap((stop, n) => stop.itemKeys.map((key) => answer(key, (n + 1) * secondsPerStop)));

  it('says nothing for a walk-around answered stop by stop at the common pace of about 15 s a stop', () => {
    const summary = summarizeInspection(combination, byStop(15), { startedAt: START });
    expect(rushedFlag(summary.rushed, summary.answeredCount)).toBeNull();
  });

  it('gives seconds per stop over the answered stops and the median gap against the thresholds', () => {
    const summary = summarizeInspection(combination, byStop(3), { startedAt: START });
    expect(rushedFlag(summary.rushed, summary.answeredCount)).toEqual({
      reasons: ['median_gap', 'total_duration'],
      answeredCount: 281,
      answeredStopCount: 60,
      secondsPerStop: 3,
      medianGapSeconds: 3,
      minimumSecondsPerStop: RUSHED_RULE.minMsPerStop / 1000,
      minimumMedianGapSeconds: RUSHED_RULE.minMedianGapMs / 1000,
    });
  });
});

describe('findRecurringDefects (our own product choice: 90-day window)', () => {
  const NOW = '2026-11-30T06:00:00.000Z';
  const daysAgo = (days: number) => new Date(Date.parse(NOW) - days * 86_400_000).toISOString();
  const current = [
    { vehicleId: 'v1', itemKey: 'u1.axle2.left.tire.tread', title: 'Tread', positionLabel: 'Trailer, axle 2, left' },
  ];
  function earlier(overrides: Partial<EarlierDefect>): EarlierDefect {
    return {
      inspectionId: 'i-old',
      defectId: 'd-old',
      vehicleId: 'v1',
      itemKey: 'u1.axle2.left.tire.tread',
      reportedAt: daysAgo(10),
      state: 'repaired',
      certifiedAt: daysAgo(9),
      ...overrides,
    };
  }

  it('uses a 90-day window', () => {
    expect(RECURRING_RULE.windowDays).toBe(90);
  });

  it('finds the same item on the same vehicle repaired within the window, naming the earlier inspection', () => {
    const found = findRecurringDefects(current, [earlier({})], NOW);
    expect(found).toHaveLength(1);
    expect(found[0]!.earlier.inspectionId).toBe('i-old');
    expect(found[0]!.earlierCount).toBe(1);
  });

  it('matches across the unit position in the combination (a trailer behind another tractor)', () => {
    expect(itemKeyOnUnit('u2.axle2.left.tire.tread')).toBe('axle2.left.tire.tread');
    expect(findRecurringDefects(current, [earlier({ itemKey: 'u2.axle2.left.tire.tread' })], NOW)).toHaveLength(1);
  });

  it('ignores another vehicle, another item, a later report and a repair older than the window', () => {
    expect(
      findRecurringDefects(
        current,
        [
          earlier({ vehicleId: 'v2' }),
          earlier({ itemKey: 'u1.axle2.right.tire.tread' }),
          earlier({ reportedAt: daysAgo(-1), certifiedAt: null, state: 'open' }),
          earlier({ reportedAt: daysAgo(200), certifiedAt: daysAgo(91) }),
        ],
        NOW,
      ),
    ).toEqual([]);
  });

  it('counts a defect still open or deferred however old, and names the latest earlier report', () => {
    const found = findRecurringDefects(
      current,
      [
        earlier({ defectId: 'd-1', reportedAt: daysAgo(400), state: 'open', certifiedAt: null }),
        earlier({ defectId: 'd-2', inspectionId: 'i-2', reportedAt: daysAgo(300), state: 'deferred' }),
      ],
      NOW,
    );
    expect(found[0]!.earlierCount).toBe(2);
    expect(found[0]!.earlier.defectId).toBe('d-2');
  });

  it('counts a long-ago report certified within the window', () => {
    expect(
      findRecurringDefects(current, [earlier({ reportedAt: daysAgo(120), certifiedAt: daysAgo(30) })], NOW),
    ).toHaveLength(1);
  });
});
