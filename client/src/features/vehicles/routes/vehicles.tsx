import type { QueryClient } from '@tanstack/react-query';
import { useTranslation } from 'react-i18next';
import { useSearchParams, type LoaderFunctionArgs } from 'react-router';
import { ErrorAlert, Loading } from '@/components/ui/alert';
import { LinkButton } from '@/components/ui/link-button';
import { PageHeading } from '@/components/ui/layout';
import { describeError } from '@/lib/errors';
import { useCurrentUser } from '@/lib/api/auth';
import { useVehicles, vehiclesQueryOptions, type VehicleFilters } from '@/lib/api/vehicles';
import { VehicleList } from '../components/vehicle-list';
import { VehicleSearch } from '../components/vehicle-search';
import { vehicleFiltersFromSearch } from '../utils/vehicle-filters';

export function vehiclesLoader(queryClient: QueryClient) {
  return async ({ request }: LoaderFunctionArgs) => {
    await queryClient.ensureQueryData(
      vehiclesQueryOptions(vehicleFiltersFromSearch(new URL(request.url).searchParams)),
    );
    return null;
  };
}

export function VehiclesRoute() {
  const { t } = useTranslation();
  const user = useCurrentUser();
  const [search, setSearch] = useSearchParams();
  const filters = vehicleFiltersFromSearch(search);
  const vehicles = useVehicles(filters);
  const editable = user.role === 'admin';

  function changeFilters(next: VehicleFilters) {
    const params = new URLSearchParams();
    if (next.q) params.set('q', next.q);
    if (next.kind) params.set('kind', next.kind);
    setSearch(params, { replace: true });
  }

  return (
    <>
      <PageHeading
        title={t('vehicles.list.title')}
        actions={
          editable ? (
            <LinkButton to="/vehicles/new" data-testid="add-vehicle">
              {t('vehicles.list.add')}
            </LinkButton>
          ) : null
        }
      />
      <VehicleSearch filters={filters} onChange={changeFilters} />
      {vehicles.isPending ? <Loading label={t('common.loading')} /> : null}
      {vehicles.isError ? <ErrorAlert>{describeError(vehicles.error)}</ErrorAlert> : null}
      {vehicles.data ? <VehicleList vehicles={vehicles.data} editable={editable} /> : null}
    </>
  );
}
