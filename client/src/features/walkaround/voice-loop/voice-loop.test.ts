import { buildChecklist, readBackMeasurement, sampleCombination, type Checklist } from '@yardcall/shared';
import { beforeAll, describe, expect, it } from 'vitest';
import {
  initialVoiceLoopState,
  reduceVoiceLoop,
  restoreVoiceLoop,
  serializeVoiceLoop,
  type VoiceLoopState,
} from './voice-loop';
import {
  contextFor,
  latestResults,
  passEverything,
  passingAnswer,
  simulateVoiceLoop,
  type SimulatedTurn,
} from './voice-loop.testing';
import { VOICE_LOOP_WORDS } from './voice-loop-words';

let en: Checklist;
let es: Checklist;
const at = '2026-12-01T06:00:00.000Z';

beforeAll(() => {
  en = buildChecklist(sampleCombination(), 'pre_trip', 'en');
  es = buildChecklist(sampleCombination(), 'pre_trip', 'es');
});

function indexOf(checklist: Checklist, key: string): number {
  const index = checklist.items.findIndex((item) => item.key === key);
  if (index < 0) throw new Error(`no item ${key}`);
  return index;
}

// A state parked on an item, as if the driver had walked there.
function stateAt(checklist: Checklist, key: string): VoiceLoopState {
  const index = indexOf(checklist, key);
  return { ...initialVoiceLoopState(checklist), phase: 'asking', index, itemKey: key };
}

// Answers from a list, one per turn, then stops.
function scripted(...replies: (string | { silence: true })[]) {
  let i = 0;
  return () => replies[i++] ?? null;
}

const STEER_TREAD = 'u1.axle1.left.tire.tread';

describe('the voice loop reducer', () => {
  it('walks a whole tractor-and-trailer pre-trip by voice alone, saving every item', () => {
    const run = simulateVoiceLoop(contextFor(en), passEverything);
    const results = latestResults(run.saved);
    expect(run.state.phase).toBe('finished');
    expect(results.size).toBe(en.items.length);
    expect(en.items.length).toBeGreaterThan(200);
    for (const item of en.items) {
      const result = results.get(item.key);
      expect(result?.answer, item.key).toBe('pass');
      if (item.expects.type === 'measure') expect(result?.measurement?.quantity, item.key).toBe(item.expects.quantity);
    }
    const finish = run.effects.find((e) => e.type === 'finish');
    expect(finish).toMatchObject({ type: 'finish', notDone: [] });
    expect(finish?.type === 'finish' && finish.results).toHaveLength(en.items.length);
    // Every measurement was read back before it was kept.
    const readBacks = run.spoken.filter((s) => s.endsWith('Is that right?'));
    expect(readBacks.length).toBe(en.items.filter((i) => i.expects.type === 'measure').length);
  });

  it('reads a measurement back and keeps it only after the driver confirms', () => {
    const ctx = contextFor(en);
    const run = simulateVoiceLoop(ctx, scripted('twelve thirty seconds', 'yes'), { state: stateAt(en, STEER_TREAD) });
    expect(run.spoken[1]).toBe('Twelve thirty-seconds. Is that right?');
    expect(run.saved).toHaveLength(1);
    expect(run.saved[0]).toMatchObject({
      itemKey: STEER_TREAD,
      answer: 'pass',
      verdict: 'ok',
      measurement: { quantity: 'tread_depth', value: 12, unit: 'in/32' },
      heard: 'twelve thirty seconds',
    });
    expect(run.state.index).toBe(indexOf(en, STEER_TREAD) + 1);
  });

  it('confirms a tread depth of 1/32 on a steer tire and keeps it as an out-of-limit defect', () => {
    // 49 CFR 393.75(b): steer tires need at least 4/32 in.
    const run = simulateVoiceLoop(contextFor(en), scripted('one thirty second', 'yes'), {
      state: stateAt(en, STEER_TREAD),
    });
    const question = run.spoken[1] ?? '';
    expect(question).toContain('I heard one thirty-second.');
    expect(question).toContain('below the minimum of 4 thirty-seconds');
    expect(question).toContain('Is that right?');
    expect(run.saved[0]).toMatchObject({ answer: 'defect', verdict: 'out_of_limit', measurement: { value: 1 } });
    expect(run.saved[0]?.detail).toContain('below the minimum');
    const after = run.spoken[2] ?? '';
    expect(after).toContain('Kept at one thirty-second.');
    expect(after).toContain('Marked as a defect.');
    // The safety caution rides with every tire verdict.
    expect(after).toMatch(/judgement/i);
  });

  it('takes a correction after the read-back ("no, six") and reads the new value back', () => {
    const run = simulateVoiceLoop(contextFor(en), scripted('five thirty seconds', 'no, six', 'yes'), {
      state: stateAt(en, STEER_TREAD),
    });
    expect(run.spoken[1]).toBe('Five thirty-seconds. Is that right?');
    expect(run.spoken[2]).toBe('Six thirty-seconds. Is that right?');
    expect(run.saved).toHaveLength(1);
    expect(run.saved[0]).toMatchObject({ answer: 'pass', measurement: { value: 6 } });
  });

  it('asks for the value again after a plain "no" to the read-back, without saving', () => {
    const run = simulateVoiceLoop(contextFor(en), scripted('five thirty seconds', 'no'), {
      state: stateAt(en, STEER_TREAD),
    });
    expect(run.spoken[2]).toBe('Say the value again.');
    expect(run.saved).toHaveLength(0);
    expect(run.state.phase).toBe('asking');
  });

  it('asks again when unclear, offers the choices after the second time, and never saves a pass', () => {
    const start = stateAt(en, 'u1.lights.headlamps');
    const run = simulateVoiceLoop(contextFor(en), scripted('the thing', 'maybe', 'um'), { state: start });
    expect(run.spoken[1]).toBe("Sorry, I didn't understand. Say good, or say defect and what is wrong.");
    expect(run.spoken[2]).toBe('Say good, defect, or skip.');
    expect(run.spoken[3]).toBe('Say good, defect, or skip.');
    expect(run.saved).toHaveLength(0);
    expect(run.state.itemKey).toBe('u1.lights.headlamps');
  });

  it('asks again when the recogniser hypotheses disagree between good and a defect', () => {
    const run = simulateVoiceLoop(
      contextFor(en),
      (() => {
        let i = 0;
        return () =>
          i++ === 0
            ? [
                { transcript: 'good', confidence: 0.6 },
                { transcript: 'broken', confidence: 0.55 },
              ]
            : null;
      })(),
      { state: stateAt(en, 'u1.lights.headlamps') },
    );
    expect(run.spoken[1]).toBe('I heard that two ways. Please say it again.');
    expect(run.saved).toHaveLength(0);
  });

  it('says a retryable speech error once, then keeps listening quietly', () => {
    const ctx = contextFor(en);
    const error = {
      type: 'speech_error',
      code: 'network',
      fatal: false,
      spoken: 'Lost it.',
      shown: 'Offline.',
    } as const;
    const first = reduceVoiceLoop(stateAt(en, 'u1.mirrors'), error, ctx);
    expect(first.effects.map((e) => e.type)).toEqual(['speak', 'listen']);
    const second = reduceVoiceLoop(first.state, error, ctx);
    expect(second.effects.map((e) => e.type)).toEqual(['listen']);
    expect(second.state.phase).toBe('asking');
  });

  it('does not take "good" as a value on a measurement item', () => {
    const run = simulateVoiceLoop(contextFor(en), scripted('good', 'good'), { state: stateAt(en, STEER_TREAD) });
    expect(run.spoken[1]).toMatch(/I need the value/);
    expect(run.spoken[2]).toBe('Say the value, defect, or skip.');
    expect(run.saved).toHaveLength(0);
  });

  it('saves a defect with what the driver said is wrong', () => {
    const run = simulateVoiceLoop(contextFor(en), scripted('defect, cracked lens'), {
      state: stateAt(en, 'u1.lights.headlamps'),
    });
    expect(run.saved[0]).toMatchObject({ answer: 'defect', detail: 'cracked lens' });
    expect(run.spoken[1]).toMatch(/^Defect noted\./);
  });

  it('remembers skipped items and offers them again before finishing', () => {
    const skippedKeys = ['u1.engine.coolant', 'u1.cab.horn', STEER_TREAD];
    let offered = false;
    const reply = (turn: SimulatedTurn) => {
      if (turn.mode === 'offer') {
        if (offered) return 'finish';
        offered = true;
        return 'yes';
      }
      if (turn.item && skippedKeys.includes(turn.item.key) && !turn.state.review) return 'skip';
      return passEverything(turn);
    };
    const run = simulateVoiceLoop(contextFor(en), reply);
    const offer = run.spoken.find((s) => s.includes('skipped:'));
    expect(offer).toMatch(
      /^3 checks skipped: Coolant level, Tractor, engine compartment; Horn, Tractor, cab; Tread depth/,
    );
    expect(run.state.phase).toBe('finished');
    const results = latestResults(run.saved);
    for (const key of skippedKeys) expect(results.get(key)?.answer).toBe('pass');
    expect(run.effects.find((e) => e.type === 'finish')).toMatchObject({ notDone: [] });
    expect(run.state.skipped).toEqual([]);
  });

  it('finishes with the skipped items listed as not done when the driver says finish at the offer', () => {
    const reply = (turn: SimulatedTurn) => {
      if (turn.mode === 'offer') return 'finish';
      if (turn.item?.key === 'u1.cab.horn' && turn.state.results['u1.cab.horn'] === undefined) return 'skip';
      return passEverything(turn);
    };
    const run = simulateVoiceLoop(contextFor(en), reply);
    expect(run.spoken.some((s) => s.startsWith('1 check skipped: Horn, Tractor, cab.'))).toBe(true);
    expect(run.effects.find((e) => e.type === 'finish')).toMatchObject({ notDone: ['u1.cab.horn'] });
    expect(run.spoken.at(-1)).toMatch(/Finishing with 1 not done/);
  });

  it('goes back to the previous item and lets the driver answer it again', () => {
    const run = simulateVoiceLoop(contextFor(en), scripted('good', 'good', 'back', 'defect, low oil'));
    const first = en.items[1];
    expect(run.saved.map((r) => `${r.itemKey}:${r.answer}`)).toEqual([
      `${en.items[0]?.key}:pass`,
      `${first?.key}:pass`,
      `${first?.key}:defect`,
    ]);
    expect(run.spoken[3]).toBe(first?.prompt);
  });

  it('says an item gone back to in full, even one of a kind heard many times', () => {
    const key = 'u1.axle2.left.outer.tire.tread';
    const previous = en.items[indexOf(en, key) - 1];
    if (!previous) throw new Error('no previous item');
    const state = { ...stateAt(en, key), titleCounts: { [previous.title]: 10 } };
    const run = simulateVoiceLoop(contextFor(en), scripted('back'), { state, first: { type: 'silence' } });
    expect(run.spoken).toEqual([previous.prompt]);
  });

  it('says the first item again when "back" is said on it', () => {
    const run = simulateVoiceLoop(contextFor(en), scripted('back'));
    expect(run.spoken[1]).toBe(`This is the first check. ${en.items[0]?.prompt}`);
    expect(run.state.index).toBe(0);
  });

  it('repeats the prompt in full, and the read-back while confirming', () => {
    const run = simulateVoiceLoop(contextFor(en), scripted('repeat', 'five thirty seconds', 'repeat'), {
      state: stateAt(en, STEER_TREAD),
    });
    const item = en.items[indexOf(en, STEER_TREAD)];
    expect(run.spoken[1]).toBe(item?.prompt);
    expect(run.spoken[3]).toBe(run.spoken[2]);
    expect(run.saved).toHaveLength(0);
  });

  it('records a note at the item with the words heard and returns to the item', () => {
    const run = simulateVoiceLoop(
      contextFor(en),
      scripted('note', 'the lens is cracked at the top', 'good', 'end note', 'defect'),
      { state: stateAt(en, 'u1.lights.headlamps') },
    );
    const noteEffects = run.effects.filter((e) => e.type === 'startNote' || e.type === 'stopNote');
    expect(noteEffects).toEqual([
      { type: 'startNote', itemKey: 'u1.lights.headlamps', heard: 'note' },
      { type: 'stopNote', itemKey: 'u1.lights.headlamps', heard: 'the lens is cracked at the top good' },
    ]);
    // "good" inside the note is part of the note, not an answer.
    expect(run.saved).toHaveLength(1);
    expect(run.saved[0]).toMatchObject({ itemKey: 'u1.lights.headlamps', answer: 'defect' });
    // The prompt is said before recording starts, so the note does not open with our voice.
    const startIndex = run.effects.findIndex((e) => e.type === 'startNote');
    expect(run.effects[startIndex - 1]).toMatchObject({ type: 'speak', text: VOICE_LOOP_WORDS.en.noteStarted });
    expect(run.spoken).toContain(`Note saved. ${en.items[indexOf(en, 'u1.lights.headlamps')]?.prompt}`);
  });

  it('pauses, ignores talk while paused, and resumes at the same item', () => {
    const run = simulateVoiceLoop(contextFor(en), scripted('pause', 'good', { silence: true }, 'resume', 'good'), {
      state: stateAt(en, 'u1.mirrors'),
    });
    expect(run.spoken[1]).toBe(VOICE_LOOP_WORDS.en.paused);
    expect(run.spoken[2]).toBe(`Resuming. ${en.items[indexOf(en, 'u1.mirrors')]?.prompt}`);
    expect(run.saved.map((r) => r.itemKey)).toEqual(['u1.mirrors']);
  });

  it('says where the driver is: zone, position and progress', () => {
    const state = {
      ...stateAt(en, STEER_TREAD),
      results: { a: { itemKey: 'a', answer: 'pass' as const, answeredAt: at } },
    };
    const run = simulateVoiceLoop(contextFor(en), scripted('where am i'), { state, first: { type: 'silence' } });
    const n = indexOf(en, STEER_TREAD) + 1;
    expect(run.spoken[0]).toBe(
      `Left side, front to back. Tractor, axle 1, left tire, Tread depth. Check ${n} of ${en.items.length}, 1 done.`,
    );
  });

  it('answers help with the commands and the choices for the item', () => {
    const run = simulateVoiceLoop(contextFor(en), scripted('help'), {
      state: stateAt(en, STEER_TREAD),
      first: { type: 'silence' },
    });
    expect(run.spoken[0]).toContain('where am I');
    expect(run.spoken[0]).toContain('Say the value, defect, or skip.');
  });

  it('uses the short prompt once three items of a kind have been asked', () => {
    const run = simulateVoiceLoop(contextFor(en), passEverything);
    const inflation = en.items.filter((i) => i.title === 'Tire inflation');
    const said = (key: string) => run.spoken.find((s) => s.endsWith(en.items[indexOf(en, key)]?.shortPrompt ?? '#'));
    expect(inflation.length).toBeGreaterThan(4);
    // The first three are said in full, the fourth on is short.
    for (const item of inflation.slice(0, 3)) expect(run.spoken.some((s) => s.endsWith(item.prompt))).toBe(true);
    for (const item of inflation.slice(3)) expect(said(item.key), item.key).toBeDefined();
    expect(run.spoken.some((s) => s.endsWith(inflation[3]?.prompt ?? '#'))).toBe(false);
  });

  it('stays quiet through two silent turns, then says the short prompt again', () => {
    const item = en.items[indexOf(en, 'u1.mirrors')];
    const run = simulateVoiceLoop(contextFor(en), scripted({ silence: true }, { silence: true }, { silence: true }), {
      state: stateAt(en, 'u1.mirrors'),
    });
    expect(run.spoken.slice(1)).toEqual([item?.shortPrompt]);
  });

  it('stalls on a fatal speech error, tells the host, and resumes on start', () => {
    const state = stateAt(en, 'u1.mirrors');
    const ctx = contextFor(en);
    const failed = reduceVoiceLoop(
      state,
      { type: 'speech_error', code: 'not-allowed', fatal: true, spoken: 'No microphone.', shown: 'Blocked.' },
      ctx,
    );
    expect(failed.state.phase).toBe('stalled');
    expect(failed.effects).toEqual([
      { type: 'speak', text: 'No microphone.', locale: 'en' },
      { type: 'speechFailed', code: 'not-allowed', shown: 'Blocked.' },
    ]);
    const resumed = reduceVoiceLoop(failed.state, { type: 'start' }, ctx);
    expect(resumed.state.phase).toBe('asking');
    expect(resumed.effects.map((e) => e.type)).toEqual(['speak', 'listen']);
  });

  it('finishing early offers every check not done yet', () => {
    const run = simulateVoiceLoop(contextFor(en), scripted('good', 'finish', 'finish'));
    const open = en.items.length - 1;
    expect(run.spoken[2]).toMatch(new RegExp(`^${open} checks not done: `));
    expect(run.spoken[2]).toContain(`and ${open - 3} more`);
    const finish = run.effects.find((e) => e.type === 'finish');
    expect(finish?.type === 'finish' && finish.notDone.length).toBe(open);
  });

  it('serialises to plain JSON and resumes at the same item, saying its prompt again', () => {
    const ctx = contextFor(en);
    const firstPart = simulateVoiceLoop(ctx, (turn) => (turn.state.index >= 40 ? null : passEverything(turn)));
    const stored = serializeVoiceLoop(firstPart.state);
    expect(JSON.parse(stored)).toEqual(firstPart.state);
    const restored = restoreVoiceLoop(stored, en);
    expect(restored).toEqual(firstPart.state);
    if (!restored) return;
    const step = reduceVoiceLoop(restored, { type: 'start' }, ctx);
    const item = en.items[40];
    expect(step.effects[0]).toEqual({
      type: 'speak',
      text: `Picking up where you left off. ${item?.prompt}`,
      locale: 'en',
    });
    // And the rest of the walk-around finishes from there.
    const rest = simulateVoiceLoop(ctx, passEverything, { state: restored });
    expect(rest.state.phase).toBe('finished');
    expect(Object.keys(rest.state.results)).toHaveLength(en.items.length);
  });

  it('refuses a stored state that does not belong to the checklist', () => {
    expect(restoreVoiceLoop('not json', en)).toBeNull();
    expect(restoreVoiceLoop(JSON.stringify({ version: 99 }), en)).toBeNull();
    const foreign = { ...initialVoiceLoopState(en), itemKey: 'u9.nothing' };
    expect(restoreVoiceLoop(serializeVoiceLoop(foreign), en)).toBeNull();
  });

  it('runs a walk-around in Spanish with Spanish read-backs', () => {
    const ctx = contextFor(es);
    const run = simulateVoiceLoop(ctx, passEverything, { state: initialVoiceLoopState(es) });
    expect(run.state.phase).toBe('finished');
    expect(latestResults(run.saved).size).toBe(es.items.length);
    const tread = run.spoken.find((s) => s.startsWith('Doce treintaidosavos'));
    expect(tread).toBe(
      readBackMeasurement(
        { quantity: 'tread_depth', value: 12, unit: 'in/32', said: { value: 12, unit: 'in/32' } },
        'es',
      ),
    );
    expect(run.spoken.at(-1)).toMatch(/revisiones están hechas/);
  });

  it('switches language by voice and says the same item in the new language', () => {
    const ctx = contextFor(en, es);
    const run = simulateVoiceLoop(ctx, scripted('good', 'español', 'bien'));
    expect(run.effects).toContainEqual({ type: 'setLocale', locale: 'es' });
    expect(run.spoken[2]).toContain(es.items[1]?.prompt);
    expect(run.state.locale).toBe('es');
    expect(run.saved.map((r) => r.itemKey)).toEqual([en.items[0]?.key, en.items[1]?.key]);
  });

  it('gives every sample measurement item a passing answer', () => {
    // Guards the helpers the other tests rely on.
    for (const item of en.items) expect(passingAnswer(item, 'en')).not.toBe('');
  });
});
