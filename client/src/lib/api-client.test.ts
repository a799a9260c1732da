import { afterEach, describe, expect, it, vi } from 'vitest';
import { errorBody, mockApi } from '@/testing/mock-api';
import { api, ApiError, buildApiUrl, setUnauthorizedHandler, tokenStore } from './api-client';

afterEach(() => setUnauthorizedHandler(null));

describe('api client', () => {
  it('sends the stored token as a bearer token', async () => {
    const { calls } = mockApi({ 'GET /auth/me': { body: { id: 'u1' } } });
    tokenStore.set('token-123');
    await api.get('/auth/me');
    expect(calls[0]?.headers.Authorization).toBe('Bearer token-123');
  });

  it('turns an error body into an ApiError with status, message and fields', async () => {
    mockApi({
      'POST /vehicles': {
        status: 400,
        body: errorBody(400, 'Check the highlighted fields.', [
          { field: 'vin', message: 'A VIN has 17 letters and digits, without I, O or Q.' },
        ]),
      },
    });
    const error: unknown = await api.post('/vehicles', {}).catch((caught: unknown) => caught);
    expect(error).toBeInstanceOf(ApiError);
    expect(error).toMatchObject({ status: 400, message: 'Check the highlighted fields.', fields: [{ field: 'vin' }] });
  });

  it('fetches a guarded file as a Blob with the token and the type asked for, and names a refusal', async () => {
    const { calls } = mockApi({
      'GET /inspections/i1/report.pdf': { body: { pdf: true } },
      'GET /inspections/i2/report.pdf': { status: 404, body: errorBody(404, 'No inspection with this id.') },
    });
    tokenStore.set('token-123');
    const blob = await api.getBlob('/inspections/i1/report.pdf', { accept: 'application/pdf' });
    expect(await blob.text()).toBe('{"pdf":true}');
    expect(calls[0]?.headers).toMatchObject({ Accept: 'application/pdf', Authorization: 'Bearer token-123' });
    await expect(api.getBlob('/inspections/i2/report.pdf')).rejects.toMatchObject({
      status: 404,
      message: 'No inspection with this id.',
    });
  });

  it('on a 401 clears the token and calls the registered handler', async () => {
    mockApi({ 'GET /vehicles': { status: 401, body: errorBody(401, 'Your session has expired.') } });
    const handler = vi.fn();
    setUnauthorizedHandler(handler);
    tokenStore.set('expired');
    await expect(api.get('/vehicles')).rejects.toMatchObject({ status: 401 });
    expect(handler).toHaveBeenCalledTimes(1);
    expect(tokenStore.get()).toBeNull();
  });

  it('leaves a refused sign-in to the form', async () => {
    mockApi({ 'POST /auth/login': { status: 401, body: errorBody(401, 'Wrong password.') } });
    const handler = vi.fn();
    setUnauthorizedHandler(handler);
    await expect(api.post('/auth/login', {}, { skipUnauthorizedHandler: true })).rejects.toMatchObject({
      message: 'Wrong password.',
    });
    expect(handler).not.toHaveBeenCalled();
  });

  it('reports a dropped connection as status 0', async () => {
    vi.stubGlobal(
      'fetch',
      vi.fn(() => Promise.reject(new TypeError('Failed to fetch'))),
    );
    await expect(api.get('/health')).rejects.toMatchObject({ status: 0, code: 'network' });
  });

  it('leaves out empty query parameters', () => {
    expect(buildApiUrl('/vehicles', { q: '', kind: 'bus', student: undefined })).toBe('/api/vehicles?kind=bus');
  });
});
