import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { Locator, Page } from 'playwright-core';
import type { AssemblyListItemDto } from '../../shared/src/schemas/assemblies.schema.js';
import { formatTagCode } from '../../shared/src/tags/tag-code.js';
import { DEMO_SIGN_INS } from '../../backend/src/seed/demo-scenario.js';
import { getJson, launchBrowser, signIn, submitSignIn, type TestBrowser } from '../support/browser.js';

let browser: TestBrowser;

beforeAll(async () => {
  browser = await launchBrowser();
});

afterAll(async () => {
  await browser?.close();
});

const ENGINEER = DEMO_SIGN_INS.find((s) => s.role === 'reliability_engineer')!;

const registerTable = (page: Page) => page.getByRole('table', { name: 'Register of assemblies' });

/** The tag codes of the rows the register's table shows, top to bottom. */
async function shownCodes(page: Page): Promise<string[]> {
  const rows = registerTable(page).locator('tbody').getByRole('row');
  const codes: string[] = [];
  for (const row of await rows.all()) codes.push(((await row.getByRole('cell').first().textContent()) ?? '').trim());
  return codes;
}

/** The words of the option a select shows as chosen. */
function chosen(select: Locator): Promise<string> {
  return select.evaluate((el) => {
    const s = el as unknown as { options: ArrayLike<{ label: string }>; selectedIndex: number };
    return s.options[s.selectedIndex]?.label ?? '';
  });
}

/** The tag codes the API gives for the register's address, in its order: what the view must show. */
async function codesFor(page: Page, url: string): Promise<string[]> {
  const params = new URL(url).searchParams;
  params.delete('cols');
  const body = await getJson<{ data: AssemblyListItemDto[] }>(page, `/api/assemblies?${params.toString()}`);
  return body.data.map((a) => formatTagCode(a.number));
}

/** Waits until the table shows exactly the rows the API gives for the current address, and returns them. */
async function settled(page: Page): Promise<string[]> {
  await registerTable(page).waitFor();
  const deadline = Date.now() + 10_000;
  for (;;) {
    const expected = await codesFor(page, page.url());
    const shown = await shownCodes(page);
    if (JSON.stringify(shown) === JSON.stringify(expected) || Date.now() > deadline) {
      expect(shown).toEqual(expected);
      return shown;
    }
    await page.waitForTimeout(200);
  }
}

describe('the register', () => {
  it("reproduces a filtered, sorted view from its address in a fresh sign-in", async () => {
    const page = await browser.newPage({ viewport: 'desktop' });
    await signIn(page, ENGINEER.email);
    await page.getByRole('navigation', { name: 'Main' }).getByRole('link', { name: 'Register', exact: true }).click();
    await page.getByRole('heading', { level: 1, name: 'Register' }).waitFor();
    await settled(page);

    const filters = page.getByRole('search', { name: 'Search and filter the register' });
    await filters.getByLabel('Site', { exact: true }).selectOption({ label: 'Brackenfold Quarry (BFQ)' });
    await filters.getByLabel('Service', { exact: true }).selectOption({ label: 'Compressed air' });
    // The boxes follow the address, which the click changes: each shows its tick once the view has moved on.
    for (const status of ['Installed', 'Tagged out']) {
      const box = filters.getByRole('checkbox', { name: status, exact: true });
      await box.click();
      await expect.poll(() => box.isChecked()).toBe(true);
    }
    // Twice on the heading: soonest due first, then latest first.
    const due = registerTable(page).getByRole('columnheader', { name: 'Inspection due' });
    await due.getByRole('button').click();
    await expect.poll(() => due.getAttribute('aria-sort')).toBe('ascending');
    await due.getByRole('button').click();
    await expect.poll(() => due.getAttribute('aria-sort')).toBe('descending');
    await page.getByRole('button', { name: /^Columns/ }).click();
    const siteColumn = page.getByRole('group', { name: 'Columns to show' }).getByRole('checkbox', { name: 'Site', exact: true });
    await siteColumn.click();
    await expect.poll(() => siteColumn.isChecked()).toBe(true);
    await page.keyboard.press('Escape');

    const rows = await settled(page);
    expect(rows.length).toBeGreaterThan(3);
    const url = page.url();
    const address = new URL(url).searchParams;
    expect(address.get('status')).toBe('installed,tagged_out');
    expect(address.get('serviceCode')).toBe('compressed-air');
    expect(address.get('sort')).toBe('nextInspectionDue');
    expect(address.get('dir')).toBe('desc');
    // Every row is what the filters say: installed or tagged out, at the quarry, latest due first.
    const listed = await getJson<{ data: AssemblyListItemDto[] }>(page, `/api/assemblies?${address.toString()}`);
    for (const a of listed.data) {
      expect(['installed', 'tagged_out']).toContain(a.status);
      expect(a.siteName).toBe('Brackenfold Quarry');
      expect(a.position?.serviceCode).toBe('compressed-air');
    }
    const dues = listed.data.map((a) => a.nextInspectionDue).filter((d): d is string => d !== null);
    expect(dues).toEqual([...dues].sort().reverse());

    // Someone else's browser, signed out: the link leads through sign-in back to the same view.
    const fresh = await browser.newPage({ viewport: 'desktop' });
    await fresh.goto(url);
    await fresh.waitForURL((u) => u.pathname === '/sign-in');
    await submitSignIn(fresh, ENGINEER.email);
    await fresh.waitForURL((u) => u.pathname === '/register');
    expect(fresh.url()).toBe(url);
    expect(await settled(fresh)).toEqual(rows);

    const again = fresh.getByRole('search', { name: 'Search and filter the register' });
    await expect.poll(() => chosen(again.getByLabel('Site', { exact: true }))).toBe('Brackenfold Quarry (BFQ)');
    await expect.poll(() => chosen(again.getByLabel('Service', { exact: true }))).toBe('Compressed air');
    expect(await again.getByRole('checkbox', { name: 'Installed', exact: true }).isChecked()).toBe(true);
    expect(await again.getByRole('checkbox', { name: 'Tagged out', exact: true }).isChecked()).toBe(true);
    expect(await again.getByRole('checkbox', { name: 'In stock', exact: true }).isChecked()).toBe(false);
    expect(await registerTable(fresh).getByRole('columnheader', { name: 'Inspection due' }).getAttribute('aria-sort')).toBe('descending');
    expect(await registerTable(fresh).getByRole('columnheader', { name: 'Site', exact: true }).isVisible()).toBe(true);
  });
});
