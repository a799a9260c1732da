// A stand-in for the inspection routes behind a stubbed fetch, for the offline tests only.
import type { CreateInspectionRequest, PutResultsRequest, SubmitInspectionRequest } from '@yardcall/shared';

export type RouteName = 'create' | 'results' | 'note' | 'photo' | 'submit' | 'get';

export type Failure =
  { network: true } | { status: number; message: string; fields?: { field: string; message: string }[] };

export interface ReceivedUpload {
  inspectionId: string;
  clientId: string;
  itemKey: string;
  fields: Record<string, string>;
  fileName: string;
  fileType: string;
  fileText: string;
}

interface Gate {
  route: RouteName;
  release: Promise<void>;
}

// Records every request, stores by client id as the real server does, and fails on demand.
export function createFakeSyncServer() {
  const inspections = new Map<string, string>();
  const storedResults = new Map<string, unknown>();
  const receivedResultIds: string[] = [];
  const createRequests: CreateInspectionRequest[] = [];
  // Server id -> the submit it took; a second submit of the same inspection is a 409, as on the server.
  const submitted = new Map<string, SubmitInspectionRequest>();
  const uploads: { note: ReceivedUpload[]; photo: ReceivedUpload[] } = { note: [], photo: [] };
  const order: RouteName[] = [];
  const failures: { route: RouteName; failure: Failure; afterHandling: boolean; skip: number }[] = [];
  const gates: Gate[] = [];
  let inFlight = 0;
  let maxInFlight = 0;

  function jsonBody(init: RequestInit): string {
    if (typeof init.body !== 'string') throw new Error('expected a JSON body');
    return init.body;
  }

  function reply(status: number, body: unknown): Response {
    return new Response(JSON.stringify(body), { status, headers: { 'Content-Type': 'application/json' } });
  }

  function routeOf(method: string, path: string): { route: RouteName; inspectionId?: string } | null {
    if (method === 'POST' && path === '/api/inspections') return { route: 'create' };
    const one = /^\/api\/inspections\/([^/]+)$/.exec(path);
    if (method === 'GET' && one?.[1]) return { route: 'get', inspectionId: decodeURIComponent(one[1]) };
    const match = /^\/api\/inspections\/([^/]+)\/(results|notes|photos|submit)$/.exec(path);
    if (!match?.[1]) return null;
    const inspectionId = decodeURIComponent(match[1]);
    if (method === 'POST' && match[2] === 'submit') return { route: 'submit', inspectionId };
    if (method === 'PUT' && match[2] === 'results') return { route: 'results', inspectionId };
    if (method === 'POST' && match[2] === 'notes') return { route: 'note', inspectionId };
    if (method === 'POST' && match[2] === 'photos') return { route: 'photo', inspectionId };
    return null;
  }

  async function readUpload(inspectionId: string, form: FormData): Promise<ReceivedUpload> {
    const fields: Record<string, string> = {};
    let file: File | null = null;
    for (const [key, value] of form.entries()) {
      if (typeof value === 'string') fields[key] = value;
      else file = value;
    }
    if (!file) throw new Error('multipart body without a file');
    return {
      inspectionId,
      clientId: fields.clientId ?? '',
      itemKey: fields.itemKey ?? '',
      fields,
      fileName: file.name,
      fileType: file.type,
      fileText: await file.text(),
    };
  }

  async function handle(route: RouteName, inspectionId: string | undefined, init: RequestInit): Promise<Response> {
    order.push(route);
    switch (route) {
      case 'create': {
        const body = JSON.parse(jsonBody(init)) as CreateInspectionRequest;
        createRequests.push(body);
        const id = inspections.get(body.clientId) ?? `srv-${inspections.size + 1}`;
        inspections.set(body.clientId, id);
        return reply(201, { id, clientId: body.clientId });
      }
      case 'results': {
        const body = JSON.parse(jsonBody(init)) as PutResultsRequest;
        for (const result of body.results) {
          receivedResultIds.push(result.clientId);
          storedResults.set(result.clientId, result);
        }
        return reply(200, { results: [] });
      }
      case 'note':
      case 'photo': {
        const upload = await readUpload(inspectionId ?? '', init.body as FormData);
        uploads[route].push(upload);
        return reply(201, { id: `${route}-${upload.clientId}`, clientId: upload.clientId });
      }
      case 'submit': {
        const id = inspectionId ?? '';
        if (submitted.has(id)) return reply(409, { statusCode: 409, message: 'This report is already submitted.' });
        submitted.set(id, JSON.parse(jsonBody(init)) as SubmitInspectionRequest);
        return reply(201, { id, status: 'submitted', submittedAt: '2026-12-01T09:00:00.000Z' });
      }
      case 'get': {
        const id = inspectionId ?? '';
        return submitted.has(id)
          ? reply(200, { id, status: 'submitted', submittedAt: '2026-12-01T09:00:00.000Z' })
          : reply(200, { id, status: 'in_progress', submittedAt: null });
      }
    }
  }

  async function fetchStub(input: RequestInfo | URL, init: RequestInit = {}): Promise<Response> {
    const url = new URL(typeof input === 'string' ? input : input instanceof URL ? input.href : input.url, 'http://x');
    const found = routeOf(init.method ?? 'GET', url.pathname);
    if (!found) return reply(404, { message: `No route ${init.method ?? 'GET'} ${url.pathname}` });
    inFlight += 1;
    maxInFlight = Math.max(maxInFlight, inFlight);
    try {
      const gateIndex = gates.findIndex((gate) => gate.route === found.route);
      if (gateIndex >= 0) {
        const [gate] = gates.splice(gateIndex, 1);
        await gate?.release;
      }
      const failureIndex = failures.findIndex((entry) => entry.route === found.route && entry.skip-- === 0);
      const failure = failureIndex >= 0 ? failures.splice(failureIndex, 1)[0] : undefined;
      if (failure && !failure.afterHandling) {
        if ('network' in failure.failure) throw new TypeError('Failed to fetch');
        const { status, message, fields } = failure.failure;
        return reply(status, { statusCode: status, message, ...(fields ? { fields } : {}) });
      }
      const response = await handle(found.route, found.inspectionId, init);
      // The server did the work but the answer was lost on the way back.
      if (failure?.afterHandling) throw new TypeError('Failed to fetch');
      return response;
    } finally {
      inFlight -= 1;
    }
  }

  return {
    fetch: fetchStub,
    inspections,
    storedResults,
    receivedResultIds,
    createRequests,
    submitted,
    uploads,
    order,
    get maxInFlight() {
      return maxInFlight;
    },
    // A coming request to `route` (the next, or the one after `skip` others) fails before the
    // server sees it, or after it did the work (the answer is lost).
    failNext(route: RouteName, failure: Failure, options: { afterHandling?: boolean; skip?: number } = {}) {
      failures.push({ route, failure, afterHandling: options.afterHandling ?? false, skip: options.skip ?? 0 });
    },
    // The next request to `route` waits until the returned function is called.
    holdNext(route: RouteName): () => void {
      let release: () => void = () => undefined;
      gates.push({ route, release: new Promise<void>((resolve) => (release = resolve)) });
      return () => release();
    },
  };
}
