import type { Express } from 'express';
import request from 'supertest';
import type { Test } from 'supertest';
import { createApp } from '../../backend/src/app.js';
import { loadConfig } from '../../backend/src/config.js';
import type { AppContext } from '../../backend/src/context.js';
import { createDataSource } from '../../backend/src/db/data-source.js';
import { TestClock } from '../../backend/src/lib/clock.js';
import { createLogger } from '../../backend/src/lib/logger.js';
import { startMailCatcher, type CaughtMail, type MailCatcher } from '../../backend/src/mail/catcher.js';
import { createSmtpMailer } from '../../backend/src/mail/mailer.js';

export const TEST_ORIGIN = 'http://ferrule.test';

/** Each test file speaks from an address of its own, so per-address slowing in one file leaves the others alone. */
export const TEST_ADDRESS = `10.${rand()}.${rand()}.${rand()}`;
function rand(): number {
  return Math.floor(Math.random() * 254) + 1;
}

export interface TestServer {
  ctx: AppContext;
  app: Express;
  clock: TestClock;
  catcher: MailCatcher;
  close(): Promise<void>;
}

/** The real application on the test database, with a test clock and a local mail catcher. */
export async function startTestServer(env: Record<string, string> = {}): Promise<TestServer> {
  const catcher = await startMailCatcher();
  const config = loadConfig({
    FERRULE_MODE: 'test',
    DATABASE_URL: process.env.TEST_DATABASE_URL,
    PUBLIC_BASE_URL: TEST_ORIGIN,
    SESSION_SECRET: 'test-secret-that-is-long-enough-for-ferrule',
    SMTP_URL: `smtp://127.0.0.1:${catcher.port}?ignoreTLS=true`,
    TRUST_PROXY: 'loopback',
    ...env,
  });
  const ds = createDataSource(config.databaseUrl, { poolSize: 5 });
  await ds.initialize();
  const clock = new TestClock();
  const ctx: AppContext = { config, ds, clock, mailer: createSmtpMailer(config.smtpUrl, config.mailFrom), logger: createLogger('test') };
  return {
    ctx,
    app: createApp(ctx),
    clock,
    catcher,
    async close() {
      await ds.destroy();
      await catcher.close();
    },
  };
}

type Method = 'get' | 'post' | 'put' | 'patch' | 'delete';

/** A request as Ferrule's own pages send it: our Origin, and the session cookie when given. */
export function call(app: Express, method: Method, path: string, cookie?: string, address = TEST_ADDRESS): Test {
  const req = request(app)[method](path).set('Origin', TEST_ORIGIN).set('X-Forwarded-For', address);
  return cookie ? req.set('Cookie', cookie) : req;
}

/** Waits for a message to `to` to reach the catcher (mail is sent after the answer). */
export async function waitForMail(catcher: MailCatcher, to: string, since = 0, timeoutMs = 5000): Promise<CaughtMail> {
  const started = Date.now();
  while (Date.now() - started < timeoutMs) {
    const found = catcher.messages().slice(since).find((m) => m.to.includes(to));
    if (found) return found;
    await new Promise((r) => setTimeout(r, 25));
  }
  throw new Error(`No mail to ${to} within ${timeoutMs} ms`);
}

export function tokenFromMail(mail: CaughtMail): string {
  const match = /[?&]token=([A-Za-z0-9_-]+)/.exec(mail.text);
  if (!match?.[1]) throw new Error('No link token in the mail');
  return match[1];
}
