import { useTranslation } from 'react-i18next';
import { INSPECTION_KINDS, type InspectionKind, type InspectionListFilters } from '@yardcall/shared';
import { Button } from '@/components/ui/button';
import { CheckboxField, SelectField, TextField } from '@/components/ui/field';
import { driversOf, useUsers } from '@/lib/api/users';
import { byUnitNumber, useVehicles } from '@/lib/api/vehicles';

// A change to some filters; undefined removes one.
export type FilterPatch = { [K in keyof InspectionListFilters]?: InspectionListFilters[K] | undefined };

export interface InspectionFiltersProps {
  filters: InspectionListFilters;
  onChange: (patch: FilterPatch) => void;
  onClear: () => void;
}

// Each change applies at once (and lands in the address); no separate "apply" step.
export function InspectionFilters({ filters, onChange, onClear }: InspectionFiltersProps) {
  const { t } = useTranslation();
  const units = useVehicles({}, byUnitNumber);
  const drivers = useUsers({}, driversOf);
  const set = <K extends keyof InspectionListFilters>(key: K, value: InspectionListFilters[K] | undefined) =>
    onChange({ [key]: value === '' || value === false ? undefined : value });
  const hasAny = Object.keys(filters).some((key) => key !== 'sort' && key !== 'order');

  return (
    <form
      role="search"
      aria-label={t('inspections.filters.label')}
      className="mb-4 grid gap-4 rounded-xl border-2 border-line bg-surface p-4 sm:grid-cols-2 lg:grid-cols-3"
      onSubmit={(event) => event.preventDefault()}
      data-testid="inspection-filters"
    >
      <SelectField
        label={t('inspections.filters.unit')}
        value={filters.vehicleId ?? ''}
        onChange={(event) => set('vehicleId', event.target.value)}
        data-testid="filter-unit"
      >
        <option value="">{t('inspections.filters.anyUnit')}</option>
        {(units.data ?? []).map((vehicle) => (
          <option key={vehicle.id} value={vehicle.id}>
            {t('inspections.filters.unitOption', {
              unit: vehicle.unitNumber,
              kind: t(`vehicles.kinds.${vehicle.kind}`),
            })}
          </option>
        ))}
      </SelectField>
      <SelectField
        label={t('inspections.filters.driver')}
        value={filters.driverId ?? ''}
        onChange={(event) => set('driverId', event.target.value)}
        data-testid="filter-driver"
      >
        <option value="">{t('inspections.filters.anyDriver')}</option>
        {(drivers.data ?? []).map((driver) => (
          <option key={driver.id} value={driver.id}>
            {driver.name}
          </option>
        ))}
      </SelectField>
      <SelectField
        label={t('inspections.filters.kind')}
        value={filters.kind ?? ''}
        onChange={(event) => set('kind', (event.target.value || undefined) as InspectionKind | undefined)}
        data-testid="filter-kind"
      >
        <option value="">{t('inspections.filters.anyKind')}</option>
        {INSPECTION_KINDS.map((kind) => (
          <option key={kind} value={kind}>
            {t(`inspections.kinds.${kind}`)}
          </option>
        ))}
      </SelectField>
      <TextField
        type="date"
        label={t('inspections.filters.from')}
        value={filters.from ?? ''}
        max={filters.to}
        onChange={(event) => set('from', event.target.value)}
        data-testid="filter-from"
      />
      <TextField
        type="date"
        label={t('inspections.filters.to')}
        value={filters.to ?? ''}
        min={filters.from}
        onChange={(event) => set('to', event.target.value)}
        data-testid="filter-to"
      />
      <div className="flex flex-col justify-end gap-1">
        <CheckboxField
          label={t('inspections.filters.hasDefects')}
          checked={filters.hasDefects === true}
          onChange={(event) => set('hasDefects', event.target.checked)}
          data-testid="filter-has-defects"
        />
        <CheckboxField
          label={t('inspections.filters.rushed')}
          checked={filters.rushed === true}
          onChange={(event) => set('rushed', event.target.checked)}
          data-testid="filter-rushed"
        />
      </div>
      {hasAny ? (
        <div className="sm:col-span-2 lg:col-span-3">
          <Button variant="quiet" onClick={onClear} data-testid="clear-filters">
            {t('inspections.filters.clear')}
          </Button>
        </div>
      ) : null}
    </form>
  );
}
