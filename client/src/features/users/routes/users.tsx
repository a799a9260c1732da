import { useState } from 'react';
import type { QueryClient } from '@tanstack/react-query';
import { useTranslation } from 'react-i18next';
import { ErrorAlert, Loading, Notice } from '@/components/ui/alert';
import { Button } from '@/components/ui/button';
import { LinkButton } from '@/components/ui/link-button';
import { PageHeading } from '@/components/ui/layout';
import { describeError } from '@/lib/errors';
import { useCurrentUser } from '@/lib/api/auth';
import { useUsers, usersQueryOptions } from '@/lib/api/users';
import { InviteUserDialog } from '../components/invite-user-dialog';
import { UserList } from '../components/user-list';

export function usersLoader(queryClient: QueryClient) {
  return async () => {
    await queryClient.ensureQueryData(usersQueryOptions());
    return null;
  };
}

export function UsersRoute() {
  const { t } = useTranslation();
  const me = useCurrentUser();
  const users = useUsers();
  const [inviting, setInviting] = useState(false);
  const [invited, setInvited] = useState<string | null>(null);
  return (
    <>
      <PageHeading
        title={t('users.title')}
        actions={
          <>
            <Button onClick={() => setInviting(true)}>{t('users.invite.open')}</Button>
            <LinkButton to="/admin/outbox" variant="secondary">
              {t('outbox.title')}
            </LinkButton>
          </>
        }
      />
      {invited ? <Notice>{t('users.invite.sent', { email: invited })}</Notice> : null}
      {users.isPending ? <Loading label={t('common.loading')} /> : null}
      {users.isError ? <ErrorAlert>{describeError(users.error)}</ErrorAlert> : null}
      {users.data ? (
        <div className="mt-4">
          <UserList users={users.data} currentUserId={me.id} />
        </div>
      ) : null}
      <InviteUserDialog open={inviting} onClose={() => setInviting(false)} onInvited={setInvited} />
    </>
  );
}
