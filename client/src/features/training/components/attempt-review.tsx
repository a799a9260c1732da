import { useRef, useState, type FormEvent } from 'react';
import { useTranslation } from 'react-i18next';
import {
  TRAINING_COMMENT_MAX,
  TRAINING_GRADES,
  type TrainingAttemptResponse,
  type TrainingGrade,
} from '@yardcall/shared';
import { ErrorAlert, Notice } from '@/components/ui/alert';
import { Button } from '@/components/ui/button';
import { RadioGroup } from '@/components/ui/radio-group';
import { Section } from '@/components/ui/layout';
import { describeError } from '@/lib/errors';
import { usePutReview } from '@/lib/api/training';
import { AttemptAudio } from './attempt-audio';
import { AttemptChecklist, type ItemDraft } from './attempt-checklist';
import { AttemptSummary } from './attempt-summary';
import { formatClock } from './format';
import { SafetyCaution } from '@/components/ui/safety-caution';

function initialDrafts(attempt: TrainingAttemptResponse): Record<string, ItemDraft> {
  const scored = new Map((attempt.score?.items ?? []).map((item) => [item.itemKey, item.status]));
  const reviewed = new Map((attempt.review?.marks ?? []).map((mark) => [mark.itemKey, mark]));
  return Object.fromEntries(
    attempt.checklist.items.map((item) => {
      const saved = reviewed.get(item.key);
      return [item.key, { mark: saved?.mark ?? scored.get(item.key) ?? 'missed', comment: saved?.comment ?? '' }];
    }),
  );
}

// Seeks the recording to a moment and plays from there; the element keeps the position if playing is refused.
export function useSeekableAudio() {
  const audioRef = useRef<HTMLAudioElement>(null);
  const [playingFrom, setPlayingFrom] = useState<number | null>(null);
  const seek = (ms: number) => {
    const audio = audioRef.current;
    if (!audio) return;
    audio.currentTime = ms / 1000;
    setPlayingFrom(ms);
    void audio.play().catch(() => undefined);
  };
  return { audioRef, playingFrom, seek };
}

// The trainer's page: the recording, the checklist with the scorer's marks, and a mark, comment and grade to save.
export function AttemptReview({ attempt }: { attempt: TrainingAttemptResponse }) {
  const { t } = useTranslation();
  const { audioRef, playingFrom, seek } = useSeekableAudio();
  const [drafts, setDrafts] = useState(() => initialDrafts(attempt));
  const [grade, setGrade] = useState<TrainingGrade | ''>(attempt.review?.grade ?? '');
  const [comment, setComment] = useState(attempt.review?.comment ?? '');
  const [gradeError, setGradeError] = useState<string | null>(null);
  const [saved, setSaved] = useState(false);
  const review = usePutReview();

  const submit = (event: FormEvent) => {
    event.preventDefault();
    setSaved(false);
    if (!grade) {
      setGradeError(t('training.review.gradeRequired'));
      return;
    }
    setGradeError(null);
    review.mutate(
      {
        attemptId: attempt.id,
        body: {
          grade,
          comment: comment.trim(),
          marks: Object.entries(drafts).map(([itemKey, draft]) => ({
            itemKey,
            mark: draft.mark,
            comment: draft.comment.trim(),
          })),
        },
      },
      { onSuccess: () => setSaved(true) },
    );
  };

  return (
    <div data-testid="attempt-review">
      <AttemptSummary attempt={attempt} />
      <Section title={t('training.attempt.recording')} id="attempt-recording">
        <AttemptAudio ref={audioRef} attempt={attempt} />
        {playingFrom !== null ? (
          <p role="status" className="mt-2" data-testid="playing-from">
            {t('training.attempt.playingFrom', { time: formatClock(playingFrom) })}
          </p>
        ) : null}
      </Section>
      {attempt.status !== 'finished' ? <Notice>{t('training.review.notFinished')}</Notice> : null}
      <form onSubmit={submit} noValidate>
        <Section title={t('training.attempt.checklist')} id="attempt-items">
          <p className="mb-3">{t('training.review.hint')}</p>
          <AttemptChecklist
            attempt={attempt}
            onSeek={attempt.audio ? seek : undefined}
            drafts={attempt.status === 'finished' ? drafts : undefined}
            onDraftChange={(itemKey, draft) => setDrafts((all) => ({ ...all, [itemKey]: draft }))}
          />
        </Section>
        {attempt.status === 'finished' ? (
          <Section title={t('training.review.overall')} id="attempt-grade">
            <RadioGroup
              legend={t('training.review.grade')}
              legendSize="plain"
              look="list"
              name="grade"
              choices={TRAINING_GRADES}
              labelOf={(value) => t(`training.grade.${value}`)}
              value={grade}
              onChange={setGrade}
              error={gradeError ?? undefined}
              className="mb-4"
              data-testid="review-grade"
            />
            <div className="mb-4 flex flex-col gap-1">
              <label htmlFor="review-comment" className="font-bold">
                {t('training.review.comment')}
              </label>
              <textarea
                id="review-comment"
                value={comment}
                maxLength={TRAINING_COMMENT_MAX}
                onChange={(event) => setComment(event.target.value)}
                rows={4}
                className="block w-full rounded-lg border-2 border-line bg-surface px-3 py-2 text-ink"
                data-testid="review-comment"
              />
            </div>
            {review.isError ? <ErrorAlert>{describeError(review.error)}</ErrorAlert> : null}
            {saved ? <Notice>{t('training.review.saved')}</Notice> : null}
            <Button type="submit" size="large" busy={review.isPending} data-testid="review-save">
              {t('training.review.save')}
            </Button>
          </Section>
        ) : null}
      </form>
      <SafetyCaution />
    </div>
  );
}
