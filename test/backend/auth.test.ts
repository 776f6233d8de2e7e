import { afterAll, beforeAll, beforeEach, describe, expect, it } from 'vitest';
import { delaySeconds, SIGN_IN_ACCOUNT_RULE } from '../../backend/src/services/attempts.service.js';
import { call, startTestServer, tokenFromMail, waitForMail, type TestServer } from '../support/api.js';
import { buildUser, signIn, TEST_PASSWORD } from '../support/factories.js';

let server: TestServer;
beforeAll(async () => {
  server = await startTestServer();
});
afterAll(() => server.close());
beforeEach(() => server.clock.reset());

const signInAs = (email: string, password: string, address?: string) =>
  call(server.app, 'post', '/api/auth/sign-in', undefined, address).send({ email, password });

describe('signing in', () => {
  it('sets an httpOnly, SameSite session cookie that is not Secure on http', async () => {
    const user = await buildUser(server.ctx, { role: 'technician' });
    const res = await signInAs(user.email, TEST_PASSWORD);
    expect(res.status).toBe(200);
    const cookie = (res.headers['set-cookie'] as unknown as string[])[0]!;
    expect(cookie).toMatch(/^ferrule_session=/);
    expect(cookie).toMatch(/HttpOnly/);
    expect(cookie).toMatch(/SameSite=Lax/);
    expect(cookie).not.toMatch(/Secure/);
    expect(res.body.data).toMatchObject({ email: user.email, role: 'technician' });
    expect(res.body.data).not.toHaveProperty('passwordHash');
  });

  it('marks the cookie Secure when the public address is https', async () => {
    const https = await startTestServer({ PUBLIC_BASE_URL: 'https://hoses.ferrule.test' });
    try {
      const user = await buildUser(https.ctx);
      const res = await call(https.app, 'post', '/api/auth/sign-in').set('Origin', 'https://hoses.ferrule.test').send({ email: user.email, password: TEST_PASSWORD });
      expect(res.status).toBe(200);
      expect((res.headers['set-cookie'] as unknown as string[])[0]).toMatch(/Secure/);
    } finally {
      await https.close();
    }
  });

  it('accepts the e-mail in any case and with spaces around it', async () => {
    const user = await buildUser(server.ctx);
    const res = await signInAs(`  ${user.email.toUpperCase()} `, TEST_PASSWORD);
    expect(res.status).toBe(200);
  });

  it('answers the same for an unknown account and a wrong password', async () => {
    const user = await buildUser(server.ctx);
    const wrong = await signInAs(user.email, 'not-the-right-one');
    const unknown = await signInAs('nobody-at-all@ferrule.test', 'not-the-right-one');
    expect(wrong.status).toBe(401);
    expect(unknown.status).toBe(401);
    expect(wrong.body).toEqual(unknown.body);
  });

  it('keeps passwords longer than 72 bytes whole (bcrypt would cut them)', async () => {
    const long = 'hose-'.repeat(20);
    const user = await buildUser(server.ctx, { password: long });
    expect((await signInAs(user.email, long)).status).toBe(200);
    expect((await signInAs(user.email, `${long.slice(0, 72)}different-tail`)).status).toBe(401);
  });

  it('refuses a user whose access has expired', async () => {
    const user = await buildUser(server.ctx, { accessExpiresOn: '2020-01-01' });
    const res = await signInAs(user.email, TEST_PASSWORD);
    expect(res.status).toBe(401);
    expect(res.body.error.code).toBe('access_expired');
  });
});

describe('slowing repeated failed sign-ins', () => {
  it('states its thresholds: five free failures per account, then 1, 2, 4 … seconds up to 15 minutes', () => {
    expect([4, 5, 6, 7, 30].map((n) => delaySeconds(SIGN_IN_ACCOUNT_RULE, n))).toEqual([0, 1, 2, 4, 900]);
  });

  it('slows an account after five failures, then lets the right password in once the wait is over', async () => {
    const user = await buildUser(server.ctx);
    for (let i = 0; i < 5; i++) expect((await signInAs(user.email, `wrong-${i}`)).status).toBe(401);
    const slowed = await signInAs(user.email, TEST_PASSWORD);
    expect(slowed.status).toBe(429);
    expect(slowed.body.error.code).toBe('too_many_attempts');
    expect(Number(slowed.headers['retry-after'])).toBeGreaterThan(0);
    server.clock.advance(Number(slowed.headers['retry-after']) * 1000 + 10);
    expect((await signInAs(user.email, TEST_PASSWORD)).status).toBe(200);
  });

  it('doubles the wait with each further failure, never a lock', async () => {
    const user = await buildUser(server.ctx);
    for (let i = 0; i < 5; i++) await signInAs(user.email, `wrong-${i}`);
    server.clock.advance(1100);
    expect((await signInAs(user.email, 'wrong-again')).status).toBe(401);
    const slowed = await signInAs(user.email, TEST_PASSWORD);
    expect(slowed.status).toBe(429);
    expect(Number(slowed.headers['retry-after'])).toBe(2);
    server.clock.advance(2100);
    expect((await signInAs(user.email, TEST_PASSWORD)).status).toBe(200);
  });

  it('slows an address that tries many accounts', async () => {
    const address = '10.200.1.7';
    for (let i = 0; i < 20; i++) await signInAs(`guess-${i}@ferrule.test`, 'guessing-password', address);
    const user = await buildUser(server.ctx);
    expect((await signInAs(user.email, TEST_PASSWORD, address)).status).toBe(429);
    expect((await signInAs(user.email, TEST_PASSWORD, '10.200.1.8')).status).toBe(200);
  });

  it('keeps the counters in PostgreSQL, shared by every server instance', async () => {
    const second = await startTestServer();
    try {
      const user = await buildUser(server.ctx);
      for (let i = 0; i < 5; i++) await signInAs(user.email, `wrong-${i}`);
      const res = await call(second.app, 'post', '/api/auth/sign-in').send({ email: user.email, password: TEST_PASSWORD });
      expect(res.status).toBe(429);
    } finally {
      await second.close();
    }
  });
});

describe('sessions end at once', () => {
  it('refuses the cookie of a user who was deactivated', async () => {
    const admin = await buildUser(server.ctx, { role: 'administrator' });
    const user = await buildUser(server.ctx, { role: 'technician' });
    const adminCookie = await signIn(server.app, admin.email);
    const cookie = await signIn(server.app, user.email);
    expect((await call(server.app, 'get', '/api/auth/me', cookie)).status).toBe(200);
    expect((await call(server.app, 'post', `/api/users/${user.id}/deactivate`, adminCookie)).status).toBe(200);
    expect((await call(server.app, 'get', '/api/auth/me', cookie)).status).toBe(401);
    expect((await signInAs(user.email, TEST_PASSWORD)).body.error.code).toBe('account_inactive');
  });

  it('refuses the cookie after a role change', async () => {
    const admin = await buildUser(server.ctx, { role: 'administrator' });
    const user = await buildUser(server.ctx, { role: 'technician' });
    const adminCookie = await signIn(server.app, admin.email);
    const cookie = await signIn(server.app, user.email);
    await call(server.app, 'patch', `/api/users/${user.id}`, adminCookie).send({ role: 'viewer' }).expect(200);
    expect((await call(server.app, 'get', '/api/auth/me', cookie)).status).toBe(401);
  });

  it('signs out one browser, and everywhere', async () => {
    const user = await buildUser(server.ctx);
    const first = await signIn(server.app, user.email);
    const second = await signIn(server.app, user.email);
    const third = await signIn(server.app, user.email);
    await call(server.app, 'post', '/api/auth/sign-out', first).expect(204);
    expect((await call(server.app, 'get', '/api/auth/me', first)).status).toBe(401);
    expect((await call(server.app, 'get', '/api/auth/me', second)).status).toBe(200);
    await call(server.app, 'post', '/api/auth/sign-out-everywhere', second).expect(204);
    expect((await call(server.app, 'get', '/api/auth/me', third)).status).toBe(401);
  });

  it('expires a session after the stated hours', async () => {
    const user = await buildUser(server.ctx);
    const cookie = await signIn(server.app, user.email);
    server.clock.advance(server.ctx.config.sessionHours * 3600_000 + 1000);
    expect((await call(server.app, 'get', '/api/auth/me', cookie)).status).toBe(401);
  });

  it('refuses a forged or tampered cookie', async () => {
    const user = await buildUser(server.ctx);
    const cookie = await signIn(server.app, user.email);
    const tampered = `${cookie.slice(0, -3)}abc`;
    expect((await call(server.app, 'get', '/api/auth/me', tampered)).status).toBe(401);
  });
});

describe('password reset by e-mail', () => {
  it('answers the same whether or not the account exists', async () => {
    const user = await buildUser(server.ctx);
    const known = await call(server.app, 'post', '/api/auth/password-reset').send({ email: user.email });
    const unknown = await call(server.app, 'post', '/api/auth/password-reset').send({ email: 'ghost@ferrule.test' });
    expect(known.status).toBe(202);
    expect(unknown.status).toBe(202);
    expect(known.body).toEqual(unknown.body);
  });

  it('mails a link on the public base URL that works once and ends every session', async () => {
    const user = await buildUser(server.ctx);
    const cookie = await signIn(server.app, user.email);
    const before = server.catcher.messages().length;
    await call(server.app, 'post', '/api/auth/password-reset').set('Host', 'evil.example').send({ email: user.email }).expect(202);
    const mail = await waitForMail(server.catcher, user.email, before);
    expect(mail.subject).toBe('Reset your Ferrule password');
    expect(mail.text).toContain('http://ferrule.test/reset-password?token=');
    expect(mail.text).not.toContain('evil.example');
    const token = tokenFromMail(mail);
    const done = await call(server.app, 'post', '/api/auth/password-reset/complete').send({ token, password: 'new-crimp-ferrule-7' });
    expect(done.status).toBe(204);
    expect((await call(server.app, 'get', '/api/auth/me', cookie)).status).toBe(401);
    expect((await signInAs(user.email, 'new-crimp-ferrule-7')).status).toBe(200);
    const again = await call(server.app, 'post', '/api/auth/password-reset/complete').send({ token, password: 'another-crimp-ferrule-8' });
    expect(again.status).toBe(400);
    expect(again.body.error.code).toBe('invalid_token');
  });

  it('stores only a hash of the token', async () => {
    const user = await buildUser(server.ctx);
    const before = server.catcher.messages().length;
    await call(server.app, 'post', '/api/auth/password-reset').send({ email: user.email }).expect(202);
    const token = tokenFromMail(await waitForMail(server.catcher, user.email, before));
    const rows = await server.ctx.ds.query(`SELECT token_hash FROM link_tokens WHERE user_id = $1`, [user.id]);
    expect(rows.length).toBe(1);
    expect(rows[0].token_hash).not.toContain(token);
  });

  it('expires a reset link after 60 minutes', async () => {
    const user = await buildUser(server.ctx);
    const before = server.catcher.messages().length;
    await call(server.app, 'post', '/api/auth/password-reset').send({ email: user.email }).expect(202);
    const token = tokenFromMail(await waitForMail(server.catcher, user.email, before));
    server.clock.advance(61 * 60_000);
    const res = await call(server.app, 'post', '/api/auth/password-reset/complete').send({ token, password: 'new-crimp-ferrule-7' });
    expect(res.status).toBe(400);
    expect(res.body.error.code).toBe('invalid_token');
  });

  it('sends nothing to a deactivated user', async () => {
    const user = await buildUser(server.ctx, { active: false });
    await call(server.app, 'post', '/api/auth/password-reset').send({ email: user.email }).expect(202);
    await new Promise((r) => setTimeout(r, 300));
    expect(server.catcher.messages().some((m) => m.to.includes(user.email))).toBe(false);
  });

  it('limits requests from one address', async () => {
    const address = '10.201.3.4';
    let last = 0;
    for (let i = 0; i < 11; i++) {
      last = (await call(server.app, 'post', '/api/auth/password-reset', undefined, address).send({ email: `x${i}@ferrule.test` })).status;
    }
    expect(last).toBe(429);
  });
});

describe('new passwords', () => {
  it.each([
    ['too short', 'short-1', 'at least 12'],
    ['too common', 'password1234', 'most common'],
    ['too simple', 'aaaaaaaaaaaaaaaa', 'different characters'],
  ])('refuses a password that is %s', async (_label, password, words) => {
    const user = await buildUser(server.ctx);
    const before = server.catcher.messages().length;
    await call(server.app, 'post', '/api/auth/password-reset').send({ email: user.email }).expect(202);
    const token = tokenFromMail(await waitForMail(server.catcher, user.email, before));
    const res = await call(server.app, 'post', '/api/auth/password-reset/complete').send({ token, password });
    expect(res.status).toBe(400);
    expect(res.body.error.field).toBe('password');
    expect(res.body.error.message).toContain(words);
    // The link still works after a refused password.
    expect((await call(server.app, 'post', '/api/auth/password-reset/complete').send({ token, password: 'a-better-hose-phrase' })).status).toBe(204);
  });
});
