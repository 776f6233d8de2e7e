import { createDataSource } from '../db/data-source.js';

/** Runs pending migrations against DATABASE_URL. */
const url = process.env.DATABASE_URL;
if (!url) {
  console.error('Set DATABASE_URL to the database to migrate.');
  process.exit(2);
}
const ds = createDataSource(url, { poolSize: 2 });
await ds.initialize();
const ran = await ds.runMigrations({ transaction: 'each' });
console.log(ran.length ? `Ran ${ran.length} migration(s): ${ran.map((m) => m.name).join(', ')}` : 'Database is up to date.');
await ds.destroy();
