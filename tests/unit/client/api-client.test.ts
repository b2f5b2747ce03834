import { describe, expect, it } from 'vitest';
import { ApiError, apiErrorFromResponse, createApiClient, fieldErrorsFrom } from '../../../src/lib/api-client';

function json(status: number, body: unknown, headers: Record<string, string> = {}): Response {
  return new Response(body === undefined ? null : JSON.stringify(body), {
    status,
    headers: { 'Content-Type': 'application/json', ...headers },
  });
}

type Call = { url: string; init: RequestInit };

function fakeFetch(handler: (call: Call, n: number) => Response) {
  const calls: Call[] = [];
  const impl = (async (url: string, init: RequestInit) => {
    const call = { url, init };
    calls.push(call);
    return handler(call, calls.length);
  }) as unknown as typeof fetch;
  return { impl, calls };
}

const header = (call: Call, name: string) => (call.init.headers as Record<string, string>)[name];

describe('fieldErrorsFrom', () => {
  it('reads zod-flatten details', () => {
    expect(fieldErrorsFrom({ fieldErrors: { email: ['Bad e-mail', 'second'], password: ['Too short'] }, formErrors: [] })).toEqual({
      email: 'Bad e-mail',
      password: 'Too short',
    });
  });
  it('reads a flat field → message map', () => {
    expect(fieldErrorsFrom({ email: 'Already registered', displayName: ['Too long'] })).toEqual({
      email: 'Already registered',
      displayName: 'Too long',
    });
  });
  it('reads a list of issues with paths', () => {
    expect(fieldErrorsFrom([{ path: ['targets', 'kcalMax'], message: 'Too low' }])).toEqual({ 'targets.kcalMax': 'Too low' });
  });
  it('reads a zod tree', () => {
    expect(fieldErrorsFrom({ errors: [], properties: { email: { errors: ['Nope'] } } })).toEqual({ email: 'Nope' });
  });
  it('gives nothing for non-objects', () => {
    expect(fieldErrorsFrom(undefined)).toEqual({});
    expect(fieldErrorsFrom('x')).toEqual({});
  });
});

describe('apiErrorFromResponse', () => {
  it('keeps the server code and message and field errors of a 400', () => {
    const e = apiErrorFromResponse(400, { error: { code: 'validation', message: 'Check the form', details: { fieldErrors: { email: ['Taken'] } } } }, null);
    expect(e).toBeInstanceOf(ApiError);
    expect(e.code).toBe('validation');
    expect(e.message).toBe('Check the form');
    expect(e.fieldErrors).toEqual({ email: 'Taken' });
    expect(e.hasFieldErrors).toBe(true);
  });
  it('says how long to wait on 429 with Retry-After', () => {
    const e = apiErrorFromResponse(429, { error: { code: 'rate_limited', message: 'Too many requests' } }, '42');
    expect(e.message).toContain('42 seconds');
    expect(e.retryAfterSeconds).toBe(42);
  });
  it('is readable on 429 without a body', () => {
    expect(apiErrorFromResponse(429, undefined, null).message).toMatch(/wait a minute/);
  });
  it("does not treat an infeasible rewrite's details as field errors", () => {
    const e = apiErrorFromResponse(
      422,
      { error: { code: 'infeasible', message: 'Best reachable…', details: { bestReachable: { kcal: 1 }, binding: ['proteinMinG'] } } },
      null,
    );
    expect(e.fieldErrors).toEqual({});
    expect(e.details).toEqual({ bestReachable: { kcal: 1 }, binding: ['proteinMinG'] });
  });
  it('falls back to a status message for non-JSON failures', () => {
    expect(apiErrorFromResponse(502, undefined, null).message).toMatch(/server ran into a problem/);
  });
});

describe('createApiClient', () => {
  it('sends GET without a CSRF token, same-origin credentials', async () => {
    const { impl, calls } = fakeFetch(() => json(200, { ok: true }));
    const api = createApiClient(impl);
    await expect(api.get('/api/health')).resolves.toEqual({ ok: true });
    expect(calls).toHaveLength(1);
    expect(calls[0].init.credentials).toBe('same-origin');
    expect(header(calls[0], 'X-CSRF-Token')).toBeUndefined();
  });

  it('fetches the token once and sends it on every unsafe request', async () => {
    const { impl, calls } = fakeFetch((call) => (call.url === '/api/auth/csrf' ? json(200, { token: 'tok-1' }) : json(200, { done: true })));
    const api = createApiClient(impl);
    await api.post('/api/a', { x: 1 });
    await api.patch('/api/b', { y: 2 });
    await api.delete('/api/c');
    const csrfCalls = calls.filter((c) => c.url === '/api/auth/csrf');
    expect(csrfCalls).toHaveLength(1);
    const unsafe = calls.filter((c) => c.url !== '/api/auth/csrf');
    expect(unsafe.map((c) => c.init.method)).toEqual(['POST', 'PATCH', 'DELETE']);
    for (const c of unsafe) {
      expect(header(c, 'X-CSRF-Token')).toBe('tok-1');
      expect(c.init.credentials).toBe('same-origin');
    }
    expect(unsafe[0].init.body).toBe('{"x":1}');
  });

  it('fetches a fresh token after a CSRF rejection and retries once', async () => {
    let tokenN = 0;
    const { impl, calls } = fakeFetch((call) => {
      if (call.url === '/api/auth/csrf') return json(200, { token: `tok-${++tokenN}` });
      return header(call, 'X-CSRF-Token') === 'tok-1' ? json(403, { error: { code: 'csrf_invalid', message: 'Invalid CSRF token' } }) : json(200, { ok: true });
    });
    const api = createApiClient(impl);
    await expect(api.post('/api/x', {})).resolves.toEqual({ ok: true });
    expect(calls.filter((c) => c.url === '/api/x').map((c) => header(c, 'X-CSRF-Token'))).toEqual(['tok-1', 'tok-2']);
  });

  it('does not retry a 403 that is not about CSRF', async () => {
    const { impl, calls } = fakeFetch((call) =>
      call.url === '/api/auth/csrf' ? json(200, { token: 't' }) : json(403, { error: { code: 'forbidden', message: 'Coaches only' } }),
    );
    const api = createApiClient(impl);
    await expect(api.post('/api/swaps', {})).rejects.toMatchObject({ status: 403, code: 'forbidden', message: 'Coaches only' });
    expect(calls.filter((c) => c.url === '/api/swaps')).toHaveLength(1);
  });

  it('gets a new token after resetCsrfToken', async () => {
    let n = 0;
    const { impl, calls } = fakeFetch((call) => (call.url === '/api/auth/csrf' ? json(200, { token: `t${++n}` }) : json(200, {})));
    const api = createApiClient(impl);
    await api.post('/api/auth/login', {});
    api.resetCsrfToken();
    await api.post('/api/auth/logout');
    expect(calls.filter((c) => c.url !== '/api/auth/csrf').map((c) => header(c, 'X-CSRF-Token'))).toEqual(['t1', 't2']);
  });

  it('turns a network failure into a readable ApiError', async () => {
    const impl = (async () => {
      throw new TypeError('Failed to fetch');
    }) as unknown as typeof fetch;
    await expect(createApiClient(impl).get('/api/auth/me')).rejects.toMatchObject({ status: 0, code: 'network' });
  });

  it('returns undefined for 204', async () => {
    const { impl } = fakeFetch((call) => (call.url === '/api/auth/csrf' ? json(200, { token: 't' }) : new Response(null, { status: 204 })));
    await expect(createApiClient(impl).delete('/api/recipes/1')).resolves.toBeUndefined();
  });
});
