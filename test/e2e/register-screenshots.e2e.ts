import { afterAll, beforeAll, describe, it } from 'vitest';
import type { Page } from 'playwright-core';
import type { AssemblyListItemDto } from '../../shared/src/schemas/assemblies.schema.js';
import type { ConstructionDto } from '../../shared/src/schemas/register.schema.js';
import { formatTagCode } from '../../shared/src/tags/tag-code.js';
import { DEMO_SIGN_INS } from '../../backend/src/seed/demo-scenario.js';
import { getJson, launchBrowser, screenshot, signIn, type TestBrowser, type ViewportName } from '../support/browser.js';

let browser: TestBrowser;

beforeAll(async () => {
  browser = await launchBrowser();
});

afterAll(async () => {
  await browser?.close();
});

const ENGINEER = DEMO_SIGN_INS.find((s) => s.role === 'reliability_engineer')!;
const VIEWPORTS: ViewportName[] = ['phone', 'desktop'];

/** The whole page, and on a phone also the first screen, where the bottom bar shows in its place. */
async function pictures(page: Page, viewport: ViewportName, name: string) {
  await screenshot(page, `${viewport}-${name}`);
  if (viewport === 'phone') await screenshot(page, `${viewport}-${name}-screen`, { fullPage: false });
}

/** Waits until no panel of the page is still loading, so the picture shows it as a person sees it. */
async function settled(page: Page) {
  await page.getByRole('main').waitFor();
  const loading = page.getByRole('status').filter({ hasText: /^(Loading|Updating|Running|Working out)/ });
  const deadline = Date.now() + 10_000;
  while ((await loading.count()) > 0 && Date.now() < deadline) await page.waitForTimeout(100);
}

/** The demo's breaker hose under the grizzly guard: installed with an accepted bend radius, with a long history. */
async function overriddenAssembly(page: Page): Promise<AssemblyListItemDto> {
  const { data } = await getJson<{ data: AssemblyListItemDto[] }>(page, '/api/assemblies', { q: 'CWM-RB-03', status: 'installed', pageSize: 5 });
  const found = data.find((a) => a.position?.code === 'CWM-RB-03/AIR');
  if (!found) throw new Error('The demo has no assembly installed at CWM-RB-03/AIR');
  return found;
}

/** One signed-in page per size, shared by the pictures: each picture opens its own page of the app. */
const signedIn = new Map<ViewportName, Promise<Page>>();
function engineerPage(viewport: ViewportName): Promise<Page> {
  if (!signedIn.has(viewport)) {
    signedIn.set(
      viewport,
      browser.newPage({ viewport }).then(async (page) => {
        await signIn(page, ENGINEER.email);
        return page;
      }),
    );
  }
  return signedIn.get(viewport)!;
}

describe.each(VIEWPORTS)('pictures of the register on a %s', (viewport) => {
  it('of the register', async () => {
    const page = await engineerPage(viewport);
    await page.goto('/');
    await page.getByRole('navigation', { name: 'Main' }).getByRole('link', { name: 'Register', exact: true }).click();
    const rows = viewport === 'phone' ? page.getByRole('list', { name: 'Register of assemblies' }).getByRole('listitem') : page.getByRole('table', { name: 'Register of assemblies' }).getByRole('row');
    await rows.nth(3).waitFor();
    await settled(page);
    await pictures(page, viewport, 'register');
  });

  it("of an assembly's page and its position's page", async () => {
    const page = await engineerPage(viewport);
    const assembly = await overriddenAssembly(page);
    await page.goto(`/assemblies/${assembly.id}`);
    await page.getByRole('heading', { level: 1, name: formatTagCode(assembly.number) }).waitFor();
    await page.getByRole('region', { name: 'History' }).getByRole('list', { name: 'History' }).waitFor();
    await settled(page);
    await pictures(page, viewport, 'assembly');

    await page.getByRole('region', { name: 'Where it is' }).getByRole('link', { name: /CWM-RB-03\/AIR/ }).click();
    await page.getByRole('heading', { level: 1, name: 'CWM-RB-03/AIR' }).waitFor();
    await page.getByRole('region', { name: 'History' }).getByRole(viewport === 'phone' ? 'list' : 'table', { name: 'Assemblies at this position' }).waitFor();
    await settled(page);
    await pictures(page, viewport, 'position');
  });

  it("of a construction's page in the catalogue", async () => {
    const page = await engineerPage(viewport);
    const { data } = await getJson<{ data: ConstructionDto[] }>(page, '/api/constructions', { q: 'AIR-25-TX', pageSize: 5 });
    const construction = data.find((c) => c.code === 'AIR-25-TX')!;
    await page.goto(`/catalogue/constructions/${construction.id}`);
    await page.getByRole('heading', { level: 1, name: 'AIR-25-TX' }).waitFor();
    await page.getByRole('region', { name: 'Compatibility with media' }).getByRole(viewport === 'phone' ? 'list' : 'table').first().waitFor();
    await settled(page);
    await pictures(page, viewport, 'construction');
  });

  it('of the import screen', async () => {
    const page = await engineerPage(viewport);
    await page.goto('/import');
    await page.getByRole('heading', { level: 1, name: 'Import from CSV' }).waitFor();
    await page.getByRole('form', { name: 'Upload a CSV file' }).waitFor();
    await settled(page);
    await pictures(page, viewport, 'import');
  });
});
