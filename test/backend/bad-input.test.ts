import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it, vi } from 'vitest';
import { call, startTestServer, TEST_ORIGIN, type TestServer } from '../support/api.js';
import { buildUser, signIn } from '../support/factories.js';

let server: TestServer;
let cookie: string;
beforeAll(async () => {
  server = await startTestServer();
  cookie = await signIn(server.app, (await buildUser(server.ctx, { role: 'administrator' })).email);
});
afterAll(() => server.close());

const USER_ID = '4b9a2b8e-7c1f-4a57-9a1b-2f0d6f3c1e11';

/** Each route that takes a body: a valid body, a field to break with a wrong type, and its path. */
const BODY_ROUTES: Array<{ method: 'post' | 'put' | 'patch'; path: string; valid: Record<string, unknown>; wrongType: [string, unknown] }> = [
  { method: 'post', path: '/api/auth/sign-in', valid: { email: 'a@ferrule.test', password: 'x' }, wrongType: ['password', 12] },
  { method: 'put', path: '/api/me/preferences', valid: { pressureUnit: 'bar', lengthUnit: 'mm', temperatureUnit: 'C' }, wrongType: ['pressureUnit', 'atmospheres'] },
  { method: 'post', path: '/api/auth/password-reset', valid: { email: 'a@ferrule.test' }, wrongType: ['email', 'not-an-email'] },
  { method: 'post', path: '/api/auth/password-reset/complete', valid: { token: 'x'.repeat(43), password: 'valve-seat-gasket-9' }, wrongType: ['token', 5] },
  { method: 'post', path: '/api/auth/invitations/accept', valid: { token: 'x'.repeat(43), password: 'valve-seat-gasket-9' }, wrongType: ['password', false] },
  { method: 'post', path: '/api/setup', valid: { token: 'x'.repeat(43), email: 'a@ferrule.test', name: 'A', password: 'valve-seat-gasket-9' }, wrongType: ['name', ['A']] },
  { method: 'post', path: '/api/users', valid: { email: 'b@ferrule.test', name: 'B', role: 'viewer', allSites: true, siteIds: [] }, wrongType: ['role', 'foreman'] },
  { method: 'patch', path: `/api/users/${USER_ID}`, valid: { name: 'B' }, wrongType: ['accessExpiresOn', '31/01/2030'] },
];

describe.each(BODY_ROUTES)('$method $path', ({ method, path, valid, wrongType }) => {
  it('answers 400 to malformed JSON', async () => {
    const res = await call(server.app, method, path, cookie).set('Content-Type', 'application/json').send('{"email": ');
    expect(res.status).toBe(400);
    expect(res.body.error.code).toBe('malformed_json');
  });

  it('answers 400 naming an unknown field', async () => {
    const res = await call(server.app, method, path, cookie).send({ ...valid, colour: 'red' });
    expect(res.status).toBe(400);
    expect(res.body.error).toMatchObject({ code: 'unknown_field', field: 'colour' });
  });

  it('answers 400 naming a field of the wrong type', async () => {
    const res = await call(server.app, method, path, cookie).send({ ...valid, [wrongType[0]]: wrongType[1] });
    expect(res.status).toBe(400);
    expect(res.body.error.field).toBe(wrongType[0]);
    expect(res.body.error.message.length).toBeGreaterThan(3);
  });

  it('answers 400 to an oversize body', async () => {
    const res = await call(server.app, method, path, cookie).send({ ...valid, padding: 'x'.repeat(200_000) });
    expect(res.status).toBe(400);
    expect(res.body.error.code).toBe('body_too_large');
  });
});

describe('query and path input', () => {
  it('names a bad query value', async () => {
    const res = await call(server.app, 'get', '/api/users', cookie).query({ pageSize: 'lots' });
    expect(res.status).toBe(400);
    expect(res.body.error.field).toBe('pageSize');
  });

  it('names a bad id in the path', async () => {
    for (const path of ['/api/users/42', '/api/users/42/deactivate', '/api/users/42/reactivate', '/api/users/42/resend-invite']) {
      const res = await call(server.app, path.endsWith('42') ? 'get' : 'post', path, cookie);
      expect(res.status, path).toBe(400);
      expect(res.body.error.field).toBe('id');
    }
  });

  it('names a bad audit query', async () => {
    const res = await call(server.app, 'get', '/api/audit', cookie).query({ entityType: 'user', entityId: 'nope' });
    expect(res.status).toBe(400);
    expect(res.body.error.field).toBe('entityId');
  });

  it('answers a JSON 404 to an unknown API route', async () => {
    const res = await call(server.app, 'get', '/api/hoses-of-the-moon', cookie);
    expect(res.status).toBe(404);
    expect(res.body.error.code).toBe('not_found');
  });
});

describe('safety of answers', () => {
  it('answers 500 without a stack trace or the error text', async () => {
    const spy = vi.spyOn(server.ctx.ds, 'query').mockRejectedValueOnce(new Error('connection lost at /srv/secret/path.ts:12'));
    const res = await call(server.app, 'get', '/api/sites', cookie);
    spy.mockRestore();
    expect(res.status).toBe(500);
    expect(res.body).toEqual({ error: { code: 'internal', message: expect.any(String) } });
    expect(JSON.stringify(res.body)).not.toMatch(/secret|\.ts|at /);
  });

  it('sends security headers and no x-powered-by', async () => {
    const res = await call(server.app, 'get', '/api/meta');
    expect(res.headers['content-security-policy']).toContain("default-src 'self'");
    expect(res.headers['x-content-type-options']).toBe('nosniff');
    expect(res.headers['x-frame-options']).toBe('SAMEORIGIN');
    expect(res.headers['referrer-policy']).toBe('no-referrer');
    expect(res.headers['x-powered-by']).toBeUndefined();
  });

  it('closes CORS: no Access-Control-Allow-Origin for another origin', async () => {
    const res = await request(server.app).get('/api/meta').set('Origin', 'https://elsewhere.example');
    expect(res.headers['access-control-allow-origin']).toBeUndefined();
  });

  it('refuses a mutating request from another origin, or with none', async () => {
    const user = await buildUser(server.ctx);
    const foreign = await request(server.app).post('/api/auth/sign-in').set('Origin', 'https://elsewhere.example').send({ email: user.email, password: 'x' });
    expect(foreign.status).toBe(403);
    expect(foreign.body.error.code).toBe('origin_refused');
    const none = await request(server.app).post('/api/auth/sign-in').send({ email: user.email, password: 'x' });
    expect(none.status).toBe(403);
    const ours = await request(server.app).post('/api/auth/sign-in').set('Origin', TEST_ORIGIN).send({ email: user.email, password: 'x' });
    expect(ours.status).toBe(401);
  });
});
