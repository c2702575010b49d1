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
  it('sends the station request header on every POST and fetches nothing else first', async () => {
    const server = fakeServer(() => new Response(null, { status: 204 }));
    const api = createApiClient(server.fetchImpl);

    await api.post('/station/heartbeat');
    await api.post('/station/heartbeat');

    expect(server.calls.map((c) => `${c.method} ${c.url}`)).toEqual(['POST /api/station/heartbeat', 'POST /api/station/heartbeat']);
    expect(server.calls.every((c) => c.headers['x-chuckkey-station'] === '1')).toBe(true);
    expect(server.calls.every((c) => c.headers['content-type'] === 'application/json')).toBe(true);
  });

  it('does not send the header with GET requests', async () => {
    const server = fakeServer(() => json(200, { ok: true }));
    const api = createApiClient(server.fetchImpl);

    await api.get('/station', z.object({ ok: z.boolean() }));

    expect(server.calls).toHaveLength(1);
    expect(server.calls[0]?.headers['x-chuckkey-station']).toBeUndefined();
  });

  it('turns problem details into an ApiError with the status, code and detail', async () => {
    const server = fakeServer(() => problem(401, 'wrong_pin', 'That PIN is not right. Try again.'));
    const api = createApiClient(server.fetchImpl);

    const error = await api.post('/station/instructor', { badge: 'b', pin: '1234' }).catch((e: unknown) => e);

    expect(error).toBeInstanceOf(ApiError);
    expect(error).toMatchObject({ status: 401, code: 'wrong_pin', message: 'That PIN is not right. Try again.' });
  });

  it('keeps the further members a problem carries, such as the basket line it names (RFC 9457 §3.2)', async () => {
    const server = fakeServer(() =>
      json(409, { type: '/problems/already_out', title: 'Conflict', status: 409, code: 'already_out', itemId: '5d1c1f0e-8a3b-4c55-9a4e-2f7d6b1c0a99' }, 'application/problem+json'),
    );
    const api = createApiClient(server.fetchImpl);

    const error = await api.post('/station/crib/checkouts', {}).catch((e: unknown) => e);

    expect(error).toBeInstanceOf(ApiError);
    expect((error as ApiError).extension('itemId')).toBe('5d1c1f0e-8a3b-4c55-9a4e-2f7d6b1c0a99');
    expect((error as ApiError).extension('reasons')).toBeUndefined();
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

  it('gives up on a POST that never answers after its time limit, as not reached (status 0)', async () => {
    // A fetch that hangs until it is aborted, as over a connection the network dropped silently.
    const fetchImpl: typeof fetch = (_input, init) =>
      new Promise((_resolve, reject) => init?.signal?.addEventListener('abort', () => reject(init.signal?.reason as Error)));
    const api = createApiClient(fetchImpl);

    const error = await api.post('/station/heartbeat', {}, undefined, { timeoutMs: 20 }).catch((caught: unknown) => caught);

    expect(error).toBeInstanceOf(ApiError);
    expect((error as ApiError).status).toBe(0);
    expect((error as ApiError).code).toBe('network_error');
  });
});
