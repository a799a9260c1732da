import { HttpException, HttpStatus, NotFoundException, StreamableFile } from '@nestjs/common';
import type { Request, Response } from 'express';
import { ObjectNotFoundError, type ByteRange, type ObjectStorage } from '../storage/object-storage';

export interface ServedObject {
  objectKey: string;
  sizeBytes: number;
  mimeType: string;
  // Said when the stored file has gone missing: "recording", "photo".
  label: string;
}

// The one byte range to send, or null for the whole file. Follows RFC 9110 14.2: a range unit
// other than bytes, a malformed header or several ranges may be ignored (we send the whole file);
// a byte range that starts past the end is 416.
function chooseRange(request: Request, sizeBytes: number): ByteRange | null {
  if (!request.headers.range) return null;
  const parsed = request.range(sizeBytes, { combine: true });
  if (parsed === undefined || parsed === -2) return null;
  if (parsed === -1 || sizeBytes === 0) {
    throw new HttpException(
      `The requested range is outside the file, which has ${sizeBytes} bytes: ask for bytes=0-${Math.max(sizeBytes - 1, 0)} or less.`,
      HttpStatus.REQUESTED_RANGE_NOT_SATISFIABLE,
    );
  }
  if (parsed.type !== 'bytes' || parsed.length !== 1 || !parsed[0]) return null;
  return { start: parsed[0].start, end: parsed[0].end };
}

// Streams a stored file with HTTP Range support (206 + Content-Range, 416 for a range outside it).
export async function serveObject(
  storage: ObjectStorage,
  request: Request,
  response: Response,
  object: ServedObject,
): Promise<StreamableFile> {
  response.setHeader('Accept-Ranges', 'bytes');
  // Ids are never reused and a stored file never changes.
  response.setHeader('Cache-Control', 'private, max-age=86400, immutable');
  let range: ByteRange | null;
  try {
    range = chooseRange(request, object.sizeBytes);
  } catch (error) {
    response.setHeader('Content-Range', `bytes */${object.sizeBytes}`);
    throw error;
  }
  let stream;
  try {
    stream = await storage.get(object.objectKey, range ?? undefined);
  } catch (error) {
    if (error instanceof ObjectNotFoundError) {
      throw new NotFoundException(`The ${object.label} is no longer in storage; ask your administrator.`);
    }
    throw error;
  }
  if (range) {
    response.status(HttpStatus.PARTIAL_CONTENT);
    response.setHeader('Content-Range', `bytes ${range.start}-${range.end}/${object.sizeBytes}`);
  }
  return new StreamableFile(stream, {
    type: object.mimeType,
    length: range ? range.end - range.start + 1 : object.sizeBytes,
    disposition: 'inline',
  });
}
