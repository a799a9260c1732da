import { useCallback, useEffect, useId, useImperativeHandle, useMemo, useRef, useState, type Ref } from 'react';
import { useTranslation } from 'react-i18next';
import { ErrorAlert, Loading } from '@/components/ui/alert';
import { Button } from '@/components/ui/button';
import { SelectField } from '@/components/ui/field';
import { describeError } from '@/lib/errors';
import {
  AUDIO_FORMATS,
  CLIP_FORMATS,
  choosePlaybackFormat,
  clipFileName,
  clipPlan,
  conversionPlan,
  needsConversion,
  originalFileName,
  type AudioFormat,
} from './audio-formats';
import { clampClip } from './format-time';
import { useNoteAudio } from './get-note-audio';
import { saveBlob } from './save-blob';
import { useFfmpegJob, type FfmpegJobState } from './use-ffmpeg-job';
import { WaveformPlayer, type ClipRange, type WaveformHandle } from './waveform-player';

export interface NotePlayerProps {
  noteId: string;
  mimeType: string;
  durationMs: number;
  label: string;
  ref?: Ref<WaveformHandle>;
}

function browserCanPlay(type: string): string {
  return document.createElement('audio').canPlayType(type);
}

// Progress of a conversion or a clip, in words and as a bar.
export function JobProgress({ state, label }: { state: FfmpegJobState; label: string }) {
  const { t } = useTranslation();
  if (state.status === 'idle' || state.status === 'done') return null;
  if (state.status === 'error') {
    return (
      <ErrorAlert>
        {state.kind === 'load' ? t('audio.ffmpegLoadFailed') : t('audio.ffmpegFailed')}{' '}
        <span className="font-normal">({state.message})</span>
      </ErrorAlert>
    );
  }
  const { stage, fraction } = state.progress;
  const percent = fraction === null ? null : Math.round(fraction * 100);
  const words =
    stage === 'loading'
      ? t('audio.loadingConverter', { percent: percent ?? '…' })
      : t('audio.working', { what: label, percent: percent ?? '…' });
  return (
    <div className="flex flex-col gap-1" data-testid="ffmpeg-progress">
      <p role="status">{words}</p>
      <progress className="h-4 w-full" max={100} value={percent ?? undefined} aria-label={words} />
    </div>
  );
}

// The note ready to play: the recording itself, or a copy this browser can play.
function usePlayableAudio(blob: Blob | undefined, mimeType: string) {
  const conversion = useFfmpegJob();
  const { run } = conversion;
  const [converted, setConverted] = useState<{ from: Blob; to: Blob } | null>(null);
  // What to do with the note, decided from what this browser says it plays.
  const plan = useMemo(() => {
    if (!needsConversion(mimeType, browserCanPlay)) return { convert: false as const };
    return { convert: true as const, format: choosePlaybackFormat(browserCanPlay) };
  }, [mimeType]);

  useEffect(() => {
    if (!blob || !plan.convert || !plan.format) return;
    let cancelled = false;
    void run({ input: blob, ...conversionPlan(mimeType, plan.format) }).then((result) => {
      if (result && !cancelled) setConverted({ from: blob, to: result });
    });
    return () => {
      cancelled = true;
    };
  }, [blob, mimeType, plan, run]);

  const playable = !blob ? null : !plan.convert ? blob : converted?.from === blob ? converted.to : null;
  return { playable, unplayable: plan.convert && !plan.format, conversion: conversion.state };
}

const CLIP_EDGES = ['start', 'end'] as const;

// One edge of the clip, in seconds with tenths.
function SecondsField(props: {
  label: string;
  max: number;
  value: number;
  onChange: (value: number) => void;
  testId: string;
}) {
  const id = useId();
  return (
    <div className="flex flex-col gap-1">
      <label htmlFor={id} className="font-bold">
        {props.label}
      </label>
      <input
        id={id}
        type="number"
        inputMode="decimal"
        min={0}
        max={props.max}
        step={0.1}
        value={props.value}
        onChange={(event) => props.onChange(event.target.valueAsNumber)}
        className="min-h-tap w-32 rounded-lg border-2 border-line bg-surface px-3 text-base text-ink"
        data-testid={props.testId}
      />
    </div>
  );
}

function ClipTrimmer({
  noteId,
  blob,
  mimeType,
  duration,
  clip,
  onClipChange,
}: {
  noteId: string;
  blob: Blob;
  mimeType: string;
  duration: number;
  clip: ClipRange;
  onClipChange: (clip: ClipRange) => void;
}) {
  const { t } = useTranslation();
  const [formatIdValue, setFormatIdValue] = useState<AudioFormat['id']>('webm');
  const clipJob = useFfmpegJob();

  const setEdge = (edge: (typeof CLIP_EDGES)[number], value: number) => {
    if (!Number.isFinite(value)) return;
    const next = edge === 'start' ? { ...clip, startSeconds: value } : { ...clip, endSeconds: value };
    onClipChange(clampClip(next.startSeconds, next.endSeconds, duration));
  };

  const download = async () => {
    const format = AUDIO_FORMATS[formatIdValue];
    const made = await clipJob.run({
      input: blob,
      ...clipPlan(mimeType, clip.startSeconds, clip.endSeconds, format),
    });
    if (made) saveBlob(made, clipFileName(noteId, clip.startSeconds, clip.endSeconds, format));
  };

  return (
    <fieldset className="flex flex-col gap-2 rounded-lg border-2 border-line p-3" data-testid="clip-trimmer">
      <legend className="px-1 font-bold">{t('audio.clip.title')}</legend>
      <p className="text-muted">{t('audio.clip.lead')}</p>
      <div className="flex flex-wrap items-end gap-tap-gap">
        {CLIP_EDGES.map((edge) => (
          <SecondsField
            key={edge}
            label={t(`audio.clip.${edge}`)}
            max={duration}
            value={edge === 'start' ? clip.startSeconds : clip.endSeconds}
            onChange={(value) => setEdge(edge, value)}
            testId={`clip-${edge}`}
          />
        ))}
        <SelectField
          label={t('audio.clip.format')}
          value={formatIdValue}
          onChange={(event) => setFormatIdValue(event.target.value as AudioFormat['id'])}
          data-testid="clip-format"
        >
          {CLIP_FORMATS.map((id) => (
            <option key={id} value={id}>
              {t(`audio.clip.formats.${id}`)}
            </option>
          ))}
        </SelectField>
        <Button
          variant="secondary"
          onClick={() => void download()}
          busy={clipJob.state.status === 'running'}
          data-testid="download-clip"
        >
          <span aria-hidden="true">✂</span>
          {t('audio.clip.download')}
        </Button>
      </div>
      <JobProgress state={clipJob.state} label={t('audio.clip.making')} />
    </fieldset>
  );
}

// A voice note: fetched with the session's token, converted when this browser cannot play its
// type, shown as a waveform with speed and keyboard control, and cut into a downloadable clip.
export function NotePlayer({ noteId, mimeType, durationMs, label, ref }: NotePlayerProps) {
  const { t } = useTranslation();
  const audio = useNoteAudio(noteId);
  const playable = usePlayableAudio(audio.data, mimeType);
  const [duration, setDuration] = useState(durationMs / 1000);
  const [clip, setClip] = useState<ClipRange>(() => clampClip(0, durationMs / 1000, durationMs / 1000));
  const inner = useRef<WaveformHandle | null>(null);
  // "Play note" may be pressed before the audio has arrived: it plays once the player exists.
  const pending = useRef<number | null | undefined>(undefined);
  const attach = useCallback((handle: WaveformHandle | null) => {
    inner.current = handle;
    if (handle && pending.current !== undefined) {
      const from = pending.current;
      pending.current = undefined;
      handle.play(from ?? undefined);
    }
  }, []);
  useImperativeHandle(
    ref,
    () => ({
      play: (fromSeconds?: number) => {
        if (inner.current) inner.current.play(fromSeconds);
        else pending.current = fromSeconds ?? null;
      },
      focus: () => inner.current?.focus(),
    }),
    [],
  );

  const onDuration = (seconds: number) => {
    setDuration(seconds);
    setClip((current) => clampClip(current.startSeconds, Math.min(current.endSeconds, seconds) || seconds, seconds));
  };

  if (audio.isPending) return <Loading label={t('audio.loading')} />;
  if (audio.isError) return <ErrorAlert>{describeError(audio.error)}</ErrorAlert>;

  return (
    <div className="flex flex-col gap-3" data-testid="note-player" data-note-id={noteId}>
      <JobProgress state={playable.conversion} label={t('audio.converting')} />
      {playable.unplayable ? <ErrorAlert>{t('audio.unplayable')}</ErrorAlert> : null}
      {playable.playable ? (
        <>
          <WaveformPlayer
            ref={attach}
            audio={playable.playable}
            label={label}
            clip={clip}
            onClipChange={(next) => setClip(clampClip(next.startSeconds, next.endSeconds, duration))}
            onDuration={onDuration}
          />
          <ClipTrimmer
            noteId={noteId}
            blob={audio.data}
            mimeType={mimeType}
            duration={duration}
            clip={clip}
            onClipChange={setClip}
          />
        </>
      ) : null}
      <div>
        <Button variant="quiet" onClick={() => saveBlob(audio.data, originalFileName(noteId, mimeType))}>
          {t('audio.downloadOriginal')}
        </Button>
      </div>
    </div>
  );
}
