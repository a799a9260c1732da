import { vi } from 'vitest';

export interface MockReply {
  status?: number;
  body?: unknown;
}

export interface RecordedCall {
  method: string;
  path: string;
  search: string;
  headers: Record<string, string>;
  body: unknown;
}

type Handler = MockReply | ((call: RecordedCall) => MockReply);

// Stubs fetch for calls to /api: routes are "METHOD /path" (no query); anything else answers 404.
export function mockApi(routes: Record<string, Handler>) {
  const calls: RecordedCall[] = [];
  const fetchMock = vi.fn(async (input: RequestInfo | URL, init: RequestInit = {}) => {
    const url = new URL(
      typeof input === 'string' ? input : input instanceof URL ? input.href : input.url,
      'http://localhost',
    );
    const call: RecordedCall = {
      method: init.method ?? 'GET',
      path: url.pathname.replace(/^\/api/, ''),
      search: url.search,
      headers: { ...(init.headers as Record<string, string> | undefined) },
      body: typeof init.body === 'string' ? JSON.parse(init.body) : undefined,
    };
    calls.push(call);
    const handler = routes[`${call.method} ${call.path}`];
    const reply = typeof handler === 'function' ? handler(call) : (handler ?? { status: 404, body: notFound(call) });
    const status = reply.status ?? 200;
    await Promise.resolve();
    return new Response(status === 204 ? null : JSON.stringify(reply.body ?? {}), {
      status,
      headers: { 'Content-Type': 'application/json' },
    });
  });
  vi.stubGlobal('fetch', fetchMock);
  return { calls, fetchMock };
}

function notFound(call: RecordedCall) {
  return { statusCode: 404, error: 'Not Found', message: `No mock for ${call.method} ${call.path}.` };
}

export function errorBody(statusCode: number, message: string, fields?: { field: string; message: string }[]) {
  return { statusCode, error: 'Error', message, ...(fields ? { fields } : {}) };
}
