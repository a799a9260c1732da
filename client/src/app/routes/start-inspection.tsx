import type { QueryClient } from '@tanstack/react-query';
import { StartInspection } from '@/features/home/routes/start-inspection';
import { vehiclesQueryOptions } from '@/features/vehicles/api/get-vehicles';
import { VehiclePicker } from '@/features/vehicles/components/vehicle-picker';

export function startInspectionLoader(queryClient: QueryClient) {
  return async () => {
    await queryClient.ensureQueryData(vehiclesQueryOptions());
    return null;
  };
}

export function StartInspectionRoute() {
  return (
    <StartInspection
      renderPicker={(onPicked) => <VehiclePicker onPick={(vehicle) => onPicked(vehicle.unitNumber)} />}
    />
  );
}
