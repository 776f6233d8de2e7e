import type { DataSource } from 'typeorm';
import type { Logger } from 'pino';
import type { Config } from './config.js';
import type { Clock } from './lib/clock.js';
import type { Mailer } from './mail/mailer.js';

/** What every service needs from the running server. */
export interface AppContext {
  config: Config;
  ds: DataSource;
  clock: Clock;
  mailer: Mailer;
  logger: Logger;
}
