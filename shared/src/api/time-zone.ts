// The organisation's time zone (an IANA name such as America/Chicago): the supervisor's days, the
// report PDF and the e-mails read times in it. GET /api/organizations/time-zone (signed in),
// PATCH the same (admin).
export interface OrganizationTimeZone {
  timeZone: string;
}

export type UpdateTimeZoneRequest = OrganizationTimeZone;

export const DEFAULT_TIME_ZONE = 'UTC';

// Area/Location names and the few single-word ones (UTC, GMT, EST5EDT...); never a bare offset such as
// +01:00, which follows no daylight-saving rules.
const IANA_NAME = /^[A-Za-z][A-Za-z0-9_+-]*(\/[A-Za-z0-9_+-]+){0,2}$/;

// The canonical spelling of an IANA time zone name this runtime knows (any case accepted), or null.
export function canonicalTimeZone(name: string): string | null {
  if (name.length > 64 || !IANA_NAME.test(name)) return null;
  try {
    return new Intl.DateTimeFormat('en-US', { timeZone: name }).resolvedOptions().timeZone;
  } catch {
    return null;
  }
}

// "2026-11-03 06:02 UTC", "2026-11-03 00:02 CST": a time as a reader in that zone sees it, with the
// zone's short name so the reader knows which clock it is.
export function formatZonedTime(date: Date, timeZone: string): string {
  const parts = new Intl.DateTimeFormat('en-US', {
    timeZone,
    year: 'numeric',
    month: '2-digit',
    day: '2-digit',
    hour: '2-digit',
    minute: '2-digit',
    hourCycle: 'h23',
    timeZoneName: 'short',
  }).formatToParts(date);
  const part = (type: Intl.DateTimeFormatPartTypes) => parts.find((p) => p.type === type)?.value ?? '';
  return `${part('year')}-${part('month')}-${part('day')} ${part('hour')}:${part('minute')} ${part('timeZoneName')}`;
}
