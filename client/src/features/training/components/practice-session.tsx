import { useEffect, useRef, useState } from 'react';
import { useTranslation } from 'react-i18next';
import {
  isPowerUnit,
  type Locale,
  type TrainingAttemptResponse,
  type TrainingSegmentUpsert,
  type VehicleResponse,
} from '@yardcall/shared';
import { ErrorAlert, Notice } from '@/components/ui/alert';
import { Button } from '@/components/ui/button';
import { LinkButton } from '@/components/ui/link-button';
import { SelectField } from '@/components/ui/field';
import { Section } from '@/components/ui/layout';
import { describeError } from '@/lib/errors';
import { startRecording, type NoteRecording, type RecordedNote } from '@/lib/recorder';
import { TypedInputEngine, chooseSpeechEngine, type SpeechEngine } from '@/lib/speech';
import { putSegments, useCreateAttempt, useFinishAttempt, useUploadAudio } from '@/lib/api/training';
import { FEEDBACK_LIST_PATH } from '../paths';
import { formatClock, formatPercent } from './format';
import { startNarrationLoop, type NarrationLoop } from './narration-loop';
import { SafetyCaution } from '@/components/ui/safety-caution';
import { TypedInputForm } from '@/components/ui/typed-input-form';

// Our own bound: a practice walk-around is well under an hour; the recorder stops there.
export const PRACTICE_MAX_MS = 60 * 60 * 1000;
// At least 20 mm (about 76 CSS px) high, as the walk-around's own targets.
const TARGET_CLASS = 'min-h-[max(76px,4.75rem)]! w-full text-3xl';

type Phase = 'choose' | 'starting' | 'recording' | 'saving' | 'failed' | 'done';

interface Session {
  attemptId: string;
  startedAt: number;
  loop: NarrationLoop;
  recording: Promise<NoteRecording | null>;
  segments: TrainingSegmentUpsert[];
  sent: number;
  // Batches go one after another, so the server sees them in order.
  sending: Promise<void>;
  note: RecordedNote | null;
  durationMs: number;
}

export interface PracticeSessionProps {
  units: readonly VehicleResponse[];
  locale: Locale;
  // Tests pass a scripted engine; the app picks the browser's own speech or typed input.
  createEngine?: () => SpeechEngine;
}

// Narration mode: the student picks a unit, presses Start and talks through the walk-around
// while the app records and notes what it hears; Stop sends it for scoring.
export function PracticeSession({ units, locale, createEngine }: PracticeSessionProps) {
  const { t } = useTranslation();
  const powerUnits = units.filter((u) => isPowerUnit(u.kind));
  const trailers = units.filter((u) => !isPowerUnit(u.kind));
  const [powerUnitId, setPowerUnitId] = useState(powerUnits[0]?.id ?? '');
  const [trailerId, setTrailerId] = useState('');
  const [phase, setPhase] = useState<Phase>('choose');
  const [heard, setHeard] = useState<TrainingSegmentUpsert[]>([]);
  const [elapsedMs, setElapsedMs] = useState(0);
  const [problem, setProblem] = useState<string | null>(null);
  const [notice, setNotice] = useState<string | null>(null);
  const [result, setResult] = useState<TrainingAttemptResponse | null>(null);
  const [engine] = useState<SpeechEngine>(() => (createEngine ? createEngine() : chooseSpeechEngine(window)));
  const session = useRef<Session | null>(null);
  const heardEnd = useRef<HTMLLIElement>(null);
  const create = useCreateAttempt();
  const upload = useUploadAudio();
  const finish = useFinishAttempt();

  useEffect(() => {
    if (phase !== 'recording') return;
    const timer = setInterval(() => {
      if (session.current) setElapsedMs(performance.now() - session.current.startedAt);
    }, 500);
    return () => clearInterval(timer);
  }, [phase]);

  useEffect(() => {
    heardEnd.current?.scrollIntoView?.({ block: 'nearest' });
  }, [heard.length]);

  // Leaving the screen mid-attempt stops listening and the microphone.
  useEffect(
    () => () => {
      const current = session.current;
      if (!current) return;
      void current.loop.stop();
      void current.recording.then((rec) => rec?.stop());
    },
    [],
  );

  const send = (s: Session) => {
    s.sending = s.sending.then(async () => {
      const batch = s.segments.slice(s.sent);
      if (batch.length === 0) return;
      try {
        await putSegments(s.attemptId, batch);
        s.sent += batch.length;
      } catch {
        // Kept for the next batch or for Stop, which sends what is left.
      }
    });
    return s.sending;
  };

  const start = async () => {
    setProblem(null);
    setNotice(null);
    setHeard([]);
    setElapsedMs(0);
    setPhase('starting');
    try {
      const attempt = await create.mutateAsync({
        clientId: crypto.randomUUID(),
        vehicleIds: [powerUnitId, trailerId].filter(Boolean),
        startedAt: new Date().toISOString(),
        locale,
      });
      const recording = startRecording({ maxMs: PRACTICE_MAX_MS, silenceMs: Number.POSITIVE_INFINITY }).catch(() => {
        setNotice(t('training.practice.noRecorder'));
        return null;
      });
      // The segments' times count from the moment the recorder runs.
      await recording;
      const startedAt = performance.now();
      const s: Session = {
        attemptId: attempt.id,
        startedAt,
        recording,
        segments: [],
        sent: 0,
        sending: Promise.resolve(),
        note: null,
        durationMs: 0,
        loop: startNarrationLoop({
          engine,
          locale,
          startedAt,
          onSegment: (segment) => {
            s.segments.push(segment);
            setHeard((list) => [...list, segment]);
            void send(s);
          },
          onFatal: (error) => setNotice(error.shown),
        }),
      };
      session.current = s;
      setPhase('recording');
    } catch (error) {
      setProblem(describeError(error));
      setPhase('choose');
    }
  };

  // Every step is idempotent on the server, so a failed save is simply tried again.
  const save = async (s: Session) => {
    setProblem(null);
    setPhase('saving');
    try {
      await send(s);
      if (s.sent < s.segments.length) {
        await putSegments(s.attemptId, s.segments.slice(s.sent));
        s.sent = s.segments.length;
      }
      if (s.note && s.note.blob.size > 0) {
        await upload.mutateAsync({
          attemptId: s.attemptId,
          recording: { blob: s.note.blob, mimeType: s.note.mimeType, durationMs: s.note.durationMs },
        });
      }
      const done = await finish.mutateAsync({
        attemptId: s.attemptId,
        body: { finishedAt: new Date().toISOString(), durationMs: s.durationMs },
      });
      session.current = null;
      setResult(done);
      setPhase('done');
    } catch (error) {
      setProblem(describeError(error));
      setPhase('failed');
    }
  };

  const stop = async () => {
    const s = session.current;
    if (!s) return;
    setPhase('saving');
    s.durationMs = Math.round(performance.now() - s.startedAt);
    await s.loop.stop();
    const rec = await s.recording;
    s.note = rec ? await rec.stop().catch(() => null) : null;
    await save(s);
  };

  if (phase === 'done' && result) {
    const overall = result.coverage;
    return (
      <div className="flex flex-col gap-tap-gap" data-testid="practice-done">
        <Notice>
          {overall
            ? t('training.practice.doneScore', {
                named: overall.named,
                total: overall.itemCount,
                percent: formatPercent(overall.namedFraction),
              })
            : t('training.practice.done')}
        </Notice>
        <p>{t('training.practice.doneHint')}</p>
        <LinkButton to={FEEDBACK_LIST_PATH} size="large">
          {t('training.practice.seeFeedback')}
        </LinkButton>
        <Button variant="secondary" onClick={() => setPhase('choose')}>
          {t('training.practice.again')}
        </Button>
      </div>
    );
  }

  const running = phase === 'recording' || phase === 'saving' || phase === 'failed';
  return (
    <div className="flex flex-col gap-tap-gap" data-testid="practice-session" data-phase={phase}>
      {problem ? <ErrorAlert>{problem}</ErrorAlert> : null}
      {notice ? <Notice>{notice}</Notice> : null}
      {!running ? (
        <>
          {powerUnits.length === 0 ? (
            <Notice>{t('training.practice.noUnits')}</Notice>
          ) : (
            <>
              <SelectField
                label={t('training.practice.unit')}
                value={powerUnitId}
                onChange={(event) => setPowerUnitId(event.target.value)}
                data-testid="practice-unit"
              >
                {powerUnits.map((unit) => (
                  <option key={unit.id} value={unit.id}>
                    {unit.unitNumber}
                  </option>
                ))}
              </SelectField>
              <SelectField
                label={t('training.practice.trailer')}
                value={trailerId}
                onChange={(event) => setTrailerId(event.target.value)}
                data-testid="practice-trailer"
              >
                <option value="">{t('training.practice.noTrailer')}</option>
                {trailers.map((unit) => (
                  <option key={unit.id} value={unit.id}>
                    {unit.unitNumber}
                  </option>
                ))}
              </SelectField>
            </>
          )}
          <p>{t('training.practice.howTo')}</p>
          <Button
            size="large"
            className={TARGET_CLASS}
            onClick={() => void start()}
            busy={phase === 'starting'}
            disabled={!powerUnitId || phase === 'starting'}
            data-testid="practice-start"
          >
            {t('training.practice.start')}
          </Button>
        </>
      ) : (
        <>
          <p role="status" className="flex items-center gap-3 text-2xl font-bold" data-testid="practice-status">
            {phase === 'recording' ? (
              <>
                <span aria-hidden="true" className="inline-block size-5 animate-pulse rounded-full bg-danger" />
                <span>{t('training.practice.recording')}</span>
              </>
            ) : (
              <span>{phase === 'saving' ? t('training.practice.saving') : t('training.practice.saveFailed')}</span>
            )}
            <span className="font-mono" data-testid="practice-elapsed">
              {formatClock(elapsedMs)}
            </span>
          </p>
          {phase === 'failed' ? (
            <Button
              size="large"
              className={TARGET_CLASS}
              onClick={() => {
                if (session.current) void save(session.current);
              }}
            >
              {t('training.practice.retry')}
            </Button>
          ) : (
            <Button
              size="large"
              variant="danger"
              className={TARGET_CLASS}
              onClick={() => void stop()}
              busy={phase === 'saving'}
              disabled={phase !== 'recording'}
              data-testid="practice-stop"
            >
              {t('training.practice.stop')}
            </Button>
          )}
          {engine instanceof TypedInputEngine && phase === 'recording' ? (
            <TypedInputForm
              engine={engine}
              label={t('training.practice.typedLabel')}
              sendLabel={t('training.practice.typedSend')}
              testId="typed-narration"
            />
          ) : null}
        </>
      )}
      <Section title={t('training.practice.heard')} id="practice-heard">
        {heard.length === 0 ? (
          <p className="text-muted">{running ? t('training.practice.listening') : t('training.practice.nothingYet')}</p>
        ) : (
          <ol
            className="flex max-h-80 flex-col gap-2 overflow-y-auto rounded-xl border-2 border-line bg-surface p-3 text-xl"
            aria-live="polite"
            // The list scrolls: it takes focus so the keyboard can scroll it (WCAG 2.1.1); nothing in it is a control.
            // eslint-disable-next-line jsx-a11y-x/no-noninteractive-tabindex
            tabIndex={0}
            aria-label={t('training.practice.heard')}
            data-testid="practice-heard-list"
          >
            {heard.map((segment, index) => (
              <li key={segment.seq} ref={index === heard.length - 1 ? heardEnd : undefined}>
                <span className="mr-2 font-mono text-base text-muted">{formatClock(segment.startMs)}</span>
                {segment.text}
              </li>
            ))}
          </ol>
        )}
      </Section>
      <SafetyCaution />
    </div>
  );
}
