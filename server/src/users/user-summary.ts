import { DEFAULT_DISPLAY_SETTINGS, type UserSummary } from '@yardcall/shared';
import type { Organization } from '../organizations/entities/organization.entity';
import type { User } from './entities/user.entity';

export function toUserSummary(user: User, organization: Organization): UserSummary {
  return {
    id: user.id,
    email: user.email,
    name: user.name,
    role: user.role,
    isStudent: user.isStudent,
    status: user.status,
    organizationId: organization.id,
    organizationName: organization.name,
    settings: { ...DEFAULT_DISPLAY_SETTINGS, ...user.settings },
  };
}
