import connectPgSimple from 'connect-pg-simple';
import session from 'express-session';
import pg from 'pg';
import type { Config } from '../config';
import type { Logger } from '../lib/logger';

export const SESSION_COOKIE = 'chuckkey.sid';
const TWELVE_HOURS_MS = 12 * 60 * 60 * 1000;

/** express-session stored in PostgreSQL, so every server process shares the same sessions. */
export function createSessionMiddleware(config: Config, logger: Logger) {
  const pool = new pg.Pool({ connectionString: config.DATABASE_URL, max: 5 });
  // An idle client losing its connection must not crash the process; the pool reconnects.
  pool.on('error', (err) => logger.warn({ err }, 'session store connection lost'));
  const PgStore = connectPgSimple(session);
  const store = new PgStore({
    pool,
    tableName: 'web_sessions',
    createTableIfMissing: false,
    pruneSessionInterval: config.NODE_ENV === 'test' ? false : 15 * 60,
    errorLog: (...args: unknown[]) => logger.warn({ detail: args.map(String).join(' ') }, 'session store error'),
  });
  const middleware = session({
    name: SESSION_COOKIE,
    secret: config.SESSION_SECRET,
    store,
    resave: false,
    saveUninitialized: false,
    rolling: true,
    cookie: {
      httpOnly: true,
      sameSite: 'lax',
      secure: config.COOKIE_SECURE === 'auto' ? 'auto' : config.COOKIE_SECURE === 'true',
      maxAge: TWELVE_HOURS_MS,
    },
  });
  return {
    middleware,
    async close() {
      store.close();
      await pool.end();
    },
  };
}
