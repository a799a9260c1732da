// Wires the runner, a speech engine and React state, so the glove screen only renders.
import { useCallback, useEffect, useRef, useState } from 'react';
import type { ChecklistItem, ChecklistStop, Command, Locale, ReadingRule } from '@yardcall/shared';
import type { SpeechEngine } from '@/lib/speech';
import {
  runVoiceLoop,
  type ChecklistSource,
  type TurnTiming,
  type VoiceLoopHost,
  type VoiceLoopRunner,
} from './run-voice-loop';
import { initialVoiceLoopState, type VoiceLoopEvent, type VoiceLoopState } from './voice-loop';

export interface UseVoiceLoopOptions {
  // Keep both stable (memoise them): a new engine or checklist ends the running loop.
  engine: SpeechEngine;
  checklist: ChecklistSource;
  // May change on every render; the latest callbacks are used.
  host: VoiceLoopHost;
  // A stored state to resume from.
  initialState?: VoiceLoopState;
  locale?: Locale;
  // Readings the organisation requires, kept with the walk-around when it started.
  requiredReadings?: readonly ReadingRule[];
}

export interface VoiceLoopView {
  state: VoiceLoopState;
  currentStop: ChecklistStop | undefined;
  // The item asked on its own, or the stop's first item while the stop is asked as a whole.
  item: ChecklistItem | undefined;
  running: boolean;
  // What the screen shows when listening cannot work.
  speechFailure: { code: string; shown: string } | null;
  lastTiming: TurnTiming | null;
  // Starts, or resumes after a failure, a pause in the app or a reload. Call from a tap: mobile
  // browsers only speak after a user gesture.
  start: () => void;
  // A button, handled as if spoken.
  command: (command: Exclude<Command, 'language'>) => void;
  setLocale: (locale: Locale) => void;
  // A button answer ("good", "defect"), handled exactly as if it had been heard.
  answer: (transcript: string) => void;
  // Go to one item of the checklist.
  jump: (itemKey: string) => void;
  stop: () => void;
}

function checklistFor(source: ChecklistSource, locale: Locale) {
  return typeof source === 'function' ? source(locale) : source;
}

export function useVoiceLoop(options: UseVoiceLoopOptions): VoiceLoopView {
  const { engine, checklist, initialState, locale, requiredReadings } = options;
  const hostRef = useRef(options.host);
  const runnerRef = useRef<VoiceLoopRunner | null>(null);
  const [state, setState] = useState<VoiceLoopState>(
    () => initialState ?? initialVoiceLoopState(checklistFor(checklist, locale ?? 'en')),
  );
  const stateRef = useRef(state);
  const [running, setRunning] = useState(false);
  const [speechFailure, setSpeechFailure] = useState<{ code: string; shown: string } | null>(null);
  const [lastTiming, setLastTiming] = useState<TurnTiming | null>(null);

  useEffect(() => {
    hostRef.current = options.host;
  });

  // A new engine or checklist ends the old runner; the state carries over.
  useEffect(
    () => () => {
      runnerRef.current?.stop();
      runnerRef.current = null;
    },
    [engine, checklist],
  );

  const watch = useCallback((runner: VoiceLoopRunner) => {
    setRunning(true);
    void runner.whenIdle().then(() => {
      if (runnerRef.current === runner) setRunning(runner.running);
    });
  }, []);

  const start = useCallback(() => {
    setSpeechFailure(null);
    const existing = runnerRef.current;
    if (existing) {
      existing.send({ type: 'start' });
      watch(existing);
      return;
    }
    const host: VoiceLoopHost = {
      onResult: (result) => hostRef.current.onResult(result),
      onStartNote: (key, heard) => hostRef.current.onStartNote?.(key, heard),
      onStopNote: (key, heard) => hostRef.current.onStopNote?.(key, heard),
      onFinish: (finish) => hostRef.current.onFinish?.(finish),
      onLocale: (l) => hostRef.current.onLocale?.(l),
      onHostError: (error) => hostRef.current.onHostError?.(error),
      onState: (next) => {
        stateRef.current = next;
        setState(next);
        hostRef.current.onState?.(next);
      },
      onSpeechFailed: (failure) => {
        setSpeechFailure(failure);
        hostRef.current.onSpeechFailed?.(failure);
      },
      onTiming: (timing) => {
        setLastTiming(timing);
        hostRef.current.onTiming?.(timing);
      },
    };
    const runner = runVoiceLoop(engine, checklist, host, {
      initialState: stateRef.current,
      ...(locale ? { locale } : {}),
      ...(requiredReadings ? { requiredReadings } : {}),
    });
    runnerRef.current = runner;
    watch(runner);
  }, [engine, checklist, locale, requiredReadings, watch]);

  // A button may wake a loop that had stopped (stalled, paused by the system): watch it again.
  const sendEvent = useCallback(
    (event: VoiceLoopEvent) => {
      const runner = runnerRef.current;
      if (!runner) return;
      runner.send(event);
      watch(runner);
    },
    [watch],
  );

  const command = useCallback(
    (cmd: Exclude<Command, 'language'>) => sendEvent({ type: 'command', command: cmd, at: new Date().toISOString() }),
    [sendEvent],
  );

  const setLocale = useCallback((next: Locale) => sendEvent({ type: 'set_locale', locale: next }), [sendEvent]);

  const answer = useCallback(
    (transcript: string) =>
      sendEvent({ type: 'heard', alternatives: [{ transcript, confidence: 1 }], at: new Date().toISOString() }),
    [sendEvent],
  );

  const jump = useCallback((itemKey: string) => sendEvent({ type: 'jump', itemKey }), [sendEvent]);

  const stop = useCallback(() => {
    runnerRef.current?.stop();
    runnerRef.current = null;
    setRunning(false);
  }, []);

  const current = checklistFor(checklist, state.locale);
  const item = current.items[state.index];
  const stopView = current.stops[state.stop];
  return {
    state,
    currentStop: stopView,
    item,
    running,
    speechFailure,
    lastTiming,
    start,
    command,
    setLocale,
    answer,
    jump,
    stop,
  };
}
