import { useTranslation } from 'react-i18next';
import { Link } from 'react-router';
import type { VehicleResponse } from '@yardcall/shared';
import { EmptyState } from '@/components/ui/layout';
import { StatusBadge } from './status-badge';

// A list of cards rather than a table: it reflows at 320 px and at 200 % text.
export function VehicleList({ vehicles, editable }: { vehicles: VehicleResponse[]; editable: boolean }) {
  const { t } = useTranslation();
  if (vehicles.length === 0) return <EmptyState title={t('vehicles.list.empty')} />;
  return (
    <ul className="grid grid-cols-1 gap-tap-gap md:grid-cols-2" aria-label={t('vehicles.list.label')}>
      {vehicles.map((vehicle) => (
        <li key={vehicle.id} className="flex min-w-0 flex-col gap-2 rounded-xl border-2 border-line bg-surface p-4">
          <div className="flex flex-wrap items-center justify-between gap-2">
            {editable ? (
              <Link to={`/vehicles/${vehicle.id}`} className="inline-flex min-h-tap items-center text-xl font-bold">
                {t('vehicles.list.unit', { unit: vehicle.unitNumber })}
              </Link>
            ) : (
              <span className="text-xl font-bold">{t('vehicles.list.unit', { unit: vehicle.unitNumber })}</span>
            )}
            <StatusBadge status={vehicle.status} />
          </div>
          <p className="text-muted">
            {t(`vehicles.kinds.${vehicle.kind}`)} · {t('vehicles.list.axles', { count: vehicle.config.axles.length })} ·{' '}
            {vehicle.plate}
          </p>
          {vehicle.status === 'out_of_service' && vehicle.statusReason ? <p>{vehicle.statusReason}</p> : null}
        </li>
      ))}
    </ul>
  );
}
