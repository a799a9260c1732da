// The sentences the voice loop itself says (the items' own prompts come with the checklist),
// kept as data with the other spoken words in @yardcall/prompts.
import en from '@yardcall/prompts/en/voice-loop.json';
import es from '@yardcall/prompts/es/voice-loop.json';
import type { Locale } from '@yardcall/shared';

// The English file is the shape; `phrases` are words worth biasing the recogniser towards.
export type VoiceLoopWords = Readonly<typeof en>;

// Assigning through the English shape makes the compiler refuse a Spanish file that lacks a key.
const spanish: VoiceLoopWords = es;

export const VOICE_LOOP_WORDS: Readonly<Record<Locale, VoiceLoopWords>> = { en, es: spanish };

// Fills "{name}" placeholders; a placeholder without a value is said as nothing.
export function fillWords(template: string, values: Record<string, string | number>): string {
  return template.replace(/\{(\w+)\}/g, (_, key: string) => String(values[key] ?? ''));
}
