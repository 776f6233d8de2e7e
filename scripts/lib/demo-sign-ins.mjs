// The demo sign-ins as `npm start` prints them; read from the seed so they never drift.
import { readFileSync } from 'node:fs';
import { join } from 'node:path';
import { ROOT } from './setup.mjs';

const source = readFileSync(join(ROOT, 'backend', 'src', 'seed', 'demo-scenario.ts'), 'utf8');
const LABELS = {
  administrator: 'Administrator',
  reliability_engineer: 'Reliability engineer',
  technician: 'Technician',
  safety_officer: 'Safety officer',
  viewer: 'Viewer',
};
export const DEMO_PASSWORD = /DEMO_PASSWORD = '([^']+)'/.exec(source)?.[1] ?? '';
export const DEMO_SIGN_INS = [...source.matchAll(/\{ role: '(\w+)', email: '([^']+)'/g)].map((m) => ({
  role: m[1],
  email: m[2],
  label: LABELS[m[1]] ?? m[1],
}));
