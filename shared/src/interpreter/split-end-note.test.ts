import { describe, expect, it } from 'vitest';
import { splitEndNote } from './split-end-note.js';

describe('splitEndNote', () => {
  it('ends a note said inside its own sentence and leaves the closing words out', () => {
    expect(splitEndNote('the marker lens is cracked, end note', 'en')).toEqual({
      words: 'the marker lens is cracked',
      ended: true,
    });
    expect(splitEndNote('La mica está rota, fin de nota.', 'es')).toEqual({ words: 'La mica está rota', ended: true });
    expect(splitEndNote("Hub's weeping a little. That's the note.", 'en')).toEqual({
      words: "Hub's weeping a little",
      ended: true,
    });
  });

  it('ends a note on the closing words alone', () => {
    expect(splitEndNote('end note', 'en')).toEqual({ words: '', ended: true });
    expect(splitEndNote('Fin de nota', 'es')).toEqual({ words: '', ended: true });
  });

  it('allows please, okay and a hesitation after the closing words, and drops a hesitation before them', () => {
    expect(splitEndNote('cracked lens, end note please', 'en')).toEqual({ words: 'cracked lens', ended: true });
    expect(splitEndNote('cracked lens um end note okay', 'en')).toEqual({ words: 'cracked lens', ended: true });
    expect(splitEndNote('mica rota, fin de nota, gracias', 'es')).toEqual({ words: 'mica rota', ended: true });
  });

  it('never ends a note on closing words in mid-sentence', () => {
    expect(splitEndNote('I will say end note when the lens is done', 'en')).toEqual({
      words: 'I will say end note when the lens is done',
      ended: false,
    });
    expect(splitEndNote('la mica está rota', 'es')).toEqual({ words: 'la mica está rota', ended: false });
    expect(splitEndNote('', 'en')).toEqual({ words: '', ended: false });
  });
});
