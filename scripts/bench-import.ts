// npm run bench:import — CSV import at scale: 50,000 positions, then 50,000 historical assemblies
// installed at them, through the HTTP API of a server on a scratch database; times the check
// (preview) and the write of each file.
import type { AddressInfo } from 'node:net';
import { createApp } from '../backend/src/app.js';
import { loadConfig } from '../backend/src/config.js';
import type { AppContext } from '../backend/src/context.js';
import { createDataSource } from '../backend/src/db/data-source.js';
import { systemClock } from '../backend/src/lib/clock.js';
import { hashPassword } from '../backend/src/lib/crypto.js';
import { createLogger } from '../backend/src/lib/logger.js';
// @ts-expect-error plain JavaScript helper shared with the other scripts
import { ensureCluster, ensureDatabase } from './lib/postgres.mjs';

const N = Number(process.env.BENCH_ROWS ?? 50_000);
const ORIGIN = 'http://bench.ferrule.test';
let base = '';
let cookie = '';

async function call<T>(method: string, path: string, body?: unknown): Promise<T> {
  const form = body instanceof FormData;
  const res = await fetch(base + path, {
    method,
    headers: { Origin: ORIGIN, Cookie: cookie, ...(body && !form ? { 'Content-Type': 'application/json' } : {}) },
    body: form ? body : body ? JSON.stringify(body) : undefined,
  });
  const setCookie = res.headers.get('set-cookie');
  if (setCookie) cookie = setCookie.split(';')[0]!;
  const text = await res.text();
  if (!res.ok) throw new Error(`${method} ${path} answered ${res.status}: ${text.slice(0, 300)}`);
  return (text ? JSON.parse(text) : null) as T;
}

interface Job {
  id: string;
  status: string;
  totalRows: number;
  processedRows: number;
  errorCount: number;
  writtenRows: number;
  problems: unknown[];
}

async function waitWhile(job: Job, status: string): Promise<Job> {
  let current = job;
  while (current.status === status) {
    await new Promise((r) => setTimeout(r, 200));
    current = (await call<{ data: Job }>('GET', `/api/imports/${job.id}`)).data;
  }
  return current;
}

async function importFile(kind: string, siteId: string | null, content: string): Promise<{ checkS: number; writeS: number }> {
  const form = new FormData();
  form.set('kind', kind);
  if (siteId) form.set('siteId', siteId);
  form.set('file', new Blob([content], { type: 'text/csv' }), `${kind}.csv`);
  const t0 = Date.now();
  const checked = await waitWhile((await call<{ data: Job }>('POST', '/api/imports', form)).data, 'checking');
  const checkS = (Date.now() - t0) / 1000;
  if (checked.errorCount) throw new Error(`${kind}: ${checked.errorCount} problems, e.g. ${JSON.stringify(checked.problems.slice(0, 3))}`);
  const t1 = Date.now();
  const written = await waitWhile((await call<{ data: Job }>('POST', `/api/imports/${checked.id}/write`)).data, 'writing');
  const writeS = (Date.now() - t1) / 1000;
  if (written.status !== 'done') throw new Error(`${kind}: write ended ${written.status}`);
  console.log(
    `${kind.padEnd(13)} ${String(written.writtenRows).padStart(6)} rows, ${(content.length / 1_048_576).toFixed(1)} MB: check ${checkS.toFixed(1)} s, write ${writeS.toFixed(1)} s, together ${(checkS + writeS).toFixed(1)} s`,
  );
  return { checkS, writeS };
}

async function main() {
  const uid = process.getuid?.() ?? 0;
  const cluster = ensureCluster({ dir: process.env.FERRULE_BENCH_DIR ?? `/tmp/ferrule-bench-import-${uid}`, port: Number(process.env.FERRULE_BENCH_PG_PORT ?? 54388), throwaway: true });
  const url = (await ensureDatabase(cluster, { db: 'ferrule_bench_test', fresh: true })) as string;
  const config = loadConfig({ FERRULE_MODE: 'test', DATABASE_URL: url, PUBLIC_BASE_URL: ORIGIN, SESSION_SECRET: 'bench-secret-that-is-long-enough-for-ferrule', SMTP_URL: 'smtp://127.0.0.1:9?ignoreTLS=true' });
  const ds = createDataSource(url, { poolSize: 10 });
  await ds.initialize();
  await ds.runMigrations({ transaction: 'each' });
  const ctx: AppContext = { config, ds, clock: systemClock, mailer: { send: async () => {} }, logger: createLogger('test') };
  await ds.query(`INSERT INTO users (email, name, role, all_sites, password_hash) VALUES ('bench@ferrule.test', 'Bench Administrator', 'administrator', true, $1)`, [await hashPassword('bench-password-2026', 4)]);
  const server = createApp(ctx).listen(0);
  base = `http://127.0.0.1:${(server.address() as AddressInfo).port}`;
  await call('POST', '/api/auth/sign-in', { email: 'bench@ferrule.test', password: 'bench-password-2026' });

  // One site with 500 pieces of equipment, 40 constructions and a fitting type, made through the API.
  const site = (await call<{ data: { id: string } }>('POST', '/api/sites', { code: 'BNCH', name: 'Bench site', timeZone: 'UTC', currency: 'GBP', defaultUnits: { pressureUnit: 'bar', lengthUnit: 'mm', temperatureUnit: 'C' } })).data;
  const sizes = ['19 mm', '25 mm', '38 mm', '51 mm', '76 mm'];
  const constructions = Array.from({ length: 40 }, (_, i) => `BC${i},Bench hose ${i},${sizes[i % 5]},NBR,textile,${20 + (i % 3) * 10},${80 + (i % 3) * 40},-30,80,${150 + i * 5}`);
  await importFile('constructions', null, ['code,name,size,tube_compound,reinforcement,working_pressure_bar,burst_pressure_bar,min_temp_c,max_temp_c,min_bend_radius_mm', ...constructions].join('\n'));
  await call('POST', '/api/fitting-types', { code: 'BF', name: 'Crimped stem and ferrule', style: 'crimped', material: 'zinc-plated steel', sizes: ['bore-19', 'bore-25', 'bore-38', 'bore-51', 'bore-76'].map((s) => ({ sizeCode: s, rating: { value: 60, unit: 'bar' } })) });
  const equipment: string[] = [];
  for (let a = 0; a < 5; a++) {
    const area = (await call<{ data: { id: string } }>('POST', '/api/areas', { siteId: site.id, code: `BA${a}`, name: `Bench area ${a}` })).data;
    for (let e = 0; e < 100; e++) equipment.push((await call<{ data: { assetNumber: string } }>('POST', '/api/equipment', { areaId: area.id, assetNumber: `BE${a}-${e}`, name: `Bench machine ${a}-${e}` })).data.assetNumber);
  }

  const positions = Array.from({ length: N }, (_, i) => `BP${i},Bench position ${i},${equipment[i % equipment.length]},compressed-air,compressed-air-oil-mist,7,bar,${sizes[i % 5]},-10,50,400,${['high', 'medium', 'low'][i % 3]}`);
  const p = await importFile('positions', site.id, ['code,name,equipment,service,medium,max_operating_pressure,max_operating_pressure_unit,size,min_temp_c,max_temp_c,routed_bend_radius_mm,criticality', ...positions].join('\n'));
  // Every assembly historical and installed at its position, with its proof test; semicolons and decimal commas.
  const assemblies = Array.from({ length: N }, (_, i) => {
    const k = (i % 40) - ((i % 40) % 5) + (i % 5);
    const year = 2015 + (i % 10);
    return [`BC${k}`, `BP${i}`, (2.5 + (i % 7)).toFixed(1).replace('.', ','), 'BF', 'BF', `${year}-03-01`, i % 2 ? 'yes' : 'no', `${year}-04-01`, i % 3 ? 'yes' : 'no', i % 4 === 0 ? 'yes' : 'no', `${year}-03-02`, 40 + (k % 3) * 20, 'pass'].join(';');
  });
  const a = await importFile(
    'assemblies',
    site.id,
    ['construction;position;overall_length_m;end_a_fitting;end_b_fitting;built_on;built_on_estimated;installed_on;installed_on_estimated;predates_records;proof_test_on;proof_test_pressure_bar;proof_test_result', ...assemblies].join('\n'),
  );
  const total = a.checkS + a.writeS;
  console.log(`\nTarget: ${N.toLocaleString()} assemblies, preview and write, under 60 s — ${total.toFixed(1)} s, ${total < 60 ? 'met' : 'NOT met'} (positions file: ${(p.checkS + p.writeS).toFixed(1)} s)`);
  server.close();
  await ds.destroy();
  cluster.stop();
}

void main();
