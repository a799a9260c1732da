import type { Readable } from 'node:stream';

// Inclusive byte positions, as in an HTTP Range header (RFC 9110 14.1.2).
export interface ByteRange {
  start: number;
  end: number;
}

export interface StoredObjectInfo {
  sizeBytes: number;
  contentType: string;
}

export interface PutOptions {
  contentType: string;
  // Known length of a stream body; without it the S3 store reads the stream into memory first.
  sizeBytes?: number;
}

// Where uploaded files live: a local folder or an S3-compatible store, chosen by configuration.
export interface ObjectStorage {
  put(key: string, body: Buffer | Readable, options: PutOptions): Promise<void>;
  // Throws ObjectNotFoundError for a missing key.
  get(key: string, range?: ByteRange): Promise<Readable>;
  // Null for a missing key.
  head(key: string): Promise<StoredObjectInfo | null>;
  // Deleting a missing key is not an error.
  delete(key: string): Promise<void>;
}

// The Nest injection token for the configured ObjectStorage.
export const OBJECT_STORAGE = Symbol('ObjectStorage');

export class ObjectNotFoundError extends Error {
  constructor(readonly key: string) {
    super(`No stored object under "${key}".`);
    this.name = 'ObjectNotFoundError';
  }
}

export class InvalidObjectKeyError extends Error {
  constructor(readonly key: string) {
    super(
      `"${key}" is not a storage key: use segments of letters, digits, dots, hyphens and underscores separated by "/".`,
    );
    this.name = 'InvalidObjectKeyError';
  }
}

const SEGMENT = /^[A-Za-z0-9_-][A-Za-z0-9._-]*$/;

// Keys map to file paths and S3 keys alike: relative, no "..", no empty or hidden segments, so no traversal.
export function assertObjectKey(key: string): void {
  const segments = key.split('/');
  const ok =
    key.length > 0 &&
    key.length <= 512 &&
    segments.every((segment) => SEGMENT.test(segment) && segment !== '..' && !segment.includes('..'));
  if (!ok) throw new InvalidObjectKeyError(key);
}

export function assertRange(range: ByteRange): void {
  if (
    !Number.isSafeInteger(range.start) ||
    !Number.isSafeInteger(range.end) ||
    range.start < 0 ||
    range.end < range.start
  ) {
    throw new RangeError(`Byte range ${range.start}-${range.end} is not a range.`);
  }
}

// Reads a whole stream into one Buffer (bounded by what the caller lets in).
export async function readAll(stream: Readable): Promise<Buffer> {
  const chunks: Buffer[] = [];
  for await (const chunk of stream) chunks.push(Buffer.isBuffer(chunk) ? chunk : Buffer.from(chunk as Uint8Array));
  return Buffer.concat(chunks);
}
