import { afterAll, beforeAll, beforeEach, describe, expect, it } from 'vitest';
import { COMPATIBILITY_TABLE, MEDIA } from '../../shared/src/checks/compatibility.js';
import { FITTING_STYLES } from '../../shared/src/schemas/register.schema.js';
import { CRITICALITY_LEVELS } from '../../shared/src/services/criticality.js';
import { REMOVAL_REASONS } from '../../shared/src/services/removal-reasons.js';
import { defaultServiceSettings, SERVICE_CATALOGUE, serviceByCode } from '../../shared/src/services/service-catalogue.js';
import { SIZE_CLASSES } from '../../shared/src/sizes/nominal-sizes.js';
import { KPA_PER_PSI } from '../../shared/src/units/units.js';
import { Assembly, type Site } from '../../backend/src/entities/index.js';
import { call, startTestServer, type TestServer } from '../support/api.js';
import { buildSite, buildUser, signIn } from '../support/factories.js';
import { buildConstruction, buildFittingType, buildInstalledAssembly, buildPosition } from '../support/register-factories.js';

let server: TestServer;
let siteA: Site;
let siteB: Site;
let engineer: string;
let limited: string;
let viewer: string;
beforeAll(async () => {
  server = await startTestServer();
  siteA = await buildSite(server.ctx);
  siteB = await buildSite(server.ctx);
  engineer = await signIn(server.app, (await buildUser(server.ctx, { role: 'reliability_engineer' })).email);
  limited = await signIn(server.app, (await buildUser(server.ctx, { role: 'administrator', allSites: false, siteIds: [siteA.id] })).email);
  viewer = await signIn(server.app, (await buildUser(server.ctx, { role: 'viewer' })).email);
});
afterAll(() => server.close());
beforeEach(() => server.clock.reset());

let sequence = 0;
const code = (prefix: string) => `${prefix}-${Date.now().toString(36)}${(++sequence).toString(36)}`.toUpperCase();
const storedOutcome = async (id: string) => (await server.ctx.ds.getRepository(Assembly).findOneByOrFail({ id })).checkOutcome;
const auditRows = (entityId: string): Promise<Array<{ action: string; before: Record<string, any> | null; after: Record<string, any> | null }>> =>
  server.ctx.ds.query(`SELECT action, before, after FROM audit_entries WHERE entity_id = $1 ORDER BY at, id`, [entityId]);
const airDefaults = () => defaultServiceSettings(serviceByCode('compressed-air')!);

describe('services at a site', () => {
  it('lists every catalogue service with the site’s settings, the defaults and whether they differ', async () => {
    const res = await call(server.app, 'get', '/api/services', viewer).query({ siteId: siteA.id });
    expect(res.status).toBe(200);
    expect(res.body.data.map((s: { serviceCode: string }) => s.serviceCode)).toEqual(SERVICE_CATALOGUE.map((s) => s.code));
    expect(res.body.pagination.total).toBe(SERVICE_CATALOGUE.length);
    const air = res.body.data[0];
    expect(air).toMatchObject({ siteId: siteA.id, serviceCode: 'compressed-air', name: 'Compressed air', customised: false });
    expect(air.settings).toEqual(airDefaults());
    expect(air.defaults).toEqual(airDefaults());
  });

  it('answers 404 for a site outside my sites', async () => {
    expect((await call(server.app, 'get', '/api/services', limited).query({ siteId: siteB.id })).status).toBe(404);
    expect((await call(server.app, 'put', `/api/sites/${siteB.id}/services/compressed-air`, limited).send(airDefaults())).status).toBe(404);
    expect((await call(server.app, 'post', `/api/sites/${siteB.id}/services/compressed-air/reset`, limited)).status).toBe(404);
  });

  it('names the site when it is missing from the query', async () => {
    const res = await call(server.app, 'get', '/api/services', viewer);
    expect(res.status).toBe(400);
    expect(res.body.error.field).toBe('siteId');
  });

  it('changes a service’s settings at one site, audited, and recomputes the assemblies in that service there', async () => {
    const site = await buildSite(server.ctx);
    const { assembly } = await buildInstalledAssembly(server.ctx, { siteId: site.id });
    const elsewhere = await buildInstalledAssembly(server.ctx, { siteId: siteA.id });
    expect(['pass', 'warn']).toContain(assembly.checkOutcome);
    // An 80 bar hose at 7 bar passes at 4:1; at 12:1 the burst limit is 6.7 bar.
    const settings = { ...airDefaults(), designFactorBands: [{ upToKpa: null, factor: 12, source: 'site rule: 12:1 for drill air' }], defaultInspectionIntervalDays: 30 };
    const res = await call(server.app, 'put', `/api/sites/${site.id}/services/compressed-air`, engineer).send(settings);
    expect(res.status).toBe(200);
    expect(res.body.data).toMatchObject({ customised: true, settings: { defaultInspectionIntervalDays: 30, designFactorBands: [{ factor: 12 }] } });
    expect(await storedOutcome(assembly.id)).toBe('fail');
    expect(await storedOutcome(elsewhere.assembly.id)).toBe(elsewhere.assembly.checkOutcome);

    const [row] = await server.ctx.ds.query(`SELECT id FROM site_services WHERE site_id = $1 AND service_code = 'compressed-air'`, [site.id]);
    const [audit] = await auditRows(row.id);
    expect(audit).toMatchObject({ action: 'site_service.updated', before: null, after: { settings: { defaultInspectionIntervalDays: 30 } } });

    const position = await call(server.app, 'get', `/api/positions/${assembly.positionId}`, engineer);
    expect(position.body.data.effectiveInspectionIntervalDays).toBe(30);

    const reset = await call(server.app, 'post', `/api/sites/${site.id}/services/compressed-air/reset`, engineer);
    expect(reset.status).toBe(200);
    expect(reset.body.data).toMatchObject({ customised: false, settings: airDefaults() });
    expect(await storedOutcome(assembly.id)).toBe(assembly.checkOutcome);
    expect((await auditRows(row.id)).at(-1)).toMatchObject({ action: 'site_service.reset', before: { settings: { defaultInspectionIntervalDays: 30 } } });
  });

  it('refuses settings whose last band has an upper end, naming designFactorBands', async () => {
    const res = await call(server.app, 'put', `/api/sites/${siteA.id}/services/compressed-air`, engineer).send({
      ...airDefaults(),
      designFactorBands: [{ upToKpa: 1000, factor: 4, source: 'site rule' }],
    });
    expect(res.status).toBe(400);
    expect(res.body.error.field).toBe('designFactorBands');
  });

  it('answers 404 for a service that is not in the catalogue', async () => {
    const res = await call(server.app, 'put', `/api/sites/${siteA.id}/services/moon-dust`, engineer).send(airDefaults());
    expect(res.status).toBe(404);
  });

  it('answers 403 when a viewer changes settings', async () => {
    expect((await call(server.app, 'put', `/api/sites/${siteA.id}/services/compressed-air`, viewer).send(airDefaults())).status).toBe(403);
  });
});

describe('constructions', () => {
  const create = (body: Record<string, unknown>) =>
    call(server.app, 'post', '/api/constructions', engineer).send({ code: code('C'), name: 'Air hose', sizeCode: 'bore-19', ...body });

  it('adds a construction with ratings in the units given, stored in kPa, mm and °C', async () => {
    const res = await create({
      tubeCompound: 'NBR',
      reinforcement: 'textile',
      coverCompound: 'CR',
      workingPressure: { value: 300, unit: 'psi' },
      burstPressure: { value: 1200, unit: 'psi' },
      minTemp: { value: -40, unit: 'F' },
      maxTemp: { value: 212, unit: 'F' },
      minBendRadius: { value: 5, unit: 'in' },
      electrical: 'none',
      maker: 'Local hose supplier',
    });
    expect(res.status).toBe(201);
    const c = res.body.data;
    expect(c.workingPressureKpa).toBeCloseTo(300 * KPA_PER_PSI, 9);
    expect(c.burstPressureKpa).toBeCloseTo(1200 * KPA_PER_PSI, 9);
    expect(c.minTempC).toBeCloseTo(-40, 9);
    expect(c.maxTempC).toBeCloseTo(100, 9);
    expect(c.minBendRadiusMm).toBeCloseTo(127, 9);
    expect(c).toMatchObject({ tubeCompound: 'NBR', vacuumRatingKpa: null, archivedAt: null, abilities: { update: true, archive: true } });
    expect((await auditRows(c.id))[0]).toMatchObject({ action: 'construction.created', before: null });
  });

  it('names the field of a pressure in an unknown unit, a negative pressure and a burst below working', async () => {
    const unit = await create({ workingPressure: { value: 20, unit: 'atm' } });
    expect(unit.status).toBe(400);
    expect(unit.body.error.field).toBe('workingPressure.unit');
    const negative = await create({ burstPressure: { value: -5, unit: 'bar' } });
    expect(negative.status).toBe(400);
    expect(negative.body.error.field).toBe('burstPressure.value');
    const burst = await create({ workingPressure: { value: 20, unit: 'bar' }, burstPressure: { value: 15, unit: 'bar' } });
    expect(burst.status).toBe(400);
    expect(burst.body.error).toMatchObject({ field: 'burstPressure', message: 'Burst pressure must be at least the working pressure' });
  });

  it('names an unknown field and a bad size code', async () => {
    const unknown = await create({ colour: 'red' });
    expect(unknown.status).toBe(400);
    expect(unknown.body.error).toMatchObject({ code: 'unknown_field', field: 'colour' });
    const size = await create({ sizeCode: '3/4 inch' });
    expect(size.status).toBe(400);
    expect(size.body.error.field).toBe('sizeCode');
  });

  it('refuses a code already in use', async () => {
    const existing = await buildConstruction(server.ctx);
    const res = await create({ code: existing.code });
    expect(res.status).toBe(409);
    expect(res.body.error).toMatchObject({ code: 'code_taken', field: 'code' });
  });

  it('checks a change against the values kept: a burst pressure below the working pressure on file is refused and nothing changes', async () => {
    const construction = await buildConstruction(server.ctx);
    const res = await call(server.app, 'patch', `/api/constructions/${construction.id}`, engineer).send({ name: 'Changed', burstPressure: { value: 10, unit: 'bar' } });
    expect(res.status).toBe(400);
    expect(res.body.error.field).toBe('burstPressure');
    const read = await call(server.app, 'get', `/api/constructions/${construction.id}`, viewer);
    expect(read.body.data).toMatchObject({ name: construction.name, burstPressureKpa: 8000, abilities: { update: false, archive: false } });
  });

  it('fails the stored outcome of an installed assembly when its hose’s working pressure drops below the position’s', async () => {
    const { assembly, construction } = await buildInstalledAssembly(server.ctx, { siteId: siteA.id });
    expect(['pass', 'warn']).toContain(assembly.checkOutcome);
    expect(await storedOutcome(assembly.id)).toBe(assembly.checkOutcome);
    // The position runs at 7 bar; the hose is now rated for 5.
    const res = await call(server.app, 'patch', `/api/constructions/${construction.id}`, engineer).send({ workingPressure: { value: 5, unit: 'bar' } });
    expect(res.status).toBe(200);
    expect(res.body.data.workingPressureKpa).toBe(500);
    expect(await storedOutcome(assembly.id)).toBe('fail');
    const [row] = await server.ctx.ds.query(`SELECT check_results FROM assemblies WHERE id = $1`, [assembly.id]);
    expect(row.check_results.find((r: { check: string }) => r.check === 'allowable-pressure').outcome).toBe('fail');
    const audit = (await auditRows(construction.id)).at(-1);
    expect(audit).toMatchObject({ action: 'construction.updated', before: { workingPressureKpa: 2000 }, after: { workingPressureKpa: 500 } });
  });

  it('lists constructions filtered, searched, sorted by size and paged', async () => {
    const tag = code('LIST');
    await buildConstruction(server.ctx, { code: `${tag}-A`, name: 'Suction hose 102', sizeCode: 'bore-102', tubeCompound: 'NR' });
    await buildConstruction(server.ctx, { code: `${tag}-B`, name: 'Air hose 19', sizeCode: 'bore-19' });
    await buildConstruction(server.ctx, { code: `${tag}-C`, name: 'Air hose 25', sizeCode: 'bore-25' });
    await buildConstruction(server.ctx, { code: `${tag}-D`, name: 'Old air hose', sizeCode: 'bore-19', archivedAt: new Date() });
    const list = (query: Record<string, string | number>) => call(server.app, 'get', '/api/constructions', viewer).query({ q: tag, ...query });
    const codes = (res: { body: { data: Array<{ code: string }> } }) => res.body.data.map((c) => c.code.slice(tag.length + 1));

    const bySize = await list({ sort: 'sizeCode' });
    expect(bySize.status).toBe(200);
    expect(codes(bySize)).toEqual(['B', 'C', 'A']);
    expect(codes(await list({ sort: 'sizeCode', dir: 'desc' }))).toEqual(['A', 'C', 'B']);
    expect(codes(await list({ tubeCompound: 'NR' }))).toEqual(['A']);
    expect(codes(await list({ sizeCode: 'bore-19', archived: 'include' }))).toEqual(['B', 'D']);
    const paged = await list({ sort: 'name', pageSize: 2, page: 2 });
    expect(codes(paged)).toEqual(['A']);
    expect(paged.body.pagination).toEqual({ page: 2, pageSize: 2, total: 3 });
  });

  it('archives a construction: it leaves the list and can still be read', async () => {
    const construction = await buildConstruction(server.ctx);
    await call(server.app, 'post', `/api/constructions/${construction.id}/archive`, engineer).expect(204);
    const list = await call(server.app, 'get', '/api/constructions', viewer).query({ q: construction.code });
    expect(list.body.data).toEqual([]);
    const read = await call(server.app, 'get', `/api/constructions/${construction.id}`, viewer);
    expect(read.body.data.archivedAt).not.toBeNull();
    expect((await auditRows(construction.id)).at(-1)?.action).toBe('construction.archived');
  });

  it('answers 404 for a construction that does not exist', async () => {
    expect((await call(server.app, 'get', '/api/constructions/0b3d6a8e-2f4c-4a1b-9c7d-5e6f7a8b9c0d', viewer)).status).toBe(404);
  });
});

describe('fitting types', () => {
  it('adds a fitting type with a rating per size, stored in kPa and mm', async () => {
    const res = await call(server.app, 'post', '/api/fitting-types', engineer).send({
      code: code('F'),
      name: 'Claw coupling',
      style: 'claw',
      material: 'malleable iron',
      sizes: [
        { sizeCode: 'bore-19', rating: { value: 150, unit: 'psi' }, crimpDiameter: { value: 1.1, unit: 'in' }, crimpTolerance: { value: 0.2, unit: 'mm' } },
        { sizeCode: 'bore-25', rating: null },
      ],
    });
    expect(res.status).toBe(201);
    const [size19, size25] = res.body.data.sizes;
    expect(size19.ratingKpa).toBeCloseTo(150 * KPA_PER_PSI, 9);
    expect(size19.crimpDiameterMm).toBeCloseTo(27.94, 9);
    expect(size25).toEqual({ sizeCode: 'bore-25', ratingKpa: null, crimpDiameterMm: null, crimpToleranceMm: null });
    expect(res.body.data).toMatchObject({ style: 'claw', notes: null, abilities: { update: true, archive: true } });
  });

  it('names a size given twice, an unknown style and a bad size code', async () => {
    const base = { code: code('F'), name: 'Cam and groove', style: 'cam-groove', material: 'aluminium' };
    const twice = await call(server.app, 'post', '/api/fitting-types', engineer).send({ ...base, sizes: [{ sizeCode: 'bore-51', rating: null }, { sizeCode: 'bore-51', rating: null }] });
    expect(twice.status).toBe(400);
    expect(twice.body.error.field).toBe('sizes');
    const style = await call(server.app, 'post', '/api/fitting-types', engineer).send({ ...base, style: 'glued', sizes: [] });
    expect(style.body.error.field).toBe('style');
    const size = await call(server.app, 'post', '/api/fitting-types', engineer).send({ ...base, sizes: [{ sizeCode: 'bore-7', rating: null }] });
    expect(size.body.error.field).toBe('sizes.0.sizeCode');
  });

  it('refuses a code already in use', async () => {
    const existing = await buildFittingType(server.ctx);
    const res = await call(server.app, 'post', '/api/fitting-types', engineer).send({ code: existing.code, name: 'Twin', style: 'crimped', material: 'steel', sizes: [] });
    expect(res.status).toBe(409);
    expect(res.body.error).toMatchObject({ code: 'code_taken', field: 'code' });
  });

  it('fails the stored outcome of an installed assembly when its fitting’s rating drops below the position’s pressure', async () => {
    const { assembly, endA } = await buildInstalledAssembly(server.ctx, { siteId: siteA.id });
    const res = await call(server.app, 'patch', `/api/fitting-types/${endA!.id}`, engineer).send({ sizes: [{ sizeCode: 'bore-19', rating: { value: 6, unit: 'bar' } }] });
    expect(res.status).toBe(200);
    expect(res.body.data.sizes[0]).toMatchObject({ ratingKpa: 600, crimpDiameterMm: null });
    expect(await storedOutcome(assembly.id)).toBe('fail');
  });

  it('lists fitting types by style and archives one', async () => {
    const tag = code('FL');
    const claw = await buildFittingType(server.ctx, { code: `${tag}-1`, style: 'claw', name: 'Claw coupling' });
    await buildFittingType(server.ctx, { code: `${tag}-2`, style: 'crimped' });
    const res = await call(server.app, 'get', '/api/fitting-types', viewer).query({ q: tag, style: 'claw' });
    expect(res.body.data.map((f: { id: string }) => f.id)).toEqual([claw.id]);
    await call(server.app, 'post', `/api/fitting-types/${claw.id}/archive`, engineer).expect(204);
    expect((await call(server.app, 'get', '/api/fitting-types', viewer).query({ q: tag })).body.pagination.total).toBe(1);
    expect((await call(server.app, 'get', `/api/fitting-types/${claw.id}`, viewer)).body.data.archivedAt).not.toBeNull();
  });

  it('leaves the notes as they were when a change does not mention them', async () => {
    const fitting = await buildFittingType(server.ctx, { notes: 'Use the locking pin' });
    const res = await call(server.app, 'patch', `/api/fitting-types/${fitting.id}`, engineer).send({ name: 'Crimped stem, bite-type ferrule' });
    expect(res.body.data).toMatchObject({ name: 'Crimped stem, bite-type ferrule', notes: 'Use the locking pin' });
  });
});

describe('reference lists', () => {
  it('answers the size classes, media, compounds, compatibility, criticality, removal reasons, fitting styles and services in one cacheable answer', async () => {
    const res = await call(server.app, 'get', '/api/reference', viewer);
    expect(res.status).toBe(200);
    expect(res.headers['cache-control']).toContain('max-age');
    const data = res.body.data;
    expect(data.sizeClasses.map((s: { code: string }) => s.code)).toEqual(SIZE_CLASSES.map((s) => s.code));
    expect(data.sizeClasses.find((s: { code: string }) => s.code === 'bore-19')).toMatchObject({ inch: '3/4', dash: 12 });
    expect(data.media).toHaveLength(MEDIA.length);
    expect(data.tubeCompounds).toContainEqual({ code: 'NBR', name: 'nitrile rubber' });
    expect(data.compatibility.NBR['compressed-air-oil-mist']).toEqual(COMPATIBILITY_TABLE.NBR['compressed-air-oil-mist']);
    expect(data.criticalityLevels.map((c: { code: string }) => c.code)).toEqual([...CRITICALITY_LEVELS]);
    expect(data.removalReasons.map((r: { code: string }) => r.code)).toEqual([...REMOVAL_REASONS]);
    expect(data.fittingStyles.map((f: { code: string }) => f.code)).toEqual([...FITTING_STYLES]);
    expect(data.services.map((s: { code: string }) => s.code)).toEqual(SERVICE_CATALOGUE.map((s) => s.code));
    expect(data.services[0].sources.inspectionInterval).toBeTruthy();
  });

  it('answers 401 without a session', async () => {
    expect((await call(server.app, 'get', '/api/reference')).status).toBe(401);
  });
});

describe('a position in a site with customised settings', () => {
  it('takes the site’s inspection interval, adjusted by criticality', async () => {
    const site = await buildSite(server.ctx);
    await call(server.app, 'put', `/api/sites/${site.id}/services/compressed-air`, engineer).send({ ...airDefaults(), defaultInspectionIntervalDays: 60 }).expect(200);
    const low = await buildPosition(server.ctx, { siteId: site.id, criticality: 'low' });
    const own = await buildPosition(server.ctx, { siteId: site.id, inspectionIntervalDays: 14 });
    expect((await call(server.app, 'get', `/api/positions/${low.id}`, viewer)).body.data.effectiveInspectionIntervalDays).toBe(90);
    expect((await call(server.app, 'get', `/api/positions/${own.id}`, viewer)).body.data.effectiveInspectionIntervalDays).toBe(14);
  });
});
