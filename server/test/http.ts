import type { ApiErrorBody } from '@yardcall/shared';
import type request from 'supertest';

// supertest types bodies as any; these name what a test expects to read.
export function errorBody(response: request.Response): ApiErrorBody {
  return response.body as ApiErrorBody;
}

export function bodyOf<T>(response: request.Response): T {
  return response.body as T;
}

// Buffers the response body whatever its type, so binary bodies compare byte for byte.
export function binary(call: request.Test): request.Test {
  return call.buffer(true).parse((response, done) => {
    const chunks: Buffer[] = [];
    response.on('data', (chunk: Buffer) => chunks.push(chunk));
    response.on('end', () => done(null, Buffer.concat(chunks)));
  });
}
