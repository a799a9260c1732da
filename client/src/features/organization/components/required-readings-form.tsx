import { useState, type FormEvent } from 'react';
import { useTranslation } from 'react-i18next';
import { READING_RULES, type OrganizationSummary, type ReadingRule } from '@yardcall/shared';
import { ErrorAlert, Notice } from '@/components/ui/alert';
import { Button } from '@/components/ui/button';
import { CheckboxField } from '@/components/ui/field';
import { describeError } from '@/lib/errors';
import { useUpdateRequiredReadings } from '@/lib/api/organizations';

// One checkbox per reading the organisation may require, in plain words; none is checked by default.
export function RequiredReadingsForm({ organization }: { organization: OrganizationSummary }) {
  const { t } = useTranslation();
  const update = useUpdateRequiredReadings();
  const [chosen, setChosen] = useState<ReadingRule[]>(organization.requiredReadings);

  const toggle = (rule: ReadingRule, on: boolean) => {
    update.reset();
    setChosen((current) => READING_RULES.filter((r) => (r === rule ? on : current.includes(r))));
  };

  const submit = (event: FormEvent) => {
    event.preventDefault();
    update.mutate({ requiredReadings: chosen });
  };

  const saved = update.data?.requiredReadings;
  return (
    <form onSubmit={submit} noValidate className="flex max-w-2xl flex-col gap-tap-gap" data-testid="readings-form">
      <fieldset className="flex flex-col gap-3">
        <legend className="mb-2 font-bold">{t('readings.legend')}</legend>
        {READING_RULES.map((rule) => (
          <div key={rule} className="flex flex-col gap-1">
            <CheckboxField
              label={t(`readings.rules.${rule}.label`)}
              checked={chosen.includes(rule)}
              onChange={(event) => toggle(rule, event.target.checked)}
              aria-describedby={`reading-${rule}-hint`}
              data-testid={`reading-${rule}`}
            />
            <p id={`reading-${rule}-hint`} className="ml-10 text-muted">
              {t(`readings.rules.${rule}.hint`)}
            </p>
          </div>
        ))}
      </fieldset>
      {update.isError ? <ErrorAlert>{describeError(update.error)}</ErrorAlert> : null}
      {saved ? (
        <Notice>
          <span data-testid="readings-saved">
            {saved.length === 0 ? t('readings.savedNone') : t('readings.saved', { count: saved.length })}
          </span>
        </Notice>
      ) : null}
      <div>
        <Button type="submit" busy={update.isPending}>
          {t('readings.save')}
        </Button>
      </div>
    </form>
  );
}
