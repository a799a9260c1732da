import {
  infiniteQueryOptions,
  keepPreviousData,
  queryOptions,
  useInfiniteQuery,
  useMutation,
  useQuery,
  useQueryClient,
} from '@tanstack/react-query';
import type {
  AcknowledgeRequest,
  InspectionListFilters,
  InspectionListItem,
  InspectionPage,
  InspectionResponse,
  SignatureResponse,
} from '@yardcall/shared';
import { api } from '../api-client';
import { fetchKeepingCopy, type KeptCopy } from '../offline';
import { normaliseFilters, toQueryParams } from './inspection-filters';
import { vehicleKeys } from './vehicles';

// One key factory for /inspections: the office's filtered lists, the driver's latest reports and
// one report (which the office, the driver's finish screen and the shop's note player all share).
// Walk-arounds still on the phone are the walk-around feature's, under its own keys.
export const inspectionKeys = {
  all: ['inspections'] as const,
  lists: () => [...inspectionKeys.all, 'list'] as const,
  list: (filters: InspectionListFilters) => [...inspectionKeys.lists(), filters] as const,
  recent: () => [...inspectionKeys.all, 'recent'] as const,
  details: () => [...inspectionKeys.all, 'detail'] as const,
  detail: (id: string) => [...inspectionKeys.details(), id] as const,
};

const inspectionPath = (id: string) => `/inspections/${encodeURIComponent(id)}`;

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

export const RECENT_REPORTS_SHOWN = 5;
// The phone's copy of them (IndexedDB): the name stays, so a copy kept by an earlier version still answers.
const RECENT_REPORTS_COPY = 'recent-reports';

export type RecentReports = KeptCopy<InspectionListItem[]>;

const isReportList = (value: unknown): value is InspectionListItem[] => Array.isArray(value);

// The driver's own latest walk-arounds as the server has them (a driver sees only their own),
// kept on the phone so the home shows them with no signal.
export function getRecentReports(signal?: AbortSignal): Promise<RecentReports> {
  return fetchKeepingCopy(
    RECENT_REPORTS_COPY,
    async () =>
      (await api.get<InspectionPage>('/inspections', { query: { limit: RECENT_REPORTS_SHOWN }, signal })).items,
    isReportList,
  );
}

export function recentReportsQueryOptions() {
  return queryOptions({
    queryKey: inspectionKeys.recent(),
    queryFn: ({ signal }) => getRecentReports(signal),
    // Asked even offline: the phone's copy answers then.
    networkMode: 'always',
  });
}

export function useRecentReports() {
  return useQuery(recentReportsQueryOptions());
}

export function getInspection(id: string, signal?: AbortSignal): Promise<InspectionResponse> {
  return api.get<InspectionResponse>(inspectionPath(id), { signal });
}

export function inspectionQueryOptions(id: string) {
  return queryOptions({
    queryKey: inspectionKeys.detail(id),
    queryFn: ({ signal }) => getInspection(id, signal),
  });
}

export interface InspectionSelection<T> {
  // The part a screen needs (the shop's note player takes the notes).
  select?: (inspection: InspectionResponse) => T;
  staleTime?: number;
}

// One query per report, whoever reads it. Waits while the id is unknown (a walk-around whose create
// has not reached the server yet).
export function useInspection<T = InspectionResponse>(
  id: string | undefined,
  { select, staleTime }: InspectionSelection<T> = {},
) {
  return useQuery({
    ...inspectionQueryOptions(id ?? ''),
    enabled: Boolean(id),
    select,
    ...(staleTime === undefined ? {} : { staleTime }),
  });
}

// The filtered list as CSV (the token guards it, so it comes as a Blob).
export function exportInspectionsCsv(filters: InspectionListFilters): Promise<Blob> {
  return api.getBlob('/inspections/export.csv', { query: toQueryParams(filters), accept: 'text/csv' });
}

export function useExportInspectionsCsv() {
  return useMutation({ mutationFn: exportInspectionsCsv });
}

// The signed report as a PDF (the token guards it, so it comes as a Blob).
export function getReportPdf(id: string): Promise<Blob> {
  return api.getBlob(`${inspectionPath(id)}/report.pdf`, { accept: 'application/pdf' });
}

export function useReportPdf() {
  return useMutation({ mutationFn: getReportPdf });
}

// The next driver's review of a unit's last report.
export function acknowledgeInspection(id: string, body: AcknowledgeRequest): Promise<SignatureResponse> {
  return api.post<SignatureResponse>(`${inspectionPath(id)}/acknowledge`, body);
}

export function useAcknowledgeInspection() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: ({ inspectionId, body }: { inspectionId: string; body: AcknowledgeRequest }) =>
      acknowledgeInspection(inspectionId, body),
    onSuccess: async () => {
      await queryClient.invalidateQueries({ queryKey: vehicleKeys.pendingAcknowledgements() });
    },
  });
}
