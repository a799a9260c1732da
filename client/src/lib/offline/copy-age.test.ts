import { describe, expect, it } from 'vitest';
import { describeCopyAge } from './copy-age';

const now = new Date('2026-12-01T12:00:00.000Z');

describe('describeCopyAge', () => {
  it('says how old a copy is in whole minutes, hours or days', () => {
    expect(describeCopyAge('2026-12-01T11:55:30.000Z', 'en', now)).toBe('4 minutes ago');
    expect(describeCopyAge('2026-12-01T09:00:00.000Z', 'en', now)).toBe('3 hours ago');
    expect(describeCopyAge('2026-11-29T10:00:00.000Z', 'en', now)).toBe('2 days ago');
  });

  it('speaks the driver language and calls a fresh copy current', () => {
    expect(describeCopyAge('2026-12-01T09:00:00.000Z', 'es', now)).toBe('hace 3 horas');
    expect(describeCopyAge('2026-12-01T11:59:50.000Z', 'en', now)).toBe('this minute');
  });
});
