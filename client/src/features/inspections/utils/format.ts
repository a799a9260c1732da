import { formatDuration } from '@/lib/audio/format-time';

// Dates and durations as a reviewer reads them, in the screen's language.
export function formatDateTime(iso: string | null, locale: string): string {
  if (!iso) return '';
  return new Date(iso).toLocaleString(locale, { dateStyle: 'medium', timeStyle: 'short' });
}

export function formatSeconds(seconds: number | null): string {
  return seconds === null || !Number.isFinite(seconds) ? '' : formatDuration(seconds);
}

export function unitsLabel(vehicles: { unitNumber: string }[]): string {
  return vehicles.map((vehicle) => vehicle.unitNumber).join(' + ');
}
