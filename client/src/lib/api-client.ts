import type { ApiErrorBody, FieldProblem } from '@yardcall/shared';

const API_BASE = '/api';
const TOKEN_KEY = 'yardcall.token';

// A failed call: the HTTP status, the server's sentence for a person, and per-field problems.
export class ApiError extends Error {
  readonly status: number;
  readonly code: string;
  readonly fields: FieldProblem[];

  constructor(status: number, message: string, code = '', fields: FieldProblem[] = []) {
    super(message);
    this.name = 'ApiError';
    this.status = status;
    this.code = code;
    this.fields = fields;
  }
}

// Status 0: the request never got an answer (offline, server down).
export const NETWORK_ERROR_STATUS = 0;

export const tokenStore = {
  get(): string | null {
    return localStorage.getItem(TOKEN_KEY);
  },
  set(token: string): void {
    localStorage.setItem(TOKEN_KEY, token);
  },
  clear(): void {
    localStorage.removeItem(TOKEN_KEY);
  },
};

type UnauthorizedHandler = () => void;
let unauthorizedHandler: UnauthorizedHandler | null = null;

// The app decides what a lost session means (navigate to sign-in); lib never touches the location.
export function setUnauthorizedHandler(handler: UnauthorizedHandler | null): void {
  unauthorizedHandler = handler;
}

export type QueryParams = Record<string, string | number | boolean | undefined>;

export interface RequestOptions {
  method?: 'GET' | 'POST' | 'PATCH' | 'PUT' | 'DELETE';
  body?: unknown;
  query?: QueryParams;
  signal?: AbortSignal;
  // The sign-in call answers 401 for a wrong password: that is a message, not a lost session.
  skipUnauthorizedHandler?: boolean;
  // What the caller reads back; JSON unless said otherwise (a PDF, a CSV, a voice note).
  accept?: string;
}

export function buildApiUrl(path: string, query?: QueryParams): string {
  const params = new URLSearchParams();
  for (const [key, value] of Object.entries(query ?? {})) {
    if (value !== undefined && value !== '') params.set(key, String(value));
  }
  const search = params.toString();
  return `${API_BASE}${path}${search ? `?${search}` : ''}`;
}

function isErrorBody(value: unknown): value is ApiErrorBody {
  return typeof value === 'object' && value !== null && typeof (value as { message?: unknown }).message === 'string';
}

async function readErrorBody(response: Response): Promise<ApiError> {
  let body: unknown = null;
  try {
    body = await response.json();
  } catch {
    // Not JSON (a proxy's HTML page, an empty body): fall back to the status text.
  }
  if (isErrorBody(body)) {
    const fields = Array.isArray(body.fields) ? body.fields : [];
    return new ApiError(response.status, body.message, body.error ?? '', fields);
  }
  return new ApiError(response.status, response.statusText || `Request failed (${response.status}).`);
}

// One request with the session's token; answers the response when it is ok, else throws an ApiError
// that names the problem (and signs out on a lost session).
async function send(path: string, options: RequestOptions): Promise<Response> {
  const headers: Record<string, string> = { Accept: options.accept ?? 'application/json' };
  const token = tokenStore.get();
  if (token) headers.Authorization = `Bearer ${token}`;
  // A FormData body (a voice note, a photo) goes as multipart: the browser sets its boundary.
  const multipart = options.body instanceof FormData;
  if (options.body !== undefined && !multipart) headers['Content-Type'] = 'application/json';

  let response: Response;
  try {
    response = await fetch(buildApiUrl(path, options.query), {
      method: options.method ?? 'GET',
      headers,
      body:
        options.body === undefined ? undefined : multipart ? (options.body as FormData) : JSON.stringify(options.body),
      signal: options.signal,
    });
  } catch (cause) {
    if (cause instanceof DOMException && cause.name === 'AbortError') throw cause;
    throw new ApiError(
      NETWORK_ERROR_STATUS,
      'Yardcall cannot be reached. Check the connection and try again.',
      'network',
    );
  }

  if (!response.ok) {
    const error = await readErrorBody(response);
    if (response.status === 401 && !options.skipUnauthorizedHandler) {
      tokenStore.clear();
      unauthorizedHandler?.();
    }
    throw error;
  }
  return response;
}

export async function apiRequest<T>(path: string, options: RequestOptions = {}): Promise<T> {
  const response = await send(path, options);
  if (response.status === 204) return undefined as T;
  return (await response.json()) as T;
}

// A file the session's token guards (a report PDF, a CSV, a recording), which a plain link or an
// <audio src> cannot fetch: read as a Blob.
export async function apiBlob(path: string, options: RequestOptions = {}): Promise<Blob> {
  return (await send(path, options)).blob();
}

export const api = {
  get: <T>(path: string, options: Omit<RequestOptions, 'method' | 'body'> = {}) => apiRequest<T>(path, options),
  post: <T>(path: string, body?: unknown, options: Omit<RequestOptions, 'method' | 'body'> = {}) =>
    apiRequest<T>(path, { ...options, method: 'POST', body }),
  patch: <T>(path: string, body?: unknown, options: Omit<RequestOptions, 'method' | 'body'> = {}) =>
    apiRequest<T>(path, { ...options, method: 'PATCH', body }),
  put: <T>(path: string, body?: unknown, options: Omit<RequestOptions, 'method' | 'body'> = {}) =>
    apiRequest<T>(path, { ...options, method: 'PUT', body }),
  getBlob: (path: string, options: Omit<RequestOptions, 'method' | 'body'> = {}) => apiBlob(path, options),
};
