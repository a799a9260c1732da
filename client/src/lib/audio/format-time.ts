// Clock text for a position in a recording: "0:07.4", "1:05.0"; tenths are what a reviewer picks.
export function formatClock(seconds: number): string {
  const safe = Number.isFinite(seconds) && seconds > 0 ? seconds : 0;
  const tenths = Math.round(safe * 10);
  const minutes = Math.floor(tenths / 600);
  const rest = (tenths % 600) / 10;
  return `${minutes}:${rest.toFixed(1).padStart(4, '0')}`;
}

// A whole duration in words-friendly form for lists: "42 s", "3 min 05 s".
export function formatDuration(seconds: number): string {
  const whole = Math.max(0, Math.round(Number.isFinite(seconds) ? seconds : 0));
  const minutes = Math.floor(whole / 60);
  const rest = whole % 60;
  return minutes === 0 ? `${rest} s` : `${minutes} min ${String(rest).padStart(2, '0')} s`;
}

// Clamp a picked clip to the recording and keep it at least a tenth of a second long.
export function clampClip(
  startSeconds: number,
  endSeconds: number,
  durationSeconds: number,
): { startSeconds: number; endSeconds: number } {
  const minimum = 0.1;
  const duration = Math.max(durationSeconds, minimum);
  const start = Math.min(Math.max(0, startSeconds), duration - minimum);
  const end = Math.min(Math.max(endSeconds, start + minimum), duration);
  return { startSeconds: round3(start), endSeconds: round3(end) };
}

function round3(value: number): number {
  return Math.round(value * 1000) / 1000;
}
