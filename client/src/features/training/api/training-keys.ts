export interface AttemptFilters {
  // Trainers: one student's attempts.
  studentId?: string;
  // Finished and not reviewed yet, or reviewed.
  review?: 'waiting' | 'reviewed';
}

// One key factory for practice attempts, their recordings, reviews and progress.
export const trainingKeys = {
  all: ['training'] as const,
  lists: () => [...trainingKeys.all, 'list'] as const,
  list: (filters: AttemptFilters) =>
    [...trainingKeys.lists(), { studentId: filters.studentId ?? null, review: filters.review ?? null }] as const,
  details: () => [...trainingKeys.all, 'detail'] as const,
  detail: (attemptId: string) => [...trainingKeys.details(), attemptId] as const,
  audio: (attemptId: string) => [...trainingKeys.detail(attemptId), 'audio'] as const,
  progresses: () => [...trainingKeys.all, 'progress'] as const,
  // 'me' for the signed-in student.
  progress: (studentId: string) => [...trainingKeys.progresses(), studentId] as const,
  units: () => [...trainingKeys.all, 'units'] as const,
};
