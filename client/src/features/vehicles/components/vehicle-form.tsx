import { useState, type FormEvent } from 'react';
import { useTranslation } from 'react-i18next';
import {
  STEERING_TYPES,
  VEHICLE_KINDS,
  VEHICLE_STATUSES,
  isPowerUnit,
  validateVehicle,
  type VehicleRequest,
} from '@yardcall/shared';
import { ErrorAlert, Notice } from '@/components/ui/alert';
import { Button } from '@/components/ui/button';
import { FieldError, SelectField, TextField } from '@/components/ui/field';
import { Section, Stack } from '@/components/ui/layout';
import { describeError, fieldErrors } from '@/lib/errors';
import { AxleEditor } from './axle-editor';
import {
  changeKind,
  draftToRequest,
  fieldId,
  MAX_AXLES,
  newAxleDraft,
  problemsByField,
  type VehicleDraft,
} from './vehicle-draft';

interface VehicleFormProps {
  initial: VehicleDraft;
  submitLabel: string;
  busy: boolean;
  // The server's answer when saving failed (its field problems are shown like ours).
  serverError: unknown;
  onSubmit: (request: VehicleRequest) => void;
}

export function VehicleForm({ initial, submitLabel, busy, serverError, onSubmit }: VehicleFormProps) {
  const { t } = useTranslation();
  const [draft, setDraft] = useState<VehicleDraft>(initial);
  const [problems, setProblems] = useState<Record<string, string>>({});
  const errors = { ...fieldErrors(serverError), ...problems };
  const power = isPowerUnit(draft.kind);
  const set = (patch: Partial<VehicleDraft>) => setDraft((current) => ({ ...current, ...patch }));

  function submit(event: FormEvent<HTMLFormElement>) {
    event.preventDefault();
    const request = draftToRequest(draft);
    // The same rules the server applies, from the shared package.
    const found = problemsByField(validateVehicle(request));
    setProblems(found);
    const first = Object.keys(found)[0];
    if (first) {
      document.getElementById(fieldId(first))?.focus();
      return;
    }
    onSubmit(request);
  }

  const problemCount = Object.keys(problems).length;
  return (
    <form onSubmit={submit} noValidate aria-label={submitLabel}>
      <Stack>
        {problemCount > 0 ? <ErrorAlert>{t('vehicles.form.problems', { count: problemCount })}</ErrorAlert> : null}
        {serverError ? <ErrorAlert>{describeError(serverError)}</ErrorAlert> : null}
        <Notice>{t('vehicles.form.caution')}</Notice>

        <Section title={t('vehicles.form.identity')} id="vehicle-identity">
          <div className="grid grid-cols-1 gap-tap-gap sm:grid-cols-2">
            <TextField
              id={fieldId('unitNumber')}
              label={t('vehicles.fields.unitNumber')}
              value={draft.unitNumber}
              error={errors.unitNumber}
              autoComplete="off"
              onChange={(event) => set({ unitNumber: event.target.value })}
            />
            <SelectField
              id={fieldId('kind')}
              label={t('vehicles.fields.kind')}
              value={draft.kind}
              error={errors.kind}
              onChange={(event) => {
                const kind = VEHICLE_KINDS.find((value) => value === event.target.value);
                if (kind) setDraft((current) => changeKind(current, kind));
              }}
            >
              {VEHICLE_KINDS.map((kind) => (
                <option key={kind} value={kind}>
                  {t(`vehicles.kinds.${kind}`)}
                </option>
              ))}
            </SelectField>
            <TextField
              id={fieldId('vin')}
              label={t('vehicles.fields.vin')}
              value={draft.vin}
              error={errors.vin}
              autoComplete="off"
              autoCapitalize="characters"
              onChange={(event) => set({ vin: event.target.value })}
            />
            <TextField
              id={fieldId('plate')}
              label={t('vehicles.fields.plate')}
              value={draft.plate}
              error={errors.plate}
              autoComplete="off"
              onChange={(event) => set({ plate: event.target.value })}
            />
            <SelectField
              id={fieldId('status')}
              label={t('vehicles.fields.status')}
              value={draft.status}
              error={errors.status}
              onChange={(event) =>
                set({ status: VEHICLE_STATUSES.find((value) => value === event.target.value) ?? draft.status })
              }
            >
              {VEHICLE_STATUSES.map((status) => (
                <option key={status} value={status}>
                  {t(`vehicles.statuses.${status}`)}
                </option>
              ))}
            </SelectField>
          </div>
        </Section>

        {power ? (
          <Section title={t('vehicles.form.steering')} id="vehicle-steering">
            <div className="grid grid-cols-1 gap-tap-gap sm:grid-cols-2">
              <TextField
                id={fieldId('config.steering.wheelDiameterIn')}
                label={t('vehicles.fields.wheelDiameter')}
                inputMode="decimal"
                value={draft.steeringWheelDiameterIn}
                error={errors['config.steering.wheelDiameterIn'] ?? errors['config.steering']}
                onChange={(event) => set({ steeringWheelDiameterIn: event.target.value })}
              />
              <SelectField
                id={fieldId('config.steering.type')}
                label={t('vehicles.fields.steeringType')}
                value={draft.steeringType}
                error={errors['config.steering.type']}
                onChange={(event) =>
                  set({
                    steeringType: STEERING_TYPES.find((value) => value === event.target.value) ?? draft.steeringType,
                  })
                }
              >
                {STEERING_TYPES.map((type) => (
                  <option key={type} value={type}>
                    {t(`vehicles.steeringTypes.${type}`)}
                  </option>
                ))}
              </SelectField>
            </div>
          </Section>
        ) : null}

        <Section title={t('vehicles.form.axles')} id="vehicle-axles">
          <p className="mb-3 text-muted">{t('vehicles.form.axlesLead')}</p>
          <FieldError id={fieldId('config.axles')} message={errors['config.axles']} />
          <Stack>
            {draft.axles.map((axle, index) => (
              <AxleEditor
                // Axles have no identity of their own but their place, front to back.
                key={index}
                index={index}
                axle={axle}
                errors={errors}
                canRemove={draft.axles.length > 1}
                onChange={(next) => set({ axles: draft.axles.map((current, at) => (at === index ? next : current)) })}
                onRemove={() => set({ axles: draft.axles.filter((_, at) => at !== index) })}
              />
            ))}
          </Stack>
          {draft.axles.length < MAX_AXLES ? (
            <div className="mt-4">
              <Button
                variant="secondary"
                onClick={() =>
                  set({ axles: [...draft.axles, newAxleDraft(draft.kind === 'trailer' ? 'trailer' : 'drive')] })
                }
              >
                {t('vehicles.form.addAxle')}
              </Button>
            </div>
          ) : null}
        </Section>

        <div>
          <Button type="submit" busy={busy}>
            {submitLabel}
          </Button>
        </div>
      </Stack>
    </form>
  );
}
