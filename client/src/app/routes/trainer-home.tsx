import type { QueryClient } from '@tanstack/react-query';
import { TrainerHome } from '@/features/home/routes/trainer-home';
import { usersQueryOptions } from '@/features/users/api/get-users';
import { StudentList } from '@/features/users/components/student-list';

export function trainerHomeLoader(queryClient: QueryClient) {
  return async () => {
    await queryClient.ensureQueryData(usersQueryOptions({ student: true }));
    return null;
  };
}

export function TrainerHomeRoute() {
  return <TrainerHome students={<StudentList />} />;
}
