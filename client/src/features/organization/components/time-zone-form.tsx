import { useState, type FormEvent } from 'react';
import { useTranslation } from 'react-i18next';
import { canonicalTimeZone, formatZonedTime, type OrganizationTimeZone } from '@yardcall/shared';
import { ErrorAlert, Notice } from '@/components/ui/alert';
import { Button } from '@/components/ui/button';
import { TextField } from '@/components/ui/field';
import { describeError, fieldErrors } from '@/lib/errors';
import { useUpdateTimeZone } from '@/lib/api/organizations';

// The zone this device runs in, offered as a starting point.
function deviceTimeZone(): string {
  return Intl.DateTimeFormat().resolvedOptions().timeZone;
}

export function TimeZoneForm({ current }: { current: OrganizationTimeZone }) {
  const { t } = useTranslation();
  const update = useUpdateTimeZone();
  const [name, setName] = useState(current.timeZone);
  const [unknown, setUnknown] = useState(false);
  const serverError = fieldErrors(update.error).timeZone;
  const error = unknown ? t('timeZone.unknown', { name: name.trim() }) : serverError;
  const device = deviceTimeZone();

  const submit = (event: FormEvent) => {
    event.preventDefault();
    // The shared check the server makes too, said before the round trip.
    const canonical = canonicalTimeZone(name.trim());
    setUnknown(!canonical);
    if (!canonical) {
      update.reset();
      return;
    }
    setName(canonical);
    update.mutate({ timeZone: canonical });
  };

  return (
    <form onSubmit={submit} noValidate className="flex max-w-xl flex-col gap-tap-gap" data-testid="time-zone-form">
      <p data-testid="time-zone-current">
        {t('timeZone.current', {
          zone: current.timeZone,
          now: formatZonedTime(new Date(), current.timeZone),
        })}
      </p>
      <TextField
        label={t('timeZone.field')}
        hint={t('timeZone.hint')}
        autoComplete="off"
        spellCheck={false}
        value={name}
        onChange={(event) => setName(event.target.value)}
        error={error}
      />
      {device && device !== name ? (
        <div>
          <Button type="button" variant="secondary" onClick={() => setName(device)}>
            {t('timeZone.useDevice', { zone: device })}
          </Button>
        </div>
      ) : null}
      {update.isError && !serverError ? <ErrorAlert>{describeError(update.error)}</ErrorAlert> : null}
      {update.isSuccess ? (
        <Notice>
          <span data-testid="time-zone-saved">{t('timeZone.saved', { zone: update.data.timeZone })}</span>
        </Notice>
      ) : null}
      <div>
        <Button type="submit" busy={update.isPending}>
          {t('timeZone.save')}
        </Button>
      </div>
    </form>
  );
}
