// Set-up shared by the start and test scripts: npm packages, Debian packages, paths.
import { execFileSync, spawnSync } from 'node:child_process';
import { existsSync, statSync } from 'node:fs';
import { dirname, join } from 'node:path';
import { fileURLToPath } from 'node:url';

export const ROOT = join(dirname(fileURLToPath(import.meta.url)), '..', '..');
export const isRoot = typeof process.getuid === 'function' && process.getuid() === 0;

export function say(message) {
  console.log(`\x1b[36m▸\x1b[0m ${message}`);
}

export function fail(message) {
  console.error(`\n\x1b[31m✖ ${message}\x1b[0m\n`);
  process.exit(1);
}

export function run(cmd, args, options = {}) {
  const result = spawnSync(cmd, args, { stdio: 'inherit', cwd: ROOT, ...options });
  if (result.error) throw result.error;
  return result.status ?? 1;
}

export function commandExists(cmd) {
  return spawnSync('sh', ['-c', `command -v ${cmd}`], { stdio: 'ignore' }).status === 0;
}

/** Installs npm packages when node_modules is missing or older than the lock file. */
export function ensureNodeModules() {
  const marker = join(ROOT, 'node_modules', '.package-lock.json');
  const lock = join(ROOT, 'package-lock.json');
  const stale = !existsSync(marker) || (existsSync(lock) && statSync(lock).mtimeMs > statSync(marker).mtimeMs);
  if (!stale) return;
  say('Installing npm packages (npm ci)…');
  const status = run('npm', ['ci', '--no-audit', '--no-fund', '--loglevel=error']);
  if (status !== 0) fail('npm ci failed: see the messages above.');
}

let aptUpdated = false;

/** Installs Debian packages as root, or with sudo when it needs no password; explains otherwise. */
export function aptInstall(packages, why) {
  const prefix = isRoot ? [] : commandExists('sudo') && spawnSync('sudo', ['-n', 'true'], { stdio: 'ignore' }).status === 0 ? ['sudo', '-n'] : null;
  if (!commandExists('apt-get') || prefix === null) {
    fail(
      `${why} is missing and cannot be installed from here.\n` +
        `  Install it yourself, e.g.:  sudo apt-get install -y ${packages.join(' ')}\n` +
        `  then run the command again.`,
    );
  }
  const exec = (args) => {
    const [cmd, ...rest] = [...prefix, 'apt-get', ...args];
    return run(cmd, rest, { env: { ...process.env, DEBIAN_FRONTEND: 'noninteractive' } });
  };
  say(`Installing ${packages.join(', ')} from Debian's packages (${why})…`);
  if (!aptUpdated) {
    exec(['update', '-qq']);
    aptUpdated = true;
  }
  if (exec(['install', '-y', '-qq', '--no-install-recommends', ...packages]) !== 0) {
    fail(`apt-get could not install ${packages.join(' ')}. Install it yourself and run the command again.`);
  }
}

export function ensureChromium() {
  const path = process.env.CHROMIUM_PATH ?? '/usr/bin/chromium';
  if (existsSync(path)) return path;
  aptInstall(['chromium'], 'Chromium for the browser tests');
  if (!existsSync(path)) fail(`Chromium is still not at ${path}.`);
  return path;
}

export function gitRevision() {
  try {
    return execFileSync('git', ['rev-parse', '--short', 'HEAD'], { cwd: ROOT, encoding: 'utf8' }).trim();
  } catch {
    return 'unknown';
  }
}
