import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { Page } from 'playwright-core';
import { launchBrowser, signIn, type TestBrowser } from '../support/browser.js';

let browser: TestBrowser;

beforeAll(async () => {
  browser = await launchBrowser();
});

afterAll(async () => {
  await browser?.close();
});

const ENGINEER = 'engineer@kestrel-ridge.example';

/** The browser's own, inside `evaluate`: this project's server-side type library has no DOM. */
declare const getComputedStyle: (element: unknown) => { position: string };

/** The one "Main" navigation a person can see at this size (the other is hidden by CSS). */
async function visibleMainNav(page: Page) {
  const navs = page.getByRole('navigation', { name: 'Main' });
  await navs.first().waitFor({ state: 'attached' });
  const visible = [];
  for (const nav of await navs.all()) if (await nav.isVisible()) visible.push(nav);
  expect(visible).toHaveLength(1);
  return visible[0]!;
}

/**
 * Clicks a place in the visible main navigation. A phone's bar may keep some places behind its
 * last button (the sheet that also holds the account); a person opens that sheet first.
 */
async function clickPlace(page: Page, name: string) {
  const nav = await visibleMainNav(page);
  const link = nav.getByRole('link', { name, exact: true });
  if ((await link.count()) > 0) return link.click();
  await nav.getByRole('button').last().click();
  await page.getByRole('dialog').getByRole('link', { name, exact: true }).click();
}

/** Clicks Preferences, then Home, in the main navigation, checking the page and the current item each time. */
async function goToPreferencesAndBack(page: Page) {
  const nav = await visibleMainNav(page);
  await clickPlace(page, 'Preferences');
  await page.waitForURL((url) => url.pathname === '/preferences');
  await page.getByRole('heading', { level: 1, name: 'Preferences' }).waitFor();
  expect(await page.getByRole('dialog').count()).toBe(0);

  await clickPlace(page, 'Home');
  await page.waitForURL((url) => url.pathname === '/');
  await page.getByRole('heading', { level: 1, name: 'Reliability engineer home' }).waitFor();
  expect(await nav.getByRole('link', { name: 'Home', exact: true }).getAttribute('aria-current')).toBe('page');
}

describe('main navigation', () => {
  it('is a bar fixed at the bottom on a phone, with no side bar', async () => {
    const page = await browser.newPage({ viewport: 'phone' });
    await signIn(page, ENGINEER);
    await page.getByRole('heading', { level: 1, name: 'Reliability engineer home' }).waitFor();

    const nav = await visibleMainNav(page);
    const viewport = page.viewportSize()!;
    const box = (await nav.boundingBox())!;
    expect(box.x).toBe(0);
    expect(box.width).toBe(viewport.width);
    expect(Math.abs(box.y + box.height - viewport.height)).toBeLessThanOrEqual(1);
    expect(box.height).toBeGreaterThanOrEqual(44);
    expect(await nav.evaluate((el) => getComputedStyle(el).position)).toBe('fixed');
    expect(await page.getByRole('complementary').isVisible()).toBe(false);

    // Every item is a target a gloved thumb can hit.
    for (const link of await nav.getByRole('link').all()) {
      const target = (await link.boundingBox())!;
      expect(target.height).toBeGreaterThanOrEqual(44);
      expect(target.width).toBeGreaterThanOrEqual(44);
    }

    await goToPreferencesAndBack(page);
  });

  it('is a side bar at the left on a desktop, with no bottom bar', async () => {
    const page = await browser.newPage({ viewport: 'desktop' });
    await signIn(page, ENGINEER);
    await page.getByRole('heading', { level: 1, name: 'Reliability engineer home' }).waitFor();

    const nav = await visibleMainNav(page);
    const viewport = page.viewportSize()!;
    const sideBar = page.getByRole('complementary');
    expect(await sideBar.isVisible()).toBe(true);
    const bar = (await sideBar.boundingBox())!;
    expect(bar.x).toBe(0);
    expect(bar.y).toBe(0);
    expect(bar.height).toBe(viewport.height);
    expect(bar.width).toBeLessThan(viewport.width / 3);
    const box = (await nav.boundingBox())!;
    expect(box.x + box.width).toBeLessThanOrEqual(bar.x + bar.width);
    // The navigation a person sees lives in the side bar; the phone's bar is hidden.
    expect(await sideBar.getByRole('navigation', { name: 'Main' }).isVisible()).toBe(true);
    const main = (await page.getByRole('main').boundingBox())!;
    expect(main.x).toBeGreaterThanOrEqual(bar.x + bar.width);

    await goToPreferencesAndBack(page);
  });
});
