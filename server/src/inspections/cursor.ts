import type { InspectionSortField, SortDirection } from '@yardcall/shared';
import { ApiValidationException } from '../common/api-validation.exception';

// The list's position, opaque to clients: the sort it belongs to and the (time, id) of a page's last row.
// The time is kept as PostgreSQL's own text to the microsecond: a Date would round it to the
// millisecond and the next page could repeat or skip a row.
export interface ListCursor {
  sort: InspectionSortField;
  order: SortDirection;
  at: string;
  id: string;
}

const EXACT_TIME = /^\d{4}-\d{2}-\d{2}T\d{2}:\d{2}:\d{2}(\.\d{1,6})?Z$/;

const UUID = /^[0-9a-f]{8}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{12}$/i;
const SORTS: readonly string[] = ['startedAt', 'submittedAt'];
const ORDERS: readonly string[] = ['asc', 'desc'];

// A time whose every field is in range: Date.parse lets 2026-02-31 roll over into March, which
// PostgreSQL would refuse.
function isRealTime(at: string): boolean {
  const time = Date.parse(at);
  return !Number.isNaN(time) && new Date(time).toISOString().slice(0, 19) === at.slice(0, 19);
}

export function encodeCursor(cursor: ListCursor): string {
  return Buffer.from(JSON.stringify([cursor.sort, cursor.order, cursor.at, cursor.id])).toString('base64url');
}

function invalid(message = 'This cursor is not one the list gave: start again without it.'): ApiValidationException {
  return new ApiValidationException([{ field: 'cursor', message }]);
}

// A cursor is only good for the sort it was made for.
export function decodeCursor(text: string, sort: InspectionSortField, order: SortDirection): ListCursor {
  let parsed: unknown;
  try {
    parsed = JSON.parse(Buffer.from(text, 'base64url').toString('utf8'));
  } catch {
    throw invalid();
  }
  if (!Array.isArray(parsed) || parsed.length !== 4) throw invalid();
  const [cursorSort, cursorOrder, at, id] = parsed as unknown[];
  if (
    typeof cursorSort !== 'string' ||
    typeof cursorOrder !== 'string' ||
    !SORTS.includes(cursorSort) ||
    !ORDERS.includes(cursorOrder) ||
    typeof at !== 'string' ||
    !EXACT_TIME.test(at) ||
    !isRealTime(at) ||
    typeof id !== 'string' ||
    !UUID.test(id)
  ) {
    throw invalid();
  }
  if (cursorSort !== sort || cursorOrder !== order) {
    throw invalid('This cursor belongs to another sort order: start again without it.');
  }
  return { sort, order, at, id };
}
