import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { Page } from 'playwright-core';
import { ROLE_LABELS } from '../../shared/src/roles.js';
import { DEMO_SIGN_INS } from '../../backend/src/seed/demo-scenario.js';
import { launchBrowser, screenshot, signIn, type TestBrowser, type ViewportName } from '../support/browser.js';

let browser: TestBrowser;

beforeAll(async () => {
  browser = await launchBrowser();
});

afterAll(async () => {
  await browser?.close();
});

const ADMIN = DEMO_SIGN_INS.find((s) => s.role === 'administrator')!;
const TECHNICIAN = DEMO_SIGN_INS.find((s) => s.role === 'technician')!;
const VIEWPORTS: ViewportName[] = ['phone', 'desktop'];

/** The whole page, and on a phone also the first screen, where the bottom bar shows in its place. */
async function pictures(page: Page, viewport: ViewportName, name: string) {
  await screenshot(page, `${viewport}-${name}`);
  if (viewport === 'phone') await screenshot(page, `${viewport}-${name}-screen`, { fullPage: false });
}

/** Waits until the home's cards have their data, so the picture shows the page as a person sees it. */
async function homeSettled(page: Page, role: string) {
  await page.getByRole('heading', { level: 1, name: `${role} home` }).waitFor();
  await page.getByRole('region', { name: 'Your sites' }).getByRole('listitem').first().waitFor();
  await page.getByRole('region', { name: 'Your units' }).waitFor();
}

describe.each(VIEWPORTS)('pictures of the shell on a %s', (viewport) => {
  it('of the sign-in page', async () => {
    const page = await browser.newPage({ viewport });
    await page.goto('/sign-in');
    await page.getByRole('heading', { level: 1, name: 'Sign in' }).waitFor();
    await pictures(page, viewport, 'sign-in');
  });

  for (const demo of DEMO_SIGN_INS) {
    it(`of the ${ROLE_LABELS[demo.role].toLowerCase()}'s home`, async () => {
      const page = await browser.newPage({ viewport });
      await signIn(page, demo.email);
      await homeSettled(page, ROLE_LABELS[demo.role]);
      if (demo.role === 'administrator') await page.getByRole('region', { name: 'Users' }).getByRole('term').first().waitFor();
      await pictures(page, viewport, `home-${demo.role.replace('_', '-')}`);
    });
  }

  it("of the users list and a user's page", async () => {
    const page = await browser.newPage({ viewport });
    await signIn(page, ADMIN.email);
    await homeSettled(page, 'Administrator');
    await page.getByRole('link', { name: 'Manage users' }).click();
    await page.getByRole('heading', { level: 1, name: 'Users' }).waitFor();
    // A table on a desktop, a list of cards on a phone: both named "Users".
    const list = viewport === 'phone' ? page.getByRole('list', { name: 'Users' }) : page.getByRole('table', { name: 'Users' });
    await list.getByRole('link', { name: TECHNICIAN.name }).waitFor();
    expect(await list.isVisible()).toBe(true);
    await pictures(page, viewport, 'users');

    await list.getByRole('link', { name: TECHNICIAN.name }).click();
    await page.getByRole('heading', { level: 1, name: TECHNICIAN.name }).waitFor();
    await page.getByRole('region', { name: 'History' }).waitFor();
    await page.getByText('Loading history…').waitFor({ state: 'detached' });
    await page.getByRole('checkbox', { name: /Brackenfold Quarry/ }).waitFor();
    await pictures(page, viewport, 'user');
  });
});
