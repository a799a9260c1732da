import { useState, type FormEvent } from 'react';
import { useTranslation } from 'react-i18next';
import { usePhoneDates } from '@/lib/format-date';
import type { DefectResponse, PendingAcknowledgement } from '@yardcall/shared';
import { ErrorAlert, Notice } from '@/components/ui/alert';
import { Button } from '@/components/ui/button';
import { TextField } from '@/components/ui/field';
import { Card } from '@/components/ui/layout';
import { SignaturePad } from '@/components/ui/signature-pad';
import { describeError } from '@/lib/errors';
import { useAcknowledgeInspection } from '@/lib/api/inspections';
import { SafetyCaution } from '@/components/ui/safety-caution';

// What was found and what the shop did about it, said plainly: action, note, who and when.
function CertifiedDefect({ defect, driver }: { defect: DefectResponse; driver: string }) {
  const { t } = useTranslation();
  const dates = usePhoneDates();
  const repair = defect.repair;
  return (
    <Card>
      <article data-testid="acknowledged-defect" data-status={defect.status}>
        <h4 className="text-xl font-bold">
          {defect.title} — {defect.positionLabel}
        </h4>
        {defect.detail ? <p>{t('start.ack.driverSaid', { driver, words: defect.detail })}</p> : null}
        {repair ? (
          <dl className="mt-2 grid grid-cols-1 gap-x-4 gap-y-1 sm:grid-cols-[max-content_1fr]">
            <dt className="font-bold">{t('start.ack.action')}</dt>
            <dd data-testid="ack-action">{t(`start.ack.actions.${repair.action}`)}</dd>
            <dt className="font-bold">{t('start.ack.note')}</dt>
            <dd>“{repair.note}”</dd>
            {repair.deferredUntil ? (
              <>
                <dt className="font-bold">{t('start.ack.deferredUntil')}</dt>
                <dd>{dates.calendarDate(repair.deferredUntil)}</dd>
              </>
            ) : null}
            <dt className="font-bold">{t('start.ack.signedBy')}</dt>
            <dd>
              {t('start.ack.whoWhen', {
                mechanic: repair.mechanic.name,
                date: dates.dateTime(repair.signedAt),
              })}
            </dd>
          </dl>
        ) : (
          <p className="mt-2 font-bold">{t('walkaround.ack.notCertified')}</p>
        )}
      </article>
    </Card>
  );
}

// Before the pre-trip, the driver reviews what the mechanic certified on the last report and signs
// that review (49 CFR 396.13); the walk-around does not start until it is signed.
export function PendingAcknowledgementReview({
  pending,
  onSigned,
  onCancel,
}: {
  pending: PendingAcknowledgement;
  onSigned: () => void;
  onCancel?: () => void;
}) {
  const { t } = useTranslation();
  const dates = usePhoneDates();
  const [name, setName] = useState('');
  const [drawing, setDrawing] = useState<string | null>(null);
  const [nameError, setNameError] = useState<string | undefined>();
  const acknowledge = useAcknowledgeInspection();
  const unit = pending.vehicle.unitNumber;

  const submit = (event: FormEvent) => {
    event.preventDefault();
    if (name.trim() === '') {
      setNameError(t('walkaround.sign.nameNeeded'));
      return;
    }
    setNameError(undefined);
    acknowledge.mutate(
      {
        inspectionId: pending.inspectionId,
        body: { signature: { name: name.trim(), ...(drawing ? { drawing } : {}) } },
      },
      { onSuccess: onSigned },
    );
  };

  return (
    <section aria-labelledby="pending-ack-heading" className="mb-8" data-testid="pending-acknowledgement">
      <h2 id="pending-ack-heading" className="mb-2 text-2xl font-bold">
        {t('walkaround.ack.title', { unit })}
      </h2>
      <div className="mb-4">
        <Notice>
          <span data-testid="ack-blocked">{t('start.ack.blocked', { unit })}</span>
        </Notice>
      </div>
      <p className="mb-4">
        {t('walkaround.ack.lead', {
          driver: pending.driver.name,
          date: dates.date(pending.submittedAt),
        })}
      </p>
      <h3 className="mb-2 text-xl font-bold">{t('start.ack.repairsTitle', { count: pending.defects.length })}</h3>
      <ul className="mb-4 flex flex-col gap-tap-gap" data-testid="ack-repairs">
        {pending.defects.map((defect) => (
          <li key={defect.id}>
            <CertifiedDefect defect={defect} driver={pending.driver.name} />
          </li>
        ))}
      </ul>
      {pending.defects.some((defect) => defect.safety) ? (
        <div className="mb-4">
          <SafetyCaution />
        </div>
      ) : null}
      <form onSubmit={submit} className="flex flex-col gap-tap-gap" noValidate>
        <p className="font-bold">{t('walkaround.ack.statement', { unit })}</p>
        <TextField
          label={t('walkaround.sign.name')}
          value={name}
          onChange={(event) => setName(event.target.value)}
          error={nameError}
          autoComplete="name"
        />
        <SignaturePad
          label={t('walkaround.sign.signature')}
          clearLabel={t('walkaround.sign.clearSignature')}
          onChange={setDrawing}
        />
        {acknowledge.isError ? <ErrorAlert>{describeError(acknowledge.error)}</ErrorAlert> : null}
        <Button type="submit" size="large" busy={acknowledge.isPending} data-testid="sign-acknowledgement">
          {t('walkaround.ack.sign')}
        </Button>
        {onCancel ? (
          <Button variant="quiet" onClick={onCancel}>
            {t('walkaround.start.otherUnit')}
          </Button>
        ) : null}
      </form>
    </section>
  );
}
