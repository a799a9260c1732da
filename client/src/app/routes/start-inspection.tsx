import type { QueryClient } from '@tanstack/react-query';
import { startDataQueryOptions } from '@/features/walkaround/api/get-start-data';
import { StartWalkaround } from '@/features/walkaround/components/start-walkaround';
import { useVehicles, vehiclesQueryOptions } from '@/lib/api/vehicles';
import { VehiclePicker } from '@/features/vehicles/components/vehicle-picker';

// The units come with the start data, which the phone keeps for a start with no signal: the
// picker's list is filled from it, so it shows whether or not the server answers.
export function startInspectionLoader(queryClient: QueryClient) {
  return async () => {
    const start = await queryClient.fetchQuery(startDataQueryOptions());
    queryClient.setQueryData(vehiclesQueryOptions().queryKey, start.data.vehicles);
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
