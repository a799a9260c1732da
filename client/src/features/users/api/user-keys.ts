export interface UserFilters {
  // Only drivers in training (the trainer's students).
  student?: boolean;
}

export const userKeys = {
  all: ['users'] as const,
  lists: () => [...userKeys.all, 'list'] as const,
  list: (filters: UserFilters) => [...userKeys.lists(), { student: filters.student ?? false }] as const,
  details: () => [...userKeys.all, 'detail'] as const,
  detail: (id: string) => [...userKeys.details(), id] as const,
  // Invitation e-mails caught by the demo's local mail catcher.
  outbox: () => [...userKeys.all, 'outbox'] as const,
};
