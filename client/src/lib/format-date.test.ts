import { describe, expect, it } from 'vitest';
import { dateFormats } from './format-date';

describe('dateFormats', () => {
  it("reads a moment in the zone it is given, in the screen's language", () => {
    const chicago = dateFormats('en-US', 'America/Chicago');
    expect(chicago.dateTime('2026-12-03T13:05:00Z')).toBe('Dec 3, 2026, 7:05 AM');
    expect(chicago.date('2026-12-03T03:05:00Z')).toBe('Dec 2, 2026');
    expect(chicago.time('2026-12-03T13:05:00Z')).toBe('7:05 AM');
    expect(dateFormats('es', 'Europe/Madrid').time('2026-12-03T13:05:00Z')).toBe('14:05');
  });

  it('reads a calendar day sent as its midnight UTC as that day in every zone', () => {
    expect(dateFormats('en-US', 'America/Chicago').calendarDate('2026-12-15T00:00:00.000Z')).toBe('Dec 15, 2026');
    expect(dateFormats('en-US', 'Pacific/Auckland').calendarDate('2026-12-15')).toBe('Dec 15, 2026');
  });

  it('shows nothing for a time not yet there', () => {
    const formats = dateFormats('en-US', 'UTC');
    expect(formats.dateTime(null)).toBe('');
    expect(formats.date(undefined)).toBe('');
  });
});
