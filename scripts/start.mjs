// npm start: everything a fresh machine needs, then Ferrule in demo mode on http://localhost:3000.
import { mkdirSync, rmSync, writeFileSync } from 'node:fs';
import { join } from 'node:path';
import { ensureNodeModules, fail, say } from './lib/setup.mjs';

ensureNodeModules();
const { defaultDataDir, ensureCluster, ensureDatabase } = await import('./lib/postgres.mjs');
const { ensureClientBuild, runCli, spawnServer, waitForHttp } = await import('./lib/app-env.mjs');

const dataDir = defaultDataDir();
const pgPort = Number(process.env.FERRULE_PG_PORT ?? 54329);
const port = Number(process.env.PORT ?? 3000);
const mailPort = Number(process.env.MAIL_CATCHER_PORT ?? 2525);
const publicBase = process.env.PUBLIC_BASE_URL ?? `http://localhost:${port}`;

const cluster = ensureCluster({ dir: dataDir, port: pgPort });
const databaseUrl = await ensureDatabase(cluster, { db: process.env.FERRULE_DB ?? 'ferrule_demo' });
const env = {
  FERRULE_MODE: 'demo',
  DATABASE_URL: databaseUrl,
  PUBLIC_BASE_URL: publicBase,
  SESSION_SECRET: cluster.secrets.sessionSecret,
  SMTP_URL: `smtp://127.0.0.1:${mailPort}?ignoreTLS=true`,
  MAIL_CATCHER_PORT: String(mailPort),
  MAIL_DIR: join(dataDir, 'mail'),
  CLIENT_DIR: join(process.cwd(), 'dist', 'client'),
  PORT: String(port),
  EXTRA_ORIGINS: process.env.EXTRA_ORIGINS ?? 'http://localhost:5173',
};
say('Migrating the database…');
runCli('migrate', env);
runCli('seed', env);
if (process.env.FERRULE_SKIP_CLIENT_BUILD !== '1') ensureClientBuild();

say('Starting Ferrule…');
const server = spawnServer(env);
const runDir = join(dataDir, 'run');
mkdirSync(runDir, { recursive: true });
writeFileSync(join(runDir, 'server.pid'), String(server.pid));
const stopServer = () => {
  server.kill('SIGTERM');
  rmSync(join(runDir, 'server.pid'), { force: true });
};
process.on('SIGINT', () => {
  stopServer();
  process.exit(0);
});
process.on('SIGTERM', () => {
  stopServer();
  process.exit(0);
});
server.on('exit', (code) => {
  rmSync(join(runDir, 'server.pid'), { force: true });
  if (code) fail(`The server stopped (exit ${code}).`);
  process.exit(0);
});

if (!(await waitForHttp(`http://127.0.0.1:${port}/api/meta`, { child: server }))) {
  stopServer();
  fail(`Ferrule did not answer on port ${port}.`);
}
const { DEMO_SIGN_INS, DEMO_PASSWORD } = await import('./lib/demo-sign-ins.mjs');
const width = Math.max(...DEMO_SIGN_INS.map((s) => s.label.length));
console.log(`
  \x1b[1mFerrule is running in demo mode\x1b[0m:  ${publicBase}

  Demo sign-ins (password for all: ${DEMO_PASSWORD})
${DEMO_SIGN_INS.map((s) => `    ${s.label.padEnd(width)}  ${s.email}`).join('\n')}

  Demo mail (invitations, resets):  ${publicBase}/demo/mail
  Data folder:  ${dataDir}
  Ctrl-C stops the server; \`npm run stop\` also stops PostgreSQL.
`);
