import type { QueryClient } from '@tanstack/react-query';
import { useTranslation } from 'react-i18next';
import { useNavigate, useParams, type LoaderFunctionArgs } from 'react-router';
import { PageHeading } from '@/components/ui/layout';
import { useUpdateVehicle, useVehicle, vehicleQueryOptions } from '@/lib/api/vehicles';
import { VehicleForm } from '../components/vehicle-form';
import { draftFromVehicle } from '../components/vehicle-draft';
import { StatusBadge } from '../components/status-badge';

export function vehicleEditLoader(queryClient: QueryClient) {
  return async ({ params }: LoaderFunctionArgs) => {
    await queryClient.ensureQueryData(vehicleQueryOptions(params.vehicleId ?? ''));
    return null;
  };
}

export function VehicleEditRoute() {
  const { vehicleId = '' } = useParams();
  const { data: vehicle } = useVehicle(vehicleId);
  // A new form per vehicle version, so a save or another vehicle starts from the stored values.
  return <VehicleEditor key={`${vehicle.id}:${vehicle.updatedAt}`} vehicleId={vehicleId} />;
}

function VehicleEditor({ vehicleId }: { vehicleId: string }) {
  const { t } = useTranslation();
  const navigate = useNavigate();
  const { data: vehicle } = useVehicle(vehicleId);
  const update = useUpdateVehicle(vehicleId);
  return (
    <>
      <PageHeading
        title={t('vehicles.edit.title', { unit: vehicle.unitNumber })}
        lead={<StatusBadge status={vehicle.status} />}
      />
      <VehicleForm
        initial={draftFromVehicle(vehicle)}
        submitLabel={t('vehicles.edit.submit')}
        busy={update.isPending}
        serverError={update.error}
        onSubmit={(request) => update.mutate(request, { onSuccess: () => void navigate('/vehicles') })}
      />
    </>
  );
}
