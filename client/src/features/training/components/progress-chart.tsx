import { useTranslation } from 'react-i18next';
import { useOfficeDates } from '@/lib/office-dates';
import type { TrainingProgress } from '@yardcall/shared';
import { EmptyState } from '@/components/ui/layout';

import { GradeBadge } from './mark-badge';

// Items named per finished attempt, oldest first, as bars with their numbers written out.
export function ProgressChart({ progress }: { progress: TrainingProgress }) {
  const { t } = useTranslation();
  const dates = useOfficeDates();
  if (progress.attempts.length === 0) return <EmptyState title={t('training.progress.none')} />;
  const first = progress.attempts[0]!;
  const last = progress.attempts[progress.attempts.length - 1]!;
  return (
    <div data-testid="progress-chart">
      {progress.attempts.length > 1 ? (
        <p className="mb-3 font-bold">
          {t('training.progress.change', { from: first.coveragePercent, to: last.coveragePercent })}
        </p>
      ) : null}
      <ol className="flex flex-col gap-3">
        {progress.attempts.map((point, index) => (
          <li key={point.attemptId} data-testid="progress-point">
            <div className="flex flex-wrap items-center justify-between gap-2">
              <span>
                {t('training.progress.attempt', { number: index + 1 })} · {dates.dateTime(point.date)}
              </span>
              <span className="flex items-center gap-2">
                <span className="font-bold">{t('training.progress.named', { percent: point.coveragePercent })}</span>
                <GradeBadge grade={point.grade} />
              </span>
            </div>
            <div className="mt-1 h-4 w-full rounded-full border-2 border-line" aria-hidden="true">
              <div className="h-full rounded-full bg-primary" style={{ width: `${point.coveragePercent}%` }} />
            </div>
          </li>
        ))}
      </ol>
    </div>
  );
}
