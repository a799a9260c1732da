import { useState, type FormEvent } from 'react';
import { useTranslation } from 'react-i18next';
import { PASSWORD_MIN_LENGTH } from '@yardcall/shared';
import { Button } from '@/components/ui/button';
import { ErrorAlert, Loading } from '@/components/ui/alert';
import { PasswordField } from '@/components/ui/field';
import { Card, Stack } from '@/components/ui/layout';
import { describeError, fieldErrors } from '@/lib/errors';
import { useAcceptInvitation, useInvitation } from '@/lib/api/invitations';

export function AcceptInvitationForm({ token, onAccepted }: { token: string; onAccepted: () => void }) {
  const { t } = useTranslation();
  const invitation = useInvitation(token);
  const accept = useAcceptInvitation(token);
  const [password, setPassword] = useState('');
  const [confirm, setConfirm] = useState('');
  const [problems, setProblems] = useState<{ password?: string; confirm?: string }>({});

  if (invitation.isPending) return <Loading label={t('common.loading')} />;
  if (invitation.isError) return <ErrorAlert>{describeError(invitation.error)}</ErrorAlert>;

  function submit(event: FormEvent<HTMLFormElement>) {
    event.preventDefault();
    const found: { password?: string; confirm?: string } = {};
    if (password.length < PASSWORD_MIN_LENGTH)
      found.password = t('invite.passwordTooShort', { count: PASSWORD_MIN_LENGTH });
    if (confirm !== password) found.confirm = t('invite.passwordMismatch');
    setProblems(found);
    if (found.password || found.confirm) return;
    accept.mutate({ password }, { onSuccess: onAccepted });
  }

  const serverFields = fieldErrors(accept.error);
  const { name, email, organizationName } = invitation.data;
  return (
    <Stack className="max-w-xl">
      <Card>
        <p className="text-lg">{t('invite.welcome', { name, organization: organizationName })}</p>
        <p className="text-muted">{t('invite.account', { email })}</p>
      </Card>
      <form onSubmit={submit} noValidate aria-label={t('invite.title')}>
        <Stack>
          {accept.isError ? <ErrorAlert>{describeError(accept.error)}</ErrorAlert> : null}
          <PasswordField
            isNew
            label={t('invite.password')}
            hint={t('invite.passwordHint', { count: PASSWORD_MIN_LENGTH })}
            value={password}
            error={problems.password ?? serverFields.password}
            onChange={(event) => setPassword(event.target.value)}
          />
          <PasswordField
            isNew
            label={t('invite.confirm')}
            value={confirm}
            error={problems.confirm}
            onChange={(event) => setConfirm(event.target.value)}
          />
          <Button type="submit" busy={accept.isPending}>
            {t('invite.submit')}
          </Button>
        </Stack>
      </form>
    </Stack>
  );
}
