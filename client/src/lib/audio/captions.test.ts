import { describe, expect, it } from 'vitest';
import { captionsDataUrl, webVttFrom } from './captions';

describe('webVttFrom', () => {
  it('writes one timed cue per heard segment', () => {
    expect(
      webVttFrom([
        { text: 'left steer tire', startMs: 1200, endMs: 2450 },
        { text: 'lug nuts tight', startMs: 3_725_004, endMs: 3_727_000 },
      ]),
    ).toBe(
      'WEBVTT\n\n00:00:01.200 --> 00:00:02.450\nleft steer tire\n\n' +
        '01:02:05.004 --> 01:02:07.000\nlug nuts tight\n',
    );
  });

  it('escapes markup and arrows, keeps a cue on one line and drops empty text', () => {
    const vtt = webVttFrom([
      { text: 'air line <chafed> & --> rim\n\nbent', startMs: 0, endMs: 1000 },
      { text: '  ', startMs: 1000, endMs: 2000 },
    ]);
    expect(vtt).toBe('WEBVTT\n\n00:00:00.000 --> 00:00:01.000\nair line &lt;chafed&gt; &amp; --&gt; rim bent\n');
  });

  it('gives a cue with no length a millisecond so players keep it', () => {
    expect(webVttFrom([{ text: 'hub', startMs: 500, endMs: 500 }])).toContain('00:00:00.500 --> 00:00:00.501');
  });

  it('is a valid empty file when nothing was heard', () => {
    expect(webVttFrom([])).toBe('WEBVTT\n');
  });

  it('travels whole in a data: URL for a track', () => {
    const cues = [{ text: 'brake chamber, hoses & air lines', startMs: 0, endMs: 900 }];
    const url = captionsDataUrl(cues);
    expect(url.startsWith('data:text/vtt;charset=utf-8,')).toBe(true);
    expect(decodeURIComponent(url.slice(url.indexOf(',') + 1))).toBe(webVttFrom(cues));
  });
});
