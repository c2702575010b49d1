import { randomUUID } from 'node:crypto';
import type { IncomingMessage, ServerResponse } from 'node:http';
import type { RequestHandler } from 'express';
import { pinoHttp } from 'pino-http';
import type { Logger } from '../lib/logger';

const REQUEST_ID = /^[A-Za-z0-9._-]{1,100}$/;

/** The caller's x-request-id when it is a sane token, else a new one; echoed in the response. */
function requestId(req: IncomingMessage, res: ServerResponse): string {
  const given = req.headers['x-request-id'];
  const id = typeof given === 'string' && REQUEST_ID.test(given) ? given : randomUUID();
  res.setHeader('x-request-id', id);
  return id;
}

/**
 * Every request gets an id and a `req.log`. At level info and below pino-http writes one line per
 * request; above info (warn, error) it would write none, yet still serialise each request for a
 * child logger, so then a child logger bound to the request id is made only if something logs.
 */
export function requestLogging(logger: Logger): RequestHandler {
  if (logger.isLevelEnabled('info')) {
    return pinoHttp({ logger, genReqId: requestId, autoLogging: { ignore: (req) => req.url === '/api/health' } });
  }
  return (req, res, next) => {
    const id = requestId(req, res);
    req.id = id;
    let child: Logger | undefined;
    Object.defineProperty(req, 'log', {
      configurable: true,
      enumerable: false,
      get: () => (child ??= logger.child({ reqId: id })),
    });
    next();
  };
}
