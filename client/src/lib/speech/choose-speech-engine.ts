// Picks the engine the browser can run: its own speech when it can listen, typed input otherwise.
import { TypedInputEngine } from './typed-input-engine';
import type { SpeechEngine } from './types';
import {
  WebSpeechEngine,
  recognitionConstructorOf,
  type SpeechWindowLike,
  type WebSpeechOptions,
} from './web-speech-engine';

export interface ChooseSpeechEngineOptions extends WebSpeechOptions {
  // The driver asked to type (a desktop, a noisy yard).
  preferTyped?: boolean;
}

export function chooseSpeechEngine(
  win: Window | SpeechWindowLike,
  options: ChooseSpeechEngineOptions = {},
): SpeechEngine {
  const web = new WebSpeechEngine(win, options);
  if (recognitionConstructorOf(win) && !options.preferTyped) return web;
  // Prompts are still said aloud where synthesis exists.
  return new TypedInputEngine(web.capabilities.synthesis ? { voice: web } : {});
}
