// npm run bench:register — the register at scale: 100,000 assemblies over 20,000 positions in a
// scratch database; median and p95 of the register page and the assembly page through HTTP, each
// against the bare SQL of the same rows on the same pool (the baseline), measured in one run.
import type { AddressInfo } from 'node:net';
import { createApp } from '../backend/src/app.js';
import { loadConfig } from '../backend/src/config.js';
import type { AppContext } from '../backend/src/context.js';
import { createDataSource } from '../backend/src/db/data-source.js';
import { systemClock } from '../backend/src/lib/clock.js';
import { hashPassword } from '../backend/src/lib/crypto.js';
import { createLogger } from '../backend/src/lib/logger.js';
import { registerWhere } from '../backend/src/services/assembly-queries.service.js';
import { assemblyListQuerySchema } from '../shared/src/schemas/assemblies.schema.js';
// @ts-expect-error plain JavaScript helper shared with the other scripts
import { ensureCluster, ensureDatabase } from './lib/postgres.mjs';

const ASSEMBLIES = Number(process.env.BENCH_ASSEMBLIES ?? 100_000);
const POSITIONS = Number(process.env.BENCH_POSITIONS ?? 20_000);
const RUNS = Number(process.env.BENCH_RUNS ?? 60);
const WARMUP = 10;

function stats(samples: number[]) {
  const sorted = [...samples].sort((a, b) => a - b);
  const at = (q: number) => sorted[Math.min(sorted.length - 1, Math.floor(q * sorted.length))]!;
  return { median: at(0.5), p95: at(0.95) };
}

async function time(fn: () => Promise<unknown>): Promise<number[]> {
  for (let i = 0; i < WARMUP; i++) await fn();
  const samples: number[] = [];
  for (let i = 0; i < RUNS; i++) {
    const started = process.hrtime.bigint();
    await fn();
    samples.push(Number(process.hrtime.bigint() - started) / 1e6);
  }
  return samples;
}

async function seed(ctx: AppContext): Promise<{ userEmail: string; assemblyId: string }> {
  const q = (sql: string, params: unknown[] = []) => ctx.ds.query(sql, params);
  const started = Date.now();
  await q(`INSERT INTO sites (code, name) VALUES ('BA', 'Bench North'), ('BB', 'Bench South')`);
  await q(`INSERT INTO areas (site_id, code, name) SELECT s.id, 'A' || g, 'Area ' || g FROM sites s, generate_series(1, 10) g`);
  await q(`INSERT INTO equipment (site_id, area_id, asset_number, name, has_hour_meter)
           SELECT a.site_id, a.id, a.code || '-E' || g, 'Machine ' || g, g % 2 = 0 FROM areas a, generate_series(1, ${Math.ceil(POSITIONS / 200)}) g`);
  await q(`INSERT INTO positions (site_id, equipment_id, code, name, service_code, medium_code, max_operating_pressure_kpa, size_code, criticality)
           SELECT e.site_id, e.id, e.asset_number || '-P' || g, 'Hose point ' || g,
                  (ARRAY['compressed-air','water-discharge','slurry','fuel-oil','hydraulic-suction-return'])[1 + (g % 5)], 'water', 700, 'bore-25',
                  (ARRAY['high','medium','low'])[1 + (g % 3)]
             FROM equipment e, generate_series(1, 10) g`);
  await q(`INSERT INTO constructions (code, name, size_code, working_pressure_kpa, burst_pressure_kpa) SELECT 'BC-' || g, 'Bench hose ' || g, 'bore-25', 2000, 8000 FROM generate_series(1, 50) g`);
  // One installed assembly per position; the rest in stock, removed or scrapped.
  await q(`INSERT INTO assemblies (number, construction_id, status, site_id, position_id, installed_at, check_outcome, next_inspection_due, built_on, overall_length_mm, version)
           SELECT 'B' || lpad(n::text, 7, '0'),
                  (SELECT id FROM constructions ORDER BY code OFFSET (n % 50) LIMIT 1),
                  'installed', p.site_id, p.id, now() - (n % 900)::int * interval '1 day',
                  (ARRAY['pass','pass','pass','warn','fail'])[1 + (n % 5)],
                  current_date + ((n % 120) - 30)::int, current_date - 1000, 3000, 1
             FROM (SELECT id, site_id, row_number() OVER (ORDER BY id) AS n FROM positions) p`);
  await q(`INSERT INTO assemblies (number, construction_id, status, site_id, built_on, overall_length_mm, version)
           SELECT 'B' || lpad(n::text, 7, '0'), c.id, (ARRAY['in_stock','removed','scrapped','scrapped'])[1 + (n % 4)],
                  (SELECT id FROM sites ORDER BY code OFFSET (n % 2) LIMIT 1), current_date - 1500, 3000, 1
             FROM generate_series(${POSITIONS + 1}, ${ASSEMBLIES}) n
             JOIN LATERAL (SELECT id FROM constructions ORDER BY code OFFSET (n % 50) LIMIT 1) c ON TRUE`);
  await q(`ANALYZE`);
  const hash = await hashPassword('bench-password-2026', 4);
  await q(`INSERT INTO users (email, name, role, all_sites, password_hash) VALUES ('bench@ferrule.test', 'Bench Engineer', 'reliability_engineer', true, $1)`, [hash]);
  const [one] = await q(`SELECT id FROM assemblies WHERE status = 'installed' ORDER BY number OFFSET 5000 LIMIT 1`);
  console.log(`Seeded ${ASSEMBLIES.toLocaleString()} assemblies over ${POSITIONS.toLocaleString()} positions in ${((Date.now() - started) / 1000).toFixed(1)} s`);
  return { userEmail: 'bench@ferrule.test', assemblyId: one.id };
}

async function main() {
  const uid = process.getuid?.() ?? 0;
  const cluster = ensureCluster({ dir: process.env.FERRULE_BENCH_DIR ?? `/tmp/ferrule-bench-${uid}`, port: Number(process.env.FERRULE_BENCH_PG_PORT ?? 54389), throwaway: true });
  const url = (await ensureDatabase(cluster, { db: 'ferrule_bench_test', fresh: true })) as string;
  const config = loadConfig({
    FERRULE_MODE: 'test',
    DATABASE_URL: url,
    PUBLIC_BASE_URL: 'http://bench.ferrule.test',
    SESSION_SECRET: 'bench-secret-that-is-long-enough-for-ferrule',
    SMTP_URL: 'smtp://127.0.0.1:9?ignoreTLS=true',
  });
  const ds = createDataSource(url, { poolSize: 10 });
  await ds.initialize();
  await ds.runMigrations({ transaction: 'each' });
  const ctx: AppContext = { config, ds, clock: systemClock, mailer: { send: async () => {} }, logger: createLogger('test') };
  const { userEmail, assemblyId } = await seed(ctx);
  const server = createApp(ctx).listen(0);
  const base = `http://127.0.0.1:${(server.address() as AddressInfo).port}`;
  const signIn = await fetch(`${base}/api/auth/sign-in`, {
    method: 'POST',
    headers: { 'Content-Type': 'application/json', Origin: 'http://bench.ferrule.test' },
    body: JSON.stringify({ email: userEmail, password: 'bench-password-2026' }),
  });
  const cookie = (signIn.headers.get('set-cookie') ?? '').split(';')[0]!;

  // The register: installed, failing or warning, due soonest first, page 50 of 50 rows, with the total.
  const search = 'status=installed&checkOutcome=warn&sort=nextInspectionDue&dir=asc&page=50&pageSize=50';
  const query = assemblyListQuerySchema.parse(Object.fromEntries(new URLSearchParams(search)));
  const actor = { id: '', email: '', name: '', role: 'reliability_engineer' as const, allSites: true, siteIds: [], sessionId: '' };
  const where = registerWhere(actor, query, new Date().toISOString().slice(0, 10));
  const from = `FROM assemblies a JOIN sites s ON s.id = a.site_id JOIN constructions c ON c.id = a.construction_id
    LEFT JOIN positions p ON p.id = a.position_id LEFT JOIN equipment e ON e.id = p.equipment_id LEFT JOIN areas ar ON ar.id = e.area_id`;
  const bareRegister = async () => {
    await ds.query(`SELECT count(*)::int AS n ${from} ${where.sql}`, where.params);
    await ds.query(
      `SELECT a.id, a.number, a.status, s.name, c.code, c.name, c.size_code, p.code, p.name, e.name, ar.name, p.service_code, a.check_outcome,
              EXISTS (SELECT 1 FROM check_overrides o WHERE o.assembly_id = a.id AND o.position_id = a.position_id), a.next_inspection_due, a.installed_at, a.updated_at
         ${from} ${where.sql} ORDER BY a.next_inspection_due ASC NULLS LAST, a.number ASC LIMIT 50 OFFSET 2450`,
      where.params,
    );
  };
  const httpRegister = async () => {
    const res = await fetch(`${base}/api/assemblies?${search}`, { headers: { Cookie: cookie } });
    const body = (await res.json()) as { data: unknown[] };
    if (res.status !== 200 || body.data.length !== 50) throw new Error(`register answered ${res.status} with ${body.data.length} rows`);
  };
  const bareAssembly = async () => {
    await ds.query(`SELECT a.*, s.name, c.*, p.*, e.name, ar.name FROM assemblies a JOIN sites s ON s.id = a.site_id JOIN constructions c ON c.id = a.construction_id
      LEFT JOIN positions p ON p.id = a.position_id LEFT JOIN equipment e ON e.id = p.equipment_id LEFT JOIN areas ar ON ar.id = e.area_id WHERE a.id = $1`, [assemblyId]);
  };
  const httpAssembly = async () => {
    const res = await fetch(`${base}/api/assemblies/${assemblyId}`, { headers: { Cookie: cookie } });
    if (res.status !== 200) throw new Error(`assembly page answered ${res.status}`);
    await res.json();
  };

  if (process.env.BENCH_EXPLAIN) {
    for (const sql of [`SELECT count(*)::int AS n ${from} ${where.sql}`, `SELECT a.id ${from} ${where.sql} ORDER BY a.next_inspection_due ASC NULLS LAST, a.number ASC LIMIT 50 OFFSET 2450`]) {
      const plan: Array<Record<string, string>> = await ds.query(`EXPLAIN (ANALYZE, BUFFERS) ${sql}`, where.params);
      console.log(plan.map((row) => Object.values(row)[0]).join('\n'));
    }
  }
  const results = [
    { name: 'register page (filter, sort, page 50 × 50 rows, total)', http: stats(await time(httpRegister)), bare: stats(await time(bareRegister)) },
    { name: 'assembly page', http: stats(await time(httpAssembly)), bare: stats(await time(bareAssembly)) },
  ];
  console.log(`\n${RUNS} runs each after ${WARMUP} warm-up runs; times in ms`);
  for (const r of results) {
    console.log(
      `${r.name}\n  HTTP  median ${r.http.median.toFixed(1)}  p95 ${r.http.p95.toFixed(1)}\n  SQL   median ${r.bare.median.toFixed(1)}  p95 ${r.bare.p95.toFixed(1)}\n  ratio ${(r.http.median / r.bare.median).toFixed(2)} (median HTTP ÷ median bare SQL)`,
    );
  }
  const register = results[0]!;
  const verdict = register.http.median < 100 && register.http.median / register.bare.median <= 3;
  console.log(`\nTargets: register median under 100 ms and ratio at most 3 — ${verdict ? 'met' : 'NOT met'}`);
  server.close();
  await ds.destroy();
  cluster.stop();
}

void main();
