import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { ROLE_LABELS } from '../../shared/src/roles.js';
import { DEMO_SIGN_INS } from '../../backend/src/seed/demo-scenario.js';
import { launchBrowser, signIn, type TestBrowser } from '../support/browser.js';

let browser: TestBrowser;

beforeAll(async () => {
  browser = await launchBrowser();
});

afterAll(async () => {
  await browser?.close();
});

describe('signing in', () => {
  for (const demo of DEMO_SIGN_INS) {
    it(`takes the ${ROLE_LABELS[demo.role].toLowerCase()} to their own home`, async () => {
      const page = await browser.newPage();
      await signIn(page, demo.email);

      expect(new URL(page.url()).pathname).toBe('/');
      await page.getByRole('heading', { level: 1, name: `${ROLE_LABELS[demo.role]} home`, exact: true }).waitFor();
      expect(await page.getByRole('heading', { level: 1 }).allTextContents()).toEqual([`${ROLE_LABELS[demo.role]} home`]);
      await page.getByText(`Signed in as ${demo.name}.`).waitFor();
      expect(await page.title()).toBe(`${ROLE_LABELS[demo.role]} home · Ferrule`);
    });
  }

  it('shows an error and stays on the sign-in page when the password is wrong', async () => {
    const page = await browser.newPage();
    await page.goto('/sign-in');
    const form = page.getByRole('form', { name: 'Sign in' });
    await form.getByLabel('E-mail', { exact: true }).fill('viewer@kestrel-ridge.example');
    await form.getByLabel('Password', { exact: true }).fill('not-the-right-password');
    await form.getByRole('button', { name: 'Sign in', exact: true }).click();

    const alert = form.getByRole('alert');
    await alert.waitFor();
    expect(await alert.textContent()).toContain('The e-mail or password is not right');
    expect(new URL(page.url()).pathname).toBe('/sign-in');
    expect(await page.getByRole('heading', { level: 1 }).textContent()).toBe('Sign in');
    // Nothing of the signed-in app is reachable: the session check still says no.
    const me = await page.request.get('/api/auth/me');
    expect(me.status()).toBe(401);
  });
});
