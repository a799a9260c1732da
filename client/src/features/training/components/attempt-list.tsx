import { useTranslation } from 'react-i18next';
import { useOfficeDates } from '@/lib/office-dates';
import { Link } from 'react-router';
import type { TrainingAttemptListItem } from '@yardcall/shared';
import { ErrorAlert, Loading } from '@/components/ui/alert';
import { EmptyState } from '@/components/ui/layout';
import { describeError } from '@/lib/errors';
import { type AttemptFilters, useAttempts } from '@/lib/api/training';
import { formatPercent } from './format';
import { GradeBadge } from './mark-badge';

export function AttemptRow({
  attempt,
  to,
  showStudent,
}: {
  attempt: TrainingAttemptListItem;
  to: string;
  showStudent: boolean;
}) {
  const { t } = useTranslation();
  const dates = useOfficeDates();
  const units = attempt.vehicles.map((v) => v.unitNumber).join(' + ');
  const when = dates.dateTime(attempt.finishedAt ?? attempt.startedAt);
  return (
    <li
      className="rounded-xl border-2 border-line bg-surface p-4"
      data-testid="attempt-row"
      data-attempt-id={attempt.id}
    >
      <p className="text-xl font-bold">
        <Link to={to}>{showStudent ? `${attempt.student.name} · ${units}` : `${units} · ${when}`}</Link>
      </p>
      <p className="text-muted">
        {[
          showStudent ? when : null,
          attempt.coverage
            ? t('training.list.coverage', { percent: formatPercent(attempt.coverage.namedFraction) })
            : t('training.attempt.notFinished'),
          attempt.status === 'finished' && !attempt.reviewedAt ? t('training.list.waiting') : null,
        ]
          .filter(Boolean)
          .join(' · ')}
      </p>
      {attempt.reviewedAt ? (
        <p>
          <GradeBadge grade={attempt.grade} />
        </p>
      ) : null}
    </li>
  );
}

// Attempts as links: to the trainer's review page or the student's feedback page.
export function AttemptList({
  filters,
  pathFor,
  showStudent,
  emptyTitle,
  testId,
}: {
  filters: AttemptFilters;
  pathFor: (attemptId: string) => string;
  showStudent: boolean;
  emptyTitle: string;
  testId: string;
}) {
  const { t } = useTranslation();
  const attempts = useAttempts(filters);
  if (attempts.isPending) return <Loading label={t('common.loading')} />;
  if (attempts.isError) return <ErrorAlert>{describeError(attempts.error)}</ErrorAlert>;
  if (attempts.data.length === 0) return <EmptyState title={emptyTitle} />;
  return (
    <ul className="flex flex-col gap-tap-gap" data-testid={testId}>
      {attempts.data.map((attempt) => (
        <AttemptRow key={attempt.id} attempt={attempt} to={pathFor(attempt.id)} showStudent={showStudent} />
      ))}
    </ul>
  );
}
