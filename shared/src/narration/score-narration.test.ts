import { describe, expect, it } from 'vitest';
import { buildChecklist } from '../checklist/index.js';
import { sampleCombination } from '../testing.js';
import { handBuiltChecklist, spoken } from './narration.fixture.js';
import { scoreNarration } from './score-narration.js';
import type { NarrationScore } from './types.js';

const en = handBuiltChecklist('en');
const es = handBuiltChecklist('es');

function statusOf(score: NarrationScore, key: string): string | undefined {
  return score.items.find((item) => item.itemKey === key)?.status;
}

function itemOf(score: NarrationScore, key: string) {
  const item = score.items.find((entry) => entry.itemKey === key);
  if (!item) throw new Error(`no item ${key}`);
  return item;
}

describe('scoreNarration: paraphrase and trade words', () => {
  it('credits a paraphrase in trade words, not only the words of the title', () => {
    const score = scoreNarration(spoken('left front wheel the air can is not leaking', 'adjuster arm not loose'), en);
    expect(statusOf(score, 'u1.axle1.left.brake.chamber')).toBe('named');
    expect(statusOf(score, 'u1.axle1.left.brake.slack')).toBe('named');
  });

  it('credits English synonyms: lugs, splash guard, air spring, tyre', () => {
    const score = scoreNarration(
      spoken(
        'driver side steer tyre no bulges',
        'lugs are tight',
        'drive axle air springs not leaking',
        'splash guard secure',
      ),
      en,
    );
    expect(statusOf(score, 'u1.axle1.left.tire.condition')).toBe('named');
    expect(statusOf(score, 'u1.axle1.left.lugs')).toBe('named');
    expect(statusOf(score, 'u1.axle2.left.air_bags')).toBe('named');
    expect(statusOf(score, 'u1.left.mud_flap')).toBe('named');
  });

  it('credits Spanish synonyms: pulmón, birlos, ajustador, neumático, with or without accents', () => {
    const score = scoreNarration(
      spoken(
        'lado del chofer neumatico delantero sin chichones',
        'birlos completos',
        'el pulmón sin fugas',
        'el ajustador no esta flojo',
      ),
      es,
    );
    expect(statusOf(score, 'u1.axle1.left.tire.condition')).toBe('named');
    expect(statusOf(score, 'u1.axle1.left.lugs')).toBe('named');
    expect(statusOf(score, 'u1.axle1.left.brake.chamber')).toBe('named');
    expect(statusOf(score, 'u1.axle1.left.brake.slack')).toBe('named');
  });

  it('mends a recogniser near miss on a long trade word', () => {
    const score = scoreNarration(spoken('izquierda delantera el ajustadro no esta roto'), es);
    expect(statusOf(score, 'u1.axle1.left.brake.slack')).toBe('named');
  });

  it('lists the points heard near a mention of the item', () => {
    const score = scoreNarration(spoken('left steer tire no cuts', 'valve cap in place'), en);
    const item = itemOf(score, 'u1.axle1.left.tire.condition');
    expect(item.pointsHeard).toEqual(['no cuts or bulges', 'valve stem and cap in place']);
    expect(item.pointsMissed).toEqual([]);
    const tread = itemOf(score, 'u1.axle1.left.tire.tread');
    expect(tread.pointsHeard).toEqual([]);
  });

  it('gives the time the item was first named and the words that named it', () => {
    const score = scoreNarration(spoken('front of the truck', 'headlights high and low beams work'), en);
    const item = itemOf(score, 'u1.front.headlamps');
    expect(item.firstNamedMs).toBe(4000);
    expect(item.heardIn).toBe('headlights high and low beams work');
    expect(item.pointsHeard).toEqual(['high and low beams work']);
  });
});

describe('scoreNarration: wheel positions', () => {
  it('names only the wheel end the student said', () => {
    const score = scoreNarration(spoken('left front tire no cuts no bulges'), en);
    expect(statusOf(score, 'u1.axle1.left.tire.condition')).toBe('named');
    expect(statusOf(score, 'u1.axle1.right.tire.condition')).toBe('missed');
    expect(statusOf(score, 'u1.axle2.left.outer.tire.condition')).toBe('missed');
  });

  it('reads a position said after the part: the tire on the right front', () => {
    const score = scoreNarration(spoken('checking the tire on the right front'), en);
    expect(statusOf(score, 'u1.axle1.right.tire.condition')).toBe('named');
    expect(statusOf(score, 'u1.axle1.left.tire.condition')).toBe('missed');
  });

  it('names one tire of a dual from side, axle and inner or outer', () => {
    const score = scoreNarration(spoken('on the right side drive axle the outer tire is good'), en);
    expect(statusOf(score, 'u1.axle2.right.outer.tire.condition')).toBe('named');
    expect(statusOf(score, 'u1.axle2.right.inner.tire.condition')).not.toBe('named');
  });

  it('names both tires of a dual when the student says them together', () => {
    const score = scoreNarration(spoken('left side drive tires no cuts'), en);
    expect(statusOf(score, 'u1.axle2.left.outer.tire.condition')).toBe('named');
    expect(statusOf(score, 'u1.axle2.left.inner.tire.condition')).toBe('named');
  });

  it('carries the position said before to the checks that follow', () => {
    const score = scoreNarration(spoken('now the left steer tire', 'tread depth good', 'lug nuts tight'), en);
    expect(statusOf(score, 'u1.axle1.left.tire.tread')).toBe('named');
    expect(statusOf(score, 'u1.axle1.left.lugs')).toBe('named');
    expect(statusOf(score, 'u1.axle1.right.lugs')).toBe('missed');
  });

  it('at most partly credits generic narration with no position', () => {
    const score = scoreNarration(spoken('checking my tires'), en);
    const tires = score.items.filter((item) => item.itemKey.endsWith('tire.condition'));
    expect(tires.length).toBe(6);
    expect(tires.every((item) => item.status === 'partly')).toBe(true);
  });

  it('keeps generic narration partly even after a position was said', () => {
    const score = scoreNarration(spoken('left side mud flap secure', 'checking my tires'), en);
    expect(statusOf(score, 'u1.left.mud_flap')).toBe('named');
    expect(statusOf(score, 'u1.axle2.left.outer.tire.condition')).toBe('partly');
    // Zone context: the right side is two zones away.
    expect(statusOf(score, 'u1.axle1.right.tire.condition')).toBe('missed');
  });

  it('reads Spanish positions: eje de tracción, derecha, exterior', () => {
    const score = scoreNarration(spoken('lado derecho eje de tracción llanta exterior sin cortes'), es);
    expect(statusOf(score, 'u1.axle2.right.outer.tire.condition')).toBe('named');
    expect(statusOf(score, 'u1.axle2.right.inner.tire.condition')).not.toBe('named');
  });
});

describe('scoreNarration: coverage and route order', () => {
  const leftAndFront = spoken(
    'headlights work',
    'steering box not leaking',
    'left steer tire no cuts tread good lug nuts tight',
    'brake chamber and slack adjuster good',
    'left drive tires good air bags good mud flap secure',
  );

  it('shows a zone never narrated as missed with low coverage', () => {
    const score = scoreNarration(leftAndFront, en);
    const right = score.zones.find((zone) => zone.zone === 'right_side')!;
    expect(right.named).toBe(0);
    expect(right.missed).toBe(right.itemCount);
    expect(right.namedFraction).toBe(0);
    expect(score.items.filter((item) => item.zone === 'right_side').every((item) => item.status !== 'named')).toBe(
      true,
    );
    const left = score.zones.find((zone) => zone.zone === 'left_side')!;
    expect(left.namedFraction).toBeGreaterThan(0.8);
    expect(score.overall.namedFraction).toBeLessThan(0.7);
    expect(score.overall.named + score.overall.partly + score.overall.missed).toBe(en.items.length);
  });

  it('flags an item named after items of a later zone on the route', () => {
    const score = scoreNarration(
      spoken('right side mud flap secure', 'right front tire no cuts', 'tail lights work', 'headlights work'),
      en,
    );
    expect(score.outOfOrder.map((item) => item.itemKey)).toEqual(['u1.rear.tail', 'u1.front.headlamps']);
    expect(score.outOfOrder[1]).toMatchObject({
      afterZone: 'right_side',
      afterItemKey: 'u1.right.mud_flap',
      firstNamedMs: 12000,
    });
  });

  it('does not take one stray mention of a later zone as having moved on', () => {
    const score = scoreNarration(
      spoken('right side mud flap secure', 'headlights work', 'steering box not leaking'),
      en,
    );
    expect(statusOf(score, 'u1.right.mud_flap')).toBe('named');
    expect(score.outOfOrder).toEqual([]);
  });

  it('finds nothing out of order in a walk-around that follows the route', () => {
    expect(scoreNarration(leftAndFront, en).outOfOrder).toEqual([]);
  });

  it('gives the same output for the same input, whatever the order the segments arrive in', () => {
    const first = scoreNarration(leftAndFront, en);
    const again = scoreNarration(leftAndFront, handBuiltChecklist('en'));
    const shuffled = scoreNarration([...leftAndFront].reverse(), en);
    expect(again).toEqual(first);
    expect(shuffled).toEqual(first);
  });

  it('scores an empty narration as all missed', () => {
    const score = scoreNarration([], en);
    expect(score.overall).toMatchObject({ named: 0, partly: 0, missed: en.items.length, creditFraction: 0 });
  });
});

describe('scoreNarration on a generated tractor and trailer checklist', () => {
  const english = buildChecklist(sampleCombination(), 'practice', 'en');
  const spanish = buildChecklist(sampleCombination(), 'practice', 'es');

  it('names coupling checks from trade words', () => {
    const score = scoreNarration(
      spoken(
        'coupling now',
        'glad hands connected and sealed',
        'kingpin not bent',
        'locking jaws closed around the shank',
        'landing gear fully raised',
      ),
      english,
    );
    const named = score.items.filter((item) => item.status === 'named').map((item) => item.itemKey);
    expect(named).toEqual(
      expect.arrayContaining([
        'u2.coupling.air_lines',
        'u2.coupling.kingpin',
        'u2.coupling.jaws',
        'u2.coupling.landing_gear',
      ]),
    );
    expect(score.zones.find((zone) => zone.zone === 'coupling')!.named).toBeGreaterThanOrEqual(4);
  });

  it('names a tractor wheel end from a free narration and leaves the trailer missed', () => {
    const score = scoreNarration(
      spoken(
        'left side steer tire properly inflated no cuts',
        'rim not cracked lugs tight hub oil good',
        'air can and slack adjuster good',
      ),
      english,
    );
    for (const key of [
      'u1.axle1.left.tire.inflation',
      'u1.axle1.left.tire.condition',
      'u1.axle1.left.rim',
      'u1.axle1.left.lugs',
      'u1.axle1.left.hub',
      'u1.axle1.left.brake.chamber',
      'u1.axle1.left.brake.slack',
    ]) {
      expect([key, statusOf(score, key)]).toEqual([key, 'named']);
    }
    expect(score.zones.find((zone) => zone.zone === 'trailer')!.named).toBe(0);
  });

  it('names Spanish trade words on the generated Spanish checklist', () => {
    const score = scoreNarration(
      spoken(
        'lado izquierdo llanta delantera bien inflada',
        'el rin sin grietas los birlos completos',
        'el pulmón bien montado',
        'manitas conectadas',
        'perno rey sin desgaste',
      ),
      spanish,
    );
    for (const key of [
      'u1.axle1.left.tire.inflation',
      'u1.axle1.left.rim',
      'u1.axle1.left.lugs',
      'u1.axle1.left.brake.chamber',
      'u2.coupling.air_lines',
      'u2.coupling.kingpin',
    ]) {
      expect([key, statusOf(score, key)]).toEqual([key, 'named']);
    }
  });
});
