// Every recogniser failure as a typed error with a sentence to say and one to show, in en and es.
import type { Locale } from '@yardcall/shared';
import { SPEECH_ERROR_CODES, type SpeechError, type SpeechErrorCode } from './types';

interface Sentences {
  spoken: string;
  shown: string;
}

// Retrying cannot help these: the microphone, the permission or the language is missing.
const FATAL: ReadonlySet<SpeechErrorCode> = new Set<SpeechErrorCode>([
  'audio-capture',
  'not-allowed',
  'service-not-allowed',
  'language-not-supported',
  'unsupported',
]);

const SENTENCES: Record<Locale, Record<SpeechErrorCode, Sentences>> = {
  en: {
    'no-speech': {
      spoken: "I didn't hear anything. Answer when you're ready.",
      shown: 'Nothing was heard. Answer when you are ready.',
    },
    aborted: { spoken: 'Listening stopped.', shown: 'Listening stopped.' },
    'audio-capture': {
      spoken: "I can't hear the microphone. You can type your answers instead.",
      shown: 'No microphone could be used. Check it is connected, or type your answers.',
    },
    network: {
      spoken: "I lost the connection to speech recognition. I'll keep trying.",
      shown: 'Speech recognition needs a connection here. Retrying; you can also type your answers.',
    },
    'not-allowed': {
      spoken: "I'm not allowed to use the microphone. You can type your answers instead.",
      shown: 'Microphone access is blocked. Allow it in the browser settings, or type your answers.',
    },
    'service-not-allowed': {
      spoken: "Speech recognition isn't available on this device. You can type your answers instead.",
      shown: 'This browser does not allow speech recognition here. Type your answers instead.',
    },
    'language-not-supported': {
      spoken: "Speech recognition doesn't support this language here. You can type your answers instead.",
      shown: 'This language is not supported by speech recognition on this device. Type your answers instead.',
    },
    'bad-grammar': {
      spoken: "Sorry, I couldn't listen for that. Please say it again.",
      shown: 'The recogniser rejected the word list. Listening again without it.',
    },
    'phrases-not-supported': {
      spoken: 'Please say it again.',
      shown: 'This recogniser ignores word hints. Listening again without them.',
    },
    timeout: {
      spoken: "I didn't hear an answer. Answer when you're ready.",
      shown: 'Listening took too long and was restarted.',
    },
    unsupported: {
      spoken: "This browser can't listen. You can type your answers instead.",
      shown: 'This browser has no speech recognition. Type your answers instead.',
    },
  },
  es: {
    'no-speech': {
      spoken: 'No oí nada. Conteste cuando esté listo.',
      shown: 'No se oyó nada. Conteste cuando esté listo.',
    },
    aborted: { spoken: 'Dejé de escuchar.', shown: 'Se dejó de escuchar.' },
    'audio-capture': {
      spoken: 'No puedo oír el micrófono. Puede escribir sus respuestas.',
      shown: 'No se pudo usar ningún micrófono. Revise que esté conectado o escriba sus respuestas.',
    },
    network: {
      spoken: 'Perdí la conexión con el reconocimiento de voz. Sigo intentando.',
      shown: 'El reconocimiento de voz necesita conexión aquí. Reintentando; también puede escribir sus respuestas.',
    },
    'not-allowed': {
      spoken: 'No tengo permiso para usar el micrófono. Puede escribir sus respuestas.',
      shown: 'El acceso al micrófono está bloqueado. Permítalo en el navegador o escriba sus respuestas.',
    },
    'service-not-allowed': {
      spoken: 'El reconocimiento de voz no está disponible en este equipo. Puede escribir sus respuestas.',
      shown: 'Este navegador no permite el reconocimiento de voz aquí. Escriba sus respuestas.',
    },
    'language-not-supported': {
      spoken: 'El reconocimiento de voz no admite este idioma aquí. Puede escribir sus respuestas.',
      shown: 'Este idioma no está disponible para el reconocimiento de voz en este equipo. Escriba sus respuestas.',
    },
    'bad-grammar': {
      spoken: 'Perdón, no pude escuchar eso. Repítalo, por favor.',
      shown: 'El reconocedor rechazó la lista de palabras. Escuchando de nuevo sin ella.',
    },
    'phrases-not-supported': {
      spoken: 'Repítalo, por favor.',
      shown: 'Este reconocedor no usa pistas de palabras. Escuchando de nuevo sin ellas.',
    },
    timeout: {
      spoken: 'No oí ninguna respuesta. Conteste cuando esté listo.',
      shown: 'La escucha tardó demasiado y se reinició.',
    },
    unsupported: {
      spoken: 'Este navegador no puede escuchar. Puede escribir sus respuestas.',
      shown: 'Este navegador no tiene reconocimiento de voz. Escriba sus respuestas.',
    },
  },
};

export function isSpeechErrorCode(value: unknown): value is SpeechErrorCode {
  return typeof value === 'string' && (SPEECH_ERROR_CODES as readonly string[]).includes(value);
}

export function speechError(code: SpeechErrorCode, locale: Locale): SpeechError {
  const sentences = SENTENCES[locale][code];
  return { code, fatal: FATAL.has(code), spoken: sentences.spoken, shown: sentences.shown };
}

// A code from the browser may be one the spec adds later: treat it as a network-like, retryable failure.
export function speechErrorFromBrowser(raw: unknown, locale: Locale): SpeechError {
  return speechError(isSpeechErrorCode(raw) ? raw : 'network', locale);
}
