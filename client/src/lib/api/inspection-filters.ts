import {
  INSPECTION_KINDS,
  INSPECTION_SORT_FIELDS,
  SORT_DIRECTIONS,
  type InspectionKind,
  type InspectionListFilters,
  type InspectionListQuery,
  type InspectionSortField,
  type SortDirection,
} from '@yardcall/shared';
import type { QueryParams } from '../api-client';

const DATE = /^\d{4}-\d{2}-\d{2}$/;

function oneOf<T extends string>(values: readonly T[], value: string | null): T | undefined {
  return values.includes(value as T) ? (value as T) : undefined;
}

// Filters live in the address (?vehicleId=&hasDefects=true…) so a list can be bookmarked and shared.
export function inspectionFiltersFromSearch(search: URLSearchParams): InspectionListFilters {
  const filters: InspectionListFilters = {};
  const vehicleId = search.get('vehicleId');
  const driverId = search.get('driverId');
  const kind = oneOf<InspectionKind>(INSPECTION_KINDS, search.get('kind'));
  const from = search.get('from');
  const to = search.get('to');
  const sort = oneOf<InspectionSortField>(INSPECTION_SORT_FIELDS, search.get('sort'));
  const order = oneOf<SortDirection>(SORT_DIRECTIONS, search.get('order'));
  if (vehicleId) filters.vehicleId = vehicleId;
  if (driverId) filters.driverId = driverId;
  if (kind) filters.kind = kind;
  if (from && DATE.test(from)) filters.from = from;
  if (to && DATE.test(to)) filters.to = to;
  if (search.get('hasDefects') === 'true') filters.hasDefects = true;
  if (search.get('rushed') === 'true') filters.rushed = true;
  if (sort) filters.sort = sort;
  if (order) filters.order = order;
  return filters;
}

export function searchFromInspectionFilters(filters: InspectionListFilters): URLSearchParams {
  const search = new URLSearchParams();
  for (const [key, value] of Object.entries(toQueryParams(filters))) {
    if (value !== undefined) search.set(key, String(value));
  }
  return search;
}

// The API's query: only what is set, booleans only when true (false would filter them out).
export function toQueryParams(query: InspectionListQuery): QueryParams {
  return {
    vehicleId: query.vehicleId,
    driverId: query.driverId,
    kind: query.kind,
    from: query.from,
    to: query.to,
    hasDefects: query.hasDefects ? true : undefined,
    rushed: query.rushed ? true : undefined,
    sort: query.sort,
    order: query.order,
    cursor: query.cursor,
    limit: query.limit,
  };
}

// A stable key: the same filters in any order share one cache entry.
export function normaliseFilters(filters: InspectionListFilters): InspectionListFilters {
  return inspectionFiltersFromSearch(searchFromInspectionFilters(filters));
}
