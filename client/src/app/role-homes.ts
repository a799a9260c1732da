import type { Role } from '@yardcall/shared';

// Where each role lands after sign-in; the Playwright tests use these paths too.
export const HOME_PATHS = {
  driver: '/driver',
  mechanic: '/mechanic',
  supervisor: '/supervisor',
  trainer: '/trainer',
  admin: '/admin',
} as const satisfies Record<Role, string>;

export function homePathFor(role: Role): string {
  return HOME_PATHS[role];
}
