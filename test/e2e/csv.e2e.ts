import { readFile } from 'node:fs/promises';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { Page } from 'playwright-core';
import type { AssemblyListItemDto } from '../../shared/src/schemas/assemblies.schema.js';
import type { PositionDto } from '../../shared/src/schemas/register.schema.js';
import { formatTagCode } from '../../shared/src/tags/tag-code.js';
import { DEMO_SIGN_INS } from '../../backend/src/seed/demo-scenario.js';
import { getJson, launchBrowser, signIn, uniqueCode, type TestBrowser } from '../support/browser.js';

let browser: TestBrowser;

beforeAll(async () => {
  browser = await launchBrowser();
});

afterAll(async () => {
  await browser?.close();
});

const ENGINEER = DEMO_SIGN_INS.find((s) => s.role === 'reliability_engineer')!;

const mainNav = (page: Page) => page.getByRole('navigation', { name: 'Main' });

/** The rows of a CSV text (RFC 4180: quoted fields may hold commas, quotes and line breaks), without a leading byte-order mark. */
function parseCsv(text: string): string[][] {
  const rows: string[][] = [];
  let row: string[] = [];
  let cell = '';
  let quoted = false;
  const body = text.replace(/^\uFEFF/, '');
  for (let i = 0; i < body.length; i++) {
    const ch = body[i]!;
    if (quoted) {
      if (ch === '"' && body[i + 1] === '"') {
        cell += '"';
        i++;
      } else if (ch === '"') quoted = false;
      else cell += ch;
    } else if (ch === '"') quoted = true;
    else if (ch === ',') {
      row.push(cell);
      cell = '';
    } else if (ch === '\n' || ch === '\r') {
      if (ch === '\r' && body[i + 1] === '\n') i++;
      row.push(cell);
      rows.push(row);
      row = [];
      cell = '';
    } else cell += ch;
  }
  if (cell !== '' || row.length) rows.push([...row, cell]);
  return rows;
}

/** Chooses the import's file through the page's own file picker, as a person does. */
async function chooseFile(page: Page, name: string, content: string) {
  const chooser = page.waitForEvent('filechooser');
  await page.getByRole('form', { name: 'Upload a CSV file' }).getByText(/^Choose (a|another) file$/).click();
  await (await chooser).setFiles({ name, mimeType: 'text/csv', buffer: Buffer.from(content, 'utf8') });
}

/** Fills the upload form for a positions file at the quarry and sends it. */
async function uploadPositions(page: Page, name: string, content: string) {
  const form = page.getByRole('form', { name: 'Upload a CSV file' });
  // The whole tile is the radio's label: a person presses its words.
  await form.getByText('Positions', { exact: true }).click();
  expect(await form.getByRole('radio', { name: 'Positions' }).isChecked()).toBe(true);
  await form.getByLabel('Site', { exact: true }).selectOption({ label: 'Brackenfold Quarry (BFQ)' });
  await chooseFile(page, name, content);
  await form.getByText(`${name}`).waitFor();
  await form.getByRole('button', { name: 'Upload and check' }).click();
  await page.waitForURL((url) => url.searchParams.has('job'));
}

const HEADER = 'code,name,equipment,service,size,max_operating_pressure_bar,min_temp_c,max_temp_c,routed_bend_radius_mm,criticality';

describe('CSV files', () => {
  it('refuses a positions file with bad rows, naming each row and column, writes nothing, then imports the corrected file', async () => {
    const page = await browser.newPage({ viewport: 'desktop' });
    await signIn(page, ENGINEER.email);
    const prefix = uniqueCode('BFQ-DR-02/CSV');
    const codes = [`${prefix}-A`, `${prefix}-B`, `${prefix}-C`];
    const rows = (equipmentOfB: string, pressureOfC: string) =>
      [
        HEADER,
        `${codes[0]},Spare flushing air take-off,BFQ-DR-02,compressed-air,25 mm,9.5,0,40,250,high`,
        `${codes[1]},Spare lubrication air take-off,${equipmentOfB},Compressed air,19,7.5,0,40,,medium`,
        `${codes[2]},Spare feed return line,BFQ-DR-02,hydraulic-suction-return,1 in,${pressureOfC},5,80,300,medium`,
      ].join('\r\n') + '\r\n';

    await mainNav(page).getByRole('link', { name: 'Import', exact: true }).click();
    await page.getByRole('heading', { level: 1, name: 'Import from CSV' }).waitFor();

    // Two bad rows: equipment that is not at the site, and a pressure that is not a number.
    await uploadPositions(page, 'drill-rig-positions.csv', rows('BFQ-DR-99', 'about ten'));
    const problems = page.getByRole('region', { name: 'Problems by row and column' }).getByRole('table', { name: 'Problems in the file' });
    await problems.waitFor({ timeout: 20_000 });
    const problemRows = problems.locator('tbody').getByRole('row');
    await expect.poll(() => problemRows.count()).toBe(2);
    const first = problemRows.nth(0).getByRole('cell');
    const second = problemRows.nth(1).getByRole('cell');
    expect((await first.nth(0).textContent())?.trim()).toBe('2');
    expect((await first.nth(1).textContent())?.trim()).toBe('equipment');
    expect(await first.nth(2).textContent()).toContain('BFQ-DR-99');
    expect((await second.nth(0).textContent())?.trim()).toBe('3');
    expect((await second.nth(1).textContent())?.trim()).toBe('max_operating_pressure_bar');
    await page.getByRole('alert').filter({ hasText: '2 problems to correct' }).waitFor();
    expect(await page.getByRole('button', { name: /^Write / }).count()).toBe(0);

    // Nothing was written, not even the good row.
    const written = async () => (await getJson<{ data: PositionDto[] }>(page, '/api/positions', { q: prefix, pageSize: 50 })).data.map((p) => p.code).sort();
    expect(await written()).toEqual([]);

    // The corrected file goes in, with its progress shown.
    await page.getByRole('link', { name: 'Upload another file' }).first().click();
    await uploadPositions(page, 'drill-rig-positions-corrected.csv', rows('BFQ-DR-02', '10'));
    await page.getByRole('status').filter({ hasText: 'Every row is clean' }).waitFor({ timeout: 20_000 });
    await page.getByRole('table').filter({ hasText: codes[0]! }).waitFor();
    await page.getByRole('button', { name: 'Write 3 positions' }).click();
    await page.getByRole('progressbar', { name: 'Writing 3 positions' }).waitFor();
    await page.getByRole('status').filter({ hasText: '3 positions written' }).waitFor({ timeout: 20_000 });
    expect(await written()).toEqual([...codes].sort());
    const imported = (await getJson<{ data: PositionDto[] }>(page, '/api/positions', { q: codes[0]!, pageSize: 5 })).data.find((p) => p.code === codes[0]);
    expect(imported?.maxOperatingPressureKpa).toBe(950);
    expect(imported?.routedBendRadiusMm).toBe(250);
    expect(imported?.sizeCode).toBe('bore-25');
  });

  it('exports exactly the rows of a filtered register view', async () => {
    const page = await browser.newPage({ viewport: 'desktop' });
    await signIn(page, ENGINEER.email);
    await mainNav(page).getByRole('link', { name: 'Register', exact: true }).click();
    const table = page.getByRole('table', { name: 'Register of assemblies' });
    await table.waitFor();

    const filters = page.getByRole('search', { name: 'Search and filter the register' });
    await filters.getByLabel('Site', { exact: true }).selectOption({ label: 'Brackenfold Quarry (BFQ)' });
    await filters.getByLabel('Area', { exact: true }).selectOption({ label: 'Drill and blast (DNB)' });
    await filters.getByLabel('Service', { exact: true }).selectOption({ label: 'Compressed air' });
    await table.getByRole('columnheader', { name: 'Position' }).getByRole('button').click();
    await page.waitForURL((url) => url.searchParams.get('sort') === 'position' && url.searchParams.has('serviceCode') && url.searchParams.has('areaId'));
    // The whole view on one page, so the rows on screen are all the rows of the view.
    await page.getByRole('navigation', { name: 'Pages of the register' }).getByLabel('Rows per page').selectOption('100');
    await page.waitForURL((url) => url.searchParams.get('pageSize') === '100');

    // What the API gives for the view's address, every row of it: the view and the file must both hold these.
    const query = new URL(page.url()).searchParams;
    query.set('pageSize', '200');
    const listed = await getJson<{ data: AssemblyListItemDto[]; pagination: { total: number } }>(page, `/api/assemblies?${query.toString()}`);
    const expected = listed.data.map((a) => formatTagCode(a.number));
    expect(expected.length).toBeGreaterThan(2);
    expect(expected.length).toBeLessThanOrEqual(100);
    expect(listed.pagination.total).toBe(expected.length);
    const shown = async () => {
      const codes: string[] = [];
      for (const row of await table.locator('tbody').getByRole('row').all()) codes.push(((await row.getByRole('cell').first().textContent()) ?? '').trim());
      return codes;
    };
    await expect.poll(shown, { timeout: 10_000 }).toEqual(expected);

    const download = page.waitForEvent('download');
    await page.getByRole('button', { name: 'Export CSV' }).click();
    const file = await download;
    expect(file.suggestedFilename()).toMatch(/\.csv$/);
    const csv = parseCsv(await readFile((await file.path())!, 'utf8')).filter((r) => r.some((c) => c !== ''));
    expect(csv[0]![0]).toBe('tag_code');
    expect(csv.slice(1).map((r) => r[0])).toEqual(expected);
  });
});
