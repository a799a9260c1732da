import { describe, expect, it } from 'vitest';
import { dayOfUse, type DayInspection } from './day-of-use.js';

const at = (hhmm: string) => `2026-12-03T${hhmm}:00.000Z`;
const inspection = (id: string, kind: DayInspection['kind'], hhmm: string): DayInspection => ({
  id,
  kind,
  startedAt: at(hhmm),
});

describe('dayOfUse', () => {
  it('finds the first pre-trip of the day and no use without one after it', () => {
    const day = dayOfUse([inspection('b', 'post_trip', '15:30'), inspection('a', 'pre_trip', '05:40')]);
    expect(day.preTrip?.id).toBe('a');
    expect(day.usedWithoutPreTrip).toBeNull();
  });

  it('calls an en-route or post-trip inspection with no pre-trip that day a use without one', () => {
    expect(dayOfUse([inspection('e', 'en_route', '09:30')])).toEqual({
      preTrip: null,
      usedWithoutPreTrip: inspection('e', 'en_route', '09:30'),
    });
  });

  it('still calls it so when the pre-trip came only after the unit was used', () => {
    const day = dayOfUse([inspection('p', 'pre_trip', '11:00'), inspection('e', 'en_route', '08:10')]);
    expect(day.preTrip?.id).toBe('p');
    expect(day.usedWithoutPreTrip?.id).toBe('e');
  });

  it('counts no practice walk-around as a pre-trip or a use, and an empty day as neither', () => {
    expect(dayOfUse([inspection('x', 'practice', '07:00')])).toEqual({ preTrip: null, usedWithoutPreTrip: null });
    expect(dayOfUse([])).toEqual({ preTrip: null, usedWithoutPreTrip: null });
  });
});
