import { buildChecklist, type Checklist, type ItemResult } from '@yardcall/shared';
import { sampleCombination } from '@yardcall/shared/testing';
import { beforeAll, describe, expect, it } from 'vitest';
import { ScriptedEngine, type ScriptedReply, type ScriptedTurn } from '@/lib/speech';
import { runVoiceLoop, summarizeTimings, type VoiceLoopRunner } from './run-voice-loop';
import { passingAnswer } from './voice-loop.testing';
import { restoreVoiceLoop } from './voice-loop';

let en: Checklist;
let es: Checklist;

beforeAll(() => {
  en = buildChecklist(sampleCombination(), 'pre_trip', 'en');
  es = buildChecklist(sampleCombination(), 'pre_trip', 'es');
});

// Answers like a careful driver, reading the loop's own state to know the stop or the item.
function carefulDriver(getRunner: () => VoiceLoopRunner | undefined, checklist: () => Checklist) {
  return (turn: ScriptedTurn): ScriptedReply => {
    const state = getRunner()?.getState();
    if (!state) return 'good';
    const yes = turn.locale === 'es' ? 'sí' : 'yes';
    if (state.phase === 'confirming') return yes;
    if (state.phase === 'offering') return 'finish';
    if (state.current === null) return turn.locale === 'es' ? 'bien' : 'good';
    const item = checklist().items[state.index];
    return item ? passingAnswer(item, turn.locale) : 'finish';
  };
}

describe('summarizeTimings', () => {
  it('reports nearest-rank percentiles of the latencies', () => {
    const timings = [5, 1, 4, 2, 3, 10, 6, 7, 8, 9].map((ms) => ({
      answerEndedAt: 0,
      promptStartedAt: ms,
      latencyMs: ms,
    }));
    expect(summarizeTimings(timings)).toEqual({ count: 10, p50Ms: 5, p95Ms: 10, maxMs: 10 });
  });
});

describe('runVoiceLoop', () => {
  it('runs a whole walk-around on the scripted engine, never listening while speaking, and times each turn', async () => {
    const holder: { runner?: VoiceLoopRunner } = {};
    const engine = new ScriptedEngine(
      carefulDriver(
        () => holder.runner,
        () => en,
      ),
    );
    const saved: ItemResult[] = [];
    let finished = false;
    const runner = runVoiceLoop(engine, en, {
      onResult: (result) => {
        saved.push(result);
      },
      onFinish: () => {
        finished = true;
      },
    });
    holder.runner = runner;
    const state = await runner.whenIdle();
    expect(state.phase).toBe('finished');
    expect(finished).toBe(true);
    expect(new Set(saved.map((r) => r.itemKey)).size).toBe(en.items.length);
    expect(engine.listenedWhileSpeaking).toBe(false);
    // One timing per answer that led to a prompt: one a stop.
    expect(runner.timings.length).toBeGreaterThanOrEqual(en.stops.length - 1);
    const latencies = runner.timings.map((t) => t.latencyMs);
    expect(latencies.every((ms) => ms >= 0)).toBe(true);
    const summary = summarizeTimings(runner.timings);
    console.info(
      `answer end -> next prompt, scripted engine in jsdom: p50 ${summary.p50Ms.toFixed(2)} ms, p95 ${summary.p95Ms.toFixed(2)} ms, max ${summary.maxMs.toFixed(2)} ms, n=${summary.count}`,
    );
    // Well inside a conversational turn gap of about 200 ms (Stivers et al. 2009, PNAS 106(26)).
    expect(summary.p95Ms).toBeLessThan(200);
  });

  it('interrupts a prompt or a turn for a button and carries on from there', async () => {
    const engine = new ScriptedEngine(() => undefined, { answerMs: 1000 });
    const states: string[] = [];
    const runner = runVoiceLoop(engine, en, { onResult: () => undefined, onState: (s) => states.push(s.itemKey) });
    runner.send({ type: 'command', command: 'skip', at: '2026-12-01T06:00:00.000Z' });
    expect(runner.getState().skipped).toEqual(en.stops[0]?.itemKeys);
    expect(runner.getState().stop).toBe(1);
    runner.stop();
    await runner.whenIdle();
    expect(engine.prompts.at(-1)).toContain('Skipped.');
  });

  it('stops when the engine aborts (end of script), and resumes a stored state at the same stop', async () => {
    const engine = new ScriptedEngine(['good', 'good', 'good']);
    const runner = runVoiceLoop(engine, en, { onResult: () => undefined });
    const state = await runner.whenIdle();
    expect(state.stop).toBe(3);
    const restored = restoreVoiceLoop(JSON.parse(JSON.stringify(state)), en);
    if (!restored) throw new Error('not restored');
    const second = new ScriptedEngine(['good']);
    const resumed = runVoiceLoop(second, en, { onResult: () => undefined }, { initialState: restored });
    await resumed.whenIdle();
    expect(second.prompts[0]).toBe(`Picking up where you left off. ${en.stops[3]?.prompt}`);
    expect(resumed.getState().stop).toBe(4);
  });

  it('ends a note at its longest length and says so', async () => {
    const engine = new ScriptedEngine(['note'], { answerMs: 5 });
    const stops: string[] = [];
    const runner = runVoiceLoop(engine, en, {
      onResult: () => undefined,
      onStopNote: (_key, heard) => void stops.push(heard),
    });
    await new Promise((resolve) => setTimeout(resolve, 50));
    expect(runner.getState().phase).toBe('noting');
    runner.send({ type: 'note_limit' });
    await runner.whenIdle();
    expect(stops).toEqual(['']);
    expect(engine.prompts.some((p) => p.startsWith('Two minutes.'))).toBe(true);
  });

  it('tells the host about notes and a fatal speech failure', async () => {
    const events: string[] = [];
    const engine = new ScriptedEngine(['note', 'brake line rubbing', 'end note', { error: 'not-allowed' }]);
    const runner = runVoiceLoop(engine, en, {
      onResult: () => undefined,
      onStartNote: (key, heard) => {
        events.push(`start ${key} ${heard}`);
      },
      onStopNote: (key, heard) => {
        events.push(`stop ${key} ${heard}`);
      },
      onSpeechFailed: ({ code }) => events.push(`failed ${code}`),
    });
    const state = await runner.whenIdle();
    const key = en.stops[0]?.itemKeys[0] ?? '';
    expect(events).toEqual([`start ${key} note`, `stop ${key} brake line rubbing`, 'failed not-allowed']);
    expect(state.phase).toBe('stalled');
  });

  it('switches the checklist language when the driver asks', async () => {
    const locales: string[] = [];
    const engine = new ScriptedEngine(['español', 'bien']);
    const runner = runVoiceLoop(engine, (locale) => (locale === 'es' ? es : en), {
      onResult: () => undefined,
      onLocale: (l) => locales.push(l),
    });
    await runner.whenIdle();
    expect(locales).toEqual(['es']);
    expect(engine.spoken[1]?.locale).toBe('es');
    expect(engine.prompts[1]).toContain(es.stops[0]?.prompt);
  });
});
