import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { launchBrowser, signIn, type TestBrowser } from '../support/browser.js';

let browser: TestBrowser;

beforeAll(async () => {
  browser = await launchBrowser();
});

afterAll(async () => {
  await browser?.close();
});

const VIEWER = 'viewer@kestrel-ridge.example';

describe("a viewer and the administrator's pages", () => {
  it('sees the "no access" screen and no users at /users', async () => {
    const page = await browser.newPage();
    await signIn(page, VIEWER);
    await page.getByRole('heading', { level: 1, name: 'Viewer home' }).waitFor();

    await page.goto('/users');
    await page.getByRole('heading', { level: 1, name: "You don't have access to this page" }).waitFor();
    expect(await page.title()).toBe('No access · Ferrule');
    expect(await page.getByRole('table').count()).toBe(0);
    expect(await page.getByRole('list', { name: 'Users' }).count()).toBe(0);
    expect(await page.getByRole('button', { name: 'Invite user' }).count()).toBe(0);
    // The way out works.
    await page.getByRole('link', { name: 'Go to your home page' }).click();
    await page.getByRole('heading', { level: 1, name: 'Viewer home' }).waitFor();
  });

  it("sees the same screen on a user's own page", async () => {
    const page = await browser.newPage({ viewport: 'phone' });
    await signIn(page, VIEWER);
    await page.goto('/users/00000000-0000-4000-8000-000000000000');
    await page.getByRole('heading', { level: 1, name: "You don't have access to this page" }).waitFor();
  });

  it('has no Users item in either navigation', async () => {
    const page = await browser.newPage();
    await signIn(page, VIEWER);
    await page.getByRole('heading', { level: 1, name: 'Viewer home' }).waitFor();
    // Both the side bar and the phone's bottom bar, whichever this screen shows.
    const navs = page.getByRole('navigation', { name: 'Main', includeHidden: true });
    expect(await navs.count()).toBe(2);
    for (const nav of await navs.all()) {
      expect(await nav.getByRole('link', { name: 'Home', includeHidden: true }).count()).toBe(1);
      expect(await nav.getByRole('link', { name: 'Users', includeHidden: true }).count()).toBe(0);
    }
    // Nor does the viewer's home offer user administration.
    expect(await page.getByRole('link', { name: 'Manage users' }).count()).toBe(0);
  });

  it("has no Users item in the phone bar's sheet either", async () => {
    const page = await browser.newPage({ viewport: 'phone' });
    await signIn(page, VIEWER);
    await page.getByRole('heading', { level: 1, name: 'Viewer home' }).waitFor();
    const bar = page.getByRole('navigation', { name: 'Main' });
    expect(await bar.getByRole('link', { name: 'Users' }).count()).toBe(0);
    await bar.getByRole('button').last().click();
    const sheet = page.getByRole('dialog');
    await sheet.getByRole('button', { name: 'Sign out' }).waitFor();
    expect(await sheet.getByRole('link', { name: 'Users' }).count()).toBe(0);
  });

  it("is refused by the API: GET /api/users answers 403 with the viewer's session", async () => {
    const page = await browser.newPage();
    await signIn(page, VIEWER);
    const cookies = await page.context().cookies();
    expect(cookies.some((c) => c.name === 'ferrule_session')).toBe(true);

    const list = await page.request.get('/api/users');
    expect(list.status()).toBe(403);
    const body = (await list.json()) as { error?: { code?: string } };
    expect(typeof body.error?.code).toBe('string');
    // The session itself is fine: the refusal is about the role.
    expect((await page.request.get('/api/auth/me')).status()).toBe(200);
  });
});
