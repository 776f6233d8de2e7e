import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { Page } from 'playwright-core';
import type { AssemblyDto, AssemblyEventDto, AssemblyListItemDto } from '../../shared/src/schemas/assemblies.schema.js';
import { REMOVAL_CAUTIONS } from '../../shared/src/schemas/assemblies.schema.js';
import type { MeDto } from '../../shared/src/schemas/auth.schema.js';
import type { ConstructionDto } from '../../shared/src/schemas/register.schema.js';
import { formatTagCode } from '../../shared/src/tags/tag-code.js';
import { DEMO_SIGN_INS } from '../../backend/src/seed/demo-scenario.js';
import { getJson, launchBrowser, screenshot, signIn, type TestBrowser } from '../support/browser.js';

let browser: TestBrowser;

beforeAll(async () => {
  browser = await launchBrowser();
});

afterAll(async () => {
  await browser?.close();
});

const TECHNICIAN = DEMO_SIGN_INS.find((s) => s.role === 'technician')!;

const assemblyOf = async (page: Page, id: string) => (await getJson<{ data: AssemblyDto }>(page, `/api/assemblies/${id}`)).data;
const eventsOf = async (page: Page, id: string) => (await getJson<{ data: AssemblyEventDto[] }>(page, `/api/assemblies/${id}/events`)).data.filter((e) => !e.voidedBy);
const fittingsOf = (a: AssemblyDto) => `${a.endA?.fittingTypeId ?? '-'}|${a.endB?.fittingTypeId ?? '-'}`;

/**
 * An assembly installed at the technician's site whose checks pass, and one in stock there that
 * would pass in its place: the same construction (with no life limits to run out) and the same
 * fittings, proof-tested and passed.
 */
async function pickReplacement(page: Page): Promise<{ old: AssemblyDto; spare: AssemblyDto }> {
  const me = (await getJson<{ data: MeDto }>(page, '/api/auth/me')).data;
  const siteId = me.sites.find((s) => s.code === 'BFQ')!.id;
  const list = (status: string, extra: Record<string, string> = {}) =>
    getJson<{ data: AssemblyListItemDto[] }>(page, '/api/assemblies', { siteId, status, pageSize: 200, ...extra }).then((b) => b.data);
  const [installed, stock] = await Promise.all([list('installed', { checkOutcome: 'pass' }), list('in_stock')]);
  const limitless = new Map<string, boolean>();
  const spares = new Map<string, AssemblyDto[]>();
  for (const item of stock) {
    const spare = await assemblyOf(page, item.id);
    if (spare.proofTest?.result !== 'pass') continue;
    const key = `${spare.construction.id}|${fittingsOf(spare)}`;
    spares.set(key, [...(spares.get(key) ?? []), spare]);
  }
  for (const item of installed) {
    if (item.overridden || ![...spares.keys()].some((k) => k.startsWith(`${item.construction.id}|`))) continue;
    if (!limitless.has(item.construction.id)) {
      const c = (await getJson<{ data: ConstructionDto }>(page, `/api/constructions/${item.construction.id}`)).data;
      limitless.set(item.construction.id, c.serviceLifeMonths == null && c.shelfLifeMonths == null && c.storageLifeMonths == null);
    }
    if (!limitless.get(item.construction.id)) continue;
    const old = await assemblyOf(page, item.id);
    const spare = spares.get(`${old.construction.id}|${fittingsOf(old)}`)?.[0];
    if (spare && old.checkOutcome === 'pass' && old.position) return { old, spare };
  }
  throw new Error('The demo has no installed assembly at BFQ with a matching spare in stock');
}

describe('a technician on a phone', () => {
  it('finds a hose by its tag code as read off the label and replaces it from stock, once, however often confirm is tapped', async () => {
    const page = await browser.newPage({ viewport: 'phone' });
    await signIn(page, TECHNICIAN.email);
    const { old, spare } = await pickReplacement(page);
    const oldTag = formatTagCode(old.number);
    const spareTag = formatTagCode(spare.number);
    const before = { old: (await eventsOf(page, old.id)).length, spare: (await eventsOf(page, spare.id)).length };

    // The code as a fitter types it from the label: lower case, no hyphens.
    await page.getByRole('navigation', { name: 'Main' }).getByRole('link', { name: /^Find/ }).click();
    await page.getByRole('heading', { level: 1, name: 'Find a hose' }).waitFor();
    await page.getByRole('textbox', { name: 'Tag code' }).fill(old.number.toLowerCase());
    await page.getByRole('link', { name: new RegExp(oldTag.replace(/[$*~=]/g, '\\$&')) }).click();
    await page.getByRole('heading', { level: 1, name: oldTag }).waitFor();

    await page.getByRole('group', { name: 'Actions' }).getByRole('link', { name: 'Replace' }).click();
    await page.getByRole('heading', { level: 2, name: 'Why did it come out?' }).waitFor();
    await page.getByRole('radio', { name: 'Planned replacement' }).check();
    await page.getByRole('button', { name: 'Next: pick the new assembly' }).click();

    await page.getByRole('heading', { level: 2, name: 'Pick the new assembly' }).waitFor();
    await page.getByLabel('Search by tag code or construction').fill(spare.number.toLowerCase());
    await page.getByRole('list', { name: 'Assemblies in stock' }).getByRole('radio', { name: new RegExp(spareTag.replace(/[$*~=]/g, '\\$&')) }).check();
    await page.getByRole('button', { name: 'Next: the cautions' }).click();

    // The cautions, each on its own, before anything is confirmed.
    await page.getByRole('heading', { level: 2, name: 'Before you disconnect' }).waitFor();
    const cautions = page.getByRole('list', { name: 'Cautions' }).getByRole('listitem');
    expect(await cautions.count()).toBe(REMOVAL_CAUTIONS.length);
    for (const caution of REMOVAL_CAUTIONS) await cautions.filter({ hasText: caution }).waitFor();
    await page.getByRole('button', { name: 'I have read these: next' }).click();

    await page.getByRole('heading', { level: 2, name: 'Confirm the replacement' }).waitFor();
    const confirm = page.getByRole('form', { name: 'Confirm the replacement' });
    await confirm.getByRole('region', { name: 'Coming out' }).getByText(oldTag).waitFor();
    await confirm.getByRole('region', { name: 'Going in' }).getByText(spareTag).waitFor();
    await confirm.getByRole('region', { name: 'Cautions' }).getByText(REMOVAL_CAUTIONS[0]!).waitFor();
    await confirm.getByText('Every check passes at this position.').waitFor();
    await screenshot(page, 'phone-replace-confirm');

    // Two taps on the one button, the second while the first is still on its way (a slow mobile network).
    const sent: string[] = [];
    await page.route('**/api/assemblies/*/replace', async (route) => {
      sent.push(String((route.request().postDataJSON() as { idempotencyKey?: string }).idempotencyKey));
      await new Promise((resolve) => setTimeout(resolve, 1200));
      await route.continue();
    });
    const button = confirm.getByRole('button', { name: 'Confirm replacement' });
    await button.scrollIntoViewIfNeeded();
    const box = (await button.boundingBox())!;
    const x = box.x + box.width / 2;
    const y = box.y + box.height / 2;
    await page.touchscreen.tap(x, y);
    await page.waitForTimeout(400);
    await page.touchscreen.tap(x, y);
    await page.getByRole('heading', { level: 2, name: 'Saved' }).waitFor();
    await page.getByRole('status').getByText(spareTag).first().waitFor();

    // Whatever reached the server carried one submission key: at most one replacement could be made.
    expect(sent.length).toBeGreaterThan(0);
    expect(new Set(sent).size).toBe(1);
    // Exactly one removal of the old and one install of the new, at the old one's position.
    await page.waitForTimeout(500);
    const oldEvents = await eventsOf(page, old.id);
    const spareEvents = await eventsOf(page, spare.id);
    const added = { old: oldEvents.slice(0, oldEvents.length - before.old), spare: spareEvents.slice(0, spareEvents.length - before.spare) };
    expect(added.old.map((e) => e.kind)).toEqual(['remove']);
    expect(added.spare.map((e) => e.kind)).toEqual(['install']);
    expect(added.spare[0]!.positionId).toBe(old.position!.id);
    const [oldNow, spareNow] = await Promise.all([assemblyOf(page, old.id), assemblyOf(page, spare.id)]);
    expect(oldNow.status).toBe('removed');
    expect(spareNow.status).toBe('installed');
    expect(spareNow.position?.id).toBe(old.position!.id);
  });
});
