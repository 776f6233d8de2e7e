import { spawnSync } from 'node:child_process';
import { describe, expect, it } from 'vitest';
import { loadConfig } from '../../backend/src/config.js';

const PRODUCTION = {
  NODE_ENV: 'production',
  DATABASE_URL: 'postgres://ferrule:pw@db.internal:5432/ferrule',
  SMTP_URL: 'smtp://mail.internal:587',
  PUBLIC_BASE_URL: 'https://hoses.ferrule.test',
  SESSION_SECRET: 's'.repeat(40),
};

describe('production settings', () => {
  it('starts with every required setting', () => {
    const config = loadConfig(PRODUCTION);
    expect(config.mode).toBe('production');
    expect(config.publicBaseUrl.origin).toBe('https://hoses.ferrule.test');
  });

  it.each(['DATABASE_URL', 'SMTP_URL', 'PUBLIC_BASE_URL', 'SESSION_SECRET'])('refuses to start without %s, naming it', (name) => {
    const env: Record<string, string> = { ...PRODUCTION };
    delete env[name];
    expect(() => loadConfig(env)).toThrow(name);
  });

  it('refuses a short session secret', () => {
    expect(() => loadConfig({ ...PRODUCTION, SESSION_SECRET: 'short' })).toThrow(/SESSION_SECRET must be at least 32/);
  });

  it('refuses demo data in production', () => {
    expect(() => loadConfig({ ...PRODUCTION, FERRULE_DEMO: '1' })).toThrow(/FERRULE_DEMO/);
  });

  it('reads the trust-proxy setting', () => {
    expect(loadConfig({ ...PRODUCTION, TRUST_PROXY: '1' }).trustProxy).toBe(1);
    expect(loadConfig({ ...PRODUCTION, TRUST_PROXY: 'loopback' }).trustProxy).toBe('loopback');
    expect(loadConfig(PRODUCTION).trustProxy).toBe(false);
  });

  it('the server process exits naming every missing setting', () => {
    const result = spawnSync('node_modules/.bin/tsx', ['--tsconfig', 'backend/tsconfig.json', 'backend/src/server.ts'], {
      env: { PATH: process.env.PATH, NODE_ENV: 'production' },
      encoding: 'utf8',
      timeout: 30_000,
    });
    expect(result.status).toBe(78);
    for (const name of ['DATABASE_URL', 'SMTP_URL', 'PUBLIC_BASE_URL', 'SESSION_SECRET']) expect(result.stderr).toContain(name);
  });
});
