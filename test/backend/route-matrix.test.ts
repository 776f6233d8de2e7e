import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { ROLES } from '../../shared/src/roles.js';
import { ROUTES } from '../../backend/src/routes/registry.js';
import { call, startTestServer } from '../support/api.js';
import { buildSite, buildUser, signIn } from '../support/factories.js';
import { ASSEMBLY_EXPECTATIONS } from './matrix/assemblies.js';
import { CATALOGUE_EXPECTATIONS } from './matrix/catalogue.js';
import { CSV_EXPECTATIONS } from './matrix/csv.js';
import { FOUNDATION_EXPECTATIONS } from './matrix/foundation.js';
import { REGISTER_EXPECTATIONS } from './matrix/register.js';
import type { Expectations, Fixtures, Prepared } from './matrix/types.js';

/**
 * Every route of the registry with the status each kind of caller gets: no session, each role
 * (with access to all sites), and a user whose sites do not include the record.
 */
const EXPECTATIONS: Expectations = { ...FOUNDATION_EXPECTATIONS, ...REGISTER_EXPECTATIONS, ...CATALOGUE_EXPECTATIONS, ...CSV_EXPECTATIONS, ...ASSEMBLY_EXPECTATIONS };

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
  if (prepared.file) {
    for (const [name, value] of Object.entries((prepared.body ?? {}) as Record<string, string>)) req = req.field(name, value);
    return req.attach(prepared.file.field, Buffer.from(prepared.file.content), prepared.file.name);
  }
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
    const role = expectation.outOfScopeRole ?? 'administrator';
    it(`answers ${expectation.outOfScope} to a ${role} whose sites do not include the record`, async () => {
      const user = await buildUser(fx.server.ctx, { role, allSites: false, siteIds: [fx.siteA.id] });
      const cookie = await signIn(fx.server.app, user.email);
      const res = await send(method, await expectation.prepare(fx), cookie);
      expect(res.status, JSON.stringify(res.body)).toBe(expectation.outOfScope);
    });
  }
});
