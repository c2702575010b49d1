import { z } from 'zod';
import { createDb } from './lib/db';
import { createLogger } from './lib/logger';
import { startMailCatcher } from './modules/outbox/mail-catcher';

const env = z
  .object({
    DATABASE_URL: z.url(),
    MAIL_CATCHER_PORT: z.coerce.number().int().min(0).max(65535).default(2525),
    LOG_LEVEL: z.string().default('info'),
  })
  .parse(process.env);

const logger = createLogger(env.LOG_LEVEL);
const db = createDb(env.DATABASE_URL, logger, 2);
const catcher = await startMailCatcher({ db, logger, port: env.MAIL_CATCHER_PORT });
logger.info({ url: catcher.url }, 'mail catcher listening');

for (const signal of ['SIGINT', 'SIGTERM'] as const) {
  process.on(signal, () => {
    void catcher.close().then(() => db.destroy()).then(() => process.exit(0));
  });
}
