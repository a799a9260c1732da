import { queryOptions, useQuery } from '@tanstack/react-query';
import type { InspectionListItem, InspectionPage } from '@yardcall/shared';
import { api } from '@/lib/api-client';
import { fetchKeepingCopy, type KeptCopy } from '@/lib/offline';

export const RECENT_REPORTS_SHOWN = 5;
const RECENT_REPORTS_KEY = 'recent-reports';

export type RecentReports = KeptCopy<InspectionListItem[]>;

export const homeKeys = {
  all: ['home'] as const,
  recentReports: () => [...homeKeys.all, 'recent-reports'] as const,
};

const isReportList = (value: unknown): value is InspectionListItem[] => Array.isArray(value);

// The driver's own latest walk-arounds as the server has them (a driver sees only their own),
// kept on the phone so the home shows them with no signal.
export function getRecentReports(signal?: AbortSignal): Promise<RecentReports> {
  return fetchKeepingCopy(
    RECENT_REPORTS_KEY,
    async () =>
      (await api.get<InspectionPage>('/inspections', { query: { limit: RECENT_REPORTS_SHOWN }, signal })).items,
    isReportList,
  );
}

export function recentReportsQueryOptions() {
  return queryOptions({
    queryKey: homeKeys.recentReports(),
    queryFn: ({ signal }) => getRecentReports(signal),
    networkMode: 'always',
  });
}

export function useRecentReports() {
  return useQuery(recentReportsQueryOptions());
}
