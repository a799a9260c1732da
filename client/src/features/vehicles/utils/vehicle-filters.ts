import { VEHICLE_KINDS, type VehicleKind } from '@yardcall/shared';
import type { VehicleFilters } from '@/lib/api/vehicles';

// Filters live in the address (?q=&kind=) so a list can be bookmarked and reloaded.
export function vehicleFiltersFromSearch(search: URLSearchParams): VehicleFilters {
  const kind = search.get('kind');
  const q = search.get('q') ?? '';
  return {
    ...(q ? { q } : {}),
    ...((VEHICLE_KINDS as readonly string[]).includes(kind ?? '') ? { kind: kind as VehicleKind } : {}),
  };
}
