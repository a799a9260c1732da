import { describe, expect, it } from 'vitest';
import { canonicalTimeZone, formatZonedTime } from './time-zone.js';

describe('canonicalTimeZone', () => {
  it('accepts IANA names in any case and answers their canonical spelling', () => {
    expect(canonicalTimeZone('America/Chicago')).toBe('America/Chicago');
    expect(canonicalTimeZone('america/denver')).toBe('America/Denver');
    expect(canonicalTimeZone('UTC')).toBe('UTC');
  });

  it('refuses names the runtime does not know, bare offsets and junk', () => {
    for (const name of ['Mars/Olympus_Mons', '+01:00', 'UTC+1', '', 'America/../etc', 'a'.repeat(80)]) {
      expect({ name, zone: canonicalTimeZone(name) }).toEqual({ name, zone: null });
    }
  });
});

describe('formatZonedTime', () => {
  it('writes the wall-clock time of the zone with its short name', () => {
    const date = new Date('2026-11-03T06:02:00.000Z');
    expect(formatZonedTime(date, 'UTC')).toBe('2026-11-03 06:02 UTC');
    expect(formatZonedTime(date, 'America/Chicago')).toBe('2026-11-03 00:02 CST');
  });

  it('follows daylight saving time', () => {
    expect(formatZonedTime(new Date('2026-07-01T12:00:00.000Z'), 'America/Chicago')).toBe('2026-07-01 07:00 CDT');
  });
});
