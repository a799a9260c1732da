import { useState } from 'react';
import type { QueryClient } from '@tanstack/react-query';
import { useTranslation } from 'react-i18next';
import { Notice } from '@/components/ui/alert';
import { Button } from '@/components/ui/button';
import { LinkButton } from '@/components/ui/link-button';
import { PageHeading } from '@/components/ui/layout';
import { QueryState } from '@/components/ui/query-state';
import { ensuringLoader } from '@/lib/route-loader';
import { useCurrentUser } from '@/lib/api/auth';
import { useUsers, usersQueryOptions } from '@/lib/api/users';
import { InviteUserDialog } from '../components/invite-user-dialog';
import { UserList } from '../components/user-list';

export function usersLoader(queryClient: QueryClient) {
  return ensuringLoader(queryClient, usersQueryOptions());
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
      <QueryState query={users}>
        {(list) => (
          <div className="mt-4">
            <UserList users={list} currentUserId={me.id} />
          </div>
        )}
      </QueryState>
      <InviteUserDialog open={inviting} onClose={() => setInviting(false)} onInvited={setInvited} />
    </>
  );
}
