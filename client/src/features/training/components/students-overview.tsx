import { useTranslation } from 'react-i18next';
import { Link } from 'react-router';
import { ErrorAlert, Loading } from '@/components/ui/alert';
import { EmptyState } from '@/components/ui/layout';
import { PersonItem } from '@/components/ui/person-item';
import { describeError } from '@/lib/errors';
import { useAttempts } from '@/lib/api/training';
import { formatPercent } from './format';

export interface StudentRef {
  id: string;
  name: string;
  email: string;
}

// Each student with how many attempts they made, the latest share named and what waits for review.
export function StudentsOverview({
  students,
  pathFor,
}: {
  students: readonly StudentRef[];
  pathFor: (attemptId: string) => string;
}) {
  const { t } = useTranslation();
  const attempts = useAttempts();
  if (students.length === 0) {
    return <EmptyState title={t('training.students.none')}>{t('training.students.noneHint')}</EmptyState>;
  }
  if (attempts.isPending) return <Loading label={t('common.loading')} />;
  if (attempts.isError) return <ErrorAlert>{describeError(attempts.error)}</ErrorAlert>;
  return (
    <ul className="flex flex-col gap-tap-gap" data-testid="training-students">
      {students.map((student) => {
        const own = attempts.data.filter((a) => a.student.id === student.id);
        const latest = own.find((a) => a.coverage !== null);
        const waiting = own.filter((a) => a.status === 'finished' && !a.reviewedAt).length;
        return (
          <PersonItem key={student.id} person={student} data-testid="training-student">
            <p>
              {own.length === 0
                ? t('training.students.noAttempts')
                : t('training.students.attempts', { count: own.length })}
              {waiting > 0 ? ` · ${t('training.students.waiting', { count: waiting })}` : ''}
            </p>
            {latest?.coverage ? (
              <p>
                <Link to={pathFor(latest.id)}>
                  {t('training.students.latest', { percent: formatPercent(latest.coverage.namedFraction) })}
                </Link>
              </p>
            ) : null}
          </PersonItem>
        );
      })}
    </ul>
  );
}
