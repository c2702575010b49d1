import { csrfResponseSchema, problemSchema } from '@chuckkey/core';
import type { z } from 'zod';

export type FieldErrors = Record<string, string[]>;

interface ApiErrorInit {
  status: number;
  code: string;
  title: string;
  detail?: string | undefined;
  fieldErrors?: FieldErrors | undefined;
}

/** Every failed call to the API ends up as one of these, whatever went wrong on the way. */
export class ApiError extends Error {
  readonly status: number;
  readonly code: string;
  readonly title: string;
  readonly detail: string | undefined;
  readonly fieldErrors: FieldErrors;

  constructor(init: ApiErrorInit, options?: ErrorOptions) {
    super(init.detail ?? init.title, options);
    this.name = 'ApiError';
    this.status = init.status;
    this.code = init.code;
    this.title = init.title;
    this.detail = init.detail;
    this.fieldErrors = init.fieldErrors ?? {};
  }
}

const API_BASE = '/api';

const fallbackTitles: Record<number, string> = {
  400: 'The request was not accepted.',
  401: 'Sign in to continue.',
  403: "You don't have access to this.",
  404: 'That was not found.',
  409: 'That clashes with what is already saved.',
  413: 'That is too large to send.',
  429: 'Too many tries. Wait a moment, then try again.',
};

function fallbackTitle(status: number): string {
  if (status >= 500) return 'The server had a problem. Try again in a moment.';
  return fallbackTitles[status] ?? 'Something went wrong. Try again.';
}

const lenientProblemSchema = problemSchema.partial();

/**
 * Turns an error answer into an ApiError. Proxies and crashed servers answer with HTML or
 * nothing at all, so anything that is not problem details still yields a readable error.
 */
export function parseProblem(status: number, body: unknown): ApiError {
  const parsed = lenientProblemSchema.safeParse(body);
  const problem = parsed.success ? parsed.data : {};
  return new ApiError({
    status,
    code: problem.code ?? `http_${status}`,
    title: problem.title ?? fallbackTitle(status),
    detail: problem.detail,
    fieldErrors: problem.errors,
  });
}

function networkError(cause?: unknown): ApiError {
  return new ApiError(
    {
      status: 0,
      code: 'network_error',
      title: "Can't reach Chuckkey. Check the connection, then try again.",
    },
    { cause },
  );
}

/** The sentence to show a person for any error, with per-code wording where a screen has better words. */
export function errorMessage(error: unknown, byCode: Record<string, string> = {}): string {
  if (error instanceof ApiError) return byCode[error.code] ?? error.message;
  return 'Something went wrong. Try again.';
}

export type QueryParams = Record<string, string | number | boolean | null | undefined>;

/** Leaves out empty values so that URLs stay short and defaults stay the server's. */
export function buildQueryString(params: QueryParams = {}): string {
  const search = new URLSearchParams();
  for (const [key, value] of Object.entries(params)) {
    if (value === undefined || value === null || value === '') continue;
    search.append(key, String(value));
  }
  const text = search.toString();
  return text ? `?${text}` : '';
}

/** For plain links into the API, such as CSV downloads that the browser saves itself. */
export function apiHref(path: string, params?: QueryParams): string {
  return `${API_BASE}${path}${buildQueryString(params)}`;
}

type Method = 'GET' | 'POST' | 'PUT' | 'PATCH' | 'DELETE';
type Result<S> = S extends z.ZodType ? z.output<S> : void;

export interface RequestOptions<S extends z.ZodType | undefined> {
  query?: QueryParams;
  body?: unknown;
  /** The answer is checked against the schema, so a server that drifts from the contract fails loudly here. */
  schema?: S;
  signal?: AbortSignal;
}

export interface ApiClientOptions {
  fetch?: typeof fetch;
  /** Uploads go through XMLHttpRequest, the one browser API that reports how much has been sent. */
  xhr?: () => XMLHttpRequest;
  baseUrl?: string;
}

function parseText(text: string): unknown {
  if (!text) return undefined;
  try {
    return JSON.parse(text);
  } catch {
    return text;
  }
}

async function readBody(response: Response): Promise<unknown> {
  return parseText(await response.text().catch(() => ''));
}

export interface UploadOptions<S extends z.ZodType | undefined> {
  method?: 'POST' | 'PUT';
  body: FormData;
  schema?: S;
  /** Called as the file goes out, with the share sent so far from 0 to 1. */
  onProgress?: (fraction: number) => void;
  signal?: AbortSignal;
}

interface RawAnswer {
  status: number;
  body: unknown;
}

export function createApiClient(options: ApiClientOptions = {}) {
  const fetchImpl = options.fetch ?? ((input, init) => globalThis.fetch(input, init));
  const createXhr = options.xhr ?? (() => new XMLHttpRequest());
  const baseUrl = options.baseUrl ?? API_BASE;
  let csrfToken: Promise<string> | undefined;
  let unauthorizedHandler: ((error: ApiError) => void) | undefined;

  async function send(method: Method, path: string, init: RequestOptions<z.ZodType | undefined>, csrf?: string) {
    const headers: Record<string, string> = { accept: 'application/json, application/problem+json' };
    if (init.body !== undefined) headers['content-type'] = 'application/json';
    if (csrf) headers['x-csrf-token'] = csrf;
    try {
      return await fetchImpl(`${baseUrl}${path}${buildQueryString(init.query)}`, {
        method,
        headers,
        credentials: 'same-origin',
        body: init.body === undefined ? undefined : JSON.stringify(init.body),
        signal: init.signal,
      });
    } catch (cause) {
      if (init.signal?.aborted) throw cause;
      throw networkError(cause);
    }
  }

  async function fetchCsrfToken(): Promise<string> {
    const response = await send('GET', '/auth/csrf', {});
    const body = await readBody(response);
    if (!response.ok) throw parseProblem(response.status, body);
    const parsed = csrfResponseSchema.safeParse(body);
    if (!parsed.success) throw invalidAnswer(response.status, parsed.error);
    return parsed.data.token;
  }

  // The token belongs to the web session and survives sign-in, so one fetch per page load
  // is enough; a failed fetch is forgotten so that the next call tries again.
  function currentCsrfToken(): Promise<string> {
    csrfToken ??= fetchCsrfToken().catch((error: unknown) => {
      csrfToken = undefined;
      throw error;
    });
    return csrfToken;
  }

  function invalidAnswer(status: number, cause: unknown): ApiError {
    return new ApiError(
      { status, code: 'invalid_response', title: 'The server sent an answer this page does not understand. Reload the page.' },
      { cause },
    );
  }

  /**
   * Turns an answer into the call's result. A stale CSRF token (the web session behind it
   * ended: sign-out, expiry) earns one more try with a fresh token.
   */
  async function settle<S extends z.ZodType | undefined>(
    answer: RawAnswer,
    schema: S | undefined,
    csrf: string | undefined,
    isRetry: boolean,
    retry: () => Promise<Result<S>>,
  ): Promise<Result<S>> {
    if (answer.status < 200 || answer.status > 299) {
      const error = parseProblem(answer.status, answer.body);
      if (error.status === 403 && error.code === 'csrf_invalid' && csrf && !isRetry) {
        csrfToken = undefined;
        return retry();
      }
      if (error.status === 401) unauthorizedHandler?.(error);
      throw error;
    }

    if (!schema) return undefined as Result<S>;
    const parsed = schema.safeParse(answer.body);
    if (!parsed.success) throw invalidAnswer(answer.status, parsed.error);
    return parsed.data as Result<S>;
  }

  async function request<S extends z.ZodType | undefined>(
    method: Method,
    path: string,
    init: RequestOptions<S>,
    isRetry = false,
  ): Promise<Result<S>> {
    const csrf = method === 'GET' ? undefined : await currentCsrfToken();
    const response = await send(method, path, init, csrf);
    const body = await readBody(response);
    return settle({ status: response.status, body }, init.schema, csrf, isRetry, () => request(method, path, init, true));
  }

  function sendForm(path: string, init: UploadOptions<z.ZodType | undefined>, csrf: string): Promise<RawAnswer> {
    return new Promise((resolve, reject) => {
      const xhr = createXhr();
      xhr.open(init.method ?? 'POST', `${baseUrl}${path}`);
      xhr.setRequestHeader('accept', 'application/json, application/problem+json');
      xhr.setRequestHeader('x-csrf-token', csrf);
      xhr.upload.onprogress = (event) => {
        if (event.lengthComputable && event.total > 0) init.onProgress?.(event.loaded / event.total);
      };
      xhr.onload = () => resolve({ status: xhr.status, body: parseText(xhr.responseText) });
      xhr.onerror = () => reject(networkError());
      xhr.onabort = () => reject(new DOMException('The upload was cancelled.', 'AbortError'));
      init.signal?.addEventListener('abort', () => xhr.abort(), { once: true });
      xhr.send(init.body);
    });
  }

  async function upload<S extends z.ZodType | undefined>(path: string, init: UploadOptions<S>, isRetry = false): Promise<Result<S>> {
    const csrf = await currentCsrfToken();
    const answer = await sendForm(path, init, csrf);
    return settle(answer, init.schema, csrf, isRetry, () => upload(path, init, true));
  }

  return {
    get: <S extends z.ZodType | undefined = undefined>(path: string, init: Omit<RequestOptions<S>, 'body'> = {}) =>
      request('GET', path, init),
    post: <S extends z.ZodType | undefined = undefined>(path: string, init: RequestOptions<S> = {}) =>
      request('POST', path, init),
    put: <S extends z.ZodType | undefined = undefined>(path: string, init: RequestOptions<S> = {}) =>
      request('PUT', path, init),
    patch: <S extends z.ZodType | undefined = undefined>(path: string, init: RequestOptions<S> = {}) =>
      request('PATCH', path, init),
    delete: <S extends z.ZodType | undefined = undefined>(path: string, init: RequestOptions<S> = {}) =>
      request('DELETE', path, init),
    /** Sends a multipart form (files) and reports progress; errors arrive like those of any other call. */
    upload: <S extends z.ZodType | undefined = undefined>(path: string, init: UploadOptions<S>) => upload(path, init),
    /** The one place that decides what a 401 means for the app: the person is no longer signed in. */
    onUnauthorized(handler: (error: ApiError) => void) {
      unauthorizedHandler = handler;
      return () => {
        if (unauthorizedHandler === handler) unauthorizedHandler = undefined;
      };
    },
  };
}

export const api = createApiClient();
