import { describe, expect, it, vi } from 'vitest';
import { z } from 'zod';
import { ApiError, buildQueryString, createApiClient, parseProblem } from './api-client';

function json(status: number, body: unknown, contentType = 'application/json'): Response {
  return new Response(JSON.stringify(body), { status, headers: { 'content-type': contentType } });
}

function problem(status: number, code: string, extra: Record<string, unknown> = {}): Response {
  return json(status, { type: 'about:blank', title: `title of ${code}`, status, code, ...extra }, 'application/problem+json');
}

interface Call {
  url: string;
  method: string;
  headers: Record<string, string>;
}

/** A fake server: answers in order and records what the client sent. */
function fakeFetch(...answers: Response[]) {
  const calls: Call[] = [];
  const fetch = vi.fn(async (input: RequestInfo | URL, init?: RequestInit) => {
    calls.push({
      url: String(input),
      method: init?.method ?? 'GET',
      headers: { ...(init?.headers as Record<string, string>) },
    });
    const answer = answers.shift();
    if (!answer) throw new Error(`unexpected request to ${String(input)}`);
    return answer;
  });
  return { fetch: fetch as unknown as typeof globalThis.fetch, calls };
}

describe('parseProblem', () => {
  it('keeps the code, title, detail and field errors of problem details', () => {
    const error = parseProblem(400, {
      type: 'about:blank',
      title: 'Check the form',
      status: 400,
      detail: 'Two fields need attention.',
      code: 'validation_failed',
      errors: { email: ['Enter an e-mail address.'], firstName: ['Enter a name.'] },
    });

    expect(error).toBeInstanceOf(ApiError);
    expect(error.status).toBe(400);
    expect(error.code).toBe('validation_failed');
    expect(error.title).toBe('Check the form');
    expect(error.message).toBe('Two fields need attention.');
    expect(error.fieldErrors).toEqual({ email: ['Enter an e-mail address.'], firstName: ['Enter a name.'] });
  });

  it('falls back to a readable sentence when a proxy answers with HTML', () => {
    const error = parseProblem(502, '<html><body>Bad gateway</body></html>');

    expect(error.code).toBe('http_502');
    expect(error.message).toBe('The server had a problem. Try again in a moment.');
    expect(error.fieldErrors).toEqual({});
  });

  it('uses what it can of an incomplete problem body', () => {
    const error = parseProblem(409, { title: 'Already taken' });

    expect(error.code).toBe('http_409');
    expect(error.message).toBe('Already taken');
  });

  it('trusts the status of the answer over the one written in its body', () => {
    expect(parseProblem(404, { title: 'x', status: 200, code: 'not_found', type: 't' }).status).toBe(404);
  });
});

describe('buildQueryString', () => {
  it('leaves out empty values and encodes the rest', () => {
    expect(buildQueryString({ search: 'Ada & Co', role: undefined, page: 2, sort: '', order: null })).toBe(
      '?search=Ada+%26+Co&page=2',
    );
  });

  it('gives nothing at all when every value is empty', () => {
    expect(buildQueryString({ search: '' })).toBe('');
  });
});

describe('the API client', () => {
  const ok = z.object({ ok: z.boolean() });

  it('asks for the CSRF token once and sends it on every change, never on reads', async () => {
    const server = fakeFetch(json(200, { token: 'tok-1' }), json(200, { ok: true }), json(200, { ok: true }), json(200, { ok: true }));
    const client = createApiClient({ fetch: server.fetch });

    await client.post('/a', { body: {}, schema: ok });
    await client.patch('/b', { body: {}, schema: ok });
    await client.get('/c', { schema: ok });

    expect(server.calls.map((call) => `${call.method} ${call.url}`)).toEqual([
      'GET /api/auth/csrf',
      'POST /api/a',
      'PATCH /api/b',
      'GET /api/c',
    ]);
    expect(server.calls[1]?.headers['x-csrf-token']).toBe('tok-1');
    expect(server.calls[2]?.headers['x-csrf-token']).toBe('tok-1');
    expect(server.calls[3]?.headers['x-csrf-token']).toBeUndefined();
  });

  it('when the CSRF token is refused, fetches a fresh one and tries once more', async () => {
    const server = fakeFetch(
      json(200, { token: 'old' }),
      problem(403, 'csrf_invalid'),
      json(200, { token: 'new' }),
      json(200, { ok: true }),
    );
    const client = createApiClient({ fetch: server.fetch });

    await expect(client.post('/a', { schema: ok })).resolves.toEqual({ ok: true });
    expect(server.calls[3]?.headers['x-csrf-token']).toBe('new');
  });

  it('gives up after one retry when the fresh CSRF token is refused as well', async () => {
    const server = fakeFetch(
      json(200, { token: 'old' }),
      problem(403, 'csrf_invalid'),
      json(200, { token: 'new' }),
      problem(403, 'csrf_invalid'),
    );
    const client = createApiClient({ fetch: server.fetch });

    await expect(client.post('/a')).rejects.toMatchObject({ status: 403, code: 'csrf_invalid' });
    expect(server.calls).toHaveLength(4);
  });

  it('does not retry a 403 that is about permissions', async () => {
    const server = fakeFetch(json(200, { token: 't' }), problem(403, 'forbidden'));
    const client = createApiClient({ fetch: server.fetch });

    await expect(client.post('/a')).rejects.toMatchObject({ code: 'forbidden' });
    expect(server.calls).toHaveLength(2);
  });

  it('tells the app in one place when the person is no longer signed in', async () => {
    const server = fakeFetch(problem(401, 'unauthenticated'));
    const client = createApiClient({ fetch: server.fetch });
    const onUnauthorized = vi.fn();
    client.onUnauthorized(onUnauthorized);

    await expect(client.get('/members')).rejects.toMatchObject({ status: 401 });
    expect(onUnauthorized).toHaveBeenCalledOnce();
  });

  it('turns a failed connection into a network error', async () => {
    const fetch = vi.fn(async () => {
      throw new TypeError('fetch failed');
    }) as unknown as typeof globalThis.fetch;
    const client = createApiClient({ fetch });

    await expect(client.get('/shop')).rejects.toMatchObject({ status: 0, code: 'network_error' });
  });

  it('refuses an answer that does not match the contract', async () => {
    const server = fakeFetch(json(200, { ok: 'yes' }));
    const client = createApiClient({ fetch: server.fetch });

    await expect(client.get('/a', { schema: ok })).rejects.toMatchObject({ code: 'invalid_response' });
  });

  it('accepts an empty 204 answer when no body is expected', async () => {
    const server = fakeFetch(json(200, { token: 't' }), new Response(null, { status: 204 }));
    const client = createApiClient({ fetch: server.fetch });

    await expect(client.post('/auth/logout')).resolves.toBeUndefined();
  });

  it('sends JSON bodies with the session cookie of this origin only', async () => {
    const seen: RequestInit[] = [];
    const fetch = vi.fn(async (_input: RequestInfo | URL, init?: RequestInit) => {
      seen.push(init ?? {});
      return seen.length === 1 ? json(200, { token: 't' }) : json(200, { ok: true });
    }) as unknown as typeof globalThis.fetch;
    const client = createApiClient({ fetch });

    await client.put('/profile', { body: { firstName: 'Ada' }, schema: ok });

    expect(seen[1]?.credentials).toBe('same-origin');
    expect(seen[1]?.body).toBe('{"firstName":"Ada"}');
    expect((seen[1]?.headers as Record<string, string>)['content-type']).toBe('application/json');
  });
});

interface FakeUpload {
  method: string;
  url: string;
  headers: Record<string, string>;
  body: unknown;
}

/** Stands in for the browser's XMLHttpRequest: reports progress in two steps, then answers. */
function fakeXhr(...answers: { status: number; body?: unknown }[]) {
  const sent: FakeUpload[] = [];
  class FakeRequest {
    status = 0;
    responseText = '';
    upload: { onprogress: ((event: { lengthComputable: boolean; loaded: number; total: number }) => void) | null } = {
      onprogress: null,
    };
    onload: (() => void) | null = null;
    onerror: (() => void) | null = null;
    onabort: (() => void) | null = null;
    private current: FakeUpload = { method: '', url: '', headers: {}, body: undefined };

    open(method: string, url: string) {
      this.current = { method, url, headers: {}, body: undefined };
    }
    setRequestHeader(name: string, value: string) {
      this.current.headers[name] = value;
    }
    abort() {
      this.onabort?.();
    }
    send(body: unknown) {
      this.current.body = body;
      sent.push(this.current);
      const answer = answers.shift();
      if (!answer) {
        this.onerror?.();
        return;
      }
      this.upload.onprogress?.({ lengthComputable: true, loaded: 50, total: 100 });
      this.upload.onprogress?.({ lengthComputable: true, loaded: 100, total: 100 });
      this.status = answer.status;
      this.responseText = answer.body === undefined ? '' : JSON.stringify(answer.body);
      this.onload?.();
    }
  }
  return { xhr: () => new FakeRequest() as unknown as XMLHttpRequest, sent };
}

describe('uploading a file', () => {
  it('sends the form with the CSRF token and reports how much has gone out', async () => {
    const server = fakeFetch(json(200, { token: 'tok-u' }));
    const device = fakeXhr({ status: 204 });
    const client = createApiClient({ fetch: server.fetch, xhr: device.xhr });
    const form = new FormData();
    form.append('photo', new Blob(['x'], { type: 'image/png' }), 'me.png');
    const progress: number[] = [];

    await expect(client.upload('/members/m1/photo', { method: 'PUT', body: form, onProgress: (f) => progress.push(f) })).resolves.toBeUndefined();

    expect(device.sent).toEqual([
      { method: 'PUT', url: '/api/members/m1/photo', headers: expect.objectContaining({ 'x-csrf-token': 'tok-u' }), body: form },
    ]);
    expect(progress).toEqual([0.5, 1]);
  });

  it('turns a refused file into the same error as any other call, code and all', async () => {
    const server = fakeFetch(json(200, { token: 't' }));
    const device = fakeXhr({ status: 413, body: { type: 'about:blank', title: 'Too large', status: 413, code: 'too_large' } });
    const client = createApiClient({ fetch: server.fetch, xhr: device.xhr });

    await expect(client.upload('/members/m1/photo', { body: new FormData() })).rejects.toMatchObject({ status: 413, code: 'too_large' });
  });

  it('checks the answer against the contract', async () => {
    const server = fakeFetch(json(200, { token: 't' }));
    const device = fakeXhr({ status: 201, body: { ok: true } });
    const client = createApiClient({ fetch: server.fetch, xhr: device.xhr });

    await expect(client.upload('/x', { body: new FormData(), schema: z.object({ ok: z.boolean() }) })).resolves.toEqual({ ok: true });
  });

  it('tries once more with a fresh token when the old one is refused', async () => {
    const server = fakeFetch(json(200, { token: 'old' }), json(200, { token: 'new' }));
    const device = fakeXhr({ status: 403, body: { type: 't', title: 't', status: 403, code: 'csrf_invalid' } }, { status: 204 });
    const client = createApiClient({ fetch: server.fetch, xhr: device.xhr });

    await client.upload('/x', { body: new FormData() });

    expect(device.sent.map((upload) => upload.headers['x-csrf-token'])).toEqual(['old', 'new']);
  });

  it('turns a dropped connection into a network error', async () => {
    const server = fakeFetch(json(200, { token: 't' }));
    const client = createApiClient({ fetch: server.fetch, xhr: fakeXhr().xhr });

    await expect(client.upload('/x', { body: new FormData() })).rejects.toMatchObject({ code: 'network_error' });
  });
});
