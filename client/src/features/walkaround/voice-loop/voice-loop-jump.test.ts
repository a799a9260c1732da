import { buildChecklist, type Checklist } from '@yardcall/shared';
import { sampleCombination } from '@yardcall/shared/testing';
import { beforeAll, describe, expect, it } from 'vitest';
import { initialVoiceLoopState, reduceVoiceLoop, type VoiceLoopState } from './voice-loop';
import { contextFor } from './voice-loop.testing';

let checklist: Checklist;
const at = '2026-12-01T06:00:00.000Z';

beforeAll(() => {
  checklist = buildChecklist(sampleCombination(), 'pre_trip', 'en');
});

function started(): VoiceLoopState {
  return reduceVoiceLoop(initialVoiceLoopState(checklist), { type: 'start' }, contextFor(checklist)).state;
}

describe('jumping to an item from the list', () => {
  it('asks the chosen item in full and carries on at the stop the driver left', () => {
    const ctx = contextFor(checklist);
    const target = checklist.items[10]!;
    const before = started();
    const jumped = reduceVoiceLoop(before, { type: 'jump', itemKey: target.key }, ctx);
    expect(jumped.state).toMatchObject({
      phase: 'asking',
      index: 10,
      itemKey: target.key,
      current: { key: target.key },
    });
    expect(jumped.effects).toContainEqual({ type: 'speak', text: target.prompt, locale: 'en' });
    const answered = reduceVoiceLoop(
      jumped.state,
      { type: 'heard', alternatives: [{ transcript: 'good', confidence: 1 }], at },
      ctx,
    );
    expect(answered.state).toMatchObject({ stopKey: before.stopKey, current: null });
  });

  it('ignores an unknown key and a jump during a note', () => {
    const ctx = contextFor(checklist);
    const state = started();
    expect(reduceVoiceLoop(state, { type: 'jump', itemKey: 'no.such.item' }, ctx).state).toBe(state);
    const noting = reduceVoiceLoop(state, { type: 'command', command: 'note', at }, ctx).state;
    expect(noting.phase).toBe('noting');
    const key = checklist.items[5]!.key;
    expect(reduceVoiceLoop(noting, { type: 'jump', itemKey: key }, ctx).state.index).toBe(0);
  });
});
