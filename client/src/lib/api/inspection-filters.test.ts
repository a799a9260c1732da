import { describe, expect, it } from 'vitest';
import {
  inspectionFiltersFromSearch,
  normaliseFilters,
  searchFromInspectionFilters,
  toQueryParams,
} from './inspection-filters';

describe('inspection filters in the address', () => {
  it('reads every filter back from the address it wrote', () => {
    const filters = {
      vehicleId: 'veh-1',
      driverId: 'drv-1',
      kind: 'pre_trip' as const,
      from: '2026-11-01',
      to: '2026-11-30',
      hasDefects: true,
      rushed: true,
      sort: 'submittedAt' as const,
      order: 'asc' as const,
    };
    expect(inspectionFiltersFromSearch(searchFromInspectionFilters(filters))).toEqual(filters);
  });

  it('drops values the API would refuse (unknown kind, malformed date, unknown sort)', () => {
    const search = new URLSearchParams('kind=lunch&from=yesterday&sort=driver&order=up&hasDefects=yes');
    expect(inspectionFiltersFromSearch(search)).toEqual({});
  });

  it('leaves false booleans out of the address and the query', () => {
    expect(searchFromInspectionFilters({ hasDefects: false, rushed: false }).toString()).toBe('');
    expect(toQueryParams({ hasDefects: false })).toMatchObject({ hasDefects: undefined });
  });

  it('gives the same cache key whatever order the filters were set in', () => {
    expect(normaliseFilters({ rushed: true, vehicleId: 'v' })).toStrictEqual(
      normaliseFilters({ vehicleId: 'v', rushed: true }),
    );
  });
});
