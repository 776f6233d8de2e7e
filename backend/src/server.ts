import { createApp } from './app.js';
import { ConfigError, loadConfig } from './config.js';
import type { AppContext } from './context.js';
import { createDataSource } from './db/data-source.js';
import { systemClock } from './lib/clock.js';
import { createLogger } from './lib/logger.js';
import { startMailCatcher } from './mail/catcher.js';
import { createSmtpMailer } from './mail/mailer.js';
import { issueSetupToken } from './services/auth.service.js';

async function main(): Promise<void> {
  let config;
  try {
    config = loadConfig();
  } catch (err) {
    if (err instanceof ConfigError) {
      console.error(err.message);
      process.exit(78);
    }
    throw err;
  }
  const logger = createLogger(config.mode);
  const catcherPort = process.env.MAIL_CATCHER_PORT;
  if (catcherPort && config.mode !== 'production') {
    const catcher = await startMailCatcher({ port: Number(catcherPort), dir: config.mailDir ?? undefined });
    logger.info({ port: catcher.port }, 'local mail catcher is listening');
  }
  const ds = createDataSource(config.databaseUrl);
  await ds.initialize();
  const pending = await ds.showMigrations();
  if (pending) {
    console.error('Ferrule cannot start: the database has migrations still to run (npm run db:migrate).');
    process.exit(78);
  }
  const ctx: AppContext = { config, ds, clock: systemClock, mailer: createSmtpMailer(config.smtpUrl, config.mailFrom), logger };
  if (config.mode === 'production') {
    const token = await issueSetupToken(ctx);
    if (token) {
      console.log(`\nFerrule has no users yet. Create the first administrator at ${new URL('/setup', config.publicBaseUrl).toString()}\nwith this one-time set-up token (shown only now):\n\n  ${token}\n`);
    }
  }
  const app = createApp(ctx);
  const server = app.listen(config.port, () => logger.info({ port: config.port, mode: config.mode }, 'Ferrule is listening'));
  const stop = async () => {
    server.close();
    await ds.destroy();
    process.exit(0);
  };
  process.on('SIGTERM', stop);
  process.on('SIGINT', stop);
}

void main();
