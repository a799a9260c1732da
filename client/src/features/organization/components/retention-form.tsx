import { useState, type FormEvent } from 'react';
import { useTranslation } from 'react-i18next';
import { useOfficeDates } from '@/lib/office-dates';
import { RETENTION_MAX_MONTHS, RETENTION_MIN_MONTHS, type RetentionSettings } from '@yardcall/shared';
import { ErrorAlert, Notice } from '@/components/ui/alert';
import { Button } from '@/components/ui/button';
import { TextField } from '@/components/ui/field';
import { describeError, fieldErrors } from '@/lib/errors';
import { useUpdateRetention } from '@/lib/api/organizations';

export type MonthsProblem = 'monthsWhole' | 'monthsTooFew' | 'monthsTooMany';

// The bounds are the shared rule's (49 CFR 396.11(a)(4): three months at least), said before the
// round trip; the server checks them again.
export function retentionMonthsProblem(text: string): MonthsProblem | null {
  const trimmed = text.trim();
  if (!/^\d+$/.test(trimmed)) return 'monthsWhole';
  const months = Number(trimmed);
  if (months < RETENTION_MIN_MONTHS) return 'monthsTooFew';
  return months > RETENTION_MAX_MONTHS ? 'monthsTooMany' : null;
}

export function RetentionForm({ settings }: { settings: RetentionSettings }) {
  const { t } = useTranslation();
  const dates = useOfficeDates();
  const update = useUpdateRetention();
  const [months, setMonths] = useState(String(settings.months));
  const [problem, setProblem] = useState<MonthsProblem | null>(null);
  const serverError = fieldErrors(update.error).months;
  const error = problem
    ? t(`retention.${problem}`, { minimum: RETENTION_MIN_MONTHS, maximum: RETENTION_MAX_MONTHS })
    : serverError;

  const submit = (event: FormEvent) => {
    event.preventDefault();
    const found = retentionMonthsProblem(months);
    setProblem(found);
    if (found) {
      update.reset();
      return;
    }
    update.mutate({ months: Number(months.trim()) });
  };

  return (
    <form onSubmit={submit} noValidate className="flex max-w-xl flex-col gap-tap-gap" data-testid="retention-form">
      <p data-testid="retention-current">
        {t('retention.current', {
          months: settings.months,
          cutoff: dates.date(settings.cutoff),
        })}
      </p>
      <TextField
        label={t('retention.months')}
        hint={t('retention.minimum', { minimum: settings.minimumMonths })}
        inputMode="numeric"
        value={months}
        onChange={(event) => setMonths(event.target.value)}
        error={error}
      />
      {update.isError && !serverError ? <ErrorAlert>{describeError(update.error)}</ErrorAlert> : null}
      {update.isSuccess ? (
        <Notice>
          <span data-testid="retention-saved">{t('retention.saved', { months: update.data.months })}</span>
        </Notice>
      ) : null}
      <div>
        <Button type="submit" busy={update.isPending}>
          {t('retention.save')}
        </Button>
      </div>
    </form>
  );
}
