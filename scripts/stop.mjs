// npm run stop: stops the server `npm start` started, then its PostgreSQL cluster.
import { existsSync, readFileSync, rmSync } from 'node:fs';
import { join } from 'node:path';
import { say } from './lib/setup.mjs';
import { defaultDataDir, stopCluster } from './lib/postgres.mjs';

const dataDir = defaultDataDir();
const pidFile = join(dataDir, 'run', 'server.pid');
if (existsSync(pidFile)) {
  const pid = Number(readFileSync(pidFile, 'utf8'));
  try {
    process.kill(pid, 'SIGTERM');
    say(`Stopped the server (pid ${pid}).`);
  } catch {
    say('The server was not running.');
  }
  rmSync(pidFile, { force: true });
}
say(stopCluster(dataDir) ? 'Stopped PostgreSQL.' : `No PostgreSQL of Ferrule's was running in ${dataDir}.`);
