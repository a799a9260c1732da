import { describe, expect, it } from 'vitest';
import {
  AUDIO_FORMATS,
  baseMimeType,
  buildConvertArgs,
  buildTrimArgs,
  choosePlaybackFormat,
  clipFileName,
  clipPlan,
  conversionPlan,
  inputFileName,
  needsConversion,
  originalFileName,
} from './audio-formats';

// What a browser without WebM (but with WAV and Ogg) answers.
const noWebm = (type: string) => (type.startsWith('audio/webm') ? '' : type.startsWith('audio/') ? 'maybe' : '');
const onlyMp3 = (type: string) => (type === 'audio/mpeg' ? 'probably' : '');

describe('needsConversion', () => {
  it('converts a WebM note for a browser that answers "" for WebM', () => {
    expect(needsConversion('audio/webm', noWebm)).toBe(true);
  });

  it('plays the note as it is when the browser answers "maybe" or "probably"', () => {
    expect(needsConversion('audio/ogg', noWebm)).toBe(false);
    expect(needsConversion('audio/mpeg', onlyMp3)).toBe(false);
  });

  it('asks again without codec parameters before converting', () => {
    const picky = (type: string) => (type === 'audio/mp4' ? 'maybe' : '');
    expect(needsConversion('audio/mp4;codecs=opus', picky)).toBe(false);
    expect(baseMimeType('audio/webm; codecs=opus')).toBe('audio/webm');
  });
});

describe('choosePlaybackFormat', () => {
  it('prefers WAV, which every decoder handles', () => {
    expect(choosePlaybackFormat(noWebm)?.id).toBe('wav');
  });

  it('falls back to the first format the browser claims', () => {
    expect(choosePlaybackFormat(onlyMp3)?.id).toBe('mp3');
  });

  it('answers null when the browser claims no format at all', () => {
    expect(choosePlaybackFormat(() => '')).toBeNull();
  });
});

describe('inputFileName', () => {
  it('names the input after its container so ffmpeg can tell it', () => {
    expect(inputFileName('audio/webm;codecs=opus')).toBe('input.webm');
    expect(inputFileName('audio/mp4')).toBe('input.m4a');
    expect(inputFileName('audio/ogg')).toBe('input.ogg');
    expect(inputFileName('application/octet-stream')).toBe('input.bin');
  });
});

describe('buildTrimArgs', () => {
  it('cuts from start to end after the input, to the millisecond, re-encoded to the chosen format', () => {
    expect(buildTrimArgs('input.webm', 'clip.webm', 1.25, 3.5, AUDIO_FORMATS.webm)).toEqual([
      '-i',
      'input.webm',
      '-ss',
      '1.250',
      '-to',
      '3.500',
      '-vn',
      '-c:a',
      'libvorbis',
      '-q:a',
      '4',
      'clip.webm',
    ]);
  });

  it('writes 16-bit PCM for a WAV clip', () => {
    expect(buildTrimArgs('input.webm', 'clip.wav', 0, 1, AUDIO_FORMATS.wav)).toContain('pcm_s16le');
  });

  it('refuses a clip that ends before it starts', () => {
    expect(() => buildTrimArgs('input.webm', 'clip.webm', 3, 3, AUDIO_FORMATS.webm)).toThrow(RangeError);
    expect(() => buildTrimArgs('input.webm', 'clip.webm', -1, 3, AUDIO_FORMATS.webm)).toThrow(RangeError);
  });
});

describe('buildConvertArgs', () => {
  it('re-encodes the whole note without video', () => {
    expect(buildConvertArgs('input.webm', 'playable.wav', AUDIO_FORMATS.wav)).toEqual([
      '-i',
      'input.webm',
      '-vn',
      '-c:a',
      'pcm_s16le',
      'playable.wav',
    ]);
  });
});

describe('clipFileName', () => {
  it('names the clip after the note and its times', () => {
    expect(clipFileName('3a9f0c1e-aaaa-bbbb', 4.2, 67.8, AUDIO_FORMATS.ogg)).toBe(
      'note-3a9f0c1e-clip-0m04.2s-1m07.8s.ogg',
    );
  });
});

describe('conversionPlan and clipPlan', () => {
  it('names the input after the note type and the output after the format, with its type', () => {
    expect(conversionPlan('audio/webm;codecs=opus', AUDIO_FORMATS.wav)).toEqual({
      inputName: 'input.webm',
      outputName: 'playable.wav',
      outputType: 'audio/wav',
      args: buildConvertArgs('input.webm', 'playable.wav', AUDIO_FORMATS.wav),
    });
  });

  it('cuts the clip between its edges into the chosen format', () => {
    expect(clipPlan('audio/ogg', 1.25, 3.5, AUDIO_FORMATS.webm)).toEqual({
      inputName: 'input.ogg',
      outputName: 'clip.webm',
      outputType: 'audio/webm',
      args: buildTrimArgs('input.ogg', 'clip.webm', 1.25, 3.5, AUDIO_FORMATS.webm),
    });
  });

  it('refuses a clip that does not end after it starts', () => {
    expect(() => clipPlan('audio/ogg', 2, 2, AUDIO_FORMATS.webm)).toThrow(RangeError);
  });
});

describe('originalFileName', () => {
  it('keeps the stored type as the extension', () => {
    expect(originalFileName('3a9f0c1e-aaaa-bbbb', 'audio/mp4')).toBe('note-3a9f0c1e.m4a');
    expect(originalFileName('3a9f0c1e-aaaa-bbbb', 'application/x-unknown')).toBe('note-3a9f0c1e.bin');
  });
});
