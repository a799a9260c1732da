import { useState, type FormEvent } from 'react';
import { useTranslation } from 'react-i18next';
import { Button } from '@/components/ui/button';
import { ErrorAlert } from '@/components/ui/alert';
import { EmailField, PasswordField } from '@/components/ui/field';
import { Stack } from '@/components/ui/layout';
import { describeError } from '@/lib/errors';
import { useLogin } from '@/lib/api/auth';
import { DemoSignIns, isDemoBuild } from './demo-sign-ins';

export function SignInForm({ onSignedIn }: { onSignedIn: () => void }) {
  const { t } = useTranslation();
  const signIn = useLogin();
  const [email, setEmail] = useState('');
  const [password, setPassword] = useState('');

  function submit(event: FormEvent<HTMLFormElement>) {
    event.preventDefault();
    signIn.mutate({ email: email.trim(), password }, { onSuccess: onSignedIn });
  }

  return (
    <Stack className="max-w-xl">
      <form onSubmit={submit} noValidate aria-label={t('signIn.title')}>
        <Stack>
          {signIn.isError ? <ErrorAlert>{describeError(signIn.error)}</ErrorAlert> : null}
          <EmailField
            label={t('signIn.email')}
            name="email"
            autoComplete="username"
            required
            value={email}
            onChange={(event) => setEmail(event.target.value)}
          />
          <PasswordField
            label={t('signIn.password')}
            name="password"
            required
            value={password}
            onChange={(event) => setPassword(event.target.value)}
          />
          <Button type="submit" busy={signIn.isPending}>
            {signIn.isPending ? t('signIn.submitting') : t('signIn.submit')}
          </Button>
        </Stack>
      </form>
      {isDemoBuild() ? (
        <DemoSignIns
          onPick={(demoAddress, demoPassword) => {
            setEmail(demoAddress);
            setPassword(demoPassword);
          }}
        />
      ) : null}
    </Stack>
  );
}
