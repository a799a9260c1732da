import type { QueryClient } from '@tanstack/react-query';
import { useTranslation } from 'react-i18next';
import { ErrorAlert, Loading } from '@/components/ui/alert';
import { TrainerHome } from '@/features/home/routes/trainer-home';
import { attemptsQueryOptions } from '@/lib/api/training';
import { AttemptList } from '@/features/training/components/attempt-list';
import { StudentsOverview } from '@/features/training/components/students-overview';
import { reviewPath } from '@/features/training/paths';
import { useUsers, usersQueryOptions } from '@/lib/api/users';
import { describeError } from '@/lib/errors';

export function trainerHomeLoader(queryClient: QueryClient) {
  return async () => {
    // The attempts are fetched alongside; a failure there shows in its own section, not over the page.
    await Promise.all([
      queryClient.ensureQueryData(usersQueryOptions({ student: true })),
      queryClient.prefetchQuery(attemptsQueryOptions()),
      queryClient.prefetchQuery(attemptsQueryOptions({ review: 'waiting' })),
    ]);
    return null;
  };
}

// The app joins two features: the users' list of students and their practice attempts.
function Students() {
  const { t } = useTranslation();
  const students = useUsers({ student: true });
  if (students.isPending) return <Loading label={t('common.loading')} />;
  if (students.isError) return <ErrorAlert>{describeError(students.error)}</ErrorAlert>;
  return <StudentsOverview students={students.data} pathFor={reviewPath} />;
}

export function TrainerHomeRoute() {
  const { t } = useTranslation();
  return (
    <TrainerHome
      waiting={
        <AttemptList
          filters={{ review: 'waiting' }}
          pathFor={reviewPath}
          showStudent
          emptyTitle={t('training.home.noneWaiting')}
          testId="attempts-waiting-list"
        />
      }
      students={<Students />}
      recent={
        <AttemptList
          filters={{}}
          pathFor={reviewPath}
          showStudent
          emptyTitle={t('training.home.noneRecent')}
          testId="attempts-recent-list"
        />
      }
    />
  );
}
