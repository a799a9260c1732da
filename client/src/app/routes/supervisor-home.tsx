import type { QueryClient } from '@tanstack/react-query';
import { SupervisorHome } from '@/features/home/routes/supervisor-home';
import { fleetBoardQueryOptions } from '@/lib/api/fleet';
import { FleetBoard } from '@/features/vehicles/components/fleet-board';

export function supervisorHomeLoader(queryClient: QueryClient) {
  return async () => {
    // Prefetch, not ensure: a board that fails to load shows its error inside the home screen.
    await queryClient.prefetchQuery(fleetBoardQueryOptions());
    return null;
  };
}

export function SupervisorHomeRoute() {
  return <SupervisorHome board={<FleetBoard />} />;
}
