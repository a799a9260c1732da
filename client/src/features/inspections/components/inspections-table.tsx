import { useMemo } from 'react';
import {
  createColumnHelper,
  flexRender,
  getCoreRowModel,
  useReactTable,
  type SortingState,
} from '@tanstack/react-table';
import { useTranslation } from 'react-i18next';
import { useOfficeDates } from '@/lib/office-dates';
import { Link } from 'react-router';
import type { InspectionListItem, InspectionSortField, SortDirection } from '@yardcall/shared';
import { formatSeconds, unitsLabel } from '../utils/format';
import { inspectionPath } from '../utils/paths';

export interface TableSort {
  field: InspectionSortField;
  order: SortDirection;
}

export interface InspectionsTableProps {
  rows: InspectionListItem[];
  sort: TableSort;
  onSortChange: (sort: TableSort) => void;
}

const column = createColumnHelper<InspectionListItem>();

// The server sorts and pages (cursor); the table shows the rows and asks for another order.
export function InspectionsTable({ rows, sort, onSortChange }: InspectionsTableProps) {
  const { t } = useTranslation();
  const dates = useOfficeDates();

  const columns = useMemo(
    () => [
      column.accessor('startedAt', {
        header: () => t('inspections.columns.started'),
        enableSorting: true,
        cell: (info) => (
          <Link to={inspectionPath(info.row.original.id)} className="font-bold underline" data-testid="inspection-link">
            {dates.dateTime(info.getValue())}
          </Link>
        ),
      }),
      column.accessor('submittedAt', {
        header: () => t('inspections.columns.submitted'),
        enableSorting: true,
        cell: (info) => dates.dateTime(info.getValue()) || t('inspections.statuses.in_progress'),
      }),
      column.accessor((row) => unitsLabel(row.vehicles), {
        id: 'units',
        header: () => t('inspections.columns.units'),
        enableSorting: false,
        cell: (info) => <span className="font-bold">{info.getValue()}</span>,
      }),
      column.accessor((row) => row.driver.name, {
        id: 'driver',
        header: () => t('inspections.columns.driver'),
        enableSorting: false,
      }),
      column.accessor('kind', {
        header: () => t('inspections.columns.kind'),
        enableSorting: false,
        cell: (info) => t(`inspections.kinds.${info.getValue()}`),
      }),
      column.accessor('durationSeconds', {
        header: () => t('inspections.columns.duration'),
        enableSorting: false,
        cell: (info) => formatSeconds(info.getValue()),
      }),
      column.accessor('defectCount', {
        header: () => t('inspections.columns.defects'),
        enableSorting: false,
        cell: (info) =>
          info.getValue() > 0 ? (
            <span className="font-bold text-danger">
              <span aria-hidden="true">⚠ </span>
              {t('inspections.defectCount', { count: info.getValue() })}
            </span>
          ) : (
            t('inspections.noDefects')
          ),
      }),
      column.display({
        id: 'flags',
        header: () => t('inspections.columns.flags'),
        cell: (info) => {
          const { rushed, recurringDefect } = info.row.original;
          if (!rushed && !recurringDefect) return <span className="text-muted">{t('inspections.noFlags')}</span>;
          return (
            <ul className="flex flex-col gap-1">
              {rushed ? (
                <li className="font-bold" data-testid="flag-rushed">
                  <span aria-hidden="true">◷ </span>
                  {t('inspections.flags.rushed')}
                </li>
              ) : null}
              {recurringDefect ? (
                <li className="font-bold" data-testid="flag-recurring">
                  <span aria-hidden="true">↻ </span>
                  {t('inspections.flags.recurring')}
                </li>
              ) : null}
            </ul>
          );
        },
      }),
    ],
    [t, dates],
  );

  const sorting: SortingState = [{ id: sort.field, desc: sort.order === 'desc' }];
  // The table's functions change every render; nothing here is memoised by the compiler.
  // eslint-disable-next-line react-hooks/incompatible-library
  const table = useReactTable({
    data: rows,
    columns,
    getCoreRowModel: getCoreRowModel(),
    manualSorting: true,
    enableSortingRemoval: false,
    state: { sorting },
    getRowId: (row) => row.id,
  });

  const toggle = (field: InspectionSortField) => {
    const order: SortDirection = sort.field === field && sort.order === 'desc' ? 'asc' : 'desc';
    onSortChange({ field, order });
  };

  return (
    <div className="overflow-x-auto rounded-xl border-2 border-line" data-testid="inspections-table-wrap">
      <table className="w-full border-collapse text-left" data-testid="inspections-table">
        <caption className="sr-only">{t('inspections.tableCaption')}</caption>
        <thead className="bg-page">
          {table.getHeaderGroups().map((group) => (
            <tr key={group.id}>
              {group.headers.map((header) => {
                const sorted = header.column.getIsSorted();
                const sortable = header.column.getCanSort();
                const label = flexRender(header.column.columnDef.header, header.getContext());
                return (
                  <th
                    key={header.id}
                    scope="col"
                    className="border-b-2 border-line px-3 py-2 align-bottom font-bold"
                    aria-sort={sorted === 'asc' ? 'ascending' : sorted === 'desc' ? 'descending' : undefined}
                  >
                    {sortable ? (
                      <button
                        type="button"
                        className="inline-flex min-h-tap items-center gap-1 font-bold underline"
                        onClick={() => toggle(header.column.id as InspectionSortField)}
                        data-testid={`sort-${header.column.id}`}
                      >
                        {label}
                        <span aria-hidden="true">{sorted === 'asc' ? '▲' : sorted === 'desc' ? '▼' : '↕'}</span>
                        <span className="sr-only">
                          {sorted
                            ? t(sorted === 'asc' ? 'inspections.sortedAsc' : 'inspections.sortedDesc')
                            : t('inspections.sortable')}
                        </span>
                      </button>
                    ) : (
                      label
                    )}
                  </th>
                );
              })}
            </tr>
          ))}
        </thead>
        <tbody>
          {table.getRowModel().rows.map((row) => (
            <tr
              key={row.id}
              className="border-b border-line align-top"
              data-testid="inspection-row"
              data-inspection-id={row.original.id}
            >
              {row.getVisibleCells().map((cell) => (
                <td key={cell.id} className="px-3 py-2">
                  {flexRender(cell.column.columnDef.cell, cell.getContext())}
                </td>
              ))}
            </tr>
          ))}
        </tbody>
      </table>
    </div>
  );
}
