import type { ErrorRequestHandler, RequestHandler } from 'express';
import { ZodError } from 'zod';
import { PROBLEM_CONTENT_TYPE, type Problem } from '@chuckkey/core';
import { AppError } from './errors';
import { ValidationError, zodFieldErrors } from './validate';

const titles: Record<number, string> = {
  400: 'Bad request',
  401: 'Unauthorized',
  403: 'Forbidden',
  404: 'Not found',
  409: 'Conflict',
  413: 'Content too large',
  415: 'Unsupported media type',
  429: 'Too many requests',
  500: 'Internal server error',
  502: 'Bad gateway',
  503: 'Service unavailable',
};

function problem(status: number, code: string, detail: string, errors?: Record<string, string[]>, title?: string): Problem {
  return {
    type: status === 500 ? 'about:blank' : `/problems/${code}`,
    title: title ?? titles[status] ?? 'Error',
    status,
    detail,
    code,
    ...(errors ? { errors } : {}),
  };
}

function send(res: Parameters<RequestHandler>[1], body: Problem): void {
  res.status(body.status).type(PROBLEM_CONTENT_TYPE).send(JSON.stringify(body));
}

export const apiNotFound: RequestHandler = (req, res) => {
  send(res, problem(404, 'route_not_found', `There is no ${req.method} ${req.originalUrl.split('?')[0]}.`));
};

/** Turns every error into RFC 9457 problem details; never sends a stack trace. */
export const problemHandler: ErrorRequestHandler = (err: unknown, req, res, next) => {
  if (res.headersSent) {
    next(err);
    return;
  }
  if (err instanceof ValidationError) {
    send(res, problem(400, 'validation_failed', `Check the ${err.location}: ${Object.keys(err.errors).join(', ')}.`, err.errors));
    return;
  }
  if (err instanceof ZodError) {
    const errors = zodFieldErrors(err);
    send(res, problem(400, 'validation_failed', `Check these fields: ${Object.keys(errors).join(', ')}.`, errors));
    return;
  }
  if (err instanceof AppError && err.operational) {
    for (const [name, value] of Object.entries(err.options.headers ?? {})) res.setHeader(name, value);
    send(res, { ...err.options.extensions, ...problem(err.status, err.code, err.message, err.options.errors, err.options.title) });
    return;
  }
  const bodyParserType = typeof err === 'object' && err !== null && 'type' in err ? String(err.type) : '';
  if (bodyParserType === 'entity.parse.failed') {
    send(res, problem(400, 'malformed_json', 'The request body is not valid JSON.'));
    return;
  }
  if (bodyParserType === 'entity.too.large') {
    send(res, problem(413, 'payload_too_large', 'The request body is too large.'));
    return;
  }
  if (bodyParserType === 'encoding.unsupported' || bodyParserType === 'charset.unsupported') {
    send(res, problem(415, 'unsupported_encoding', 'The request body uses an encoding the server does not accept.'));
    return;
  }
  req.log.error({ err }, 'unhandled error');
  send(res, problem(500, 'internal_error', `Something went wrong on our side. Reference: ${String(req.id)}.`));
};
