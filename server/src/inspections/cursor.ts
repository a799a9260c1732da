import { ApiValidationException } from '../common/api-validation.exception';

// The list's position, opaque to clients: the (startedAt, id) of the last row of a page.
export interface ListCursor {
  startedAt: Date;
  id: string;
}

const UUID = /^[0-9a-f]{8}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{12}$/i;

export function encodeCursor(cursor: ListCursor): string {
  return Buffer.from(JSON.stringify([cursor.startedAt.toISOString(), cursor.id])).toString('base64url');
}

export function decodeCursor(text: string): ListCursor {
  const invalid = () =>
    new ApiValidationException([
      { field: 'cursor', message: 'This cursor is not one the list gave: start again without it.' },
    ]);
  let parsed: unknown;
  try {
    parsed = JSON.parse(Buffer.from(text, 'base64url').toString('utf8'));
  } catch {
    throw invalid();
  }
  if (!Array.isArray(parsed) || parsed.length !== 2) throw invalid();
  const [at, id] = parsed as unknown[];
  if (typeof at !== 'string' || typeof id !== 'string' || !UUID.test(id)) throw invalid();
  const startedAt = new Date(at);
  if (Number.isNaN(startedAt.getTime())) throw invalid();
  return { startedAt, id };
}
