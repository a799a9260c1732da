// Test helpers: answers a driver would give, and a synchronous driver of the reducer (no engine, no timers).
import type {
  Alternative,
  Checklist,
  ChecklistItem,
  ChecklistStop,
  ItemResult,
  Locale,
  ReadingRule,
} from '@yardcall/shared';
import {
  initialVoiceLoopState,
  reduceVoiceLoop,
  type VoiceLoopContext,
  type VoiceLoopEffect,
  type VoiceLoopEvent,
  type VoiceLoopState,
} from './voice-loop';

const PASSING_AIR: Record<string, string> = {
  low_air_warning: '65 psi',
  governor_cut_out: '125 psi',
  governor_cut_in: '105 psi',
  spring_brake: '40 psi',
};

// A value inside the limit for the sample combination's items, as a recogniser would write it.
export function passingAnswer(item: ChecklistItem, locale: Locale): string {
  const es = locale === 'es';
  if (item.expects.type === 'check') return es ? 'bien' : 'good';
  switch (item.expects.quantity) {
    case 'tread_depth':
      return es ? 'doce treintaidosavos' : 'twelve thirty seconds';
    case 'tire_pressure':
      return `${(item.limitContext?.specPsi ?? 100) + 3} psi`;
    case 'pushrod_stroke':
      return es ? 'una pulgada y media' : 'one and a half inches';
    case 'lining_thickness':
      return es ? 'media pulgada' : 'half an inch';
    case 'steering_lash':
      return es ? 'dos pulgadas' : 'two inches';
    case 'leak_rate':
      return es ? 'una psi por minuto' : 'one psi per minute';
    case 'air_pressure':
      return PASSING_AIR[item.limitContext?.check ?? ''] ?? '100 psi';
    case 'slack_angle':
      return '90 degrees';
  }
}

export function contextFor(...checklists: Checklist[]): VoiceLoopContext {
  return {
    checklistFor: (locale) => checklists.find((c) => c.locale === locale) ?? (checklists[0] as Checklist),
  };
}

export function contextRequiring(requiredReadings: ReadingRule[], ...checklists: Checklist[]): VoiceLoopContext {
  return { ...contextFor(...checklists), requiredReadings };
}

export interface SimulatedTurn {
  state: VoiceLoopState;
  stop: ChecklistStop | undefined;
  // True while the stop is asked as a whole; `item` is then the stop's first item.
  atStop: boolean;
  item: ChecklistItem | undefined;
  // Everything said since the previous turn.
  prompts: string[];
  mode: string;
}

// What the simulated driver does on a turn: say something, stay silent, or stop the run.
export type SimulatedReply = string | Alternative[] | { silence: true } | { event: VoiceLoopEvent } | null;

export interface Simulation {
  state: VoiceLoopState;
  spoken: string[];
  effects: VoiceLoopEffect[];
  saved: ItemResult[];
  turns: number;
}

export function simulateVoiceLoop(
  ctx: VoiceLoopContext,
  reply: (turn: SimulatedTurn) => SimulatedReply,
  options: { state?: VoiceLoopState; maxTurns?: number; first?: VoiceLoopEvent } = {},
): Simulation {
  let state = options.state ?? initialVoiceLoopState(ctx.checklistFor('en'));
  const spoken: string[] = [];
  const effects: VoiceLoopEffect[] = [];
  const saved: ItemResult[] = [];
  let event: VoiceLoopEvent | null = options.first ?? { type: 'start' };
  let turns = 0;
  let since: string[] = [];
  const maxTurns = options.maxTurns ?? 2000;
  while (event && turns < maxTurns) {
    const step = reduceVoiceLoop(state, event, ctx);
    state = step.state;
    event = null;
    for (const effect of step.effects) {
      effects.push(effect);
      if (effect.type === 'speak') {
        spoken.push(effect.text);
        since.push(effect.text);
      }
      if (effect.type === 'save') saved.push(effect.result);
      if (effect.type === 'listen') {
        turns += 1;
        const checklist = ctx.checklistFor(state.locale);
        const item = checklist.items[state.index];
        const stop = checklist.stops[state.stop];
        const answer = reply({ state, stop, atStop: state.current === null, item, prompts: since, mode: effect.mode });
        since = [];
        if (answer === null) break;
        const at = new Date(Date.UTC(2026, 11, 1, 6, 0, turns)).toISOString();
        if (typeof answer === 'string')
          event = { type: 'heard', alternatives: [{ transcript: answer, confidence: 0.92 }], at };
        else if (Array.isArray(answer)) event = { type: 'heard', alternatives: answer, at };
        else if ('silence' in answer) event = { type: 'silence' };
        else event = answer.event;
      }
    }
  }
  return { state, spoken, effects, saved, turns };
}

// The last result per item, as the server would keep them.
export function latestResults(saved: readonly ItemResult[]): Map<string, ItemResult> {
  const map = new Map<string, ItemResult>();
  for (const result of saved) map.set(result.itemKey, result);
  return map;
}

// The reply of a competent driver: "good" at every stop, a passing value where one is asked on its
// own, "yes" to a read-back, "finish" at the end.
export function passEverything(turn: SimulatedTurn): SimulatedReply {
  const locale = turn.state.locale;
  if (turn.mode === 'confirm') return locale === 'es' ? 'sí' : 'yes';
  if (turn.mode === 'offer') return locale === 'es' ? 'terminar' : 'finish';
  if (turn.mode === 'paused') return locale === 'es' ? 'continuar' : 'resume';
  if (!turn.item) return null;
  if (turn.atStop) return locale === 'es' ? 'bien' : 'good';
  return passingAnswer(turn.item, locale);
}

// Words spoken, counted the way the talk-time model counts them.
export function wordCount(sentences: readonly string[]): number {
  return sentences.reduce(
    (sum, sentence) => sum + sentence.split(/\s+/).filter((w) => /[\p{L}\p{N}]/u.test(w)).length,
    0,
  );
}
