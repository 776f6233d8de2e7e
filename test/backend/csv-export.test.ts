import Papa from 'papaparse';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { formatTagCode, tagCodeForSerial } from '../../shared/src/tags/tag-code.js';
import { KPA_PER_PSI } from '../../shared/src/units/units.js';
import { Area, Assembly, Equipment, type Site } from '../../backend/src/entities/index.js';
import { csvCell, EXPORT_BATCH } from '../../backend/src/services/csv-export.service.js';
import { call, startTestServer, type TestServer } from '../support/api.js';
import { buildSite, buildUser, signIn } from '../support/factories.js';
import { buildConstruction, buildInstalledAssembly, buildPosition } from '../support/register-factories.js';

let server: TestServer;
let siteA: Site;
let siteB: Site;
let engineer: string;
let limitedViewer: string;
beforeAll(async () => {
  server = await startTestServer();
  siteA = await buildSite(server.ctx);
  siteB = await buildSite(server.ctx);
  engineer = await signIn(server.app, (await buildUser(server.ctx, { role: 'reliability_engineer' })).email);
  limitedViewer = await signIn(server.app, (await buildUser(server.ctx, { role: 'viewer', allSites: false, siteIds: [siteA.id] })).email);
  // Site A: three installed assemblies and two in stock; site B: two installed.
  for (let i = 0; i < 3; i++) await buildInstalledAssembly(server.ctx, { siteId: siteA.id });
  const construction = await buildConstruction(server.ctx);
  for (let i = 0; i < 2; i++) await stockAssembly(siteA.id, construction.id);
  for (let i = 0; i < 2; i++) await buildInstalledAssembly(server.ctx, { siteId: siteB.id });
});
afterAll(() => server.close());

let serial = 2 ** 28;
async function stockAssembly(siteId: string, constructionId: string, overrides: Partial<Assembly> = {}): Promise<Assembly> {
  return server.ctx.ds.getRepository(Assembly).save({ number: tagCodeForSerial(serial++), constructionId, overallLengthMm: 5000, builtOn: '2026-01-10', status: 'in_stock', siteId, ...overrides });
}

/** Downloads the export and reads it back as a spreadsheet would. */
async function exportOf(cookie: string, query: Record<string, string> = {}) {
  const res = await call(server.app, 'get', '/api/assemblies/export', cookie).query(query).buffer(true);
  expect(res.status, res.text).toBe(200);
  expect(res.text.startsWith('\uFEFF')).toBe(true);
  const parsed = Papa.parse<Record<string, string>>(res.text.slice(1), { header: true, skipEmptyLines: true });
  expect(parsed.errors).toEqual([]);
  return { res, header: parsed.meta.fields ?? [], rows: parsed.data };
}

/** Every row of the register's list for a query, page by page, as tag codes. */
async function listedTags(cookie: string, query: Record<string, string>): Promise<string[]> {
  const tags: string[] = [];
  for (let page = 1; ; page++) {
    const res = await call(server.app, 'get', '/api/assemblies', cookie).query({ ...query, page: String(page), pageSize: '200' });
    expect(res.status).toBe(200);
    tags.push(...res.body.data.map((a: { number: string }) => formatTagCode(a.number)));
    if (tags.length >= res.body.pagination.total) return tags;
  }
}

describe('register export', () => {
  it('is a UTF-8 CSV attachment with a byte-order mark, one row per assembly and units in the header', async () => {
    const { res, header } = await exportOf(engineer, { siteId: siteA.id });
    expect(res.headers['content-type']).toBe('text/csv; charset=utf-8');
    expect(res.headers['content-disposition']).toMatch(/^attachment; filename="ferrule-register-\d{4}-\d{2}-\d{2}\.csv"$/);
    expect(header).toEqual(expect.arrayContaining(['tag_code', 'status', 'site', 'area', 'equipment', 'position', 'service', 'construction', 'size', 'check_outcome', 'overridden', 'next_inspection_due', 'installed_on', 'allowable_pressure_bar', 'overall_length_mm']));
  });

  it.each([
    [{ status: 'installed' }],
    [{ sort: 'checkOutcome', dir: 'desc' }],
    [{ sort: 'construction' }],
    [{ status: 'in_stock,installed', sort: 'installedAt', dir: 'desc' }],
  ])('has exactly the rows of the register list, in its order, for %j', async (filter) => {
    const query = { siteId: siteA.id, ...filter };
    const { rows } = await exportOf(engineer, query);
    expect(rows.map((r) => r.tag_code)).toEqual(await listedTags(engineer, query));
  });

  it('fills the register columns of an installed assembly in the reader’s units', async () => {
    const reader = await buildUser(server.ctx, { role: 'technician', preferences: { pressureUnit: 'psi', lengthUnit: 'in', temperatureUnit: 'F' } });
    const { assembly, position, construction } = await buildInstalledAssembly(server.ctx, { siteId: siteB.id });
    const { header, rows } = await exportOf(await signIn(server.app, reader.email), { positionId: position.id });
    expect(header).toContain('allowable_pressure_psi');
    expect(header).toContain('overall_length_in');
    expect(rows).toHaveLength(1);
    const row = rows[0]!;
    expect(row).toMatchObject({ tag_code: formatTagCode(assembly.number), status: 'Installed', position: position.code, construction: construction.code, size: '3/4 in', service: 'Compressed air', overridden: 'no' });
    expect(row.check_outcome).toBe(assembly.checkOutcome);
    expect(row.next_inspection_due).toBe(assembly.nextInspectionDue);
    expect(Number(row.allowable_pressure_psi)).toBeCloseTo(2000 / KPA_PER_PSI, 3);
    expect(Number(row.max_operating_pressure_psi)).toBeCloseTo(700 / KPA_PER_PSI, 3);
    expect(Number(row.overall_length_in)).toBeCloseTo(3000 / 25.4, 3);
  });

  it('neutralises cells that a spreadsheet would run as formulas, but leaves plain numbers alone', async () => {
    const site = await buildSite(server.ctx);
    const area = await server.ctx.ds.getRepository(Area).save({ siteId: site.id, code: 'AR1', name: '@SUM(A1:A9)' });
    const equipment = await server.ctx.ds.getRepository(Equipment).save({ siteId: site.id, areaId: area.id, assetNumber: 'EQ-1', name: '+1+2' });
    const position = await buildPosition(server.ctx, { equipmentId: equipment.id, name: '=HYPERLINK("http://example.invalid","open")' });
    const construction = await buildConstruction(server.ctx, { name: '-2+3' });
    await buildInstalledAssembly(server.ctx, { position, construction, assembly: { hoseBatch: '-10' } });
    await stockAssembly(site.id, construction.id, { hoseBatch: '\tcmd', storeLocation: '\rcmd' });
    const { rows } = await exportOf(engineer, { siteId: site.id, sort: 'status' });
    const installed = rows.find((r) => r.status === 'Installed')!;
    expect(installed.position_name).toBe(`'=HYPERLINK("http://example.invalid","open")`);
    expect(installed.construction_name).toBe(`'-2+3`);
    expect(installed.area).toBe(`'@SUM(A1:A9)`);
    expect(installed.equipment_name).toBe(`'+1+2`);
    expect(installed.hose_batch).toBe('-10');
    const stock = rows.find((r) => r.status === 'In stock')!;
    expect(stock.hose_batch).toBe(`'\tcmd`);
    expect(stock.store_location).toBe(`'\rcmd`);
  });

  it('never shows another site’s assemblies, even when asked for that site', async () => {
    const mine = await exportOf(limitedViewer);
    expect(mine.rows.length).toBeGreaterThan(0);
    expect(new Set(mine.rows.map((r) => r.site))).toEqual(new Set([siteA.name]));
    expect((await exportOf(limitedViewer, { siteId: siteB.id })).rows).toEqual([]);
    expect(mine.rows.map((r) => r.tag_code)).toEqual(await listedTags(limitedViewer, {}));
  });

  it('streams a register larger than one batch, every row once', async () => {
    const site = await buildSite(server.ctx);
    const construction = await buildConstruction(server.ctx);
    const n = EXPORT_BATCH * 2 + 17;
    const values = Array.from({ length: n }, (_, i) => `('${tagCodeForSerial(2 ** 27 + i)}', '${construction.id}', 5000, '2026-01-10', 'in_stock', '${site.id}', 1)`);
    await server.ctx.ds.query(`INSERT INTO assemblies (number, construction_id, overall_length_mm, built_on, status, site_id, version) VALUES ${values.join(',')}`);
    const { rows } = await exportOf(engineer, { siteId: site.id });
    expect(rows).toHaveLength(n);
    expect(new Set(rows.map((r) => r.tag_code)).size).toBe(n);
  });

  it('refuses a filter the register refuses', async () => {
    const res = await call(server.app, 'get', '/api/assemblies/export', engineer).query({ status: 'lost' });
    expect(res.status).toBe(400);
  });
});

describe('csv cells', () => {
  it.each([
    ['=1+1', `'=1+1`],
    ['+44 1234', `'+44 1234`],
    ['-10', '-10'],
    ['-10.5', '-10.5'],
    ['-', `'-`],
    ['@here', `'@here`],
    ['\tx', `'\tx`],
    ['plain', 'plain'],
    ['a,b', '"a,b"'],
    ['say "hi"', '"say ""hi"""'],
    ['=a,b', `"'=a,b"`],
  ])('writes %j as %j', (value, cell) => {
    expect(csvCell(value)).toBe(cell);
  });

  it('writes numbers, yes/no and empty cells', () => {
    expect(csvCell(-10)).toBe('-10');
    expect(csvCell(true)).toBe('yes');
    expect(csvCell(null)).toBe('');
  });
});
