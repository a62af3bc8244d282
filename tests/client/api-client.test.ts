/**
 * The client's one door to the API, driven by a fake fetch that answers with real WHATWG `Response`
 * objects (Node's built-in fetch implementation). Status meanings per RFC 9110 §15 (401 Unauthorized,
 * 409 Conflict; 204 No Content carries no body); the error body per PRODUCT.md §8 / shared/errors.ts.
 */
import { describe, expect, it, vi } from 'vitest';
import { ApiError, createApiClient, errorFromResponse } from '../../src/lib/api-client';

type Call = { url: string; init: RequestInit };

function fakeFetch(respond: (call: Call) => Response | Promise<Response>) {
  const calls: Call[] = [];
  const fetch = vi.fn(async (url: string, init: RequestInit = {}) => {
    const call = { url, init };
    calls.push(call);
    return respond(call);
  });
  return { fetch, calls };
}

const json = (status: number, body: unknown) =>
  new Response(JSON.stringify(body), { status, headers: { 'Content-Type': 'application/json' } });

describe('api-client', () => {
  it('sends JSON with the session cookie and returns the parsed answer', async () => {
    const { fetch, calls } = fakeFetch(() => json(201, { id: 7, version: 1 }));
    const api = createApiClient({ fetch });
    const answer = await api.post<{ id: number }>('/api/workshops/1/designs', { name: 'Box' });
    expect(answer).toEqual({ id: 7, version: 1 });
    expect(calls[0]!.url).toBe('/api/workshops/1/designs');
    expect(calls[0]!.init.method).toBe('POST');
    expect(calls[0]!.init.credentials).toBe('same-origin');
    expect(new Headers(calls[0]!.init.headers).get('Content-Type')).toBe('application/json');
    expect(JSON.parse(String(calls[0]!.init.body))).toEqual({ name: 'Box' });
  });

  it('returns undefined for 204 No Content', async () => {
    const { fetch } = fakeFetch(() => new Response(null, { status: 204 }));
    await expect(createApiClient({ fetch }).delete('/api/workshops/1/designs/3')).resolves.toBeUndefined();
  });

  it('turns a 400 into an ApiError with code, message and fields', async () => {
    const { fetch } = fakeFetch(() =>
      json(400, { error: { code: 'invalid_input', message: 'braces[1].position: outside', fields: { 'braces[1].position': 'outside the cavity' } } }),
    );
    const error = await createApiClient({ fetch }).put('/api/x', {}).catch((e: unknown) => e);
    expect(error).toBeInstanceOf(ApiError);
    const apiError = error as ApiError;
    expect(apiError.status).toBe(400);
    expect(apiError.code).toBe('invalid_input');
    expect(apiError.fields).toEqual({ 'braces[1].position': 'outside the cavity' });
  });

  it('marks a 409 as a conflict and keeps the server message', async () => {
    const { fetch } = fakeFetch(() => json(409, { error: { code: 'edited_elsewhere', message: 'Edited by someone else.' } }));
    const error = (await createApiClient({ fetch }).put('/api/x', {}).catch((e: unknown) => e)) as ApiError;
    expect(error.isConflict).toBe(true);
    expect(error.message).toBe('Edited by someone else.');
    expect(error.fields).toEqual({});
  });

  it('calls onUnauthorized on a 401, unless the request opts out', async () => {
    const onUnauthorized = vi.fn();
    const { fetch } = fakeFetch(() => json(401, { error: { code: 'not_signed_in', message: 'Please sign in.' } }));
    const api = createApiClient({ fetch, onUnauthorized });
    await expect(api.get('/api/workshops/1/designs')).rejects.toMatchObject({ status: 401, code: 'not_signed_in' });
    expect(onUnauthorized).toHaveBeenCalledTimes(1);
    await expect(api.get('/api/auth/me', { authRedirect: false })).rejects.toMatchObject({ status: 401 });
    expect(onUnauthorized).toHaveBeenCalledTimes(1);
  });

  it('gives a plain message when the error body is not ours (a proxy page, a crash)', async () => {
    const html = await errorFromResponse(new Response('<html>Bad gateway</html>', { status: 502 }));
    expect(html).toMatchObject({ status: 502, code: 'http_502', message: 'The server had a problem. Please try again.' });
    const wrongShape = await errorFromResponse(json(403, { message: 'nope' }));
    expect(wrongShape).toMatchObject({ status: 403, code: 'http_403', message: 'You do not have access to this.' });
    // Non-string field messages are dropped rather than shown as "[object Object]".
    const mixed = await errorFromResponse(json(400, { error: { code: 'invalid_input', message: 'bad', fields: { a: 'x', b: { deep: 1 } } } }));
    expect(mixed.fields).toEqual({ a: 'x' });
  });

  it('reports an unreachable server as status 0 with a plain message', async () => {
    const fetch = vi.fn(async () => {
      throw new TypeError('fetch failed');
    });
    const error = (await createApiClient({ fetch }).get('/api/health').catch((e: unknown) => e)) as ApiError;
    expect(error).toBeInstanceOf(ApiError);
    expect(error.status).toBe(0);
    expect(error.code).toBe('network');
  });

  it('reports an unreadable 200 answer instead of throwing a SyntaxError', async () => {
    const { fetch } = fakeFetch(() => new Response('not json', { status: 200 }));
    await expect(createApiClient({ fetch }).get('/api/health')).rejects.toMatchObject({ code: 'bad_response' });
  });
});
