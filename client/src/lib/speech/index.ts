export * from './types';
export { speechError, speechErrorFromBrowser, isSpeechErrorCode } from './speech-errors';
export { WebSpeechEngine, recognitionConstructorOf } from './web-speech-engine';
export type {
  SpeechWindowLike,
  RecognitionLike,
  RecognitionConstructorLike,
  SynthesisLike,
  UtteranceLike,
  VoiceLike,
  WebSpeechOptions,
} from './web-speech-engine';
export { TypedInputEngine, type TypedInputSnapshot, type PromptVoice } from './typed-input-engine';
export {
  ScriptedEngine,
  type Script,
  type ScriptedReply,
  type ScriptedTurn,
  type SpokenRecord,
  type ListenRecord,
} from './scripted-engine';
export { chooseSpeechEngine, type ChooseSpeechEngineOptions } from './choose-speech-engine';
export {
  createOfflineNoticeOnce,
  isOnline,
  listeningUnavailable,
  OFFLINE_SPEECH_NOTICE,
  recognitionNeedsNetwork,
  useOnline,
} from './offline-speech';
export {
  createListeningSwitch,
  listenByTapWhenOffline,
  type ListeningSwitch,
  type OfflineListening,
} from './listen-by-tap-offline';
