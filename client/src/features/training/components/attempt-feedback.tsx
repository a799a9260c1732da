import { useTranslation } from 'react-i18next';
import { useOfficeDates } from '@/lib/office-dates';
import type { TrainingAttemptResponse } from '@yardcall/shared';
import { Card, Section } from '@/components/ui/layout';
import { AttemptAudio } from './attempt-audio';
import { AttemptChecklist } from './attempt-checklist';
import { useSeekableAudio } from './attempt-review';
import { AttemptSummary } from './attempt-summary';
import { formatClock } from './format';
import { GradeBadge } from './mark-badge';
import { SafetyCaution } from '@/components/ui/safety-caution';

// The student's view of one attempt: the trainer's grade and words, then each item with both marks.
export function AttemptFeedback({ attempt }: { attempt: TrainingAttemptResponse }) {
  const { t } = useTranslation();
  const dates = useOfficeDates();
  const { audioRef, playingFrom, seek } = useSeekableAudio();
  const review = attempt.review;
  return (
    <div data-testid="attempt-feedback">
      <AttemptSummary attempt={attempt} />
      <Section title={t('training.feedback.fromTrainer')} id="feedback-review">
        {review ? (
          <Card>
            <p className="mb-2 flex flex-wrap items-center gap-2">
              <GradeBadge grade={review.grade} />
              <span className="text-muted">
                {t('training.feedback.reviewedBy', {
                  name: review.trainer.name,
                  date: dates.dateTime(review.reviewedAt),
                })}
              </span>
            </p>
            {review.comment ? (
              <p className="text-xl" data-testid="feedback-comment">
                {review.comment}
              </p>
            ) : null}
          </Card>
        ) : (
          <p className="text-muted">{t('training.feedback.waiting')}</p>
        )}
      </Section>
      <Section title={t('training.attempt.recording')} id="feedback-recording">
        <AttemptAudio ref={audioRef} attempt={attempt} />
        {playingFrom !== null ? (
          <p role="status" className="mt-2">
            {t('training.attempt.playingFrom', { time: formatClock(playingFrom) })}
          </p>
        ) : null}
      </Section>
      <Section title={t('training.attempt.checklist')} id="feedback-items">
        <AttemptChecklist attempt={attempt} onSeek={attempt.audio ? seek : undefined} />
      </Section>
      <SafetyCaution />
    </div>
  );
}
