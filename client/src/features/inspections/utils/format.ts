import { formatDuration } from '@/lib/audio/format-time';

// Durations and units as a reviewer reads them (times: @/lib/format-date).
export function formatSeconds(seconds: number | null): string {
  return seconds === null || !Number.isFinite(seconds) ? '' : formatDuration(seconds);
}

export function unitsLabel(vehicles: { unitNumber: string }[]): string {
  return vehicles.map((vehicle) => vehicle.unitNumber).join(' + ');
}
