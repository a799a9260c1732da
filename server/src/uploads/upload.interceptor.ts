import {
  applyDecorators,
  BadRequestException,
  Injectable,
  mixin,
  PayloadTooLargeException,
  UseInterceptors,
  type CallHandler,
  type ExecutionContext,
  type NestInterceptor,
  type Type,
} from '@nestjs/common';
import { ApiBody, ApiConsumes } from '@nestjs/swagger';
import type { Request, Response } from 'express';
import multer, { MulterError } from 'multer';
import type { Observable } from 'rxjs';
import { ApiErrors } from '../common/api-docs';
import type { MediaKind } from './media-types';

export const UPLOAD_FIELD = 'file';

// The OpenAPI body of an upload: the file under UPLOAD_FIELD and the form fields sent with it.
function multipartBody(fields: Record<string, { type: string }>, required: string[]) {
  return {
    schema: {
      type: 'object',
      required: [UPLOAD_FIELD, ...required],
      properties: { [UPLOAD_FIELD]: { type: 'string', format: 'binary' }, ...fields },
    },
  };
}

export function formatBytes(bytes: number): string {
  return bytes >= 1024 * 1024 ? `${(bytes / (1024 * 1024)).toFixed(0)} MB` : `${(bytes / 1024).toFixed(0)} KB`;
}

function toHttpError(error: unknown, kind: MediaKind<string>): Error {
  // With memory storage every other error is the body's: busboy's "Unexpected end of form",
  // "Boundary not found" and the like.
  if (!(error instanceof MulterError)) {
    const detail = error instanceof Error ? error.message : String(error);
    return new BadRequestException(
      `The upload could not be read (${detail}): send it whole, as multipart/form-data with its boundary.`,
    );
  }
  switch (error.code) {
    case 'LIMIT_FILE_SIZE':
      return new PayloadTooLargeException(
        `The file is larger than the ${formatBytes(kind.maxBytes)} (${kind.maxBytes} bytes) allowed for ${kind.label}: record a shorter one or send a smaller file.`,
      );
    case 'LIMIT_UNEXPECTED_FILE':
    case 'LIMIT_FILE_COUNT':
      return new BadRequestException(`Send one file, in the form field "${UPLOAD_FIELD}".`);
    // The other limits and problems; a code multer adds later reads the same way.
    case 'LIMIT_PART_COUNT':
    case 'LIMIT_FIELD_KEY':
    case 'LIMIT_FIELD_VALUE':
    case 'LIMIT_FIELD_COUNT':
    case 'MISSING_FIELD_NAME':
    default:
      return new BadRequestException(
        `The upload could not be read (${error.message}): send it as multipart/form-data.`,
      );
  }
}

// Reads one multipart file into memory with multer, stopping at the kind's size limit, and says
// what went wrong in words that name the limit.
export function UploadInterceptor(kind: MediaKind<string>): Type<NestInterceptor> {
  @Injectable()
  class Upload implements NestInterceptor {
    private readonly readUpload = multer({
      storage: multer.memoryStorage(),
      limits: { fileSize: kind.maxBytes, files: 1, fields: 10, fieldSize: 16 * 1024 },
    }).single(UPLOAD_FIELD);

    async intercept(context: ExecutionContext, next: CallHandler): Promise<Observable<unknown>> {
      const http = context.switchToHttp();
      await new Promise<void>((resolve, reject) => {
        this.readUpload(http.getRequest<Request>(), http.getResponse<Response>(), (error: unknown) =>
          error ? reject(toHttpError(error, kind)) : resolve(),
        );
      });
      return next.handle();
    }
  }
  return mixin(Upload);
}

// A route that takes one file of the kind as multipart/form-data, with the form fields sent beside it:
// read by the kind's interceptor, and documented with its body and the answer to a file too large.
export function UploadRoute(kind: MediaKind<string>, fields: Record<string, { type: string }>, required: string[]) {
  return applyDecorators(
    UseInterceptors(UploadInterceptor(kind)),
    ApiConsumes('multipart/form-data'),
    ApiBody(multipartBody(fields, required)),
    ApiErrors({ payloadTooLarge: true }),
  );
}
