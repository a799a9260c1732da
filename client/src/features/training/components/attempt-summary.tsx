import { useTranslation } from 'react-i18next';
import { useOfficeDates } from '@/lib/office-dates';
import type { TrainingAttemptListItem } from '@yardcall/shared';
import { formatClock, formatPercent } from './format';
import { GradeBadge } from './mark-badge';

// Who, which units, when, how long, how much was named and the grade.
export function AttemptSummary({ attempt }: { attempt: TrainingAttemptListItem }) {
  const { t } = useTranslation();
  const dates = useOfficeDates();
  const units = attempt.vehicles.map((v) => v.unitNumber).join(' + ');
  return (
    <dl className="mb-6 grid gap-x-6 gap-y-1 sm:grid-cols-[max-content_1fr]" data-testid="attempt-summary">
      <dt className="font-bold">{t('training.attempt.student')}</dt>
      <dd>{attempt.student.name}</dd>
      <dt className="font-bold">{t('training.attempt.units')}</dt>
      <dd>{units}</dd>
      <dt className="font-bold">{t('training.attempt.started')}</dt>
      <dd>{dates.dateTime(attempt.startedAt)}</dd>
      {attempt.durationMs !== null ? (
        <>
          <dt className="font-bold">{t('training.attempt.duration')}</dt>
          <dd>{formatClock(attempt.durationMs)}</dd>
        </>
      ) : null}
      <dt className="font-bold">{t('training.attempt.coverage')}</dt>
      <dd data-testid="attempt-coverage">
        {attempt.coverage
          ? t('training.attempt.coverageValue', {
              named: attempt.coverage.named,
              partly: attempt.coverage.partly,
              total: attempt.coverage.itemCount,
              percent: formatPercent(attempt.coverage.namedFraction),
            })
          : t('training.attempt.notFinished')}
      </dd>
      <dt className="font-bold">{t('training.attempt.grade')}</dt>
      <dd>
        <GradeBadge grade={attempt.grade} />
      </dd>
    </dl>
  );
}
