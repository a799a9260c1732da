import type { QueryClient } from '@tanstack/react-query';
import { SupervisorHome } from '@/features/home/routes/supervisor-home';
import { vehiclesQueryOptions } from '@/features/vehicles/api/get-vehicles';
import { FleetBoard } from '@/features/vehicles/components/fleet-board';

export function supervisorHomeLoader(queryClient: QueryClient) {
  return async () => {
    await queryClient.ensureQueryData(vehiclesQueryOptions());
    return null;
  };
}

export function SupervisorHomeRoute() {
  return <SupervisorHome board={<FleetBoard />} />;
}
