import { useTranslation } from 'react-i18next';
import { ErrorAlert, Loading } from '@/components/ui/alert';
import { EmptyState } from '@/components/ui/layout';
import { describeError } from '@/lib/errors';
import { useUsers } from '../api/get-users';

export function StudentList() {
  const { t } = useTranslation();
  const students = useUsers({ student: true });
  if (students.isPending) return <Loading label={t('common.loading')} />;
  if (students.isError) return <ErrorAlert>{describeError(students.error)}</ErrorAlert>;
  if (students.data.length === 0)
    return <EmptyState title={t('trainer.noStudents')}>{t('trainer.noStudentsHint')}</EmptyState>;
  return (
    <ul className="flex flex-col gap-tap-gap" aria-label={t('trainer.students')} data-testid="student-list">
      {students.data.map((student) => (
        <li key={student.id} className="rounded-xl border-2 border-line bg-surface p-4">
          <p className="text-xl font-bold">{student.name}</p>
          <p className="text-muted">
            {student.email} · {student.status === 'invited' ? t('users.status.invited') : t('users.status.active')}
          </p>
          <p className="text-muted">{t('trainer.noAttempts')}</p>
        </li>
      ))}
    </ul>
  );
}
