import { mkdirSync, readdirSync, readFileSync, writeFileSync } from 'node:fs';
import { join } from 'node:path';
import type { AddressInfo } from 'node:net';
import { SMTPServer } from 'smtp-server';
import { simpleParser } from 'mailparser';

/** A message the local catcher received. */
export interface CaughtMail {
  id: string;
  receivedAt: string;
  from: string;
  to: string;
  subject: string;
  text: string;
  html: string;
}

export interface MailCatcher {
  port: number;
  messages(): CaughtMail[];
  close(): Promise<void>;
}

/**
 * A local SMTP server on loopback for demo mode and tests: it accepts every message and keeps it,
 * in memory and, when `dir` is given, as one JSON file per message that a person or a test can read.
 */
export async function startMailCatcher(options: { port?: number; dir?: string } = {}): Promise<MailCatcher> {
  const kept: CaughtMail[] = [];
  if (options.dir) mkdirSync(options.dir, { recursive: true });
  let sequence = 0;
  const server = new SMTPServer({
    authOptional: true,
    disabledCommands: ['STARTTLS', 'AUTH'],
    logger: false,
    onData(stream, _session, callback) {
      simpleParser(stream)
        .then((parsed) => {
          const receivedAt = new Date().toISOString();
          const mail: CaughtMail = {
            id: `${receivedAt.replace(/[:.]/g, '-')}-${String(++sequence).padStart(4, '0')}`,
            receivedAt,
            from: parsed.from?.text ?? '',
            to: Array.isArray(parsed.to) ? parsed.to.map((a) => a.text).join(', ') : (parsed.to?.text ?? ''),
            subject: parsed.subject ?? '',
            text: parsed.text ?? '',
            html: typeof parsed.html === 'string' ? parsed.html : '',
          };
          kept.push(mail);
          if (options.dir) writeFileSync(join(options.dir, `${mail.id}.json`), JSON.stringify(mail, null, 2));
          callback();
        })
        .catch((err: Error) => callback(err));
    },
  });
  await new Promise<void>((resolve, reject) => {
    server.once('error', reject);
    server.listen(options.port ?? 0, '127.0.0.1', () => resolve());
  });
  const address = server.server.address() as AddressInfo;
  return {
    port: address.port,
    messages: () => [...kept],
    close: () => new Promise((resolve) => server.close(() => resolve())),
  };
}

/** The messages kept in a catcher's folder, newest first. */
export function readCaughtMail(dir: string, limit = 200): CaughtMail[] {
  let names: string[];
  try {
    names = readdirSync(dir).filter((n) => n.endsWith('.json'));
  } catch {
    return [];
  }
  return names
    .sort()
    .reverse()
    .slice(0, limit)
    .map((n) => JSON.parse(readFileSync(join(dir, n), 'utf8')) as CaughtMail);
}
