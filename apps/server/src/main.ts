import { loadConfig, ConfigError } from './config';
import { createApp } from './app';
import { createDb } from './lib/db';
import { listen } from './http-server';
import { startJobs } from './jobs/jobs';
import { createLogger } from './lib/logger';
import { createMailer } from './lib/mailer';
import { createLiveUpdates } from './realtime/live-updates';

async function main(): Promise<void> {
  let config;
  try {
    config = loadConfig();
  } catch (error) {
    if (error instanceof ConfigError) {
      console.error(error.message);
      process.exit(1);
    }
    throw error;
  }
  const logger = createLogger(config.LOG_LEVEL);
  const db = createDb(config.DATABASE_URL, logger);
  const mailer = createMailer(config.SMTP_URL, config.MAIL_FROM, logger);
  const live = createLiveUpdates({ config, db, logger });
  const deps = { config, db, logger, mailer, live };
  const { app, close, signIn } = createApp(deps);
  const jobs = await startJobs(deps);
  const http = await listen(app, config.PORT, config.HOST);
  live.attach(http.server, signIn);
  logger.info({ url: `http://${config.HOST}:${http.port}` }, 'Chuckkey is listening');

  let stopping = false;
  const stop = async (signal: string) => {
    if (stopping) return;
    stopping = true;
    logger.info({ signal }, 'shutting down: finishing requests in flight');
    // Open sockets hold their connections: they are closed while requests in flight finish.
    const finished = http.shutdown();
    await live.close();
    await finished;
    await close();
    await jobs.stop();
    mailer.close();
    await db.destroy();
    logger.info('stopped');
    process.exit(0);
  };
  process.on('SIGTERM', () => void stop('SIGTERM'));
  process.on('SIGINT', () => void stop('SIGINT'));
}

main().catch((error: unknown) => {
  console.error('Chuckkey could not start:', error);
  process.exit(1);
});
