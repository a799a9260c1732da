export interface CaptionCue {
  text: string;
  startMs: number;
  endMs: number;
}

// WebVTT timestamps are hh:mm:ss.ttt (W3C WebVTT, "WebVTT timestamp").
function vttTime(ms: number): string {
  const whole = Math.max(0, Math.round(Number.isFinite(ms) ? ms : 0));
  const hours = Math.floor(whole / 3_600_000);
  const minutes = Math.floor(whole / 60_000) % 60;
  const seconds = Math.floor(whole / 1000) % 60;
  const pad = (value: number, width = 2) => String(value).padStart(width, '0');
  return `${pad(hours)}:${pad(minutes)}:${pad(seconds)}.${pad(whole % 1000, 3)}`;
}

// Cue text may not hold "-->" or a raw "<" or "&" (W3C WebVTT, "cue text"); a blank line would end the cue.
function vttText(text: string): string {
  return text
    .replace(/&/g, '&amp;')
    .replace(/</g, '&lt;')
    .replace(/>/g, '&gt;')
    .replace(/\s*\n\s*/g, ' ')
    .trim();
}

// A captions file for a recording from what was heard in it, with its times; empty text is left out.
export function webVttFrom(cues: readonly CaptionCue[]): string {
  const body = cues
    .filter((cue) => vttText(cue.text) !== '')
    .map((cue) => {
      const endMs = Math.max(cue.endMs, cue.startMs + 1);
      return `${vttTime(cue.startMs)} --> ${vttTime(endMs)}\n${vttText(cue.text)}`;
    });
  return ['WEBVTT', ...body].join('\n\n') + '\n';
}

// As a data: URL for a <track>: pure to make, nothing to free, and the page's media-src allows data:.
export function captionsDataUrl(cues: readonly CaptionCue[]): string {
  return `data:text/vtt;charset=utf-8,${encodeURIComponent(webVttFrom(cues))}`;
}
