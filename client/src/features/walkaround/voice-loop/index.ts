export {
  VOICE_LOOP_VERSION,
  VOICE_LOOP_PHASES,
  LISTEN_TIMEOUT_MS,
  SHORT_PROMPT_AFTER,
  initialVoiceLoopState,
  reduceVoiceLoop,
  warmVoiceLoop,
  serializeVoiceLoop,
  restoreVoiceLoop,
  type VoiceLoopState,
  type VoiceLoopPhase,
  type VoiceLoopEvent,
  type VoiceLoopEffect,
  type VoiceLoopContext,
  type VoiceLoopStep,
  type PendingMeasurement,
  type ListenMode,
} from './voice-loop';
export {
  runVoiceLoop,
  summarizeTimings,
  type TimingSummary,
  type VoiceLoopRunner,
  type VoiceLoopHost,
  type VoiceLoopFinish,
  type RunVoiceLoopOptions,
  type TurnTiming,
  type ChecklistSource,
} from './run-voice-loop';
export { useVoiceLoop, type UseVoiceLoopOptions, type VoiceLoopView } from './use-voice-loop';
export { VOICE_LOOP_WORDS, type VoiceLoopWords } from './voice-loop-words';
