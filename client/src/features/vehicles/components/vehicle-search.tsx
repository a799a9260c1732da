import { useTranslation } from 'react-i18next';
import { VEHICLE_KINDS, type VehicleKind } from '@yardcall/shared';
import { SelectField, TextField } from '@/components/ui/field';
import type { VehicleFilters } from '@/lib/api/vehicles';

export function VehicleSearch({
  filters,
  onChange,
  showKind = true,
}: {
  filters: VehicleFilters;
  onChange: (filters: VehicleFilters) => void;
  showKind?: boolean;
}) {
  const { t } = useTranslation();
  return (
    <div role="search" className="mb-4 grid grid-cols-1 gap-tap-gap sm:grid-cols-2">
      <TextField
        label={t('vehicles.search.unit')}
        type="search"
        inputMode="search"
        autoComplete="off"
        value={filters.q ?? ''}
        onChange={(event) => onChange({ ...filters, q: event.target.value })}
      />
      {showKind ? (
        <SelectField
          label={t('vehicles.search.kind')}
          value={filters.kind ?? ''}
          onChange={(event) => {
            const kind: VehicleKind | undefined = VEHICLE_KINDS.find((value) => value === event.target.value);
            onChange({ ...filters, kind });
          }}
        >
          <option value="">{t('vehicles.search.anyKind')}</option>
          {VEHICLE_KINDS.map((kind) => (
            <option key={kind} value={kind}>
              {t(`vehicles.kinds.${kind}`)}
            </option>
          ))}
        </SelectField>
      ) : null}
    </div>
  );
}
