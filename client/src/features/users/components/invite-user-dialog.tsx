import { useState, type FormEvent } from 'react';
import { Dialog, DialogBackdrop, DialogPanel, DialogTitle } from '@headlessui/react';
import { useTranslation } from 'react-i18next';
import type { Role } from '@yardcall/shared';
import { ErrorAlert } from '@/components/ui/alert';
import { Button } from '@/components/ui/button';
import { CheckboxField, EmailField, TextField } from '@/components/ui/field';
import { Stack } from '@/components/ui/layout';
import { describeError, fieldErrors } from '@/lib/errors';
import { useInviteUser } from '@/lib/api/users';
import { RoleField } from './role-field';

const EMAIL_PATTERN = /^[^\s@]+@[^\s@]+\.[^\s@]+$/;

export function InviteUserDialog({
  open,
  onClose,
  onInvited,
}: {
  open: boolean;
  onClose: () => void;
  onInvited: (email: string) => void;
}) {
  const { t } = useTranslation();
  const invite = useInviteUser();
  const [email, setEmail] = useState('');
  const [name, setName] = useState('');
  const [role, setRole] = useState<Role>('driver');
  const [isStudent, setIsStudent] = useState(false);
  const [problems, setProblems] = useState<Record<string, string>>({});
  const errors = { ...fieldErrors(invite.error), ...problems };

  function close() {
    invite.reset();
    setProblems({});
    onClose();
  }

  function submit(event: FormEvent<HTMLFormElement>) {
    event.preventDefault();
    const found: Record<string, string> = {};
    if (!EMAIL_PATTERN.test(email.trim())) found.email = t('users.invite.emailInvalid');
    if (!name.trim()) found.name = t('users.invite.nameRequired');
    setProblems(found);
    if (Object.keys(found).length > 0) return;
    const body = { email: email.trim(), name: name.trim(), role, isStudent: role === 'driver' && isStudent };
    invite.mutate(body, {
      onSuccess: () => {
        onInvited(body.email);
        setEmail('');
        setName('');
        setRole('driver');
        setIsStudent(false);
        close();
      },
    });
  }

  return (
    <Dialog open={open} onClose={close} className="relative z-50">
      <DialogBackdrop className="fixed inset-0 bg-black/60" />
      <div className="fixed inset-0 flex w-screen items-start justify-center overflow-y-auto p-2 sm:p-6">
        <DialogPanel className="w-full max-w-lg rounded-xl border-2 border-line bg-page p-4 text-ink sm:p-6">
          <DialogTitle as="h2" className="mb-4 text-2xl font-bold">
            {t('users.invite.title')}
          </DialogTitle>
          <form onSubmit={submit} noValidate>
            <Stack>
              {invite.isError ? <ErrorAlert>{describeError(invite.error)}</ErrorAlert> : null}
              <EmailField
                label={t('users.fields.email')}
                autoComplete="off"
                value={email}
                error={errors.email}
                onChange={(event) => setEmail(event.target.value)}
              />
              <TextField
                label={t('users.fields.name')}
                autoComplete="off"
                value={name}
                error={errors.name}
                onChange={(event) => setName(event.target.value)}
              />
              <RoleField label={t('users.fields.role')} value={role} error={errors.role} onChange={setRole} />
              {role === 'driver' ? (
                <CheckboxField
                  label={t('users.fields.isStudent')}
                  checked={isStudent}
                  onChange={(event) => setIsStudent(event.target.checked)}
                />
              ) : null}
              <div className="flex flex-wrap gap-tap-gap">
                <Button type="submit" busy={invite.isPending}>
                  {t('users.invite.submit')}
                </Button>
                <Button variant="secondary" onClick={close}>
                  {t('common.cancel')}
                </Button>
              </div>
            </Stack>
          </form>
        </DialogPanel>
      </div>
    </Dialog>
  );
}
