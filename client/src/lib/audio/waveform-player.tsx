import { useCallback, useEffect, useImperativeHandle, useRef, useState, type KeyboardEvent, type Ref } from 'react';
import { useTranslation } from 'react-i18next';
import WaveSurfer from 'wavesurfer.js';
import RegionsPlugin, { type Region } from 'wavesurfer.js/dist/plugins/regions.esm.js';
import { Button } from '@/components/ui/button';
import { SelectField } from '@/components/ui/field';
import { formatClock } from './format-time';

export const PLAYBACK_RATES = [0.75, 1, 1.25, 1.5, 1.75, 2] as const;

export interface WaveformHandle {
  // Plays from `fromSeconds` (or where it stands); waits for the audio when it is still loading.
  play: (fromSeconds?: number) => void;
  focus: () => void;
}

export interface ClipRange {
  startSeconds: number;
  endSeconds: number;
}

export interface WaveformPlayerProps {
  // Given as a Blob, not a URL: the page's connect-src allows no blob: fetch, and loadBlob needs none.
  audio: Blob;
  // Names the recording for assistive technology ("Voice note at Left steer tire").
  label: string;
  ref?: Ref<WaveformHandle>;
  clip?: ClipRange | null;
  onClipChange?: (clip: ClipRange) => void;
  onDuration?: (seconds: number) => void;
}

const SEEK_STEP_SECONDS = 1;
const SEEK_BIG_STEP_SECONDS = 5;

// Canvas colours cannot read CSS variables: take the theme's values at creation time.
function themeColor(name: string, fallback: string): string {
  const value = getComputedStyle(document.documentElement).getPropertyValue(name).trim();
  return value || fallback;
}

export function WaveformPlayer({ audio, label, ref, clip, onClipChange, onDuration }: WaveformPlayerProps) {
  const { t } = useTranslation();
  const waveRef = useRef<HTMLDivElement>(null);
  const audioRef = useRef<HTMLAudioElement>(null);
  const surferRef = useRef<WaveSurfer | null>(null);
  const regionRef = useRef<Region | null>(null);
  const pendingPlay = useRef<number | null | undefined>(undefined);
  const onClipChangeRef = useRef(onClipChange);
  const onDurationRef = useRef(onDuration);
  const [ready, setReady] = useState(false);
  const [failed, setFailed] = useState(false);
  const [duration, setDuration] = useState(0);
  const [time, setTime] = useState(0);
  const [playing, setPlaying] = useState(false);
  const [rate, setRate] = useState<number>(1);
  const rateRef = useRef(rate);

  useEffect(() => {
    onClipChangeRef.current = onClipChange;
    onDurationRef.current = onDuration;
    rateRef.current = rate;
  });

  const startPlaying = useCallback((fromSeconds?: number | null) => {
    const surfer = surferRef.current;
    if (!surfer) return;
    if (typeof fromSeconds === 'number') surfer.setTime(fromSeconds);
    surfer.play().catch(() => setPlaying(false));
  }, []);

  useEffect(() => {
    const container = waveRef.current;
    const media = audioRef.current;
    if (!container || !media) return;
    setReady(false);
    setFailed(false);
    const regions = onClipChangeRef.current ? RegionsPlugin.create() : null;
    const surfer = WaveSurfer.create({
      container,
      media,
      height: 96,
      barWidth: 2,
      barGap: 1,
      barRadius: 1,
      cursorWidth: 3,
      normalize: true,
      dragToSeek: true,
      waveColor: themeColor('--yc-border', '#5a6270'),
      progressColor: themeColor('--yc-primary', '#0b4f6c'),
      cursorColor: themeColor('--yc-text', '#15181d'),
      plugins: regions ? [regions] : [],
    });
    surferRef.current = surfer;
    surfer.setPlaybackRate(rateRef.current, true);
    const subscriptions = [
      surfer.on('ready', (seconds) => {
        setDuration(seconds);
        setReady(true);
        onDurationRef.current?.(seconds);
        if (pendingPlay.current !== undefined) {
          const from = pendingPlay.current;
          pendingPlay.current = undefined;
          startPlaying(from);
        }
      }),
      surfer.on('timeupdate', (seconds) => setTime(seconds)),
      surfer.on('play', () => setPlaying(true)),
      surfer.on('pause', () => setPlaying(false)),
      surfer.on('finish', () => setPlaying(false)),
      surfer.on('error', () => setFailed(true)),
    ];
    if (regions) {
      subscriptions.push(
        regions.on('region-updated', (region) => {
          onClipChangeRef.current?.({ startSeconds: region.start, endSeconds: region.end });
        }),
      );
    }
    surfer.loadBlob(audio).catch(() => setFailed(true));
    return () => {
      for (const unsubscribe of subscriptions) unsubscribe();
      regionRef.current = null;
      surferRef.current = null;
      surfer.destroy();
    };
  }, [audio, startPlaying]);

  // The clip chosen in the time fields shows on the waveform as a region, and the other way round.
  useEffect(() => {
    const surfer = surferRef.current;
    if (!ready || !surfer || !clip) return;
    const regions = surfer
      .getActivePlugins()
      .find((plugin): plugin is RegionsPlugin => plugin instanceof RegionsPlugin);
    if (!regions) return;
    if (!regionRef.current) {
      regionRef.current = regions.addRegion({
        start: clip.startSeconds,
        end: clip.endSeconds,
        color: 'rgba(224, 161, 0, 0.3)',
        drag: true,
        resize: true,
      });
    } else if (regionRef.current.start !== clip.startSeconds || regionRef.current.end !== clip.endSeconds) {
      regionRef.current.setOptions({ start: clip.startSeconds, end: clip.endSeconds });
    }
  }, [ready, clip]);

  useImperativeHandle(
    ref,
    () => ({
      play: (fromSeconds?: number) => {
        if (ready) startPlaying(fromSeconds);
        else pendingPlay.current = fromSeconds ?? null;
      },
      focus: () => waveRef.current?.focus(),
    }),
    [ready, startPlaying],
  );

  const changeRate = (next: number) => {
    setRate(next);
    surferRef.current?.setPlaybackRate(next, true);
  };

  const seekBy = (seconds: number) => {
    const surfer = surferRef.current;
    if (!surfer) return;
    surfer.setTime(Math.min(Math.max(0, surfer.getCurrentTime() + seconds), surfer.getDuration()));
  };

  const onKeyDown = (event: KeyboardEvent<HTMLDivElement>) => {
    const surfer = surferRef.current;
    if (!surfer || !ready) return;
    const step = event.shiftKey ? SEEK_BIG_STEP_SECONDS : SEEK_STEP_SECONDS;
    switch (event.key) {
      case 'ArrowLeft':
      case 'ArrowDown':
        seekBy(-step);
        break;
      case 'ArrowRight':
      case 'ArrowUp':
        seekBy(step);
        break;
      case 'Home':
        surfer.setTime(0);
        break;
      case 'End':
        surfer.setTime(surfer.getDuration());
        break;
      case ' ':
      case 'Enter':
      case 'k':
        void surfer.playPause();
        break;
      default:
        return;
    }
    event.preventDefault();
  };

  const position = t('audio.positionOf', { time: formatClock(time), duration: formatClock(duration) });

  return (
    <div className="flex flex-col gap-2" data-testid="waveform-player" data-playing={playing} data-ready={ready}>
      {/* Never shown: the waveform plays it. A voice note has no captions; what was heard of it, where
          anything was, is shown by the page beside the player. */}
      {/* eslint-disable-next-line jsx-a11y-x/media-has-caption */}
      <audio ref={audioRef} preload="auto" className="hidden" data-testid="waveform-audio" />
      <div
        ref={waveRef}
        role="slider"
        tabIndex={0}
        aria-label={t('audio.positionLabel', { label })}
        aria-valuemin={0}
        aria-valuemax={Math.round(duration * 10) / 10}
        aria-valuenow={Math.round(time * 10) / 10}
        aria-valuetext={position}
        aria-keyshortcuts="Space ArrowLeft ArrowRight Home End"
        onKeyDown={onKeyDown}
        className="min-h-24 rounded-lg border-2 border-line bg-surface p-1 focus-visible:outline-4 focus-visible:outline-offset-2"
        data-testid="waveform"
      />
      {failed ? <p className="font-bold text-danger">⚠ {t('audio.cannotDecode')}</p> : null}
      <div className="flex flex-wrap items-end gap-tap-gap">
        <Button
          variant="primary"
          onClick={() => (playing ? surferRef.current?.pause() : startPlaying())}
          disabled={!ready}
          aria-pressed={playing}
          data-testid="play-pause"
        >
          <span aria-hidden="true">{playing ? '⏸' : '▶'}</span>
          {playing ? t('audio.pause') : t('audio.play')}
        </Button>
        <p className="min-h-tap content-center font-mono text-lg tabular-nums" data-testid="audio-position">
          {position}
        </p>
        <SelectField
          label={t('audio.speed')}
          value={rate}
          onChange={(event) => changeRate(Number(event.target.value))}
          data-testid="playback-speed"
        >
          {PLAYBACK_RATES.map((value) => (
            <option key={value} value={value}>
              {t('audio.rate', { rate: value })}
            </option>
          ))}
        </SelectField>
      </div>
      <p className="text-muted">{t('audio.keys')}</p>
    </div>
  );
}
