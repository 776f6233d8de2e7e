// npm run demo:reset: drops the demo database and loads the demo scenario again. Demo only.
import { fail, say } from './lib/setup.mjs';
import { defaultDataDir, ensureCluster } from './lib/postgres.mjs';
import { runCli } from './lib/app-env.mjs';

const db = process.env.FERRULE_DB ?? 'ferrule_demo';
if (!db.endsWith('_demo') && !db.endsWith('_test')) fail(`Refusing to reset ${db}: only the demo database (ending in _demo) is reset.`);
const cluster = ensureCluster({ dir: defaultDataDir(), port: Number(process.env.FERRULE_PG_PORT ?? 54329) });
const { default: pg } = await import('pg');
const client = new pg.Client({ connectionString: cluster.superUrl });
await client.connect();
await client.query(`DROP DATABASE IF EXISTS "${db}" WITH (FORCE)`);
await client.query(`CREATE DATABASE "${db}" OWNER ferrule ENCODING 'UTF8'`);
await client.end();
const env = { DATABASE_URL: cluster.urlFor(db) };
runCli('migrate', env);
runCli('seed', env);
say('The demo database was rebuilt. Restart `npm start` if it was running.');
