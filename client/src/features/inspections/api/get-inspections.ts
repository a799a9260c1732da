import { infiniteQueryOptions, keepPreviousData, useInfiniteQuery } from '@tanstack/react-query';
import type { InspectionListFilters, InspectionPage } from '@yardcall/shared';
import { api } from '@/lib/api-client';
import { normaliseFilters, toQueryParams } from '../utils/inspection-filters';
import { inspectionKeys } from './inspection-keys';

export const INSPECTIONS_PAGE_SIZE = 25;

export function getInspections(
  filters: InspectionListFilters,
  cursor: string | undefined,
  signal?: AbortSignal,
): Promise<InspectionPage> {
  return api.get<InspectionPage>('/inspections', {
    query: toQueryParams({ ...filters, cursor, limit: INSPECTIONS_PAGE_SIZE }),
    signal,
  });
}

// One cache entry per filter set; "Load more" appends the next cursor's page.
export function inspectionsQueryOptions(filters: InspectionListFilters) {
  const normalised = normaliseFilters(filters);
  return infiniteQueryOptions({
    queryKey: inspectionKeys.list(normalised),
    queryFn: ({ pageParam, signal }) => getInspections(normalised, pageParam, signal),
    initialPageParam: undefined as string | undefined,
    getNextPageParam: (last) => last.nextCursor ?? undefined,
  });
}

export function useInspections(filters: InspectionListFilters) {
  // Keep the last rows on screen while a new filter loads.
  return useInfiniteQuery({ ...inspectionsQueryOptions(filters), placeholderData: keepPreviousData });
}
