import { useEffect, useState, type FormEvent } from 'react';
import { useQueryClient } from '@tanstack/react-query';
import { useTranslation } from 'react-i18next';
import { usePhoneDates } from '@/lib/format-date';
import { formatMeasure, summarizeInspection, type ItemResult, type Locale } from '@yardcall/shared';
import { ErrorAlert } from '@/components/ui/alert';
import { Button } from '@/components/ui/button';
import { LinkButton } from '@/components/ui/link-button';
import { TextField } from '@/components/ui/field';
import { SignaturePad } from '@/components/ui/signature-pad';
import { Card, EmptyState, PageHeading, Section } from '@/components/ui/layout';
import { describeError } from '@/lib/errors';
import { inspectionKeys } from '@/lib/api/inspections';
import { useSyncStatus, type LocalInspection, type LocalWalkaround } from '@/lib/offline';
import { useSignWalkaround } from '../api/submit-inspection';
import { walkaroundKeys } from '../api/walkaround-keys';
import { SafetyCaution } from '@/components/ui/safety-caution';

// How many unanswered items are named one by one; the rest are counted.
const UNANSWERED_SHOWN = 10;

// Signed on this phone: the report waits in the outbox until the server has it. The driver may
// close the app; the screen turns into the report once the server acknowledges it.
function SignedWaiting({ inspection }: { inspection: LocalInspection }) {
  const { t } = useTranslation();
  const queryClient = useQueryClient();
  const status = useSyncStatus();
  useEffect(() => {
    // Each acknowledgement may be this report's: read the local copy and the server's report again.
    void queryClient.invalidateQueries({ queryKey: walkaroundKeys.local(inspection.clientId) });
    if (inspection.serverId) {
      void queryClient.invalidateQueries({ queryKey: inspectionKeys.detail(inspection.serverId) });
    }
  }, [status.lastSyncedAt, queryClient, inspection.clientId, inspection.serverId]);
  const signedAt = usePhoneDates().dateTime(inspection.signed?.signedAt ?? inspection.updatedAt);
  return (
    <div data-testid="signed-waiting" data-sent={inspection.submittedAt ? 'yes' : 'no'}>
      <PageHeading
        title={t('walkaround.finish.signedTitle')}
        lead={t('walkaround.finish.signedAt', { at: signedAt })}
      />
      <Card>
        <p className="text-xl font-bold" role="status">
          {inspection.submittedAt ? t('walkaround.finish.signedSent') : t('walkaround.finish.signedWaiting')}
        </p>
        {inspection.submittedAt ? null : <p>{t('walkaround.finish.signedMayClose')}</p>}
      </Card>
      <div className="mt-6">
        <LinkButton to="/driver" variant="secondary">
          {t('walkaround.finish.toHome')}
        </LinkButton>
      </div>
    </div>
  );
}

export function FinishReview({ walkaround, runPath }: { walkaround: LocalWalkaround; runPath: string }) {
  if (walkaround.inspection.signed) return <SignedWaiting inspection={walkaround.inspection} />;
  return <FinishForm walkaround={walkaround} runPath={runPath} />;
}

function FinishForm({ walkaround, runPath }: { walkaround: LocalWalkaround; runPath: string }) {
  const { t, i18n } = useTranslation();
  const locale: Locale = i18n.language === 'es' ? 'es' : 'en';
  const { inspection } = walkaround;
  const results: ItemResult[] = walkaround.results.map((r) => r.upsert);
  const summary = summarizeInspection(inspection.checklist, results, { startedAt: inspection.request.startedAt });
  const units = inspection.vehicles.map((v) => v.unitNumber).join(', ');
  const [odometer, setOdometer] = useState('');
  const [name, setName] = useState('');
  const [drawing, setDrawing] = useState<string | null>(null);
  const [errors, setErrors] = useState<{ name?: string; odometer?: string }>({});
  const submit = useSignWalkaround(inspection.clientId);
  const outOfLimit = summary.defects.filter((d) => d.reasons.includes('out_of_limit'));

  const onSubmit = (event: FormEvent) => {
    event.preventDefault();
    const next: typeof errors = {};
    if (name.trim() === '') next.name = t('walkaround.sign.nameNeeded');
    const miles = odometer.trim() === '' ? undefined : Number(odometer);
    if (miles !== undefined && (!Number.isInteger(miles) || miles < 0))
      next.odometer = t('walkaround.finish.odometerWrong');
    setErrors(next);
    if (next.name || next.odometer) return;
    submit.mutate({
      signature: { name: name.trim(), ...(drawing ? { drawing } : {}) },
      ...(miles !== undefined ? { odometer: miles } : {}),
    });
  };

  return (
    <div data-testid="finish-screen">
      <PageHeading title={t('walkaround.finish.title')} lead={t('walkaround.finish.lead', { units })} />

      <Section title={t('walkaround.finish.defects', { count: summary.defects.length })} id="finish-defects">
        {summary.defects.length === 0 ? (
          <EmptyState title={t('walkaround.finish.noDefects')} />
        ) : (
          <ul className="flex flex-col gap-tap-gap">
            {summary.defects.map((defect) => (
              <li key={defect.itemKey}>
                <Card>
                  <p className="text-xl font-bold">
                    {defect.title} — {defect.positionLabel}
                  </p>
                  {defect.detail ? <p>{defect.detail}</p> : null}
                  {defect.blocksDriving ? <p className="font-bold">{t('walkaround.finish.blocks')}</p> : null}
                </Card>
              </li>
            ))}
          </ul>
        )}
        {summary.defects.some((d) => d.safety) ? (
          <div className="mt-4">
            <SafetyCaution />
          </div>
        ) : null}
      </Section>

      {outOfLimit.length > 0 ? (
        <Section title={t('walkaround.finish.outOfLimit')} id="finish-out-of-limit">
          <ul className="flex flex-col gap-2">
            {outOfLimit.map((defect) => (
              <li key={defect.itemKey}>
                {defect.title}, {defect.positionLabel}:{' '}
                {defect.measurement
                  ? formatMeasure(defect.measurement.value, defect.measurement.unit, locale)
                  : t('walkaround.finish.noValue')}
              </li>
            ))}
          </ul>
        </Section>
      ) : null}

      <Section title={t('walkaround.finish.unanswered', { count: summary.unanswered.length })} id="finish-unanswered">
        {summary.unanswered.length === 0 ? (
          <p>{t('walkaround.finish.allAnswered')}</p>
        ) : (
          <>
            <ul className="mb-3 flex flex-col gap-1">
              {summary.unanswered.slice(0, UNANSWERED_SHOWN).map((item) => (
                <li key={item.itemKey}>
                  {item.title}, {item.positionLabel}
                </li>
              ))}
            </ul>
            {summary.unanswered.length > UNANSWERED_SHOWN ? (
              <p className="mb-3">
                {t('walkaround.finish.andMore', { count: summary.unanswered.length - UNANSWERED_SHOWN })}
              </p>
            ) : null}
          </>
        )}
        <LinkButton to={runPath} variant="secondary">
          {t('walkaround.finish.backToRun')}
        </LinkButton>
      </Section>

      <form onSubmit={onSubmit} className="flex flex-col gap-tap-gap" noValidate>
        <h2 className="text-2xl font-bold">{t('walkaround.finish.signTitle')}</h2>
        <TextField
          label={t('walkaround.finish.odometer')}
          hint={t('walkaround.finish.odometerHint')}
          inputMode="numeric"
          value={odometer}
          onChange={(event) => setOdometer(event.target.value)}
          error={errors.odometer}
        />
        <p className="rounded-lg border-2 border-line bg-surface p-3" data-testid="certification">
          {t(summary.defects.length === 0 ? 'walkaround.finish.statementNone' : 'walkaround.finish.statement', {
            units,
            count: summary.defects.length,
          })}
        </p>
        <TextField
          label={t('walkaround.sign.name')}
          value={name}
          onChange={(event) => setName(event.target.value)}
          error={errors.name}
          autoComplete="name"
        />
        <SignaturePad
          label={t('walkaround.sign.signature')}
          clearLabel={t('walkaround.sign.clearSignature')}
          onChange={setDrawing}
        />
        <p>{t('walkaround.finish.noSignalNeeded')}</p>
        {submit.isError ? <ErrorAlert>{describeError(submit.error)}</ErrorAlert> : null}
        <Button type="submit" size="large" busy={submit.isPending} data-testid="submit-report">
          {t('walkaround.finish.submit')}
        </Button>
      </form>
    </div>
  );
}
