// The demo database of `npm start`, for the backup, restore, reset and dev scripts.
import { defaultDataDir, ensureCluster, ensureDatabase } from './postgres.mjs';

export async function demoDatabase() {
  const dataDir = defaultDataDir();
  const cluster = ensureCluster({ dir: dataDir, port: Number(process.env.FERRULE_PG_PORT ?? 54329) });
  const db = process.env.FERRULE_DB ?? 'ferrule_demo';
  const url = await ensureDatabase(cluster, { db });
  return { dataDir, cluster, db, url };
}
