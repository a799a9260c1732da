import { useState } from 'react';
import { useTranslation } from 'react-i18next';
import type { VehicleResponse } from '@yardcall/shared';
import { ErrorAlert, Loading } from '@/components/ui/alert';
import { EmptyState } from '@/components/ui/layout';
import { describeError } from '@/lib/errors';
import { useVehicles, type VehicleFilters } from '@/lib/api/vehicles';
import { readRecentUnitIds, rememberRecentUnit, sortRecentFirst } from './recent-units';
import { StatusBadge } from './status-badge';
import { VehicleSearch } from './vehicle-search';

// The driver picks the unit to inspect: recent units first, search by unit number.
export function VehiclePicker({ onPick }: { onPick: (vehicle: VehicleResponse) => void }) {
  const { t } = useTranslation();
  const [filters, setFilters] = useState<VehicleFilters>({});
  const [recentIds, setRecentIds] = useState(readRecentUnitIds);
  const vehicles = useVehicles(filters);

  return (
    <div data-testid="vehicle-picker">
      <VehicleSearch filters={filters} onChange={setFilters} showKind={false} />
      {vehicles.isPending ? <Loading label={t('common.loading')} /> : null}
      {vehicles.isError ? <ErrorAlert>{describeError(vehicles.error)}</ErrorAlert> : null}
      {vehicles.data && vehicles.data.length === 0 ? <EmptyState title={t('vehicles.list.empty')} /> : null}
      {vehicles.data && vehicles.data.length > 0 ? (
        <ul className="flex flex-col gap-tap-gap" aria-label={t('start.vehicles')}>
          {sortRecentFirst(vehicles.data, recentIds).map((vehicle) => (
            <li key={vehicle.id}>
              <button
                type="button"
                className="flex min-h-tap w-full flex-wrap items-center justify-between gap-2 rounded-xl border-2 border-line bg-surface p-4 text-left"
                onClick={() => {
                  setRecentIds(rememberRecentUnit(vehicle.id));
                  onPick(vehicle);
                }}
              >
                <span className="text-xl font-bold">
                  {t('vehicles.list.unit', { unit: vehicle.unitNumber })}
                  {recentIds.includes(vehicle.id) ? (
                    <span className="ml-2 font-normal text-muted">({t('start.recent')})</span>
                  ) : null}
                </span>
                <span className="flex flex-wrap items-center gap-2">
                  <span className="text-muted">{t(`vehicles.kinds.${vehicle.kind}`)}</span>
                  <StatusBadge status={vehicle.status} />
                </span>
              </button>
            </li>
          ))}
        </ul>
      ) : null}
    </div>
  );
}
