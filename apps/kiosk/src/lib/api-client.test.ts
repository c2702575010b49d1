import { describe, expect, it } from 'vitest';
import { z } from 'zod';
import { ApiError, createApiClient } from './api-client';

interface Call {
  url: string;
  method: string;
  headers: Record<string, string>;
  body: string | undefined;
}

function json(status: number, body: unknown, type = 'application/json'): Response {
  return new Response(JSON.stringify(body), { status, headers: { 'content-type': type } });
}

function problem(status: number, code: string, detail: string): Response {
  // RFC 9457 problem details, as the server answers every error.
  return json(status, { type: `/problems/${code}`, title: 'Error', status, detail, code }, 'application/problem+json');
}

function fakeServer(answer: (call: Call, calls: Call[]) => Response) {
  const calls: Call[] = [];
  const fetchImpl: typeof fetch = async (input, init) => {
    const call: Call = {
      url: String(input),
      method: init?.method ?? 'GET',
      headers: Object.fromEntries(Object.entries((init?.headers as Record<string, string> | undefined) ?? {})),
      body: typeof init?.body === 'string' ? init.body : undefined,
    };
    calls.push(call);
    return answer(call, calls);
  };
  return { calls, fetchImpl };
}

describe('kiosk API client', () => {
  it('fetches the CSRF token once and sends it on every POST', async () => {
    const server = fakeServer((call) => (call.url === '/api/auth/csrf' ? json(200, { token: 'tok-1' }) : new Response(null, { status: 204 })));
    const api = createApiClient(server.fetchImpl);

    await api.post('/station/heartbeat');
    await api.post('/station/heartbeat');

    expect(server.calls.map((c) => `${c.method} ${c.url}`)).toEqual([
      'GET /api/auth/csrf',
      'POST /api/station/heartbeat',
      'POST /api/station/heartbeat',
    ]);
    expect(server.calls.filter((c) => c.method === 'POST').every((c) => c.headers['x-csrf-token'] === 'tok-1')).toBe(true);
  });

  it('does not send a token with GET requests', async () => {
    const server = fakeServer(() => json(200, { ok: true }));
    const api = createApiClient(server.fetchImpl);

    await api.get('/station', z.object({ ok: z.boolean() }));

    expect(server.calls).toHaveLength(1);
    expect(server.calls[0]?.headers['x-csrf-token']).toBeUndefined();
  });

  it('after csrf_invalid fetches a fresh token and tries once more', async () => {
    let tokens = 0;
    const server = fakeServer((call, calls) => {
      if (call.url === '/api/auth/csrf') return json(200, { token: `tok-${++tokens}` });
      const posts = calls.filter((c) => c.method === 'POST').length;
      return posts === 1 ? problem(403, 'csrf_invalid', 'Reload and try again.') : json(200, { id: 'x' });
    });
    const api = createApiClient(server.fetchImpl);

    const answer = await api.post('/station/pair', { pairingCode: 'ABCDEFGH' }, z.object({ id: z.string() }));

    expect(answer).toEqual({ id: 'x' });
    expect(server.calls.filter((c) => c.method === 'POST').map((c) => c.headers['x-csrf-token'])).toEqual(['tok-1', 'tok-2']);
  });

  it('turns problem details into an ApiError with the status, code and detail', async () => {
    const server = fakeServer((call) =>
      call.url === '/api/auth/csrf' ? json(200, { token: 't' }) : problem(401, 'wrong_pin', 'That PIN is not right. Try again.'),
    );
    const api = createApiClient(server.fetchImpl);

    const error = await api.post('/station/instructor', { badge: 'b', pin: '1234' }).catch((e: unknown) => e);

    expect(error).toBeInstanceOf(ApiError);
    expect(error).toMatchObject({ status: 401, code: 'wrong_pin', message: 'That PIN is not right. Try again.' });
  });

  it('reports an unreachable server as status 0, network_error', async () => {
    const api = createApiClient(async () => {
      throw new TypeError('fetch failed');
    });

    const error = await api.get('/station', z.object({})).catch((e: unknown) => e);

    expect(error).toMatchObject({ status: 0, code: 'network_error' });
  });

  it('an answer that is not problem details still gives a readable error', async () => {
    const api = createApiClient(async () => new Response('<html>Bad gateway</html>', { status: 502 }));

    const error = await api.get('/station', z.object({})).catch((e: unknown) => e);

    expect(error).toMatchObject({ status: 502, code: 'http_502' });
  });
});
