import { describe, expect, it } from 'vitest';
import { clampClip, formatClock, formatDuration } from './format-time';

describe('formatClock', () => {
  it('shows minutes, seconds and tenths', () => {
    expect(formatClock(0)).toBe('0:00.0');
    expect(formatClock(7.44)).toBe('0:07.4');
    expect(formatClock(65)).toBe('1:05.0');
  });

  it('rounds 59.96 s up to the next minute instead of showing 0:60.0', () => {
    expect(formatClock(59.96)).toBe('1:00.0');
  });

  it('shows nonsense input (NaN, negative, Infinity) as zero', () => {
    expect(formatClock(Number.NaN)).toBe('0:00.0');
    expect(formatClock(-3)).toBe('0:00.0');
    expect(formatClock(Number.POSITIVE_INFINITY)).toBe('0:00.0');
  });
});

describe('formatDuration', () => {
  it('says seconds alone under a minute and pads seconds after minutes', () => {
    expect(formatDuration(42.4)).toBe('42 s');
    expect(formatDuration(185)).toBe('3 min 05 s');
  });
});

describe('clampClip', () => {
  it('keeps a clip inside the recording', () => {
    expect(clampClip(-1, 20, 7.5)).toEqual({ startSeconds: 0, endSeconds: 7.5 });
  });

  it('moves an end before the start to a tenth of a second after it', () => {
    expect(clampClip(3, 2, 7.5)).toEqual({ startSeconds: 3, endSeconds: 3.1 });
  });

  it('keeps a start at the very end a tenth of a second before it', () => {
    expect(clampClip(7.5, 7.5, 7.5)).toEqual({ startSeconds: 7.4, endSeconds: 7.5 });
  });
});
