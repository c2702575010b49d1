import { describe, expect, it } from 'vitest';
import { createApiClient } from '@/lib/api-client';
import { END_RETRY_MS } from '../hooks/use-end-queue';
import { END_SEND_TIMEOUT_MS, PENDING_ENDS_KEY, endNow, flushPendingEnds, keepPendingEnd, readPendingEnds, type KeyValueStorage } from './end-queue';

const SESSION = '6f1c2a8e-3b4d-4e5f-8a9b-0c1d2e3f4a5b';
const OTHER_SESSION = '7a2b3c4d-5e6f-4a8b-9c0d-1e2f3a4b5c6d';
const KEY = '0d9c8b7a-6f5e-4d3c-8b2a-1f0e9d8c7b6a';
const OTHER_KEY = '1e0d9c8b-7a6f-4e5d-9c3b-2a1f0e9d8c7b';

function fakeStorage(): KeyValueStorage & { data: Map<string, string> } {
  const data = new Map<string, string>();
  return {
    data,
    getItem: (key) => data.get(key) ?? null,
    setItem: (key, value) => void data.set(key, value),
    removeItem: (key) => void data.delete(key),
  };
}

interface Sent {
  url: string;
  body: Record<string, unknown>;
}

/** A server that is down, up, or answers with a status, switched by the test. */
function fakeServer() {
  const sent: Sent[] = [];
  const server = { mode: 'down' as 'down' | 'up' | 502 | 409, sent };
  const fetchImpl: typeof fetch = async (input, init) => {
    const url = String(input);
    if (server.mode === 'down') throw new TypeError('fetch failed');
    const body = JSON.parse(String(init?.body)) as Record<string, unknown>;
    sent.push({ url, body });
    if (server.mode === 502) return new Response('Bad gateway', { status: 502 });
    if (server.mode === 409) {
      // RFC 9457 problem details, as the server answers every error.
      return Response.json({ type: '/problems/session_ended', title: 'Conflict', status: 409, code: 'session_ended', detail: 'Already ended.' }, { status: 409 });
    }
    const id = url.split('/')[4] ?? '';
    return Response.json({ id, startedAt: '2026-12-01T10:00:00.000Z', endedAt: String(body.endedAt ?? '2026-12-01T11:00:00.000Z'), hours: 1 });
  };
  return { server, client: createApiClient(fetchImpl) };
}

const pressedAt = new Date('2026-12-01T11:30:00.000Z');

describe('the offline end queue', () => {
  it('ends at once when the server answers, and keeps nothing', async () => {
    const { server, client } = fakeServer();
    server.mode = 'up';
    const storage = fakeStorage();

    const outcome = await endNow(client, storage, { sessionId: SESSION, idempotencyKey: KEY, pressedAt });

    expect(outcome.kind).toBe('ended');
    expect(server.sent).toEqual([{ url: `/api/station/sessions/${SESSION}/end`, body: { idempotencyKey: KEY } }]);
    expect(storage.data.size).toBe(0);
  });

  it('keeps an end pressed while offline with its time and key, and sends it with them once the server is back', async () => {
    const { server, client } = fakeServer();
    const storage = fakeStorage();

    const outcome = await endNow(client, storage, { sessionId: SESSION, idempotencyKey: KEY, pressedAt });
    expect(outcome).toEqual({ kind: 'kept', pending: { sessionId: SESSION, endedAt: pressedAt.toISOString(), idempotencyKey: KEY } });
    expect(JSON.parse(storage.data.get(PENDING_ENDS_KEY) ?? '[]')).toHaveLength(1);

    // Still down: the end stays.
    expect((await flushPendingEnds(client, storage)).kept).toHaveLength(1);

    server.mode = 'up';
    const flushed = await flushPendingEnds(client, storage);

    expect(flushed).toEqual({ answered: [{ sessionId: SESSION, endedAt: pressedAt.toISOString(), idempotencyKey: KEY }], kept: [] });
    expect(server.sent).toEqual([{ url: `/api/station/sessions/${SESSION}/end`, body: { idempotencyKey: KEY, endedAt: pressedAt.toISOString() } }]);
    expect(storage.data.has(PENDING_ENDS_KEY)).toBe(false);
  });

  it('keeps the end while the server answers with a 5xx', async () => {
    const { server, client } = fakeServer();
    server.mode = 502;
    const storage = fakeStorage();

    expect((await endNow(client, storage, { sessionId: SESSION, idempotencyKey: KEY, pressedAt })).kind).toBe('kept');
    expect((await flushPendingEnds(client, storage)).kept).toHaveLength(1);
  });

  it('drops an end the server refused: trying it again would never succeed', async () => {
    const { server, client } = fakeServer();
    const storage = fakeStorage();
    keepPendingEnd(storage, { sessionId: SESSION, endedAt: pressedAt.toISOString(), idempotencyKey: KEY });

    server.mode = 409;
    const flushed = await flushPendingEnds(client, storage);

    expect(flushed.kept).toEqual([]);
    expect(server.sent).toHaveLength(1);
  });

  it('refuses at once, keeping nothing, when the server says no', async () => {
    const { server, client } = fakeServer();
    server.mode = 409;
    const storage = fakeStorage();

    const outcome = await endNow(client, storage, { sessionId: SESSION, idempotencyKey: KEY, pressedAt });

    expect(outcome.kind).toBe('refused');
    expect(storage.data.size).toBe(0);
  });

  it('keeps one end per session, and sends several in the order they were pressed', async () => {
    const { server, client } = fakeServer();
    const storage = fakeStorage();
    keepPendingEnd(storage, { sessionId: SESSION, endedAt: pressedAt.toISOString(), idempotencyKey: KEY });
    keepPendingEnd(storage, { sessionId: SESSION, endedAt: new Date().toISOString(), idempotencyKey: OTHER_KEY });
    keepPendingEnd(storage, { sessionId: OTHER_SESSION, endedAt: pressedAt.toISOString(), idempotencyKey: OTHER_KEY });
    expect(readPendingEnds(storage).map((end) => end.idempotencyKey)).toEqual([KEY, OTHER_KEY]);

    server.mode = 'up';
    await flushPendingEnds(client, storage);

    expect(server.sent.map((call) => call.url)).toEqual([`/api/station/sessions/${SESSION}/end`, `/api/station/sessions/${OTHER_SESSION}/end`]);
  });

  it('reads a damaged entry as nothing kept', () => {
    const storage = fakeStorage();
    storage.setItem(PENDING_ENDS_KEY, '{not json');
    expect(readPendingEnds(storage)).toEqual([]);
    storage.setItem(PENDING_ENDS_KEY, JSON.stringify([{ sessionId: 1 }]));
    expect(readPendingEnds(storage)).toEqual([]);
  });

  it('sends each end with a time limit shorter than the retry interval, so a hung request cannot hold the queue', async () => {
    const signals: (AbortSignal | null | undefined)[] = [];
    const client = createApiClient(async (_input, init) => {
      signals.push(init?.signal);
      throw new TypeError('fetch failed');
    });
    const storage = fakeStorage();

    await endNow(client, storage, { sessionId: SESSION, idempotencyKey: KEY, pressedAt });
    await flushPendingEnds(client, storage);

    expect(signals).toHaveLength(2);
    expect(signals.every((signal) => signal instanceof AbortSignal)).toBe(true);
    expect(END_SEND_TIMEOUT_MS).toBeLessThan(END_RETRY_MS);
  });
});
