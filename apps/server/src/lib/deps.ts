import type { Db } from './db';
import type { Config } from '../config';
import type { Logger } from './logger';
import type { Mailer } from './mailer';
import type { Publisher } from '../realtime/publisher';

/** What every module's routes and services are built from. */
export interface Deps {
  config: Config;
  db: Db;
  logger: Logger;
  mailer: Mailer;
  /** Live updates to the board and other screens (realtime/live-updates.ts). */
  live: Publisher;
}

