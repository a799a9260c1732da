import { useState } from 'react';
import type { QueryClient } from '@tanstack/react-query';
import { useTranslation } from 'react-i18next';
import { useSearchParams, type LoaderFunctionArgs } from 'react-router';
import type { InspectionListFilters } from '@yardcall/shared';
import { ErrorAlert, Loading } from '@/components/ui/alert';
import { Button } from '@/components/ui/button';
import { EmptyState, PageHeading } from '@/components/ui/layout';
import { saveBlob } from '@/lib/audio/save-blob';
import { describeError } from '@/lib/errors';
import { inspectionFiltersFromSearch, searchFromInspectionFilters } from '@/lib/api/inspection-filters';
import { inspectionsQueryOptions, useExportInspectionsCsv, useInspections } from '@/lib/api/inspections';
import { InspectionFilters, type FilterPatch } from '../components/inspection-filters';
import { InspectionsTable, type TableSort } from '../components/inspections-table';

// The first visit starts the fetch early. Changing a filter does not wait for the rows: the
// address (and so the filter's own control) updates at once and the old rows stay until the new come.
export function inspectionsLoader(queryClient: QueryClient) {
  return ({ request }: LoaderFunctionArgs) => {
    const filters = inspectionFiltersFromSearch(new URL(request.url).searchParams);
    void queryClient.prefetchInfiniteQuery(inspectionsQueryOptions(filters));
    return null;
  };
}

function applyPatch(filters: InspectionListFilters, patch: FilterPatch): InspectionListFilters {
  const next: Record<string, unknown> = { ...filters, ...patch };
  for (const key of Object.keys(next)) if (next[key] === undefined) delete next[key];
  return next;
}

export function InspectionsRoute() {
  const { t } = useTranslation();
  const [searchParams, setSearchParams] = useSearchParams();
  // The filters as shown: updated at once on a change, and reset from the address whenever it
  // changes (back, forward, a link). The router's navigation may take a moment to commit.
  const urlKey = searchParams.toString();
  const [shownKey, setShownKey] = useState(urlKey);
  const [filters, setFilters] = useState(() => inspectionFiltersFromSearch(searchParams));
  if (shownKey !== urlKey) {
    setShownKey(urlKey);
    setFilters(inspectionFiltersFromSearch(searchParams));
  }
  const list = useInspections(filters);
  const csv = useExportInspectionsCsv();

  // Applied to the latest address, so two quick changes both count.
  const patchFilters = (patch: FilterPatch) => {
    setFilters((current) => applyPatch(current, patch));
    setSearchParams((current) => searchFromInspectionFilters(applyPatch(inspectionFiltersFromSearch(current), patch)), {
      replace: true,
    });
  };
  const clearFilters = () =>
    patchFilters({
      vehicleId: undefined,
      driverId: undefined,
      kind: undefined,
      from: undefined,
      to: undefined,
      hasDefects: undefined,
      rushed: undefined,
    });
  const sort: TableSort = { field: filters.sort ?? 'startedAt', order: filters.order ?? 'desc' };
  const rows = list.data?.pages.flatMap((page) => page.items) ?? [];

  const exportCsv = () => {
    csv.mutate(filters, {
      onSuccess: (blob) => saveBlob(blob, `yardcall-inspections-${new Date().toISOString().slice(0, 10)}.csv`),
    });
  };

  return (
    <div data-testid="inspections-screen">
      <PageHeading
        title={t('inspections.title')}
        lead={t('inspections.lead')}
        actions={
          <Button variant="secondary" onClick={exportCsv} busy={csv.isPending} data-testid="export-csv">
            <span aria-hidden="true">⇩</span>
            {t('inspections.exportCsv')}
          </Button>
        }
      />
      {csv.isError ? <ErrorAlert>{describeError(csv.error)}</ErrorAlert> : null}
      <InspectionFilters filters={filters} onChange={patchFilters} onClear={clearFilters} />
      {list.isPending ? (
        <Loading label={t('common.loading')} />
      ) : list.isError ? (
        <ErrorAlert>{describeError(list.error)}</ErrorAlert>
      ) : rows.length === 0 ? (
        <EmptyState title={t('inspections.empty')}>{t('inspections.emptyHint')}</EmptyState>
      ) : (
        <>
          <p role="status" className="mb-2" aria-busy={list.isFetching || undefined} data-testid="inspections-count">
            {list.hasNextPage
              ? t('inspections.shownMore', { count: rows.length })
              : t('inspections.shown', { count: rows.length })}
          </p>
          <InspectionsTable
            rows={rows}
            sort={sort}
            onSortChange={(next) => patchFilters({ sort: next.field, order: next.order })}
          />
          {list.hasNextPage ? (
            <div className="mt-4">
              <Button
                variant="secondary"
                onClick={() => void list.fetchNextPage()}
                busy={list.isFetchingNextPage}
                data-testid="load-more"
              >
                {t('inspections.loadMore')}
              </Button>
            </div>
          ) : null}
        </>
      )}
    </div>
  );
}
