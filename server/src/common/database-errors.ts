import { QueryFailedError } from 'typeorm';

// PostgreSQL error codes (PostgreSQL documentation, appendix A "Error Codes").
const UNIQUE_VIOLATION = '23505';
const FOREIGN_KEY_VIOLATION = '23503';
const INVALID_TEXT_REPRESENTATION = '22P02';

interface PgDriverError {
  code?: string;
  constraint?: string;
}

function driverError(error: unknown): PgDriverError | null {
  if (!(error instanceof QueryFailedError)) return null;
  return error.driverError as PgDriverError;
}

export function isUniqueViolation(error: unknown, constraint?: string): boolean {
  const pg = driverError(error);
  return pg?.code === UNIQUE_VIOLATION && (constraint === undefined || pg.constraint === constraint);
}

export function isForeignKeyViolation(error: unknown): boolean {
  return driverError(error)?.code === FOREIGN_KEY_VIOLATION;
}

export function isInvalidTextRepresentation(error: unknown): boolean {
  return driverError(error)?.code === INVALID_TEXT_REPRESENTATION;
}
