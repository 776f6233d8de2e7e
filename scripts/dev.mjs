// npm run dev: the API from the sources with the demo database, and Vite's hot-reloading client on :5173.
import { join } from 'node:path';
import { spawn } from 'node:child_process';
import { ensureNodeModules, ROOT, say } from './lib/setup.mjs';

ensureNodeModules();
const { demoDatabase } = await import('./lib/demo-env.mjs');
const { runCli, spawnServer } = await import('./lib/app-env.mjs');
const { dataDir, cluster, url } = await demoDatabase();
const env = {
  FERRULE_MODE: 'demo',
  DATABASE_URL: url,
  PUBLIC_BASE_URL: 'http://localhost:5173',
  EXTRA_ORIGINS: 'http://localhost:3000',
  SESSION_SECRET: cluster.secrets.sessionSecret,
  SMTP_URL: 'smtp://127.0.0.1:2525?ignoreTLS=true',
  MAIL_CATCHER_PORT: '2525',
  MAIL_DIR: join(dataDir, 'mail'),
  PORT: '3000',
};
runCli('migrate', env);
runCli('seed', env);
const api = spawnServer(env);
const vite = spawn(join(ROOT, 'node_modules', '.bin', 'vite'), [], { cwd: ROOT, stdio: 'inherit' });
say('API on :3000, client with hot reload on http://localhost:5173');
const stop = () => {
  api.kill('SIGTERM');
  vite.kill('SIGTERM');
  process.exit(0);
};
process.on('SIGINT', stop);
process.on('SIGTERM', stop);
