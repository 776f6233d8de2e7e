import { createDataSource } from '../db/data-source.js';
import { seedDemo } from '../seed/demo-scenario.js';

/** Loads the demo scenario when the database has no users. FERRULE_DEMO_ANCHOR (YYYY-MM-DD) pins "today". */
const url = process.env.DATABASE_URL;
if (!url) {
  console.error('Set DATABASE_URL to the database to seed.');
  process.exit(2);
}
const ds = createDataSource(url, { poolSize: 2 });
await ds.initialize();
const [{ n }] = await ds.query(`SELECT count(*)::int AS n FROM users`);
if (n > 0) {
  console.log('The database already has data; the demo scenario was not loaded.');
} else {
  const anchorText = process.env.FERRULE_DEMO_ANCHOR;
  const anchor = anchorText ? new Date(`${anchorText}T12:00:00Z`) : new Date();
  if (Number.isNaN(anchor.getTime())) {
    console.error('FERRULE_DEMO_ANCHOR must be a date like 2026-12-01.');
    process.exit(2);
  }
  const started = Date.now();
  await seedDemo(ds, { anchor, bcryptCost: Number(process.env.BCRYPT_COST ?? 10) });
  console.log(`Loaded the demo scenario (anchor ${anchor.toISOString().slice(0, 10)}) in ${((Date.now() - started) / 1000).toFixed(1)} s.`);
}
await ds.destroy();
