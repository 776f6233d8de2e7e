// npm test: a throw-away PostgreSQL, then typecheck, lint, unit, API, build and browser tests.
// Ends with one line "N passed, N failed" summed over every step, and exits non-zero on any failure.
import { existsSync, mkdirSync, readFileSync, rmSync } from 'node:fs';
import { join } from 'node:path';
import { ensureChromium, ensureNodeModules, ROOT, run, say } from './lib/setup.mjs';

const started = Date.now();
ensureNodeModules();
const { ensureCluster, ensureDatabase } = await import('./lib/postgres.mjs');
const { runCli, spawnServer, waitForHttp } = await import('./lib/app-env.mjs');

const only = process.argv.slice(2);
const wants = (step) => only.length === 0 || only.includes(step);
const uid = typeof process.getuid === 'function' ? process.getuid() : 0;
const workDir = process.env.FERRULE_TEST_DIR ?? `/tmp/ferrule-test-${uid}`;
const reports = join(workDir, 'reports');
const pgPort = Number(process.env.FERRULE_TEST_PG_PORT ?? 54339);
const bin = (name) => join(ROOT, 'node_modules', '.bin', name);

const totals = { passed: 0, failed: 0, skipped: 0 };
const failures = [];
function count(step, passed, failed, skipped = 0) {
  totals.passed += passed;
  totals.failed += failed;
  totals.skipped += skipped;
  if (failed) failures.push(step);
  say(`${step}: ${passed} passed, ${failed} failed${skipped ? `, ${skipped} skipped` : ''}`);
}

/** A step that is one check: its exit code decides. */
function check(step, cmd, args, env = {}) {
  if (!wants(step.split(' ')[0])) return;
  say(`${step}…`);
  const status = run(cmd, args, { env: { ...process.env, ...env } });
  count(step, status === 0 ? 1 : 0, status === 0 ? 0 : 1);
}

/** A vitest run, counted test by test from its JSON report. */
function vitest(step, projects, env = {}) {
  if (!wants(step)) return;
  const out = join(reports, `${step}.json`);
  rmSync(out, { force: true });
  say(`${step} tests…`);
  const args = ['run', ...projects.flatMap((p) => ['--project', p]), '--reporter=default', '--reporter=json', `--outputFile.json=${out}`];
  const status = run(bin('vitest'), args, { env: { ...process.env, ...env } });
  if (!existsSync(out)) return count(step, 0, 1);
  const report = JSON.parse(readFileSync(out, 'utf8'));
  const brokenFiles = report.testResults.filter((f) => f.status === 'failed' && f.assertionResults.length === 0).length;
  const failed = report.numFailedTests + brokenFiles + (status !== 0 && report.numFailedTests + brokenFiles === 0 ? 1 : 0);
  count(step, report.numPassedTests, failed, report.numPendingTests + report.numTodoTests);
  if (report.numTotalTests === 0) count(`${step} (no tests ran)`, 0, 1);
}

mkdirSync(reports, { recursive: true });
const needsDb = ['schema', 'api', 'e2e'].some(wants);
const cluster = needsDb ? ensureCluster({ dir: workDir, port: pgPort, throwaway: true }) : null;

check('typecheck shared', bin('tsc'), ['-p', 'shared/tsconfig.json']);
check('typecheck backend', bin('tsc'), ['-p', 'backend/tsconfig.json']);
check('typecheck frontend', bin('tsc'), ['-p', 'frontend/tsconfig.json']);
check('lint', bin('eslint'), ['--max-warnings=0', '.']);

if (cluster && wants('schema')) {
  const url = await ensureDatabase(cluster, { db: 'ferrule_schema_test', fresh: true });
  say('Migrations against entities…');
  runCli('migrate', { DATABASE_URL: url });
  check('schema (entities match migrations)', bin('tsx'), [
    '--tsconfig', 'backend/tsconfig.json', 'node_modules/typeorm/cli.js', 'migration:generate', '--check', '--pretty', '-d', 'backend/src/db/cli-data-source.ts', 'backend/src/migrations/unused',
  ], { DATABASE_URL: url });
}

vitest('unit', ['shared', 'frontend']);

if (cluster && wants('api')) {
  const url = await ensureDatabase(cluster, { db: 'ferrule_api_test', fresh: true });
  vitest('api', ['api'], { TEST_DATABASE_URL: url, TEST_DATABASE_MIGRATED: '0' });
}

check('build client', bin('vite'), ['build', '--logLevel', 'warn']);
check('build server', bin('tsc'), ['-p', 'backend/tsconfig.build.json']);

if (cluster && wants('e2e')) {
  const chromium = ensureChromium();
  const url = await ensureDatabase(cluster, { db: 'ferrule_e2e_test', fresh: true });
  const port = Number(process.env.FERRULE_TEST_PORT ?? 3310);
  const mailDir = join(workDir, 'mail');
  rmSync(mailDir, { recursive: true, force: true });
  const env = {
    FERRULE_MODE: 'demo',
    DATABASE_URL: url,
    PUBLIC_BASE_URL: `http://localhost:${port}`,
    SESSION_SECRET: cluster.secrets.sessionSecret,
    SMTP_URL: `smtp://127.0.0.1:${port + 1}?ignoreTLS=true`,
    MAIL_CATCHER_PORT: String(port + 1),
    MAIL_DIR: mailDir,
    CLIENT_DIR: join(ROOT, 'dist', 'client'),
    PORT: String(port),
    BCRYPT_COST: '4',
    FERRULE_DEMO_ANCHOR: '2026-06-15',
    LOG_LEVEL: 'warn',
  };
  runCli('migrate', env);
  runCli('seed', env);
  const compiled = existsSync(join(ROOT, 'dist', 'server', 'backend', 'src', 'server.js'));
  const server = spawnServer(env, { compiled });
  try {
    if (await waitForHttp(`http://127.0.0.1:${port}/api/meta`, { child: server })) {
      vitest('e2e', ['e2e'], { E2E_BASE_URL: `http://localhost:${port}`, E2E_MAIL_DIR: mailDir, CHROMIUM_PATH: chromium, E2E_SCREENSHOTS: join(workDir, 'screenshots') });
    } else {
      count('e2e (server did not start)', 0, 1);
    }
  } finally {
    server.kill('SIGTERM');
  }
}

cluster?.stop();
const minutes = ((Date.now() - started) / 60000).toFixed(1);
if (failures.length) console.log(`\nFailed: ${failures.join('; ')}`);
console.log(`\nTook ${minutes} min.`);
console.log(`${totals.passed} passed, ${totals.failed} failed${totals.skipped ? `, ${totals.skipped} skipped` : ''}`);
process.exit(totals.failed > 0 || totals.passed === 0 ? 1 : 0);
