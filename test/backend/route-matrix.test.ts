import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { ROLES, type Role } from '../../shared/src/roles.js';
import { ROUTES } from '../../backend/src/routes/registry.js';
import type { Site, User } from '../../backend/src/entities/index.js';
import { call, startTestServer, type TestServer } from '../support/api.js';
import { buildSite, buildUser, signIn } from '../support/factories.js';

/**
 * Every route of the registry with the status each kind of caller gets: no session, each role
 * (with access to all sites), and an administrator whose sites do not include the record.
 */
interface Fixtures {
  server: TestServer;
  siteA: Site;
  siteB: Site;
}
interface Prepared {
  path: string;
  body?: unknown;
  query?: Record<string, string>;
}
interface Expectation {
  anonymous: number;
  roles: Record<Role, number>;
  /** Status for an administrator limited to site A acting on a record of site B. */
  outOfScope?: number;
  prepare: (fx: Fixtures) => Promise<Prepared>;
}

const onlyAdmin = (ok: number): Record<Role, number> => ({
  administrator: ok,
  reliability_engineer: 403,
  technician: 403,
  safety_officer: 403,
  viewer: 403,
});
const everyone = (status: number): Record<Role, number> => Object.fromEntries(ROLES.map((r) => [r, status])) as Record<Role, number>;

const siteBUser = (fx: Fixtures, overrides: Partial<User> & { password?: string | null } = {}) =>
  buildUser(fx.server.ctx, { allSites: false, siteIds: [fx.siteB.id], ...overrides });

const EXPECTATIONS: Record<string, Expectation> = {
  'GET /meta': { anonymous: 200, roles: everyone(200), prepare: async () => ({ path: '/api/meta' }) },
  'POST /auth/sign-in': {
    anonymous: 401,
    roles: everyone(401),
    prepare: async () => ({ path: '/api/auth/sign-in', body: { email: `nobody-${Math.random().toString(36).slice(2)}@ferrule.test`, password: 'not-the-password-1' } }),
  },
  'POST /auth/sign-out': { anonymous: 401, roles: everyone(204), prepare: async () => ({ path: '/api/auth/sign-out' }) },
  'POST /auth/sign-out-everywhere': { anonymous: 401, roles: everyone(204), prepare: async () => ({ path: '/api/auth/sign-out-everywhere' }) },
  'GET /auth/me': { anonymous: 401, roles: everyone(200), prepare: async () => ({ path: '/api/auth/me' }) },
  'PUT /me/preferences': {
    anonymous: 401,
    roles: everyone(200),
    prepare: async () => ({ path: '/api/me/preferences', body: { pressureUnit: 'psi', lengthUnit: 'in', temperatureUnit: 'F' } }),
  },
  'POST /auth/password-reset': {
    anonymous: 202,
    roles: everyone(202),
    prepare: async () => ({ path: '/api/auth/password-reset', body: { email: 'nobody@ferrule.test' } }),
  },
  'POST /auth/password-reset/complete': {
    anonymous: 400,
    roles: everyone(400),
    prepare: async () => ({ path: '/api/auth/password-reset/complete', body: { token: 'x'.repeat(43), password: 'valve-seat-gasket-9' } }),
  },
  'POST /auth/invitations/accept': {
    anonymous: 400,
    roles: everyone(400),
    prepare: async () => ({ path: '/api/auth/invitations/accept', body: { token: 'x'.repeat(43), password: 'valve-seat-gasket-9' } }),
  },
  'POST /setup': {
    anonymous: 403,
    roles: everyone(403),
    prepare: async () => ({ path: '/api/setup', body: { token: 'x'.repeat(43), email: 'first@ferrule.test', name: 'First', password: 'valve-seat-gasket-9' } }),
  },
  'GET /sites': { anonymous: 401, roles: everyone(200), prepare: async () => ({ path: '/api/sites' }) },
  'GET /users': { anonymous: 401, roles: onlyAdmin(200), prepare: async () => ({ path: '/api/users' }) },
  'POST /users': {
    anonymous: 401,
    roles: onlyAdmin(201),
    outOfScope: 403,
    prepare: async (fx) => ({
      path: '/api/users',
      body: { email: `invitee-${Math.random().toString(36).slice(2)}@ferrule.test`, name: 'New Fitter', role: 'technician', allSites: false, siteIds: [fx.siteB.id] },
    }),
  },
  'GET /users/:id': {
    anonymous: 401,
    roles: onlyAdmin(200),
    outOfScope: 404,
    prepare: async (fx) => ({ path: `/api/users/${(await siteBUser(fx)).id}` }),
  },
  'PATCH /users/:id': {
    anonymous: 401,
    roles: onlyAdmin(200),
    outOfScope: 404,
    prepare: async (fx) => ({ path: `/api/users/${(await siteBUser(fx)).id}`, body: { name: 'Renamed Fitter' } }),
  },
  'POST /users/:id/deactivate': {
    anonymous: 401,
    roles: onlyAdmin(200),
    outOfScope: 404,
    prepare: async (fx) => ({ path: `/api/users/${(await siteBUser(fx)).id}/deactivate` }),
  },
  'POST /users/:id/reactivate': {
    anonymous: 401,
    roles: onlyAdmin(200),
    outOfScope: 404,
    prepare: async (fx) => ({ path: `/api/users/${(await siteBUser(fx, { active: false })).id}/reactivate` }),
  },
  'POST /users/:id/resend-invite': {
    anonymous: 401,
    roles: onlyAdmin(202),
    outOfScope: 404,
    prepare: async (fx) => ({ path: `/api/users/${(await siteBUser(fx, { password: null })).id}/resend-invite` }),
  },
  'GET /audit': {
    anonymous: 401,
    roles: onlyAdmin(200),
    outOfScope: 404,
    prepare: async (fx) => ({ path: '/api/audit', query: { entityType: 'user', entityId: (await siteBUser(fx)).id } }),
  },
};

let fx: Fixtures;
beforeAll(async () => {
  const server = await startTestServer();
  fx = { server, siteA: await buildSite(server.ctx), siteB: await buildSite(server.ctx) };
});
afterAll(() => fx.server.close());

async function send(method: string, prepared: Prepared, cookie?: string) {
  const m = method.toLowerCase() as 'get' | 'post' | 'put' | 'patch' | 'delete';
  let req = call(fx.server.app, m, prepared.path, cookie);
  if (prepared.query) req = req.query(prepared.query);
  if (prepared.body !== undefined) req = req.send(prepared.body as object);
  return req;
}

describe('route registry', () => {
  it('has an expectation for every route and a route for every expectation', () => {
    const registered = ROUTES.map((r) => `${r.method.toUpperCase()} ${r.path}`).sort();
    expect(registered).toEqual(Object.keys(EXPECTATIONS).sort());
  });
});

describe.each(Object.entries(EXPECTATIONS))('%s', (key, expectation) => {
  const method = key.split(' ')[0]!;

  it(`answers ${expectation.anonymous} without a session`, async () => {
    const res = await send(method, await expectation.prepare(fx));
    expect(res.status, JSON.stringify(res.body)).toBe(expectation.anonymous);
  });

  it.each(ROLES)('answers as expected for %s', async (role) => {
    const user = await buildUser(fx.server.ctx, { role, allSites: true });
    const cookie = await signIn(fx.server.app, user.email);
    const res = await send(method, await expectation.prepare(fx), cookie);
    expect(res.status, JSON.stringify(res.body)).toBe(expectation.roles[role]);
  });

  if (expectation.outOfScope !== undefined) {
    it(`answers ${expectation.outOfScope} to an administrator whose sites do not include the record`, async () => {
      const user = await buildUser(fx.server.ctx, { role: 'administrator', allSites: false, siteIds: [fx.siteA.id] });
      const cookie = await signIn(fx.server.app, user.email);
      const res = await send(method, await expectation.prepare(fx), cookie);
      expect(res.status, JSON.stringify(res.body)).toBe(expectation.outOfScope);
    });
  }
});
