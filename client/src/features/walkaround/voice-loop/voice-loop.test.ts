import { buildChecklist, verdictWords, type Checklist, type ChecklistStop } from '@yardcall/shared';
import { sampleCombination } from '@yardcall/shared/testing';
import { beforeAll, describe, expect, it } from 'vitest';
import {
  MAX_UNCLEAR,
  initialVoiceLoopState,
  reduceVoiceLoop,
  restoreVoiceLoop,
  type VoiceLoopState,
} from './voice-loop';
import {
  contextFor,
  contextRequiring,
  latestResults,
  passEverything,
  simulateVoiceLoop,
  wordCount,
  type SimulatedReply,
  type SimulatedTurn,
} from './voice-loop.testing';
import { VOICE_LOOP_WORDS } from './voice-loop-words';

let en: Checklist;
let es: Checklist;
const at = '2026-12-01T06:00:00.000Z';
const EN = VOICE_LOOP_WORDS.en;

beforeAll(() => {
  en = buildChecklist(sampleCombination(), 'pre_trip', 'en');
  es = buildChecklist(sampleCombination(), 'pre_trip', 'es');
});

function stopOf(checklist: Checklist, itemKey: string): ChecklistStop {
  const item = checklist.items.find((i) => i.key === itemKey);
  const stop = checklist.stops.find((s) => s.key === item?.stopKey);
  if (!stop) throw new Error(`no stop for ${itemKey}`);
  return stop;
}

// A state parked at the stop of an item, as if the driver had walked there.
function stateAtStop(checklist: Checklist, itemKey: string): VoiceLoopState {
  const stop = stopOf(checklist, itemKey);
  const first = stop.itemKeys[0] ?? '';
  return {
    ...initialVoiceLoopState(checklist),
    phase: 'asking',
    stop: checklist.stops.indexOf(stop),
    stopKey: stop.key,
    index: checklist.items.findIndex((i) => i.key === first),
    itemKey: first,
  };
}

// Answers from a list, one per turn, then the competent driver's answers (or stop with `null`).
function scripted(...replies: SimulatedReply[]) {
  let i = 0;
  return (turn: SimulatedTurn): SimulatedReply => (i < replies.length ? (replies[i++] ?? null) : passEverything(turn));
}

function only(...replies: SimulatedReply[]) {
  let i = 0;
  return (): SimulatedReply => replies[i++] ?? null;
}

const STEER_LEFT_HUB = 'u1.axle1.left.hub';
const STEER_LEFT_TREAD = 'u1.axle1.left.tire.tread';
const STEER_LEFT_PRESSURE = 'u1.axle1.left.tire.inflation';
const STEER_LEFT_HOSES = 'u1.axle1.left.brake.hoses';

describe('the voice loop, stop by stop', () => {
  it('walks a whole tractor-and-trailer pre-trip with one "good" per stop, saving every item', () => {
    const run = simulateVoiceLoop(contextFor(en), passEverything);
    const results = latestResults(run.saved);
    expect(run.state.phase).toBe('finished');
    expect(results.size).toBe(en.items.length);
    for (const item of en.items) {
      const result = results.get(item.key);
      expect(result?.answer, item.key).toBe('pass');
      // A measured check passed by eye is recorded as checked without a reading.
      if (item.expects.type === 'measure') expect(result?.noReading, item.key).toBe('visual');
      else expect(result?.noReading, item.key).toBeUndefined();
    }
    // One answer per stop, and the talk stays short: at 2.8 words a second plus 2 s an answer.
    expect(run.turns).toBe(en.stops.length);
    const seconds = wordCount(run.spoken) / 2.8 + 2 * run.turns;
    expect(seconds).toBeLessThan(8 * 60);
  });

  it('says each stop once, position once, without asking "Is that right?" anywhere', () => {
    const run = simulateVoiceLoop(contextFor(en), passEverything);
    expect(run.spoken.join(' ')).not.toContain('Is that right');
    const wheel = stopOf(en, STEER_LEFT_HUB);
    expect(run.spoken.filter((s) => s.includes(wheel.prompt))).toHaveLength(1);
  });

  it('"good except the hub is leaking" marks the hub with the driver\'s words and passes the rest of the stop', () => {
    const stop = stopOf(en, STEER_LEFT_HUB);
    const run = simulateVoiceLoop(contextFor(en), only('good except the hub is leaking'), {
      state: stateAtStop(en, STEER_LEFT_HUB),
      first: { type: 'start' },
    });
    const results = latestResults(run.saved);
    expect(results.get(STEER_LEFT_HUB)).toMatchObject({ answer: 'defect' });
    expect(results.get(STEER_LEFT_HUB)?.detail).toContain('leaking');
    for (const key of stop.itemKeys.filter((k) => k !== STEER_LEFT_HUB))
      expect(results.get(key)?.answer, key).toBe('pass');
    expect(run.spoken.join(' ')).toContain(
      EN.defectNoted.replace('{item}', en.items.find((i) => i.key === STEER_LEFT_HUB)?.name ?? ''),
    );
  });

  it('"defect, chafed air line" at a brake marks the air lines and passes the rest', () => {
    const stop = stopOf(en, STEER_LEFT_HOSES);
    const run = simulateVoiceLoop(contextFor(en), only('defect, chafed air line'), {
      state: stateAtStop(en, STEER_LEFT_HOSES),
    });
    const results = latestResults(run.saved);
    expect(results.get(STEER_LEFT_HOSES)?.answer).toBe('defect');
    expect(stop.itemKeys.filter((k) => results.get(k)?.answer === 'pass')).toHaveLength(stop.itemKeys.length - 1);
  });

  it('asks which item a problem belongs to when the answer does not say, and keeps the named one', () => {
    const run = simulateVoiceLoop(contextFor(en), only('defect, it is leaking', 'the hub'), {
      state: stateAtStop(en, STEER_LEFT_HUB),
    });
    expect(run.effects.some((e) => e.type === 'speak' && e.text.startsWith('Which one?'))).toBe(true);
    const results = latestResults(run.saved);
    expect(results.get(STEER_LEFT_HUB)?.answer).toBe('defect');
    expect(results.get(STEER_LEFT_HUB)?.detail).toContain('leaking');
  });

  it('"one by one" walks the stop item by item, each with its own answer', () => {
    const stop = stopOf(en, STEER_LEFT_HUB);
    const replies = [
      'one by one',
      ...stop.itemKeys.map((key) => (key === STEER_LEFT_HUB ? 'defect, seal leaking' : 'good')),
    ];
    const run = simulateVoiceLoop(contextFor(en), only(...replies), { state: stateAtStop(en, STEER_LEFT_HUB) });
    const results = latestResults(run.saved);
    expect(stop.itemKeys.every((key) => results.has(key))).toBe(true);
    expect(results.get(STEER_LEFT_HUB)?.answer).toBe('defect');
    expect(run.saved).toHaveLength(stop.itemKeys.length);
    expect(run.state.stop).toBe(en.stops.indexOf(stop) + 1);
  });
});

describe('readings', () => {
  it('says an in-limit value back at the start of the next prompt, without asking to confirm', () => {
    const stop = stopOf(en, STEER_LEFT_TREAD);
    const next = en.stops[en.stops.indexOf(stop) + 1] as ChecklistStop;
    const run = simulateVoiceLoop(contextFor(en), only('good, eight thirty-seconds'), {
      state: stateAtStop(en, STEER_LEFT_TREAD),
    });
    const results = latestResults(run.saved);
    expect(results.get(STEER_LEFT_TREAD)).toMatchObject({ answer: 'pass', measurement: { value: 8 }, verdict: 'ok' });
    const said = run.spoken.at(-1) ?? '';
    expect(said.startsWith('Eight thirty-seconds.')).toBe(true);
    expect([next.prompt, next.shortPrompt].some((prompt) => said.includes(prompt))).toBe(true);
    expect(said).not.toContain('Is that right');
  });

  it('"no" right after a value was said back asks that value again', () => {
    const run = simulateVoiceLoop(contextFor(en), only('good, eight thirty-seconds', 'no', 'six thirty-seconds'), {
      state: stateAtStop(en, STEER_LEFT_TREAD),
    });
    const results = latestResults(run.saved);
    expect(results.get(STEER_LEFT_TREAD)?.measurement?.value).toBe(6);
  });

  it('confirms a tread depth of 1/32 on a steer tire and keeps it as an out-of-limit defect', () => {
    const run = simulateVoiceLoop(contextFor(en), only('good, one thirty-second', 'yes'), {
      state: stateAtStop(en, STEER_LEFT_TREAD),
    });
    const results = latestResults(run.saved);
    expect(results.get(STEER_LEFT_TREAD)).toMatchObject({ answer: 'defect', verdict: 'out_of_limit' });
    // 49 CFR 393.75(b): steer tires at least 4/32 in.
    expect(run.spoken.some((s) => s.includes('Is that right'))).toBe(true);
  });

  it('a required reading answered "good" is asked for; "no gauge" passes it and says so', () => {
    const ctx = contextRequiring(['steer_tread_depth'], en);
    const run = simulateVoiceLoop(ctx, only('good', 'good', 'no gauge'), { state: stateAtStop(en, STEER_LEFT_TREAD) });
    const results = latestResults(run.saved);
    expect(results.get(STEER_LEFT_TREAD)).toMatchObject({ answer: 'pass', noReading: 'no_gauge' });
    expect(results.get(STEER_LEFT_PRESSURE)).toMatchObject({ answer: 'pass', noReading: 'visual' });
    expect(run.spoken.filter((s) => s.includes('a reading is required')).length).toBeGreaterThanOrEqual(1);
  });

  it('a tire under its spec, fixed on the spot with a new reading, opens no defect', () => {
    const spec = en.items.find((i) => i.key === STEER_LEFT_PRESSURE)?.limitContext?.specPsi ?? 110;
    const run = simulateVoiceLoop(
      contextFor(en),
      only(`good, ${spec - 20} psi`, 'yes', `corrected, added air, now ${spec} psi`),
      { state: stateAtStop(en, STEER_LEFT_PRESSURE) },
    );
    const result = latestResults(run.saved).get(STEER_LEFT_PRESSURE);
    expect(result?.answer).toBe('defect');
    expect(result?.fixed?.action).toContain('added air');
    expect(result?.fixed?.measurement?.value).toBe(spec);
    expect(run.spoken.join(' ')).toContain('Fixed on the spot');
  });

  it('"fixed" with nothing to fix says so and asks again; never a pass', () => {
    const run = simulateVoiceLoop(contextFor(en), only('fixed'), { state: stateAtStop(en, STEER_LEFT_HUB) });
    expect(run.saved).toHaveLength(0);
    expect(run.spoken.join(' ')).toContain(EN.nothingToFix);
  });
});

describe('never a loop', () => {
  it('after three unclear answers says once that it waits, stops prompting, and goes on at "resume"', () => {
    const run = simulateVoiceLoop(
      contextFor(en),
      only('um', 'banana', 'let me see', 'blah', 'more talk', 'resume', 'good'),
      { state: stateAtStop(en, STEER_LEFT_HUB) },
    );
    const waits = run.spoken.filter((s) => s.includes(EN.waiting));
    expect(waits).toHaveLength(1);
    // Nothing said while waiting, until "resume".
    const waitAt = run.spoken.indexOf(waits[0] as string);
    expect(run.spoken[waitAt + 1]).toContain(EN.resuming);
    expect(latestResults(run.saved).get(STEER_LEFT_HUB)?.answer).toBe('pass');
    expect(MAX_UNCLEAR).toBe(3);
  });

  it('never takes hedged praise as a pass', () => {
    const run = simulateVoiceLoop(contextFor(en), only("I wouldn't say it's good"), {
      state: stateAtStop(en, STEER_LEFT_HUB),
    });
    expect(run.saved.filter((r) => r.answer === 'pass' && r.itemKey === STEER_LEFT_HUB)).toHaveLength(0);
  });

  it('reminds twice through silence, then waits quietly', () => {
    const silence = { silence: true as const };
    const run = simulateVoiceLoop(contextFor(en), only(...Array.from({ length: 12 }, () => silence)), {
      state: stateAtStop(en, STEER_LEFT_HUB),
    });
    expect(run.spoken.filter((s) => s.includes(EN.waiting))).toHaveLength(1);
    expect(run.spoken.length).toBeLessThanOrEqual(4);
    expect(run.state.phase).toBe('paused');
  });

  it('the offer of what is not done waits after three unclear answers too', () => {
    const last = en.stops.at(-1)?.itemKeys[0] ?? '';
    const run = simulateVoiceLoop(contextFor(en), only('skip', 'hmm', 'what', 'banana', 'hmm', 'hmm'), {
      state: stateAtStop(en, last),
    });
    expect(run.spoken.filter((s) => s.includes(EN.waiting))).toHaveLength(1);
    expect(run.state.phase).toBe('paused');
  });

  it('says the safety caution once per walk-around', () => {
    const caution = verdictWords('en').verdicts.caution;
    const replies: SimulatedReply[] = [];
    const run = simulateVoiceLoop(contextFor(en), (turn) => {
      // Every tread said near its limit: each is a near-limit verdict.
      if (turn.atStop && turn.stop?.itemKeys.some((k) => k.endsWith('tire.tread'))) return 'good, four thirty-seconds';
      return replies.shift() ?? passEverything(turn);
    });
    expect(run.spoken.filter((s) => s.includes(caution))).toHaveLength(1);
  });
});

describe('notes', () => {
  it('"... end note" at the end of a sentence ends the note, and is left out of its words', () => {
    const run = simulateVoiceLoop(contextFor(en), only('note', 'the marker lens is cracked, end note'), {
      state: stateAtStop(en, STEER_LEFT_HUB),
    });
    const stopNote = run.effects.find((e) => e.type === 'stopNote');
    expect(stopNote).toMatchObject({ heard: 'the marker lens is cracked' });
    expect(run.state.phase).toBe('asking');
  });

  it('a note ends by itself at its longest length, with a spoken word', () => {
    const start = simulateVoiceLoop(contextFor(en), only('note'), { state: stateAtStop(en, STEER_LEFT_HUB) });
    expect(start.effects.find((e) => e.type === 'startNote')).toMatchObject({ maxMs: 120_000 });
    const step = reduceVoiceLoop(start.state, { type: 'note_limit' }, contextFor(en));
    expect(step.effects.find((e) => e.type === 'stopNote')).toBeTruthy();
    const said = step.effects.find((e) => e.type === 'speak');
    expect(said?.type === 'speak' ? said.text : '').toContain(EN.noteLimit);
  });

  it('a note after a defect at a stop belongs to that defect', () => {
    const run = simulateVoiceLoop(contextFor(en), only('good except the hub is leaking', 'back', 'note'), {
      state: stateAtStop(en, STEER_LEFT_HUB),
    });
    expect(run.effects.find((e) => e.type === 'startNote')).toMatchObject({ itemKey: STEER_LEFT_HUB });
  });
});

describe('moving about', () => {
  it('"back" goes to the previous stop and says it in full', () => {
    const state = stateAtStop(en, STEER_LEFT_HUB);
    const previous = en.stops[state.stop - 1] as ChecklistStop;
    const run = simulateVoiceLoop(contextFor(en), only('back up one'), { state });
    expect(run.state.stopKey).toBe(previous.key);
    expect(run.spoken.at(-1)).toContain(previous.prompt);
  });

  it('skips a stop and offers its items again before finishing; "yes" walks them', () => {
    const skippedStop = en.stops[3] as ChecklistStop;
    const run = simulateVoiceLoop(contextFor(en), (turn) => {
      if (turn.atStop && turn.stop?.key === skippedStop.key && !turn.state.review) return 'skip';
      if (turn.mode === 'offer') return 'yes';
      return passEverything(turn);
    });
    const results = latestResults(run.saved);
    expect(run.state.phase).toBe('finished');
    expect(skippedStop.itemKeys.every((key) => results.get(key)?.answer === 'pass')).toBe(true);
  });

  it('resumes from the stored state at the same stop, saying it again', () => {
    const first = simulateVoiceLoop(contextFor(en), scripted('good', 'good', 'good', null));
    const restored = restoreVoiceLoop(JSON.parse(JSON.stringify(first.state)), en);
    expect(restored?.stopKey).toBe(first.state.stopKey);
    const step = reduceVoiceLoop(restored as VoiceLoopState, { type: 'start' }, contextFor(en));
    const said = step.effects.find((e) => e.type === 'speak');
    expect(said?.type === 'speak' ? said.text : '').toContain(EN.resumed);
  });

  it('takes the answers the phone stored as the record: a state stored ahead of them asks those items again', () => {
    const first = simulateVoiceLoop(contextFor(en), scripted('good', 'good', 'good', null));
    // The last stop's answers never reached the store before the reload.
    const lastStop = en.stops[2] as ChecklistStop;
    const saved = first.saved.filter((result) => !lastStop.itemKeys.includes(result.itemKey));
    const restored = restoreVoiceLoop(JSON.parse(JSON.stringify(first.state)), en, saved);
    expect(Object.keys(restored?.results ?? {}).sort()).toEqual(saved.map((r) => r.itemKey).sort());
    const run = simulateVoiceLoop(contextFor(en), (turn) => (turn.mode === 'offer' ? 'yes' : passEverything(turn)), {
      state: restored as VoiceLoopState,
    });
    expect(run.state.phase).toBe('finished');
    expect(lastStop.itemKeys.every((key) => latestResults(run.saved).has(key))).toBe(true);
  });

  it('refuses a stored state that does not belong to the checklist', () => {
    expect(restoreVoiceLoop('not a state', en)).toBeNull();
    expect(restoreVoiceLoop({ version: 1 }, en)).toBeNull();
    const foreign = { ...initialVoiceLoopState(en), stopKey: 'nowhere' };
    expect(restoreVoiceLoop(foreign, en)).toBeNull();
  });

  it('asks for the reading of a low-confidence answer before keeping it', () => {
    const run = simulateVoiceLoop(contextFor(en), only([{ transcript: 'good', confidence: 0.3 }], 'yes'), {
      state: stateAtStop(en, STEER_LEFT_HUB),
      first: { type: 'start' },
    });
    expect(run.spoken.some((s) => s.includes('I heard: good'))).toBe(true);
    expect(latestResults(run.saved).get(STEER_LEFT_HUB)?.answer).toBe('pass');
  });

  it('a jump from the list asks the item in full, then carries on at the stop it left', () => {
    const state = stateAtStop(en, STEER_LEFT_HUB);
    const step = reduceVoiceLoop(state, { type: 'jump', itemKey: en.items[2]?.key ?? '' }, contextFor(en));
    expect(step.state.current?.key).toBe(en.items[2]?.key);
    const after = reduceVoiceLoop(
      step.state,
      { type: 'heard', alternatives: [{ transcript: 'good', confidence: 0.9 }], at },
      contextFor(en),
    );
    expect(after.state.stopKey).toBe(state.stopKey);
  });
});

describe('in Spanish', () => {
  it('runs a whole walk-around with "bien" at every stop', () => {
    const run = simulateVoiceLoop(contextFor(es), passEverything, { state: initialVoiceLoopState(es) });
    expect(run.state.phase).toBe('finished');
    expect(latestResults(run.saved).size).toBe(es.items.length);
  });

  it('"bien excepto la maza tiene fuga" marks the hub', () => {
    const run = simulateVoiceLoop(contextFor(es), only('bien excepto la maza tiene fuga'), {
      state: stateAtStop(es, STEER_LEFT_HUB),
    });
    expect(latestResults(run.saved).get(STEER_LEFT_HUB)?.answer).toBe('defect');
  });

  it('switches language by voice and says the same stop in the new language', () => {
    const run = simulateVoiceLoop(contextFor(en, es), only('español'), { state: stateAtStop(en, STEER_LEFT_HUB) });
    expect(run.state.locale).toBe('es');
    expect(run.spoken.at(-1)).toContain(stopOf(es, STEER_LEFT_HUB).prompt);
  });
});

describe('fixed on the spot, readings', () => {
  it('a value out of limit is fixed only with a new value within it', () => {
    const spec = en.items.find((i) => i.key === STEER_LEFT_PRESSURE)?.limitContext?.specPsi ?? 110;
    const run = simulateVoiceLoop(contextFor(en), only(`good, ${spec - 20} psi`, 'yes', 'fixed, added air'), {
      state: stateAtStop(en, STEER_LEFT_PRESSURE),
    });
    const result = latestResults(run.saved).get(STEER_LEFT_PRESSURE);
    expect(result?.answer).toBe('defect');
    expect(result?.fixed).toBeUndefined();
    expect(run.spoken.at(-1)).toContain(EN.fixNeedsReading);
  });
});
