import { sessionEndedSchema, type SessionEnded } from '@chuckkey/core';
import { z } from 'zod';
import { isApiError, type createApiClient } from '@/lib/api-client';

/**
 * An "End session" pressed while the server cannot be reached is kept on the device with the
 * time it was pressed and its idempotency key, and sent again until the server answers. The
 * server applies a key once, so a reply lost on the way back does no harm when it is sent again.
 * No badge code is kept: a station may end its own session without one.
 */
export const PENDING_ENDS_KEY = 'chuckkey.station.pending-ends';

const pendingEndSchema = z.object({
  sessionId: z.string().min(1),
  endedAt: z.string().min(1),
  idempotencyKey: z.string().min(1),
});
export type PendingEnd = z.infer<typeof pendingEndSchema>;

/**
 * An end that has no answer in this long counts as not reached and is kept (or stays kept): a
 * request left hanging by a dropped network must not hold the queue. Shorter than the retry
 * interval, so one pass is over before the next begins.
 */
export const END_SEND_TIMEOUT_MS = 8_000;

export type KeyValueStorage = Pick<Storage, 'getItem' | 'setItem' | 'removeItem'>;
export type EndClient = Pick<ReturnType<typeof createApiClient>, 'post'>;

/** Unreachable or failing on its side: worth trying again. Any other answer is final. */
export function isUnreachable(error: unknown): boolean {
  return isApiError(error) && (error.status === 0 || error.status >= 500);
}

export function readPendingEnds(storage: KeyValueStorage): PendingEnd[] {
  const raw = storage.getItem(PENDING_ENDS_KEY);
  if (!raw) return [];
  try {
    const parsed = z.array(pendingEndSchema).safeParse(JSON.parse(raw));
    return parsed.success ? parsed.data : [];
  } catch {
    return [];
  }
}

function writePendingEnds(storage: KeyValueStorage, ends: PendingEnd[]): void {
  if (ends.length === 0) storage.removeItem(PENDING_ENDS_KEY);
  else storage.setItem(PENDING_ENDS_KEY, JSON.stringify(ends));
}

/** Keeps an end; one session is ended once, so a second press for it keeps the first. */
export function keepPendingEnd(storage: KeyValueStorage, end: PendingEnd): PendingEnd[] {
  const ends = readPendingEnds(storage);
  if (!ends.some((kept) => kept.sessionId === end.sessionId)) ends.push(end);
  writePendingEnds(storage, ends);
  return ends;
}

export function dropPendingEnd(storage: KeyValueStorage, idempotencyKey: string): PendingEnd[] {
  const ends = readPendingEnds(storage).filter((kept) => kept.idempotencyKey !== idempotencyKey);
  writePendingEnds(storage, ends);
  return ends;
}

export function sendEnd(
  client: EndClient,
  input: { sessionId: string; idempotencyKey: string; endedAt?: string | undefined; badge?: string | undefined },
): Promise<SessionEnded> {
  const body = { idempotencyKey: input.idempotencyKey, ...(input.endedAt ? { endedAt: input.endedAt } : {}), ...(input.badge ? { badge: input.badge } : {}) };
  return client.post(`/station/sessions/${encodeURIComponent(input.sessionId)}/end`, body, sessionEndedSchema, { timeoutMs: END_SEND_TIMEOUT_MS });
}

export type EndOutcome =
  | { kind: 'ended'; ended: SessionEnded }
  | { kind: 'kept'; pending: PendingEnd }
  | { kind: 'refused'; error: unknown };

/**
 * Ends a session now. Unreachable, the end is kept with the time it was pressed; refused (not
 * allowed, already over), the refusal is the answer.
 */
export async function endNow(
  client: EndClient,
  storage: KeyValueStorage,
  input: { sessionId: string; idempotencyKey: string; pressedAt: Date; badge?: string | undefined },
): Promise<EndOutcome> {
  try {
    return { kind: 'ended', ended: await sendEnd(client, input) };
  } catch (error) {
    if (!isUnreachable(error)) return { kind: 'refused', error };
    const pending = { sessionId: input.sessionId, endedAt: input.pressedAt.toISOString(), idempotencyKey: input.idempotencyKey };
    keepPendingEnd(storage, pending);
    return { kind: 'kept', pending };
  }
}

/**
 * One pass over the kept ends, oldest first. An end the server answered, with the session ended
 * or a final refusal (a session already closed by the heartbeat job, a time too old), is
 * dropped; one it could not be reached for stays for the next pass.
 */
export async function flushPendingEnds(client: EndClient, storage: KeyValueStorage): Promise<{ answered: PendingEnd[]; kept: PendingEnd[] }> {
  const answered: PendingEnd[] = [];
  for (const end of readPendingEnds(storage)) {
    try {
      await sendEnd(client, end);
    } catch (error) {
      if (isUnreachable(error)) break;
    }
    dropPendingEnd(storage, end.idempotencyKey);
    answered.push(end);
  }
  return { answered, kept: readPendingEnds(storage) };
}
