import { createDataSource } from '../../backend/src/db/data-source.js';

/**
 * Before the API tests: a database rebuilt from the migrations. `npm test` passes a fresh one in
 * TEST_DATABASE_URL; on its own (`npm run test:api`) this makes one on the test cluster.
 */
export default async function setup(): Promise<void> {
  let url = process.env.TEST_DATABASE_URL;
  if (!url) {
    // @ts-expect-error plain JavaScript helper shared with the scripts
    const pg = await import('../../scripts/lib/postgres.mjs');
    const uid = process.getuid?.() ?? 0;
    const cluster = pg.ensureCluster({ dir: process.env.FERRULE_TEST_DIR ?? `/tmp/ferrule-test-${uid}`, port: Number(process.env.FERRULE_TEST_PG_PORT ?? 54339) });
    url = (await pg.ensureDatabase(cluster, { db: 'ferrule_api_test', fresh: true })) as string;
    process.env.TEST_DATABASE_URL = url;
  }
  if (!new URL(url).pathname.endsWith('_test')) throw new Error('API tests run only against a database whose name ends in _test');
  const ds = createDataSource(url, { poolSize: 2 });
  await ds.initialize();
  await ds.runMigrations({ transaction: 'each' });
  await ds.destroy();
}
