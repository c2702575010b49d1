import { problemSchema, STATION_REQUEST_HEADER, type Problem } from '@chuckkey/core';
import type { z } from 'zod';

/** Every failed call ends as one of these; status 0 means the server could not be reached. */
export class ApiError extends Error {
  readonly status: number;
  readonly problem: Problem | null;

  constructor(status: number, problem: Problem | null, message?: string) {
    super(message ?? problem?.detail ?? problem?.title ?? `The server answered ${status}.`);
    this.name = 'ApiError';
    this.status = status;
    this.problem = problem;
  }

  get code(): string {
    if (this.problem) return this.problem.code;
    return this.status === 0 ? 'network_error' : `http_${this.status}`;
  }

  /** A further member of the problem details (RFC 9457 §3.2), such as the basket line a refusal names. */
  extension(name: string): unknown {
    return this.problem ? (this.problem as Record<string, unknown>)[name] : undefined;
  }
}

export function isApiError(error: unknown, status?: number): error is ApiError {
  return error instanceof ApiError && (status === undefined || error.status === status);
}

async function readProblem(response: Response): Promise<Problem | null> {
  try {
    // Loose: the members a route adds to the problem (RFC 9457 §3.2) are kept for `extension()`.
    const parsed = problemSchema.loose().safeParse(await response.json());
    return parsed.success ? parsed.data : null;
  } catch {
    return null;
  }
}

type Result<S> = S extends z.ZodType ? z.output<S> : void;

/**
 * One client per page. A kiosk has no signed-in person and no web session: its device cookie is
 * its credential, and every POST carries the station request header, the station routes' CSRF
 * defence (the server refuses writes without it).
 */
export function createApiClient(fetchImpl: typeof fetch = (input, init) => globalThis.fetch(input, init)) {
  async function send(path: string, init: RequestInit, timeoutMs?: number): Promise<Response> {
    // A network that drops without a word (a half-open connection) would leave a request waiting
    // for ever; with a time limit it ends as "not reached", like a refused connection.
    const limit = timeoutMs === undefined ? undefined : AbortSignal.timeout(timeoutMs);
    const signal = limit && init.signal ? AbortSignal.any([init.signal, limit]) : (limit ?? init.signal);
    try {
      return await fetchImpl(`/api${path}`, { credentials: 'same-origin', ...init, ...(signal ? { signal } : {}) });
    } catch (cause) {
      if (init.signal?.aborted) throw cause;
      throw new ApiError(0, null, 'The shop’s server does not answer.');
    }
  }

  /** Answers are checked against core's schema, so a server of another version fails loudly. */
  async function get<S extends z.ZodType>(path: string, schema: S, signal?: AbortSignal): Promise<z.output<S>> {
    const response = await send(path, { headers: { accept: 'application/json' }, signal });
    if (!response.ok) throw new ApiError(response.status, await readProblem(response));
    return schema.parse(await response.json());
  }

  /** `timeoutMs`: give up after this long, as though the server could not be reached (status 0). */
  async function post<S extends z.ZodType | undefined = undefined>(path: string, body?: unknown, schema?: S, options: { timeoutMs?: number } = {}): Promise<Result<S>> {
    const response = await send(
      path,
      {
        method: 'POST',
        headers: { accept: 'application/json', 'content-type': 'application/json', [STATION_REQUEST_HEADER]: '1' },
        body: JSON.stringify(body ?? {}),
      },
      options.timeoutMs,
    );
    if (!response.ok) throw new ApiError(response.status, await readProblem(response));
    if (!schema) return undefined as Result<S>;
    return schema.parse(await response.json()) as Result<S>;
  }

  return { get, post };
}

const client = createApiClient();

export function apiGet<S extends z.ZodType>(path: string, schema: S, signal?: AbortSignal): Promise<z.output<S>> {
  return client.get(path, schema, signal);
}

export function apiPost<S extends z.ZodType | undefined = undefined>(path: string, body?: unknown, schema?: S, options?: { timeoutMs?: number }): Promise<Result<S>> {
  return client.post(path, body, schema, options);
}
