import { afterAll, beforeAll, beforeEach, describe, expect, it } from 'vitest';
import type { Site, User } from '../../backend/src/entities/index.js';
import { call, startTestServer, tokenFromMail, waitForMail, type TestServer } from '../support/api.js';
import { buildSite, buildUser, signIn } from '../support/factories.js';

let server: TestServer;
let siteA: Site;
let siteB: Site;
let admin: User;
let adminCookie: string;
beforeAll(async () => {
  server = await startTestServer();
  siteA = await buildSite(server.ctx);
  siteB = await buildSite(server.ctx);
  admin = await buildUser(server.ctx, { role: 'administrator', name: 'Admin <b>Bold</b>' });
  adminCookie = await signIn(server.app, admin.email);
});
afterAll(() => server.close());
beforeEach(() => server.clock.reset());

const invite = (cookie: string, body: Record<string, unknown>) => call(server.app, 'post', '/api/users', cookie).send(body);
const email = () => `invitee-${Math.random().toString(36).slice(2)}@ferrule.test`;

describe('invitations', () => {
  it('mails a set-password link that works once; the invitee then signs in', async () => {
    const address = email();
    const before = server.catcher.messages().length;
    const res = await invite(adminCookie, { email: address, name: 'Rhiannon <Fitter>', role: 'technician', allSites: false, siteIds: [siteA.id] });
    expect(res.status).toBe(201);
    expect(res.body.data).toMatchObject({ email: address, status: 'invited', role: 'technician' });
    const mail = await waitForMail(server.catcher, address, before);
    expect(mail.html).toContain('Rhiannon &lt;Fitter&gt;');
    expect(mail.html).toContain('Admin &lt;b&gt;Bold&lt;/b&gt;');
    expect(mail.html).not.toContain('<Fitter>');
    expect(mail.text).toContain('http://ferrule.test/accept-invite?token=');
    const token = tokenFromMail(mail);
    await call(server.app, 'post', '/api/auth/invitations/accept').send({ token, password: 'swaged-coupling-12' }).expect(204);
    await call(server.app, 'post', '/api/auth/invitations/accept').send({ token, password: 'swaged-coupling-13' }).expect(400);
    const signedIn = await call(server.app, 'post', '/api/auth/sign-in').send({ email: address, password: 'swaged-coupling-12' });
    expect(signedIn.status).toBe(200);
    expect(signedIn.body.data.sites.map((s: Site) => s.id)).toEqual([siteA.id]);
  });

  it('expires an invitation after 72 hours', async () => {
    const address = email();
    const before = server.catcher.messages().length;
    await invite(adminCookie, { email: address, name: 'Late Starter', role: 'viewer', allSites: true, siteIds: [] }).expect(201);
    const token = tokenFromMail(await waitForMail(server.catcher, address, before));
    server.clock.advance(72 * 3600_000 + 60_000);
    const res = await call(server.app, 'post', '/api/auth/invitations/accept').send({ token, password: 'swaged-coupling-12' });
    expect(res.status).toBe(400);
    expect(res.body.error.code).toBe('invalid_token');
  });

  it('sending again withdraws the earlier link', async () => {
    const address = email();
    let before = server.catcher.messages().length;
    const res = await invite(adminCookie, { email: address, name: 'Twice Asked', role: 'viewer', allSites: true, siteIds: [] });
    const first = tokenFromMail(await waitForMail(server.catcher, address, before));
    before = server.catcher.messages().length;
    await call(server.app, 'post', `/api/users/${res.body.data.id}/resend-invite`, adminCookie).expect(202);
    const second = tokenFromMail(await waitForMail(server.catcher, address, before));
    await call(server.app, 'post', '/api/auth/invitations/accept').send({ token: first, password: 'swaged-coupling-12' }).expect(400);
    await call(server.app, 'post', '/api/auth/invitations/accept').send({ token: second, password: 'swaged-coupling-12' }).expect(204);
  });

  it('refuses an e-mail already in use, on the e-mail field', async () => {
    const res = await invite(adminCookie, { email: admin.email, name: 'Copy', role: 'viewer', allSites: true, siteIds: [] });
    expect(res.status).toBe(409);
    expect(res.body.error).toMatchObject({ code: 'email_taken', field: 'email' });
  });

  it('refuses a site that does not exist', async () => {
    const res = await invite(adminCookie, { email: email(), name: 'Nowhere', role: 'viewer', allSites: false, siteIds: ['7b0c7e0e-1c59-4d7a-9d0b-3f3f3f3f3f3f'] });
    expect(res.status).toBe(400);
    expect(res.body.error.field).toBe('siteIds');
  });
});

describe('granting access', () => {
  let limitedCookie: string;
  beforeAll(async () => {
    const limited = await buildUser(server.ctx, { role: 'administrator', allSites: false, siteIds: [siteA.id] });
    limitedCookie = await signIn(server.app, limited.email);
  });

  it('lets an administrator limited to some sites invite to their own sites', async () => {
    expect((await invite(limitedCookie, { email: email(), name: 'Local Fitter', role: 'technician', allSites: false, siteIds: [siteA.id] })).status).toBe(201);
  });

  it('refuses them a site of someone else', async () => {
    const res = await invite(limitedCookie, { email: email(), name: 'Far Fitter', role: 'technician', allSites: false, siteIds: [siteA.id, siteB.id] });
    expect(res.status).toBe(403);
    expect(res.body.error.code).toBe('grant_beyond_scope');
  });

  it('refuses them an unlimited administrator', async () => {
    const res = await invite(limitedCookie, { email: email(), name: 'Big Boss', role: 'administrator', allSites: true, siteIds: [] });
    expect(res.status).toBe(403);
  });

  it('refuses them widening a user of their own site to all sites', async () => {
    const local = await buildUser(server.ctx, { allSites: false, siteIds: [siteA.id] });
    const res = await call(server.app, 'patch', `/api/users/${local.id}`, limitedCookie).send({ allSites: true });
    expect(res.status).toBe(403);
  });

  it('hides users beyond their sites from their list', async () => {
    const far = await buildUser(server.ctx, { allSites: false, siteIds: [siteB.id], name: 'Far Away Person' });
    const res = await call(server.app, 'get', '/api/users', limitedCookie).query({ q: 'Far Away Person', pageSize: 200 });
    expect(res.status).toBe(200);
    expect(res.body.data.map((u: User) => u.id)).not.toContain(far.id);
    const full = await call(server.app, 'get', '/api/users', adminCookie).query({ q: 'Far Away Person' });
    expect(full.body.data.map((u: User) => u.id)).toContain(far.id);
  });
});

describe('the last unlimited administrator', () => {
  it('cannot be deactivated or demoted', async () => {
    const last = await buildUser(server.ctx, { role: 'administrator', allSites: true });
    // Leave `last` as the only active administrator with every site.
    await server.ctx.ds.query(`UPDATE users SET active = false WHERE role = 'administrator' AND all_sites AND id <> $1`, [last.id]);
    const helper = await buildUser(server.ctx, { role: 'administrator', allSites: false, siteIds: [siteA.id] });
    const cookie = await signIn(server.app, last.email);
    const demote = await call(server.app, 'patch', `/api/users/${last.id}`, cookie).send({ role: 'viewer' });
    expect(demote.status).toBe(409);
    expect(demote.body.error.code).toBe('last_administrator');
    const limit = await call(server.app, 'patch', `/api/users/${last.id}`, cookie).send({ allSites: false, siteIds: [siteA.id] });
    expect(limit.status).toBe(409);
    const self = await call(server.app, 'post', `/api/users/${last.id}/deactivate`, cookie);
    expect(self.status).toBe(409);
    expect(helper.role).toBe('administrator');
    // With a second unlimited administrator, the first may step down.
    const second = await buildUser(server.ctx, { role: 'administrator', allSites: true });
    expect((await call(server.app, 'patch', `/api/users/${last.id}`, cookie).send({ role: 'reliability_engineer' })).status).toBe(200);
    await server.ctx.ds.query(`UPDATE users SET active = true WHERE role = 'administrator' AND all_sites AND id <> $1`, [second.id]);
  });
});

describe('the audit trail of user administration', () => {
  it('records who changed what, without secrets, and cannot be changed', async () => {
    const target = await buildUser(server.ctx, { role: 'technician' });
    await call(server.app, 'patch', `/api/users/${target.id}`, adminCookie).send({ role: 'safety_officer', accessExpiresOn: '2030-01-31' }).expect(200);
    await call(server.app, 'post', `/api/users/${target.id}/deactivate`, adminCookie).expect(200);
    const res = await call(server.app, 'get', '/api/audit', adminCookie).query({ entityType: 'user', entityId: target.id });
    expect(res.status).toBe(200);
    expect(res.body.data.map((e: { summary: string }) => e.summary)).toEqual(['Deactivated', 'Changed role, access expiry']);
    expect(res.body.data[0].actorName).toBe(admin.name);
    const rows = await server.ctx.ds.query(`SELECT before, after FROM audit_entries WHERE entity_id = $1`, [target.id]);
    for (const row of rows) {
      expect(JSON.stringify(row)).not.toMatch(/passwordHash|\$2[aby]\$/);
    }
    await expect(server.ctx.ds.query(`UPDATE audit_entries SET action = 'x' WHERE entity_id = $1`, [target.id])).rejects.toThrow(/append_only/);
    await expect(server.ctx.ds.query(`DELETE FROM audit_entries WHERE entity_id = $1`, [target.id])).rejects.toThrow(/append_only/);
  });
});

describe('the user list', () => {
  it('pages, sorts and filters on the server', async () => {
    const tag = Math.random().toString(36).slice(2, 8);
    for (const [name, role] of [['Ann', 'technician'], ['Bea', 'viewer'], ['Cal', 'technician']] as const) {
      await buildUser(server.ctx, { name: `${name} ${tag}`, role });
    }
    const res = await call(server.app, 'get', '/api/users', adminCookie).query({ q: tag, role: 'technician', sort: 'name', dir: 'desc', pageSize: 1, page: 1 });
    expect(res.status).toBe(200);
    expect(res.body.pagination).toEqual({ page: 1, pageSize: 1, total: 2 });
    expect(res.body.data[0].name).toBe(`Cal ${tag}`);
  });
});
