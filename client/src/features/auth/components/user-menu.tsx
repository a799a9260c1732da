import { useQueryClient } from '@tanstack/react-query';
import { useTranslation } from 'react-i18next';
import { useNavigate } from 'react-router';
import type { UserSummary } from '@yardcall/shared';
import { Button } from '@/components/ui/button';
import { endSession } from '@/lib/api/auth';
import { SIGN_IN_PATH } from '@/lib/sign-in';
import { tokenStore } from '@/lib/api-client';

// Who is signed in, and the way out.
export function UserMenu({ user }: { user: UserSummary }) {
  const { t } = useTranslation();
  const queryClient = useQueryClient();
  const navigate = useNavigate();
  return (
    <div className="flex flex-wrap items-center gap-tap-gap">
      <p className="min-w-0" data-testid="current-user">
        <span className="font-bold">{user.name}</span>{' '}
        <span className="text-muted">
          ({t(`roles.${user.role}`)}, {user.organizationName})
        </span>
      </p>
      <Button
        variant="secondary"
        onClick={() => {
          // Leave the signed-in screens first, then drop their data, so nothing refetches without a token.
          tokenStore.clear();
          void Promise.resolve(navigate(SIGN_IN_PATH, { replace: true })).then(() => endSession(queryClient));
        }}
      >
        {t('nav.signOut')}
      </Button>
    </div>
  );
}
