import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { Locator, Page } from 'playwright-core';
import { MEDIA, mediumLabel, TUBE_COMPOUND_NAMES } from '../../shared/src/checks/compatibility.js';
import type { AssemblyDto, AssemblyEventDto } from '../../shared/src/schemas/assemblies.schema.js';
import type { ConstructionDto, PositionDto } from '../../shared/src/schemas/register.schema.js';
import { formatTagCode } from '../../shared/src/tags/tag-code.js';
import { formatLength, formatPressure } from '../../shared/src/units/units.js';
import { DEMO_SIGN_INS } from '../../backend/src/seed/demo-scenario.js';
import { FITTING_TYPES } from '../../backend/src/seed/register-catalogue.js';
import { getJson, launchBrowser, screenshot, signIn, uniqueCode, type TestBrowser } from '../support/browser.js';

let browser: TestBrowser;

beforeAll(async () => {
  browser = await launchBrowser();
});

afterAll(async () => {
  await browser?.close();
});

const ENGINEER = DEMO_SIGN_INS.find((s) => s.role === 'reliability_engineer')!;
const OIL_MIST_AIR = MEDIA.find((m) => m.code === 'compressed-air-oil-mist')!;
const CLAW = FITTING_TYPES.find((f) => f.code === 'CLW-DI')!;

/** A calendar date some days from now, as a date field takes it. */
function daysFromNow(days: number): string {
  const at = new Date(Date.now() + days * 86_400_000);
  return `${at.getFullYear()}-${String(at.getMonth() + 1).padStart(2, '0')}-${String(at.getDate()).padStart(2, '0')}`;
}

/** A calendar date as the page writes it for this reader, worked out by the page's own browser. */
function shownDate(page: Page, isoDate: string): Promise<string> {
  return page.evaluate((iso) => {
    const [y, m, d] = iso.split('-').map(Number);
    return new Intl.DateTimeFormat(undefined, { year: 'numeric', month: 'short', day: 'numeric' }).format(new Date(y!, m! - 1, d!));
  }, isoDate);
}

/** The words of the option a select shows as chosen. */
function chosen(select: Locator): Promise<string> {
  return select.evaluate((el) => {
    const s = el as unknown as { options: ArrayLike<{ label: string }>; selectedIndex: number };
    return s.options[s.selectedIndex]?.label ?? '';
  });
}

const mainNav = (page: Page) => page.getByRole('navigation', { name: 'Main' });

describe('a reliability engineer on a desktop', () => {
  it('adds a construction and a position, builds and proof-tests an assembly, and installs it past a failed bend radius with an override', async () => {
    const page = await browser.newPage({ viewport: 'desktop' });
    await signIn(page, ENGINEER.email);

    // ── A new construction, through the catalogue ─────────────────────────────────────────────
    const constructionCode = uniqueCode('E2E-AIR25');
    await mainNav(page).getByRole('link', { name: 'Catalogue', exact: true }).click();
    await page.getByRole('heading', { level: 1, name: 'Hose constructions' }).waitFor();
    await page.getByRole('button', { name: 'New construction' }).first().click();
    const newConstruction = page.getByRole('dialog', { name: 'New construction' });
    await newConstruction.getByLabel('Construction code').fill(constructionCode);
    await newConstruction.getByLabel('Name', { exact: true }).fill('Air hose 25 mm, NBR tube, textile plies, wide bend');
    await newConstruction.getByLabel('Nominal size').selectOption('bore-25');
    await newConstruction.getByLabel('Tube compound').selectOption({ label: `NBR · ${TUBE_COMPOUND_NAMES.NBR}` });
    await newConstruction.getByLabel('Reinforcement').selectOption({ label: 'Textile plies' });
    await newConstruction.getByLabel('Cover compound').fill('CR');
    await newConstruction.getByLabel('Working pressure').fill('20');
    await newConstruction.getByLabel('Burst pressure').fill('80');
    await newConstruction.getByLabel('Lowest temperature').fill('-30');
    await newConstruction.getByLabel('Highest temperature').fill('80');
    await newConstruction.getByLabel('Minimum bend radius').fill('200');
    await newConstruction.getByLabel('Weight').fill('0.64');
    await newConstruction.getByLabel('Electrical property').selectOption({ label: 'Not conductive' });
    await newConstruction.getByLabel('Food contact').selectOption({ label: 'Not certified for food contact' });
    await newConstruction.getByRole('button', { name: 'Add construction' }).click();
    await page.getByRole('heading', { level: 1, name: constructionCode }).waitFor();
    const properties = page.getByRole('region', { name: 'Properties' });
    await properties.getByText(formatLength(200, 'mm')).first().waitFor();
    const constructionId = new URL(page.url()).pathname.split('/').pop()!;
    const construction = (await getJson<{ data: ConstructionDto }>(page, `/api/constructions/${constructionId}`)).data;
    expect(construction.minBendRadiusMm).toBe(200);
    expect(construction.burstPressureKpa).toBe(8000);

    // ── A new position on a demo breaker, routed tighter than the hose may bend ───────────────
    const positionCode = uniqueCode('BFQ-PB-01/E2E');
    await mainNav(page).getByRole('link', { name: 'Sites and equipment', exact: true }).click();
    const tree = page.getByRole('list', { name: 'Sites' });
    for (const branch of [/^BFQ\s*Brackenfold Quarry/, /^DNB\s*Drill and blast/, /^BFQ-PB-01\s*Pneumatic breaker for oversize/]) {
      const toggle = tree.getByRole('button', { name: branch });
      if ((await toggle.getAttribute('aria-expanded')) !== 'true') await toggle.click();
    }
    await page.getByRole('list', { name: 'Positions on Pneumatic breaker for oversize' }).waitFor();
    await tree.getByRole('link', { name: 'Add position' }).click();
    await page.getByRole('heading', { level: 1, name: 'New position' }).waitFor();
    const newPosition = page.getByRole('form', { name: 'New position' });
    // Opened from the equipment: the place is already chosen.
    await expect.poll(() => chosen(newPosition.getByLabel('Equipment', { exact: true }))).toBe('BFQ-PB-01 · Pneumatic breaker for oversize');
    expect(await chosen(newPosition.getByLabel('Site', { exact: true }))).toBe('Brackenfold Quarry (BFQ)');
    expect(await chosen(newPosition.getByLabel('Area', { exact: true }))).toBe('Drill and blast (DNB)');
    await newPosition.getByLabel('Position code').fill(positionCode);
    await newPosition.getByLabel('Position name').fill('Breaker supply, tight run under the guard');
    await newPosition.getByLabel('Service', { exact: true }).selectOption({ label: 'Compressed air' });
    await newPosition.getByLabel('Size', { exact: true }).selectOption('bore-25');
    await newPosition.getByRole('combobox', { name: 'Medium' }).selectOption({ label: mediumLabel(OIL_MIST_AIR) });
    await newPosition.getByLabel('Maximum operating pressure').fill('7');
    await newPosition.getByLabel('Suction duty').selectOption({ label: 'No' });
    await newPosition.getByLabel('Lowest temperature').fill('0');
    await newPosition.getByLabel('Highest temperature').fill('40');
    await newPosition.getByLabel('Required length').fill('5000');
    await newPosition.getByLabel('Routed bend radius').fill('100');
    await newPosition.getByLabel('End A connection').fill('1 in claw coupling');
    await newPosition.getByLabel('End B connection').fill('1 in claw coupling');
    await newPosition.getByRole('button', { name: 'Create position' }).click();
    await page.getByRole('heading', { level: 1, name: positionCode }).waitFor();
    const positionId = new URL(page.url()).pathname.split('/').pop()!;
    const position = (await getJson<{ data: PositionDto }>(page, `/api/positions/${positionId}`)).data;
    expect(position.routedBendRadiusMm).toBe(100);
    expect(position.maxOperatingPressureKpa).toBe(700);

    // ── An assembly of the new construction, built and proof-tested ───────────────────────────
    await mainNav(page).getByRole('link', { name: 'Catalogue', exact: true }).click();
    await page.getByRole('search', { name: 'Search and filter constructions' }).getByLabel('Search constructions').fill(constructionCode);
    await page.getByRole('table', { name: 'Hose constructions' }).getByRole('link', { name: constructionCode }).click();
    await page.getByRole('heading', { level: 1, name: constructionCode }).waitFor();
    await page.getByRole('link', { name: 'Build an assembly' }).click();
    await page.getByRole('heading', { level: 1, name: 'Build an assembly' }).waitFor();
    const build = page.getByRole('form', { name: 'Build an assembly' });
    await build.getByText(constructionCode).first().waitFor();
    await build.getByLabel('Overall length').fill('5000');
    await build.getByLabel('Cut length (optional)').fill('4860');
    for (const end of ['End A', 'End B']) {
      await build.getByRole('group', { name: end }).getByLabel('Fitting type').selectOption({ label: `${CLAW.code} · ${CLAW.name}` });
    }
    await build.getByLabel('Stock site').selectOption({ label: 'Brackenfold Quarry' });
    await build.getByLabel('Store location (optional)').fill('Hose shop rack 2');
    await build.getByRole('button', { name: 'Build and tag it' }).click();
    await page.waitForURL((url) => /^\/assemblies\/[0-9a-f-]{36}$/.test(url.pathname));
    const assemblyId = new URL(page.url()).pathname.split('/').pop()!;
    const built = (await getJson<{ data: AssemblyDto }>(page, `/api/assemblies/${assemblyId}`)).data;
    const tag = formatTagCode(built.number);
    await page.getByRole('heading', { level: 1, name: tag }).waitFor();
    expect(built.status).toBe('built');

    // Right after the build the proof-test form is open; if not, it is one press away.
    const proof = page.getByRole('dialog', { name: 'Record a proof test' });
    if (!(await proof.isVisible())) await page.getByRole('group', { name: 'Actions' }).getByRole('button', { name: 'Proof test' }).click();
    await proof.getByText('Never pressure-test a hose with air or gas', { exact: false }).waitFor();
    await proof.getByRole('radio', { name: 'Water', exact: true }).check();
    // Half the 80 bar burst is the default required pressure, and what the test held.
    await proof.getByText(formatPressure(4000, 'bar')).first().waitFor();
    await proof.getByLabel('Pressure held').fill('40');
    await proof.getByLabel('Held for').fill('60');
    await proof.getByRole('radio', { name: 'Passed' }).check();
    await proof.getByRole('button', { name: 'Save proof test' }).click();
    await proof.waitFor({ state: 'detached' });
    await expect.poll(async () => (await getJson<{ data: AssemblyDto }>(page, `/api/assemblies/${assemblyId}`)).data.status).toBe('in_stock');

    // ── The install: the bend-radius check fails and the server refuses it ─────────────────────
    await page.getByRole('group', { name: 'Actions' }).getByRole('button', { name: 'Install', exact: true }).click();
    const install = page.getByRole('dialog', { name: 'Install' });
    await install.getByLabel('Site', { exact: true }).selectOption({ label: 'Brackenfold Quarry' });
    await install.getByLabel('Search positions').fill(positionCode);
    await install.getByRole('radio', { name: new RegExp(positionCode.replace(/[/-]/g, '\\$&')) }).check();
    const preview = install.getByRole('region', { name: 'Selection checks before install' });
    await preview.getByText(`tighter than its ${formatLength(200, 'mm')} minimum bend radius`).waitFor();
    await install.getByRole('button', { name: 'Install', exact: true }).click();
    const refusalAlert = install.getByRole('alert').filter({ hasText: 'The selection checks refused it: one check fails' });
    await refusalAlert.waitFor();
    await refusalAlert.getByText(`The hose is routed through a ${formatLength(100, 'mm')} bend, tighter than its ${formatLength(200, 'mm')} minimum bend radius.`).waitFor();
    // Refused: still in stock, and no install was recorded.
    const refused = (await getJson<{ data: AssemblyDto }>(page, `/api/assemblies/${assemblyId}`)).data;
    expect(refused.status).toBe('in_stock');
    expect(refused.position).toBeNull();

    // ── The override: which check, why, and when to look again ────────────────────────────────
    const override = install.getByRole('group', { name: 'Override the failed checks' });
    await screenshot(page, 'desktop-install-refused', { fullPage: false });
    expect(await override.getByRole('checkbox', { name: 'Bend radius' }).isChecked()).toBe(true);
    const reason = 'The guard rail forces the bend; a wider hose port is on order and the hose is inspected weekly until it is fitted.';
    const reviewOn = daysFromNow(45);
    await override.getByLabel('Why it is acceptable').fill(reason);
    await override.getByLabel('Review by').fill(reviewOn);
    await override.getByRole('button', { name: 'Install with override' }).click();
    await install.waitFor({ state: 'detached' });

    // ── The assembly page shows the override in force ──────────────────────────────────────────
    const inForce = page.getByRole('region', { name: 'Override in force' });
    await inForce.waitFor();
    await inForce.getByText(reason).waitFor();
    await inForce.getByText(`review by ${await shownDate(page, reviewOn)}`).waitFor();
    await inForce.getByText('Bend radius').first().waitFor();
    const installed = (await getJson<{ data: AssemblyDto }>(page, `/api/assemblies/${assemblyId}`)).data;
    expect(installed.status).toBe('installed');
    expect(installed.position?.id).toBe(positionId);
    expect(installed.overridden).toBe(true);
    expect(installed.overrides.map((o) => [o.checkCode, o.reason, o.reviewOn])).toEqual([['bend-radius', reason, reviewOn]]);
    const events = (await getJson<{ data: AssemblyEventDto[] }>(page, `/api/assemblies/${assemblyId}/events`)).data;
    expect(events.filter((e) => e.kind === 'install')).toHaveLength(1);

    // ── The position's history holds the assembly ──────────────────────────────────────────────
    await page.getByRole('region', { name: 'Where it is' }).getByRole('link', { name: positionCode }).first().click();
    await page.getByRole('heading', { level: 1, name: positionCode }).waitFor();
    const history = page.getByRole('region', { name: 'History' }).getByRole('table', { name: 'Assemblies at this position' });
    const row = history.getByRole('row').filter({ has: page.getByRole('link', { name: tag }) });
    await row.waitFor();
    await row.getByText('Still in service').waitFor();
    await row.getByText(constructionCode).waitFor();
    const here = page.getByRole('region', { name: 'Assembly in this position' });
    await here.getByRole('link', { name: tag }).waitFor();
    await here.getByText(reason, { exact: false }).waitFor();
  });
});
