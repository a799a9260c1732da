import { BadRequestException, PayloadTooLargeException } from '@nestjs/common';
import { createHash } from 'node:crypto';
import { detectMedia, type MediaKind } from './media-types';
import { formatBytes, UPLOAD_FIELD } from './upload.interceptor';

export interface CheckedUpload {
  buffer: Buffer;
  mimeType: string;
  extension: string;
  sha256: string;
}

// An uploaded file judged by its content (not its name or header): there, not empty, within the
// size, of a type the kind accepts; each refusal says what to send instead.
export async function checkUpload(
  file: Express.Multer.File | undefined,
  kind: MediaKind<string>,
): Promise<CheckedUpload> {
  if (!file) {
    throw new BadRequestException(
      `Attach ${kind.label} as the form field "${UPLOAD_FIELD}" of a multipart/form-data request.`,
    );
  }
  if (file.size === 0 || file.buffer.length === 0) {
    throw new BadRequestException(`The file is empty (0 bytes): send ${kind.label} with something in it.`);
  }
  // Multer stops at the limit; this guards a buffer that came another way.
  if (file.buffer.length > kind.maxBytes) {
    throw new PayloadTooLargeException(
      `The file is larger than the ${formatBytes(kind.maxBytes)} (${kind.maxBytes} bytes) allowed for ${kind.label}.`,
    );
  }
  const detection = await detectMedia(file.buffer, kind);
  if (!detection.ok) {
    throw new BadRequestException(
      `This file is not ${kind.acceptedNames}: its content ${
        detection.found ? `looks like ${detection.found}` : 'is of no type we recognise'
      }. Send ${kind.label} as ${kind.acceptedNames}.`,
    );
  }
  return {
    buffer: file.buffer,
    mimeType: detection.mimeType,
    extension: detection.extension,
    sha256: createHash('sha256').update(file.buffer).digest('hex'),
  };
}
