import { useTranslation } from 'react-i18next';
import { useNavigate } from 'react-router';
import { PageHeading } from '@/components/ui/layout';
import { useCreateVehicle } from '@/lib/api/vehicles';
import { VehicleForm } from '../components/vehicle-form';
import { newVehicleDraft } from '../components/vehicle-draft';

export function VehicleNewRoute() {
  const { t } = useTranslation();
  const navigate = useNavigate();
  const create = useCreateVehicle();
  return (
    <>
      <PageHeading title={t('vehicles.new.title')} />
      <VehicleForm
        initial={newVehicleDraft()}
        submitLabel={t('vehicles.new.submit')}
        busy={create.isPending}
        serverError={create.error}
        onSubmit={(request) => create.mutate(request, { onSuccess: () => void navigate('/vehicles') })}
      />
    </>
  );
}
