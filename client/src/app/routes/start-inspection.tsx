import type { QueryClient } from '@tanstack/react-query';
import { StartWalkaround } from '@/features/walkaround/components/start-walkaround';
import { useVehicles, vehiclesQueryOptions } from '@/features/vehicles/api/get-vehicles';
import { VehiclePicker } from '@/features/vehicles/components/vehicle-picker';

export function startInspectionLoader(queryClient: QueryClient) {
  return async () => {
    await queryClient.ensureQueryData(vehiclesQueryOptions());
    return null;
  };
}

// The app joins the two features: the vehicles' picker and the walk-around's start.
export function StartInspectionRoute() {
  const vehicles = useVehicles();
  return (
    <StartWalkaround vehicles={vehicles.data ?? []} renderPicker={(onPick) => <VehiclePicker onPick={onPick} />} />
  );
}
