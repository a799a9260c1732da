import { useTranslation } from 'react-i18next';
import { INSPECTION_KINDS, type InspectionListFilters } from '@yardcall/shared';
import { Button } from '@/components/ui/button';
import { ChoiceField } from '@/components/ui/choice-field';
import { CheckboxField, TextField } from '@/components/ui/field';
import { driversOf, useUsers } from '@/lib/api/users';
import { byUnitNumber, useVehicles } from '@/lib/api/vehicles';

// A change to some filters; undefined removes one.
export type FilterPatch = { [K in keyof InspectionListFilters]?: InspectionListFilters[K] | undefined };

export interface InspectionFiltersProps {
  filters: InspectionListFilters;
  onChange: (patch: FilterPatch) => void;
  onClear: () => void;
}

const DATE_EDGES = ['from', 'to'] as const;

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
      <ChoiceField
        label={t('inspections.filters.unit')}
        value={filters.vehicleId ?? ''}
        onPick={(vehicleId) => set('vehicleId', vehicleId)}
        anyLabel={t('inspections.filters.anyUnit')}
        choices={(units.data ?? []).map((vehicle) => ({
          value: vehicle.id,
          label: t('inspections.filters.unitOption', {
            unit: vehicle.unitNumber,
            kind: t(`vehicles.kinds.${vehicle.kind}`),
          }),
        }))}
        data-testid="filter-unit"
      />
      <ChoiceField
        label={t('inspections.filters.driver')}
        value={filters.driverId ?? ''}
        onPick={(driverId) => set('driverId', driverId)}
        anyLabel={t('inspections.filters.anyDriver')}
        choices={(drivers.data ?? []).map((driver) => ({ value: driver.id, label: driver.name }))}
        data-testid="filter-driver"
      />
      <ChoiceField
        label={t('inspections.filters.kind')}
        value={filters.kind ?? ''}
        onPick={(kind) => set('kind', kind)}
        anyLabel={t('inspections.filters.anyKind')}
        choices={INSPECTION_KINDS.map((kind) => ({ value: kind, label: t(`inspections.kinds.${kind}`) }))}
        data-testid="filter-kind"
      />
      {DATE_EDGES.map((edge) => (
        <TextField
          key={edge}
          type="date"
          label={t(`inspections.filters.${edge}`)}
          value={filters[edge] ?? ''}
          // The range cannot turn over: "from" ends at "to", "to" starts at "from".
          max={edge === 'from' ? filters.to : undefined}
          min={edge === 'to' ? filters.from : undefined}
          onChange={(event) => set(edge, event.target.value)}
          data-testid={`filter-${edge}`}
        />
      ))}
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
