import { ROLES, type DisplaySettings, type Role } from '@yardcall/shared';
import { Column, Entity, Index } from 'typeorm';
import { EditableOrganizationOwned } from '../../organizations/entities/organization-owned';

export const USER_STATUSES = ['active', 'invited'] as const;
export type UserStatus = (typeof USER_STATUSES)[number];

// E-mail is unique whatever its case; the functional index lives in the migration only.
@Index('UQ_users_email_lower', { synchronize: false })
@Index('IDX_users_organization_id', ['organizationId'])
@Entity({ name: 'users' })
export class User extends EditableOrganizationOwned {
  @Column({ type: 'varchar', length: 254 })
  email: string;

  @Column({ type: 'varchar', length: 120 })
  name: string;

  @Column({ type: 'enum', enum: [...ROLES], enumName: 'user_role' })
  role: Role;

  @Column({ name: 'is_student', type: 'boolean', default: false })
  isStudent: boolean;

  // Null while the invitation is not accepted yet.
  @Column({ name: 'password_hash', type: 'varchar', length: 100, nullable: true })
  passwordHash: string | null;

  @Column({ type: 'enum', enum: [...USER_STATUSES], enumName: 'user_status', default: 'invited' })
  status: UserStatus;

  // Only the settings the user changed; the rest come from DEFAULT_DISPLAY_SETTINGS.
  @Column({ type: 'jsonb', default: {} })
  settings: Partial<DisplaySettings>;
}
