import { useState } from 'react';
import { useTranslation } from 'react-i18next';
import type { Role, UserSummary } from '@yardcall/shared';
import { ErrorAlert } from '@/components/ui/alert';
import { Button } from '@/components/ui/button';
import { EmptyState } from '@/components/ui/layout';
import { PersonItem } from '@/components/ui/person-item';
import { describeError } from '@/lib/errors';
import { useUpdateUser } from '@/lib/api/users';
import { RoleField } from './role-field';

function RoleChanger({ user, isSelf }: { user: UserSummary; isSelf: boolean }) {
  const { t } = useTranslation();
  const update = useUpdateUser();
  const [role, setRole] = useState<Role>(user.role);
  return (
    <div className="flex flex-col gap-2">
      <div className="flex flex-wrap items-end gap-tap-gap">
        <div className="min-w-48 flex-1">
          <RoleField
            label={t('users.fields.roleOf', { name: user.name })}
            value={role}
            // An admin cannot demote themself and lock the organisation out.
            disabled={isSelf}
            onChange={setRole}
          />
        </div>
        {role !== user.role ? (
          <Button busy={update.isPending} onClick={() => update.mutate({ id: user.id, body: { role } })}>
            {t('users.list.saveRole')}
          </Button>
        ) : null}
      </div>
      {update.isError ? <ErrorAlert>{describeError(update.error)}</ErrorAlert> : null}
      {update.isSuccess && role === user.role ? <p role="status">{t('users.list.roleSaved')}</p> : null}
    </div>
  );
}

export function UserList({ users, currentUserId }: { users: UserSummary[]; currentUserId: string }) {
  const { t } = useTranslation();
  if (users.length === 0) return <EmptyState title={t('users.list.empty')} />;
  return (
    <ul className="grid grid-cols-1 gap-tap-gap lg:grid-cols-2" aria-label={t('users.list.label')}>
      {users.map((user) => (
        <PersonItem key={user.id} person={user} className="flex min-w-0 flex-col gap-2" data-testid="user-row">
          <p>
            {user.status === 'invited' ? t('users.status.invited') : t('users.status.active')}
            {user.isStudent ? ` · ${t('users.fields.student')}` : ''}
          </p>
          <RoleChanger user={user} isSelf={user.id === currentUserId} />
        </PersonItem>
      ))}
    </ul>
  );
}
