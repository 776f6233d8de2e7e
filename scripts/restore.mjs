// npm run restore FILE: replaces the running database's contents with a backup from npm run backup.
import { spawnSync } from 'node:child_process';
import { existsSync } from 'node:fs';
import { fail, say } from './lib/setup.mjs';
import { demoDatabase } from './lib/demo-env.mjs';

const file = process.argv[2];
if (!file || !existsSync(file)) fail('Give the backup file: npm run restore FILE');
const { cluster, url } = await demoDatabase();
say(`Restoring ${file}… (stop the server first, or restart it afterwards)`);
const restore = spawnSync(
  `${cluster.bin}/pg_restore`,
  ['--clean', '--if-exists', '--no-owner', '--single-transaction', '--exit-on-error', `--dbname=${url}`, file],
  { stdio: 'inherit' },
);
if (restore.status !== 0) fail('pg_restore failed; the database was left as it was.');
say('Restored.');
