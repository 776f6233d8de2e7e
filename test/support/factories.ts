import type { Role } from '../../shared/src/roles.js';
import type { AppContext } from '../../backend/src/context.js';
import { Site, User } from '../../backend/src/entities/index.js';
import { hashPassword } from '../../backend/src/lib/crypto.js';
import { call } from './api.js';
import type { Express } from 'express';

let sequence = 0;
const unique = () => `${Date.now().toString(36)}${(++sequence).toString(36)}`;

export const TEST_PASSWORD = 'gauge-needle-41';

export async function buildSite(ctx: AppContext, overrides: Partial<Site> = {}): Promise<Site> {
  const code = `S${unique()}`.toUpperCase();
  return ctx.ds.getRepository(Site).save({ code, name: `Site ${code}`, timeZone: 'UTC', ...overrides });
}

export async function buildUser(
  ctx: AppContext,
  overrides: Partial<User> & { role?: Role; password?: string | null } = {},
): Promise<User> {
  const { password = TEST_PASSWORD, ...rest } = overrides;
  return ctx.ds.getRepository(User).save({
    email: `user-${unique()}@ferrule.test`,
    name: `Test User ${unique()}`,
    role: 'viewer',
    allSites: true,
    siteIds: [],
    active: true,
    passwordHash: password === null ? null : await hashPassword(password, 4),
    ...rest,
  });
}

/** Signs in through the API and returns the session cookie. */
export async function signIn(app: Express, email: string, password = TEST_PASSWORD): Promise<string> {
  const res = await call(app, 'post', '/api/auth/sign-in').send({ email, password });
  if (res.status !== 200) throw new Error(`sign-in failed: ${res.status} ${JSON.stringify(res.body)}`);
  const cookie = res.headers['set-cookie'] as unknown as string[] | undefined;
  return cookie?.[0]?.split(';')[0] ?? '';
}
