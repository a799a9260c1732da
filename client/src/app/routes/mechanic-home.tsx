import { useQueryClient, type QueryClient } from '@tanstack/react-query';
import { defectsQueryOptions } from '@/lib/api/defects';
import { OpenDefects } from '@/features/defects/components/open-defects';
import { RecentRepairs } from '@/features/defects/components/recent-repairs';
import { MechanicHome } from '@/features/home/routes/mechanic-home';
import { useVehicles, vehicleKeys, vehiclesQueryOptions } from '@/lib/api/vehicles';
import { StatusBadge } from '@/features/vehicles/components/status-badge';

export function mechanicHomeLoader(queryClient: QueryClient) {
  return async () => {
    await Promise.all([
      queryClient.ensureQueryData(defectsQueryOptions({ status: 'open' })),
      queryClient.ensureQueryData(vehiclesQueryOptions()),
    ]);
    return null;
  };
}

// The app joins the defects and the units' status: a certification refreshes both.
export function MechanicHomeRoute() {
  const queryClient = useQueryClient();
  const vehicles = useVehicles();
  const statusOf = (vehicleId: string) => {
    const vehicle = vehicles.data?.find((v) => v.id === vehicleId);
    return vehicle ? <StatusBadge status={vehicle.status} /> : null;
  };
  return (
    <MechanicHome
      openDefects={
        <OpenDefects
          renderVehicleStatus={statusOf}
          onCertified={() => queryClient.invalidateQueries({ queryKey: vehicleKeys.all })}
        />
      }
      recentRepairs={<RecentRepairs />}
    />
  );
}
