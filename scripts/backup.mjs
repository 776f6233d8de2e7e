// npm run backup [FILE]: a pg_dump (custom format) of the running database.
import { spawnSync } from 'node:child_process';
import { mkdirSync } from 'node:fs';
import { join } from 'node:path';
import { fail, say } from './lib/setup.mjs';
import { demoDatabase } from './lib/demo-env.mjs';

const { dataDir, cluster, url } = await demoDatabase();
const stamp = new Date().toISOString().replace(/[:.]/g, '-').slice(0, 19);
const file = process.argv[2] ?? join(dataDir, 'backups', `ferrule-${stamp}.dump`);
mkdirSync(join(file, '..'), { recursive: true });
const dump = spawnSync(join(cluster.bin, 'pg_dump'), ['--format=custom', '--no-owner', `--file=${file}`, `--dbname=${url}`], { stdio: 'inherit' });
if (dump.status !== 0) fail('pg_dump failed.');
say(`Backup written to ${file}`);
