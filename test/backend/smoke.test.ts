import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { call, startTestServer, type TestServer } from '../support/api.js';
import { buildUser, signIn } from '../support/factories.js';

let server: TestServer;
beforeAll(async () => {
  server = await startTestServer();
});
afterAll(() => server.close());

describe('sign-in', () => {
  it('signs in and reads who I am', async () => {
    const user = await buildUser(server.ctx, { role: 'technician' });
    const cookie = await signIn(server.app, user.email);
    const me = await call(server.app, 'get', '/api/auth/me', cookie);
    expect(me.status).toBe(200);
    expect(me.body.data.role).toBe('technician');
  });
});
