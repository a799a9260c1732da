import { useId, useState, type FormEvent } from 'react';
import { useTranslation } from 'react-i18next';
import { CERTIFICATION_ACTIONS, type CertificationAction, type DefectResponse } from '@yardcall/shared';
import { ErrorAlert, Notice } from '@/components/ui/alert';
import { Button } from '@/components/ui/button';
import { FieldError, TextField } from '@/components/ui/field';
import { RadioGroup } from '@/components/ui/radio-group';
import { SignaturePad } from '@/components/ui/signature-pad';
import { describeError, fieldErrors } from '@/lib/errors';
import { useRepairDefect } from '@/lib/api/defects';
import {
  EMPTY_REPAIR_DRAFT,
  checkRepairDraft,
  localDateString,
  toRepairRequest,
  type RepairDraft,
  type RepairProblems,
} from './repair-draft';

const NOTE_LABEL: Record<CertificationAction, 'noteRepaired' | 'noteNoRepair' | 'noteDeferred'> = {
  repaired: 'noteRepaired',
  no_repair_needed: 'noteNoRepair',
  deferred: 'noteDeferred',
};

// The mechanic's certification of one defect: what was done, a note, and a typed and drawn signature.
export function RepairForm({
  defect,
  onCertified,
  onCancel,
}: {
  defect: DefectResponse;
  onCertified: (certified: DefectResponse) => void;
  onCancel: () => void;
}) {
  const { t } = useTranslation();
  const id = useId();
  const repair = useRepairDefect({ onCertified });
  const [draft, setDraft] = useState<RepairDraft>(EMPTY_REPAIR_DRAFT);
  const [problems, setProblems] = useState<RepairProblems>({});
  const [tomorrow] = useState(() => localDateString(new Date(Date.now() + 24 * 3_600_000)));
  // A safety defect cannot wait: deferral is not offered at all (49 CFR 396.11(a)(3)).
  const actions = CERTIFICATION_ACTIONS.filter((action) => !(defect.safety && action === 'deferred'));
  const server = fieldErrors(repair.error);
  const say = (problem: RepairProblems[keyof RepairProblems]) => (problem ? t(`mechanic.form.${problem}`) : undefined);
  const update = (patch: Partial<RepairDraft>) => setDraft((current) => ({ ...current, ...patch }));

  const submit = (event: FormEvent) => {
    event.preventDefault();
    const found = checkRepairDraft(draft, { safety: defect.safety, today: new Date() });
    setProblems(found);
    if (Object.keys(found).length > 0 || draft.action === null) return;
    repair.mutate({ defectId: defect.id, body: toRepairRequest({ ...draft, action: draft.action }) });
  };

  const actionError = say(problems.action) ?? server.action;

  return (
    <form onSubmit={submit} noValidate className="mt-4 flex flex-col gap-tap-gap" data-testid="repair-form">
      <RadioGroup
        legend={t('mechanic.form.action')}
        name={`${id}-action`}
        choices={actions}
        labelOf={(action) => t(`mechanic.actions.${action}`)}
        value={draft.action}
        onChange={(action) => update({ action })}
        error={actionError}
      />
      {defect.safety ? <Notice>{t('mechanic.form.noDeferral')}</Notice> : null}

      <div className="flex flex-col gap-1">
        <label htmlFor={`${id}-note`} className="font-bold">
          {t(`mechanic.form.${draft.action ? NOTE_LABEL[draft.action] : 'noteRepaired'}`)}
        </label>
        <textarea
          id={`${id}-note`}
          rows={3}
          value={draft.note}
          onChange={(event) => update({ note: event.target.value })}
          aria-invalid={problems.note || server.note ? true : undefined}
          aria-describedby={problems.note || server.note ? `${id}-note-error` : undefined}
          className="block w-full rounded-lg border-2 border-line bg-surface px-3 py-2 text-base text-ink aria-[invalid=true]:border-4 aria-[invalid=true]:border-danger"
        />
        <FieldError id={`${id}-note-error`} message={say(problems.note) ?? server.note} />
      </div>

      {draft.action === 'deferred' ? (
        <TextField
          type="date"
          label={t('mechanic.form.deferredUntil')}
          hint={t('mechanic.form.deferredUntilHint')}
          min={tomorrow}
          value={draft.deferredUntil}
          onChange={(event) => update({ deferredUntil: event.target.value })}
          error={say(problems.deferredUntil) ?? server.deferredUntil}
        />
      ) : null}

      <p>{t('mechanic.form.statement', { unit: defect.vehicle.unitNumber, defect: defect.title })}</p>
      <TextField
        label={t('mechanic.form.name')}
        value={draft.name}
        onChange={(event) => update({ name: event.target.value })}
        error={say(problems.name) ?? server['signature.name']}
        autoComplete="name"
      />
      <SignaturePad
        label={t('mechanic.form.signature')}
        clearLabel={t('mechanic.form.clearSignature')}
        onChange={(drawing) => {
          update({ drawing });
          // A signature drawn after the reminder clears it at once.
          if (drawing) setProblems(({ drawing: _signed, ...rest }) => rest);
        }}
        error={say(problems.drawing)}
      />
      {repair.isError ? <ErrorAlert>{describeError(repair.error)}</ErrorAlert> : null}
      <div className="flex flex-wrap gap-tap-gap">
        <Button type="submit" busy={repair.isPending} data-testid="certify-defect">
          {t('mechanic.form.submit')}
        </Button>
        <Button variant="secondary" onClick={onCancel}>
          {t('common.cancel')}
        </Button>
      </div>
    </form>
  );
}
