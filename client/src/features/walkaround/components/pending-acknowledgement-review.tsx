import { useState, type FormEvent } from 'react';
import { useTranslation } from 'react-i18next';
import type { PendingAcknowledgement } from '@yardcall/shared';
import { ErrorAlert } from '@/components/ui/alert';
import { Button } from '@/components/ui/button';
import { TextField } from '@/components/ui/field';
import { Card } from '@/components/ui/layout';
import { describeError } from '@/lib/errors';
import { useAcknowledgeInspection } from '../api/acknowledge-inspection';
import { SignaturePad } from './signature-pad';

// Before the pre-trip, the driver reviews what the mechanic certified on the last report and signs
// that review (49 CFR 396.13).
export function PendingAcknowledgementReview({
  pending,
  onSigned,
}: {
  pending: PendingAcknowledgement;
  onSigned: () => void;
}) {
  const { t } = useTranslation();
  const [name, setName] = useState('');
  const [drawing, setDrawing] = useState<string | null>(null);
  const [nameError, setNameError] = useState<string | undefined>();
  const acknowledge = useAcknowledgeInspection();

  const submit = (event: FormEvent) => {
    event.preventDefault();
    if (name.trim() === '') {
      setNameError(t('walkaround.finish.nameNeeded'));
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
        {t('walkaround.ack.title', { unit: pending.vehicle.unitNumber })}
      </h2>
      <p className="mb-4">
        {t('walkaround.ack.lead', {
          driver: pending.driver.name,
          date: new Date(pending.submittedAt).toLocaleDateString(),
        })}
      </p>
      <ul className="mb-4 flex flex-col gap-tap-gap">
        {pending.defects.map((defect) => (
          <li key={defect.id}>
            <Card>
              <p className="text-xl font-bold">
                {defect.title} — {defect.positionLabel}
              </p>
              {defect.detail ? <p>{defect.detail}</p> : null}
              <p className="mt-2">
                {defect.repair
                  ? t(`walkaround.ack.action.${defect.repair.action}`, {
                      mechanic: defect.repair.mechanic.name,
                      note: defect.repair.note,
                    })
                  : t('walkaround.ack.notCertified')}
              </p>
            </Card>
          </li>
        ))}
      </ul>
      <form onSubmit={submit} className="flex flex-col gap-tap-gap" noValidate>
        <p>{t('walkaround.ack.statement', { unit: pending.vehicle.unitNumber })}</p>
        <TextField
          label={t('walkaround.finish.name')}
          value={name}
          onChange={(event) => setName(event.target.value)}
          error={nameError}
          autoComplete="name"
        />
        <SignaturePad label={t('walkaround.finish.signature')} onChange={setDrawing} />
        {acknowledge.isError ? <ErrorAlert>{describeError(acknowledge.error)}</ErrorAlert> : null}
        <Button type="submit" size="large" busy={acknowledge.isPending}>
          {t('walkaround.ack.sign')}
        </Button>
      </form>
    </section>
  );
}
