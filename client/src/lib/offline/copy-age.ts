const UNITS: [Intl.RelativeTimeFormatUnit, number][] = [
  ['day', 86_400_000],
  ['hour', 3_600_000],
  ['minute', 60_000],
];

// How old a kept copy is, in the driver's language ("3 hours ago", "hace 3 horas").
export function describeCopyAge(savedAt: string, locale: string, now: Date = new Date()): string {
  const format = new Intl.RelativeTimeFormat(locale, { numeric: 'auto' });
  const elapsedMs = Math.max(0, now.getTime() - Date.parse(savedAt));
  for (const [unit, ms] of UNITS) {
    if (elapsedMs >= ms) return format.format(-Math.floor(elapsedMs / ms), unit);
  }
  return format.format(0, 'minute');
}
