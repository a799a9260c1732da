import { useTranslation } from 'react-i18next';
import {
  AXLE_POSITIONS,
  BRAKE_TYPES,
  CHAMBER_SIZES,
  CHAMBER_STROKES,
  TIRE_ARRANGEMENTS,
  isAirBraked,
  type ChamberSize,
} from '@yardcall/shared';
import { Button } from '@/components/ui/button';
import { CheckboxField, SelectField, TextField } from '@/components/ui/field';
import { fieldId, type AxleDraft } from './vehicle-draft';

interface AxleEditorProps {
  index: number;
  axle: AxleDraft;
  errors: Record<string, string>;
  canRemove: boolean;
  onChange: (axle: AxleDraft) => void;
  onRemove: () => void;
}

export function AxleEditor({ index, axle, errors, canRemove, onChange, onRemove }: AxleEditorProps) {
  const { t } = useTranslation();
  const at = `config.axles.${index}`;
  const set = (patch: Partial<AxleDraft>) => onChange({ ...axle, ...patch });
  const air = isAirBraked(axle.brake);
  const canHaveRatedStroke = axle.chamberStroke === 'long' && (axle.chamberSize === 20 || axle.chamberSize === 24);
  const title = t('vehicles.axle.title', { number: index + 1 });

  return (
    <fieldset className="min-w-0 rounded-xl border-2 border-line bg-surface p-4" data-testid={`axle-${index}`}>
      <legend className="px-1 text-xl font-bold">{title}</legend>
      <div className="grid grid-cols-1 gap-tap-gap sm:grid-cols-2">
        <SelectField
          id={fieldId(`${at}.position`)}
          label={t('vehicles.axle.position')}
          value={axle.position}
          error={errors[`${at}.position`]}
          onChange={(event) => {
            const position = AXLE_POSITIONS.find((value) => value === event.target.value) ?? axle.position;
            set({ position });
          }}
        >
          {AXLE_POSITIONS.map((position) => (
            <option key={position} value={position}>
              {t(`vehicles.axlePositions.${position}`)}
            </option>
          ))}
        </SelectField>
        <SelectField
          id={fieldId(`${at}.tires`)}
          label={t('vehicles.axle.tires')}
          value={axle.tires}
          error={errors[`${at}.tires`]}
          onChange={(event) =>
            set({ tires: TIRE_ARRANGEMENTS.find((value) => value === event.target.value) ?? axle.tires })
          }
        >
          {TIRE_ARRANGEMENTS.map((tires) => (
            <option key={tires} value={tires}>
              {t(`vehicles.tireArrangements.${tires}`)}
            </option>
          ))}
        </SelectField>
        <SelectField
          id={fieldId(`${at}.brake`)}
          label={t('vehicles.axle.brake')}
          value={axle.brake}
          error={errors[`${at}.brake`]}
          onChange={(event) => set({ brake: BRAKE_TYPES.find((value) => value === event.target.value) ?? axle.brake })}
        >
          {BRAKE_TYPES.map((brake) => (
            <option key={brake} value={brake}>
              {t(`vehicles.brakeTypes.${brake}`)}
            </option>
          ))}
        </SelectField>
        {air ? (
          <>
            <SelectField
              id={fieldId(`${at}.chamber.size`)}
              label={t('vehicles.axle.chamberSize')}
              value={axle.chamberSize === null ? '' : String(axle.chamberSize)}
              error={errors[`${at}.chamber.size`]}
              onChange={(event) => {
                const size: ChamberSize | null =
                  CHAMBER_SIZES.find((value) => String(value) === event.target.value) ?? null;
                set({ chamberSize: size });
              }}
            >
              <option value="">{t('vehicles.axle.choose')}</option>
              {CHAMBER_SIZES.map((size) => (
                <option key={size} value={size}>
                  {t('vehicles.axle.chamberType', { size })}
                </option>
              ))}
            </SelectField>
            <SelectField
              id={fieldId(`${at}.chamber.stroke`)}
              label={t('vehicles.axle.chamberStroke')}
              value={axle.chamberStroke}
              error={errors[`${at}.chamber.stroke`]}
              onChange={(event) =>
                set({
                  chamberStroke: CHAMBER_STROKES.find((value) => value === event.target.value) ?? axle.chamberStroke,
                })
              }
            >
              {CHAMBER_STROKES.map((stroke) => (
                <option key={stroke} value={stroke}>
                  {t(`vehicles.chamberStrokes.${stroke}`)}
                </option>
              ))}
            </SelectField>
            {canHaveRatedStroke ? (
              <div className="sm:col-span-2">
                <CheckboxField
                  id={fieldId(`${at}.chamber.ratedStroke3In`)}
                  label={t('vehicles.axle.ratedStroke3In')}
                  checked={axle.ratedStroke3In}
                  error={errors[`${at}.chamber.ratedStroke3In`]}
                  onChange={(event) => set({ ratedStroke3In: event.target.checked })}
                />
              </div>
            ) : null}
          </>
        ) : null}
        <TextField
          id={fieldId(`${at}.tire.size`)}
          label={t('vehicles.axle.tireSize')}
          hint={t('vehicles.axle.tireSizeHint')}
          value={axle.tireSize}
          error={errors[`${at}.tire.size`]}
          autoComplete="off"
          onChange={(event) => set({ tireSize: event.target.value })}
        />
        <TextField
          id={fieldId(`${at}.tire.coldInflationPsi`)}
          label={t('vehicles.axle.coldInflation')}
          hint={t('vehicles.axle.coldInflationHint')}
          inputMode="decimal"
          value={axle.coldInflationPsi}
          error={errors[`${at}.tire.coldInflationPsi`]}
          onChange={(event) => set({ coldInflationPsi: event.target.value })}
        />
        <TextField
          id={fieldId(`${at}.tire.sidewallMaxPsi`)}
          label={t('vehicles.axle.sidewallMax')}
          inputMode="decimal"
          value={axle.sidewallMaxPsi}
          error={errors[`${at}.tire.sidewallMaxPsi`]}
          onChange={(event) => set({ sidewallMaxPsi: event.target.value })}
        />
      </div>
      {canRemove ? (
        <div className="mt-4">
          <Button variant="danger" onClick={onRemove}>
            {t('vehicles.axle.remove', { title })}
          </Button>
        </div>
      ) : null}
    </fieldset>
  );
}
