import { useTranslation } from 'react-i18next';
import { ErrorAlert, Loading } from '@/components/ui/alert';
import { LinkButton } from '@/components/ui/link-button';
import { describeError } from '@/lib/errors';
import { useVehicles } from '../api/get-vehicles';
import { VehicleList } from './vehicle-list';

// Every vehicle with its service status, out-of-service units first.
export function FleetBoard() {
  const { t } = useTranslation();
  const vehicles = useVehicles();
  if (vehicles.isPending) return <Loading label={t('common.loading')} />;
  if (vehicles.isError) return <ErrorAlert>{describeError(vehicles.error)}</ErrorAlert>;
  const sorted = [...vehicles.data].sort(
    (a, b) =>
      Number(b.status === 'out_of_service') - Number(a.status === 'out_of_service') ||
      a.unitNumber.localeCompare(b.unitNumber, undefined, { numeric: true }),
  );
  const out = sorted.filter((vehicle) => vehicle.status === 'out_of_service').length;
  return (
    <div className="flex flex-col gap-4" data-testid="fleet-board">
      <p className="text-lg" role="status">
        {t('fleet.summary', { count: sorted.length, out })}
      </p>
      <VehicleList vehicles={sorted} editable={false} />
      <div>
        <LinkButton to="/vehicles" variant="secondary">
          {t('fleet.allVehicles')}
        </LinkButton>
      </div>
    </div>
  );
}
