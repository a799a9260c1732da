import type { ApiErrorBody } from '@yardcall/shared';
import type request from 'supertest';

// supertest types bodies as any; these name what a test expects to read.
export function errorBody(response: request.Response): ApiErrorBody {
  return response.body as ApiErrorBody;
}

export function bodyOf<T>(response: request.Response): T {
  return response.body as T;
}
