// How the scripts start Ferrule's own programs.
import { spawn } from 'node:child_process';
import { existsSync, readdirSync, statSync } from 'node:fs';
import { join } from 'node:path';
import { ROOT, fail, run, say } from './setup.mjs';

const TSX = join(ROOT, 'node_modules', '.bin', 'tsx');
const SERVER_TSCONFIG = join(ROOT, 'backend', 'tsconfig.json');

/** Runs a backend command-line program (backend/src/cli/<name>.ts) to completion. */
export function runCli(name, env) {
  const status = run(TSX, ['--tsconfig', SERVER_TSCONFIG, join(ROOT, 'backend', 'src', 'cli', `${name}.ts`)], { env: { ...process.env, ...env } });
  if (status !== 0) fail(`${name} failed (exit ${status}).`);
}

/** Starts the API server; `compiled` runs the production build in dist/ instead of the sources. */
export function spawnServer(env, { compiled = false, stdio = 'inherit' } = {}) {
  const entry = compiled ? [join(ROOT, 'dist', 'server', 'backend', 'src', 'server.js')] : ['--tsconfig', SERVER_TSCONFIG, join(ROOT, 'backend', 'src', 'server.ts')];
  return spawn(compiled ? process.execPath : TSX, entry, { cwd: ROOT, env: { ...process.env, ...env }, stdio });
}

export async function waitForHttp(url, { timeoutMs = 60_000, child } = {}) {
  const started = Date.now();
  while (Date.now() - started < timeoutMs) {
    if (child && child.exitCode !== null) return false;
    try {
      const res = await fetch(url);
      if (res.ok) return true;
    } catch {}
    await new Promise((r) => setTimeout(r, 250));
  }
  return false;
}

function newestMtime(dir) {
  let newest = 0;
  for (const entry of readdirSync(dir, { withFileTypes: true })) {
    const path = join(dir, entry.name);
    newest = Math.max(newest, entry.isDirectory() ? newestMtime(path) : statSync(path).mtimeMs);
  }
  return newest;
}

/** Builds the client with Vite when dist/client is missing or older than its sources. */
export function ensureClientBuild() {
  const index = join(ROOT, 'dist', 'client', 'index.html');
  const sources = Math.max(newestMtime(join(ROOT, 'frontend')), newestMtime(join(ROOT, 'shared', 'src')), statSync(join(ROOT, 'vite.config.ts')).mtimeMs);
  if (existsSync(index) && statSync(index).mtimeMs >= sources) return;
  say('Building the client…');
  if (run(join(ROOT, 'node_modules', '.bin', 'vite'), ['build', '--logLevel', 'warn']) !== 0) fail('The client build failed.');
}
