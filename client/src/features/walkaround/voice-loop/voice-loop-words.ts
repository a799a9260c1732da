// The sentences the voice loop itself says (the items' own prompts come with the checklist).
// They belong with the other spoken words in prompts/<locale>/; kept here until that file exists.
import type { Locale } from '@yardcall/shared';

export interface VoiceLoopWords {
  intro: string;
  resumed: string;
  help: string;
  choicesCheck: string;
  choicesMeasure: string;
  choicesConfirm: string;
  choicesOffer: string;
  where: string;
  paused: string;
  resuming: string;
  noteStarted: string;
  noteSaved: string;
  defectNoted: string;
  markedDefect: string;
  skipped: string;
  sayValueAgain: string;
  firstItem: string;
  skippedOne: string;
  skippedMany: string;
  openOne: string;
  openMany: string;
  andMore: string;
  allDone: string;
  finishingOpen: string;
  // Words worth biasing the recogniser towards.
  phrases: readonly string[];
}

export const VOICE_LOOP_WORDS: Record<Locale, VoiceLoopWords> = {
  en: {
    intro: '{count} checks. Say help at any time.',
    resumed: 'Picking up where you left off.',
    help: 'Say good, or defect and what is wrong. For a measurement, say the value. You can also say repeat, back, skip, note, pause, where am I, or finish.',
    choicesCheck: 'Say good, defect, or skip.',
    choicesMeasure: 'Say the value, defect, or skip.',
    choicesConfirm: 'Say yes to keep it, or say the value again.',
    choicesOffer: 'Say yes to do them now, or say finish.',
    where: '{zone}. {position}, {title}. Check {n} of {total}, {done} done.',
    paused: "Paused. Say resume when you're ready.",
    resuming: 'Resuming.',
    noteStarted: 'Recording a note. Say end note when you are done.',
    noteSaved: 'Note saved.',
    defectNoted: 'Defect noted.',
    markedDefect: 'Marked as a defect.',
    skipped: 'Skipped.',
    sayValueAgain: 'Say the value again.',
    firstItem: 'This is the first check.',
    skippedOne: '1 check skipped: {list}. Say yes to do it now, or say finish.',
    skippedMany: '{count} checks skipped: {list}. Say yes to do them now, or say finish.',
    openOne: '1 check not done: {list}. Say yes to do it now, or say finish.',
    openMany: '{count} checks not done: {list}. Say yes to do them now, or say finish.',
    andMore: 'and {count} more',
    allDone: 'All {count} checks done. Review and sign on the screen.',
    finishingOpen: 'Finishing with {count} not done. Review and sign on the screen.',
    phrases: [
      'good',
      'defect',
      'yes',
      'no',
      'skip',
      'repeat',
      'back',
      'note',
      'end note',
      'pause',
      'resume',
      'help',
      'where am I',
      'finish',
    ],
  },
  es: {
    intro: '{count} revisiones. Diga ayuda cuando quiera.',
    resumed: 'Seguimos donde lo dejó.',
    help: 'Diga bien, o defecto y qué está mal. Para una medida, diga el valor. También puede decir repite, atrás, salta, nota, pausa, dónde estoy o terminar.',
    choicesCheck: 'Diga bien, defecto o salta.',
    choicesMeasure: 'Diga el valor, defecto o salta.',
    choicesConfirm: 'Diga sí para guardarlo, o diga el valor otra vez.',
    choicesOffer: 'Diga sí para hacerlas ahora, o diga terminar.',
    where: '{zone}. {position}, {title}. Revisión {n} de {total}, {done} hechas.',
    paused: 'En pausa. Diga continuar cuando esté listo.',
    resuming: 'Continuamos.',
    noteStarted: 'Grabando una nota. Diga fin de nota al terminar.',
    noteSaved: 'Nota guardada.',
    defectNoted: 'Defecto anotado.',
    markedDefect: 'Marcado como defecto.',
    skipped: 'Saltada.',
    sayValueAgain: 'Diga el valor otra vez.',
    firstItem: 'Esta es la primera revisión.',
    skippedOne: '1 revisión saltada: {list}. Diga sí para hacerla ahora, o diga terminar.',
    skippedMany: '{count} revisiones saltadas: {list}. Diga sí para hacerlas ahora, o diga terminar.',
    openOne: '1 revisión sin hacer: {list}. Diga sí para hacerla ahora, o diga terminar.',
    openMany: '{count} revisiones sin hacer: {list}. Diga sí para hacerlas ahora, o diga terminar.',
    andMore: 'y {count} más',
    allDone: 'Las {count} revisiones están hechas. Revise y firme en la pantalla.',
    finishingOpen: 'Terminando con {count} sin hacer. Revise y firme en la pantalla.',
    phrases: [
      'bien',
      'defecto',
      'sí',
      'no',
      'salta',
      'repite',
      'atrás',
      'nota',
      'fin de nota',
      'pausa',
      'continuar',
      'ayuda',
      'dónde estoy',
      'terminar',
    ],
  },
};

export function fillWords(template: string, values: Record<string, string | number>): string {
  return template.replace(/\{(\w+)\}/g, (_, key: string) => String(values[key] ?? ''));
}
