import { INSPECTION_CSV_COLUMNS, type InspectionListItem } from '@yardcall/shared';
import { stringify } from 'csv-stringify/sync';

// Spreadsheet apps read a leading byte-order mark as UTF-8 (accented names stay whole).
export const CSV_BOM = '\uFEFF';

// A cell starting with = + - @ or a control character would run as a formula in a spreadsheet: a
// leading apostrophe keeps it text (OWASP's advice on CSV injection).
export function safeCell(text: string): string {
  return /^[=+\-@\t\r]/.test(text) ? `'${text}` : text;
}

function yesNo(value: boolean): string {
  return value ? 'yes' : 'no';
}

export function csvCells(item: InspectionListItem): string[] {
  return [
    item.startedAt,
    safeCell(item.vehicles.map((v) => v.unitNumber).join(' + ')),
    safeCell(item.driver.name),
    item.kind,
    item.status,
    item.durationSeconds === null ? '' : (item.durationSeconds / 60).toFixed(1),
    String(item.defectCount),
    yesNo(item.rushed),
    yesNo(item.recurringDefect),
    item.id,
  ];
}

// RFC 4180: CRLF line ends, fields with commas, quotes or line breaks quoted, quotes doubled.
export function csvHeader(): string {
  return stringify([[...INSPECTION_CSV_COLUMNS]], { record_delimiter: 'windows' });
}

export function csvRows(items: readonly InspectionListItem[]): string {
  return stringify(items.map(csvCells), { record_delimiter: 'windows' });
}
