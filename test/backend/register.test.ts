import { afterAll, beforeAll, beforeEach, describe, expect, it } from 'vitest';
import { SERVICE_CATALOGUE } from '../../shared/src/services/service-catalogue.js';
import { KPA_PER_PSI } from '../../shared/src/units/units.js';
import { Area, Assembly, Position, type Site } from '../../backend/src/entities/index.js';
import { guardUniqueCodes } from '../../backend/src/services/sites-admin.service.js';
import { call, startTestServer, type TestServer } from '../support/api.js';
import { buildSite, buildUser, signIn } from '../support/factories.js';
import { buildArea, buildEquipment, buildInstalledAssembly, buildPosition } from '../support/register-factories.js';

let server: TestServer;
let siteA: Site;
let siteB: Site;
let admin: string;
let engineer: string;
let limited: string;
let technician: string;
beforeAll(async () => {
  server = await startTestServer();
  siteA = await buildSite(server.ctx);
  siteB = await buildSite(server.ctx);
  admin = await signIn(server.app, (await buildUser(server.ctx, { role: 'administrator' })).email);
  engineer = await signIn(server.app, (await buildUser(server.ctx, { role: 'reliability_engineer' })).email);
  limited = await signIn(server.app, (await buildUser(server.ctx, { role: 'administrator', allSites: false, siteIds: [siteA.id] })).email);
  technician = await signIn(server.app, (await buildUser(server.ctx, { role: 'technician' })).email);
});
afterAll(() => server.close());
beforeEach(() => server.clock.reset());

let sequence = 0;
const code = (prefix: string) => `${prefix}-${Date.now().toString(36)}${(++sequence).toString(36)}`.toUpperCase();
const units = { pressureUnit: 'bar', lengthUnit: 'mm', temperatureUnit: 'C' };

async function auditRows(entityId: string): Promise<Array<{ action: string; before: Record<string, unknown> | null; after: Record<string, unknown> | null; site_id: string | null }>> {
  return server.ctx.ds.query(`SELECT action, before, after, site_id FROM audit_entries WHERE entity_id = $1 ORDER BY at, id`, [entityId]);
}

describe('sites', () => {
  it('adds a site with every catalogue service at its default settings', async () => {
    const res = await call(server.app, 'post', '/api/sites', admin).send({
      code: code('S'),
      name: 'Hollin Bank Quarry',
      timeZone: 'Europe/London',
      currency: 'GBP',
      defaultUnits: { pressureUnit: 'psi', lengthUnit: 'in', temperatureUnit: 'F' },
    });
    expect(res.status).toBe(201);
    expect(res.body.data).toMatchObject({ name: 'Hollin Bank Quarry', timeZone: 'Europe/London', defaultUnits: { pressureUnit: 'psi' }, archivedAt: null, abilities: { update: true } });
    const [rows] = await server.ctx.ds.query(`SELECT count(*)::int AS n FROM site_services WHERE site_id = $1`, [res.body.data.id]);
    expect(rows.n).toBe(SERVICE_CATALOGUE.length);
    const services = await call(server.app, 'get', '/api/services', admin).query({ siteId: res.body.data.id });
    expect(services.body.data.every((s: { customised: boolean }) => !s.customised)).toBe(true);
    expect((await auditRows(res.body.data.id)).map((a) => a.action)).toEqual(['site.created']);
  });

  it('reads a site of mine with its settings', async () => {
    const res = await call(server.app, 'get', `/api/sites/${siteA.id}`, technician);
    expect(res.status).toBe(200);
    expect(res.body.data).toMatchObject({ id: siteA.id, code: siteA.code, currency: 'GBP', abilities: { update: false } });
  });

  it('refuses a site code already in use, naming the code', async () => {
    const res = await call(server.app, 'post', '/api/sites', admin).send({ code: siteA.code, name: 'Copy', timeZone: 'UTC', currency: 'GBP', defaultUnits: units });
    expect(res.status).toBe(409);
    expect(res.body.error).toMatchObject({ code: 'code_taken', field: 'code' });
  });

  it('names an unknown time zone', async () => {
    const res = await call(server.app, 'post', '/api/sites', admin).send({ code: code('S'), name: 'Nowhere', timeZone: 'Mars/Olympus', currency: 'GBP', defaultUnits: units });
    expect(res.status).toBe(400);
    expect(res.body.error.field).toBe('timeZone');
  });

  it('refuses to let an administrator limited to some sites add one', async () => {
    const res = await call(server.app, 'post', '/api/sites', limited).send({ code: code('S'), name: 'Side Pit', timeZone: 'UTC', currency: 'GBP', defaultUnits: units });
    expect(res.status).toBe(403);
    expect(res.body.error.code).toBe('all_sites_required');
  });

  it('changes name, time zone, currency and units, with before and after in the audit trail', async () => {
    const site = await buildSite(server.ctx);
    const res = await call(server.app, 'patch', `/api/sites/${site.id}`, admin).send({
      name: 'Renamed Works',
      timeZone: 'Australia/Perth',
      currency: 'AUD',
      defaultUnits: { pressureUnit: 'kPa', lengthUnit: 'mm', temperatureUnit: 'C' },
    });
    expect(res.status).toBe(200);
    expect(res.body.data).toMatchObject({ name: 'Renamed Works', timeZone: 'Australia/Perth', currency: 'AUD', defaultUnits: { pressureUnit: 'kPa' } });
    const [audit] = await auditRows(site.id);
    expect(audit).toMatchObject({ action: 'site.updated', before: { currency: 'GBP' }, after: { currency: 'AUD' }, site_id: site.id });
  });

  it('keeps a site code: a change of code is an unknown field', async () => {
    const res = await call(server.app, 'patch', `/api/sites/${siteA.id}`, admin).send({ code: 'NEW' });
    expect(res.status).toBe(400);
    expect(res.body.error).toMatchObject({ code: 'unknown_field', field: 'code' });
  });

  it('answers 404 for a site outside my sites, for reading and for changing', async () => {
    expect((await call(server.app, 'get', `/api/sites/${siteB.id}`, limited)).status).toBe(404);
    expect((await call(server.app, 'patch', `/api/sites/${siteB.id}`, limited).send({ name: 'Mine now' })).status).toBe(404);
    expect((await call(server.app, 'get', '/api/sites/6f1d2c3b-4a59-4e8f-9d7c-1b2a3c4d5e6f', admin)).status).toBe(404);
  });
});

describe('areas', () => {
  it('adds an area to a site, audited', async () => {
    const res = await call(server.app, 'post', '/api/areas', engineer).send({ siteId: siteA.id, code: code('AR'), name: 'Primary crusher' });
    expect(res.status).toBe(201);
    expect(res.body.data).toMatchObject({ siteId: siteA.id, name: 'Primary crusher', archivedAt: null, abilities: { update: true, archive: true } });
    const [audit] = await auditRows(res.body.data.id);
    expect(audit).toMatchObject({ action: 'area.created', before: null, after: { name: 'Primary crusher' }, site_id: siteA.id });
  });

  it('refuses a code already used at the site, but not at another site', async () => {
    const area = await buildArea(server.ctx, { siteId: siteA.id });
    const same = await call(server.app, 'post', '/api/areas', engineer).send({ siteId: siteA.id, code: area.code, name: 'Again' });
    expect(same.status).toBe(409);
    expect(same.body.error).toMatchObject({ code: 'code_taken', field: 'code' });
    const other = await call(server.app, 'post', '/api/areas', engineer).send({ siteId: siteB.id, code: area.code, name: 'Elsewhere' });
    expect(other.status).toBe(201);
  });

  it('answers code_taken when saves of the same code meet at the unique index', async () => {
    const area = await buildArea(server.ctx, { siteId: siteA.id });
    const insert = guardUniqueCodes(() => server.ctx.ds.getRepository(Area).insert({ siteId: siteA.id, code: area.code, name: 'Copy' }));
    await expect(insert).rejects.toMatchObject({ status: 409, code: 'code_taken', field: 'code' });

    const same = code('AR');
    const answers = await Promise.all(
      Array.from({ length: 4 }, () => call(server.app, 'post', '/api/areas', engineer).send({ siteId: siteA.id, code: same, name: 'Raced' })),
    );
    expect(answers.map((r) => r.status).sort()).toEqual([201, 409, 409, 409]);
    expect(answers.filter((r) => r.status === 409).every((r) => r.body.error.code === 'code_taken' && r.body.error.field === 'code')).toBe(true);
  });

  it('refuses renaming a code onto another area of the site', async () => {
    const first = await buildArea(server.ctx, { siteId: siteA.id });
    const second = await buildArea(server.ctx, { siteId: siteA.id });
    const res = await call(server.app, 'patch', `/api/areas/${second.id}`, engineer).send({ code: first.code });
    expect(res.status).toBe(409);
    expect(res.body.error.field).toBe('code');
  });

  it('answers 404 for the site when adding an area to a site outside my sites', async () => {
    const res = await call(server.app, 'post', '/api/areas', limited).send({ siteId: siteB.id, code: code('AR'), name: 'Far away' });
    expect(res.status).toBe(404);
    expect(res.body.error.message).toContain('Site');
  });

  it('lists the areas of a site, sorted and paged, and leaves archived ones out unless asked', async () => {
    const site = await buildSite(server.ctx);
    for (const name of ['Wash plant', 'Bagging', 'Stockpile', 'Workshop']) await buildArea(server.ctx, { siteId: site.id, name });
    const old = await buildArea(server.ctx, { siteId: site.id, name: 'Old kiln' });
    await call(server.app, 'post', `/api/areas/${old.id}/archive`, engineer).expect(204);

    const first = await call(server.app, 'get', '/api/areas', engineer).query({ siteId: site.id, sort: 'name', pageSize: 3 });
    expect(first.status).toBe(200);
    expect(first.body.data.map((a: { name: string }) => a.name)).toEqual(['Bagging', 'Stockpile', 'Wash plant']);
    expect(first.body.pagination).toEqual({ page: 1, pageSize: 3, total: 4 });
    const second = await call(server.app, 'get', '/api/areas', engineer).query({ siteId: site.id, sort: 'name', pageSize: 3, page: 2 });
    expect(second.body.data.map((a: { name: string }) => a.name)).toEqual(['Workshop']);
    const desc = await call(server.app, 'get', '/api/areas', engineer).query({ siteId: site.id, sort: 'name', dir: 'desc', pageSize: 1 });
    expect(desc.body.data[0].name).toBe('Workshop');
    const only = await call(server.app, 'get', '/api/areas', engineer).query({ siteId: site.id, archived: 'only' });
    expect(only.body.data.map((a: { id: string }) => a.id)).toEqual([old.id]);
    expect(only.body.data[0].archivedAt).not.toBeNull();
    const all = await call(server.app, 'get', '/api/areas', engineer).query({ siteId: site.id, archived: 'include' });
    expect(all.body.pagination.total).toBe(5);
    const q = await call(server.app, 'get', '/api/areas', engineer).query({ siteId: site.id, q: 'pile' });
    expect(q.body.data.map((a: { name: string }) => a.name)).toEqual(['Stockpile']);
  });

  it('lists only the areas of my sites, and answers 404 when asked for a site outside them', async () => {
    const far = await buildArea(server.ctx, { siteId: siteB.id });
    const near = await buildArea(server.ctx, { siteId: siteA.id });
    const res = await call(server.app, 'get', '/api/areas', limited).query({ pageSize: 200, archived: 'include' });
    const ids = res.body.data.map((a: { id: string }) => a.id);
    expect(ids).toContain(near.id);
    expect(ids).not.toContain(far.id);
    expect((await call(server.app, 'get', '/api/areas', limited).query({ siteId: siteB.id })).status).toBe(404);
  });

  it('refuses to archive an area that still has equipment', async () => {
    const equipment = await buildEquipment(server.ctx, { siteId: siteA.id });
    const res = await call(server.app, 'post', `/api/areas/${equipment.areaId}/archive`, engineer);
    expect(res.status).toBe(409);
    expect(res.body.error.code).toBe('area_in_use');
  });

  it('answers 403 when a technician adds an area', async () => {
    const res = await call(server.app, 'post', '/api/areas', technician).send({ siteId: siteA.id, code: code('AR'), name: 'Not mine to add' });
    expect(res.status).toBe(403);
  });
});

describe('equipment', () => {
  it('adds equipment to an area, in the area’s site', async () => {
    const area = await buildArea(server.ctx, { siteId: siteA.id, name: 'Bench 4' });
    const res = await call(server.app, 'post', '/api/equipment', engineer).send({ areaId: area.id, assetNumber: code('DR'), name: 'Drill rig 3', hasHourMeter: true });
    expect(res.status).toBe(201);
    expect(res.body.data).toMatchObject({ siteId: siteA.id, areaId: area.id, areaName: 'Bench 4', name: 'Drill rig 3', hasHourMeter: true, hourMeterHours: null });
    expect((await auditRows(res.body.data.id))[0]).toMatchObject({ action: 'equipment.created', site_id: siteA.id });
  });

  it('refuses an asset number already used at the site, naming assetNumber', async () => {
    const existing = await buildEquipment(server.ctx, { siteId: siteA.id });
    const res = await call(server.app, 'post', '/api/equipment', engineer).send({ areaId: existing.areaId, assetNumber: existing.assetNumber, name: 'Twin' });
    expect(res.status).toBe(409);
    expect(res.body.error).toMatchObject({ code: 'code_taken', field: 'assetNumber' });
  });

  it('answers 404 for the area when it is in a site outside my sites', async () => {
    const area = await buildArea(server.ctx, { siteId: siteB.id });
    const res = await call(server.app, 'post', '/api/equipment', limited).send({ areaId: area.id, assetNumber: code('EQ'), name: 'Pump' });
    expect(res.status).toBe(404);
    expect(res.body.error.message).toContain('Area');
    expect((await call(server.app, 'get', '/api/equipment', limited).query({ areaId: area.id })).status).toBe(404);
  });

  it('lists equipment by area, searched and sorted', async () => {
    const area = await buildArea(server.ctx, { siteId: siteA.id });
    for (const [assetNumber, name] of [
      ['PMP-002', 'Dewatering pump 2'],
      ['PMP-001', 'Dewatering pump 1'],
      ['CMP-001', 'Portable compressor'],
    ]) {
      await buildEquipment(server.ctx, { areaId: area.id, assetNumber: `${assetNumber}-${area.code}`, name });
    }
    const res = await call(server.app, 'get', '/api/equipment', technician).query({ areaId: area.id, q: 'pump', sort: 'assetNumber' });
    expect(res.status).toBe(200);
    expect(res.body.data.map((e: { name: string }) => e.name)).toEqual(['Dewatering pump 1', 'Dewatering pump 2']);
    expect(res.body.pagination.total).toBe(2);
    const byName = await call(server.app, 'get', '/api/equipment', technician).query({ areaId: area.id, sort: 'name', dir: 'desc', pageSize: 2 });
    expect(byName.body.data.map((e: { name: string }) => e.name)).toEqual(['Portable compressor', 'Dewatering pump 2']);
    expect(byName.body.pagination).toEqual({ page: 1, pageSize: 2, total: 3 });
  });

  it('reads one piece of equipment with its area', async () => {
    const equipment = await buildEquipment(server.ctx, { siteId: siteA.id });
    const res = await call(server.app, 'get', `/api/equipment/${equipment.id}`, technician);
    expect(res.status).toBe(200);
    expect(res.body.data).toMatchObject({ id: equipment.id, assetNumber: equipment.assetNumber, abilities: { update: false, archive: false } });
    expect((await call(server.app, 'get', `/api/equipment/${(await buildEquipment(server.ctx, { siteId: siteB.id })).id}`, limited)).status).toBe(404);
  });

  it('leaves fields out of a change as they were', async () => {
    const equipment = await buildEquipment(server.ctx, { siteId: siteA.id, hasHourMeter: true });
    const res = await call(server.app, 'patch', `/api/equipment/${equipment.id}`, engineer).send({ name: 'Drill rig 3 (rebuilt)' });
    expect(res.status).toBe(200);
    expect(res.body.data).toMatchObject({ name: 'Drill rig 3 (rebuilt)', hasHourMeter: true });
  });

  it('moves equipment to another area of its site, but not to another site', async () => {
    const equipment = await buildEquipment(server.ctx, { siteId: siteA.id });
    const sameSite = await buildArea(server.ctx, { siteId: siteA.id, name: 'Workshop' });
    const moved = await call(server.app, 'patch', `/api/equipment/${equipment.id}`, engineer).send({ areaId: sameSite.id });
    expect(moved.status).toBe(200);
    expect(moved.body.data).toMatchObject({ areaId: sameSite.id, areaName: 'Workshop' });
    const otherSite = await buildArea(server.ctx, { siteId: siteB.id });
    const refused = await call(server.app, 'patch', `/api/equipment/${equipment.id}`, engineer).send({ areaId: otherSite.id });
    expect(refused.status).toBe(400);
    expect(refused.body.error.field).toBe('areaId');
  });

  it('refuses to archive equipment that still has positions, and archives it once they are archived', async () => {
    const position = await buildPosition(server.ctx, { siteId: siteA.id });
    const refused = await call(server.app, 'post', `/api/equipment/${position.equipmentId}/archive`, engineer);
    expect(refused.status).toBe(409);
    expect(refused.body.error.code).toBe('equipment_in_use');
    await call(server.app, 'post', `/api/positions/${position.id}/archive`, engineer).expect(204);
    await call(server.app, 'post', `/api/equipment/${position.equipmentId}/archive`, engineer).expect(204);
    const listed = await call(server.app, 'get', '/api/equipment', engineer).query({ siteId: siteA.id, pageSize: 200 });
    expect(listed.body.data.map((e: { id: string }) => e.id)).not.toContain(position.equipmentId);
  });

  it('refuses new equipment in an archived area, naming areaId', async () => {
    const area = await buildArea(server.ctx, { siteId: siteA.id, archivedAt: new Date() });
    const res = await call(server.app, 'post', '/api/equipment', engineer).send({ areaId: area.id, assetNumber: code('EQ'), name: 'Late arrival' });
    expect(res.status).toBe(400);
    expect(res.body.error).toMatchObject({ code: 'parent_archived', field: 'areaId' });
  });
});

describe('positions', () => {
  const newPosition = async (body: Record<string, unknown> = {}) => {
    const equipment = await buildEquipment(server.ctx, { siteId: siteA.id });
    return call(server.app, 'post', '/api/positions', engineer).send({
      equipmentId: equipment.id,
      code: code('P'),
      name: 'Main air supply',
      serviceCode: 'compressed-air',
      sizeCode: 'bore-19',
      ...body,
    });
  };

  it('adds a position with design conditions in the units given, stored in kPa, mm and °C', async () => {
    const res = await newPosition({
      mediumCode: 'compressed-air-oil-mist',
      maxOperatingPressure: { value: 100, unit: 'psi' },
      minTemp: { value: 14, unit: 'F' },
      maxTemp: { value: 122, unit: 'F' },
      requiredLength: { value: 10, unit: 'ft' },
      routedBendRadius: { value: 250, unit: 'mm' },
      criticality: 'high',
      notes: 'Restrained with a whip check at both ends',
    });
    expect(res.status).toBe(201);
    const p = res.body.data;
    expect(p.maxOperatingPressureKpa).toBeCloseTo(100 * KPA_PER_PSI, 9);
    expect(p.minTempC).toBeCloseTo(-10, 9);
    expect(p.maxTempC).toBeCloseTo(50, 9);
    expect(p.requiredLengthMm).toBeCloseTo(3048, 9);
    expect(p).toMatchObject({ siteId: siteA.id, serviceCode: 'compressed-air', sizeCode: 'bore-19', criticality: 'high', currentAssembly: null, archivedAt: null });
    // Compressed air: 90 days by default, halved at a position of high criticality.
    expect(p.effectiveInspectionIntervalDays).toBe(45);
    expect(p.abilities).toEqual({ update: true, archive: true, install: true });
    expect((await auditRows(p.id))[0]).toMatchObject({ action: 'position.created', site_id: siteA.id });
  });

  it('names the field of a pressure given in an unknown unit', async () => {
    const res = await newPosition({ maxOperatingPressure: { value: 7, unit: 'atm' } });
    expect(res.status).toBe(400);
    expect(res.body.error.field).toBe('maxOperatingPressure.unit');
  });

  it('names the field of a negative pressure', async () => {
    const res = await newPosition({ maxOperatingPressure: { value: -1, unit: 'bar' } });
    expect(res.status).toBe(400);
    expect(res.body.error.field).toBe('maxOperatingPressure.value');
    expect(res.body.error.message).toContain('cannot be negative');
  });

  it('names an unknown field, a bad size code and a temperature range upside down', async () => {
    const unknown = await newPosition({ colour: 'red' });
    expect(unknown.status).toBe(400);
    expect(unknown.body.error).toMatchObject({ code: 'unknown_field', field: 'colour' });
    const size = await newPosition({ sizeCode: 'bore-20' });
    expect(size.status).toBe(400);
    expect(size.body.error.field).toBe('sizeCode');
    const range = await newPosition({ minTemp: { value: 50, unit: 'C' }, maxTemp: { value: 10, unit: 'C' } });
    expect(range.status).toBe(400);
    expect(range.body.error.field).toBe('maxTemp');
  });

  it('refuses a position code already used at the site', async () => {
    const existing = await buildPosition(server.ctx, { siteId: siteA.id });
    const res = await newPosition({ code: existing.code });
    expect(res.status).toBe(409);
    expect(res.body.error).toMatchObject({ code: 'code_taken', field: 'code' });
  });

  it('answers 404 for the equipment when it is in a site outside my sites', async () => {
    const equipment = await buildEquipment(server.ctx, { siteId: siteB.id });
    const res = await call(server.app, 'post', '/api/positions', limited).send({ equipmentId: equipment.id, code: code('P'), name: 'Far', serviceCode: 'compressed-air', sizeCode: 'bore-19' });
    expect(res.status).toBe(404);
    expect(res.body.error.message).toContain('Equipment');
  });

  it('answers 404 for a position outside my sites, for reading, changing and archiving', async () => {
    const position = await buildPosition(server.ctx, { siteId: siteB.id });
    expect((await call(server.app, 'get', `/api/positions/${position.id}`, limited)).status).toBe(404);
    expect((await call(server.app, 'patch', `/api/positions/${position.id}`, limited).send({ name: 'Mine' })).status).toBe(404);
    expect((await call(server.app, 'post', `/api/positions/${position.id}/archive`, limited)).status).toBe(404);
    const list = await call(server.app, 'get', '/api/positions', limited).query({ q: position.code });
    expect(list.body.data).toEqual([]);
  });

  it('shows the assembly in the position and the interval in force', async () => {
    const { assembly, position } = await buildInstalledAssembly(server.ctx, { siteId: siteA.id });
    const res = await call(server.app, 'get', `/api/positions/${position.id}`, technician);
    expect(res.status).toBe(200);
    expect(res.body.data.currentAssembly).toEqual({ id: assembly.id, number: assembly.number, status: 'installed', checkOutcome: assembly.checkOutcome });
    expect(res.body.data).toMatchObject({ effectiveInspectionIntervalDays: 90, abilities: { update: false, archive: false, install: false } });
  });

  describe('the list', () => {
    let site: Site;
    let areaId: string;
    let equipmentId: string;
    beforeAll(async () => {
      site = await buildSite(server.ctx);
      const equipment = await buildEquipment(server.ctx, { siteId: site.id, assetNumber: 'RIG-3' });
      const other = await buildEquipment(server.ctx, { siteId: site.id, assetNumber: 'PUMP-2' });
      areaId = other.areaId;
      equipmentId = equipment.id;
      const occupied = await buildPosition(server.ctx, { equipmentId: equipment.id, code: 'P-AIR-1', name: 'Main air supply', criticality: 'low' });
      await buildInstalledAssembly(server.ctx, { position: occupied });
      await buildPosition(server.ctx, { equipmentId: equipment.id, code: 'P-AIR-2', name: 'Feed air', criticality: 'high', notes: 'Coupling pin replaced with a locking pin' });
      await buildPosition(server.ctx, { equipmentId: other.id, code: 'P-WAT-1', name: 'Discharge', serviceCode: 'water-discharge', mediumCode: 'water', criticality: 'medium' });
      await buildPosition(server.ctx, { equipmentId: other.id, code: 'P-OLD-1', name: 'Retired line', archivedAt: new Date() });
    });
    const codes = (res: { body: { data: Array<{ code: string }> } }) => res.body.data.map((p) => p.code);
    const list = (query: Record<string, string | number>) => call(server.app, 'get', '/api/positions', technician).query({ siteId: site.id, ...query });

    it('filters by site and leaves archived positions out', async () => {
      const res = await list({});
      expect(res.status).toBe(200);
      expect(codes(res)).toEqual(['P-AIR-1', 'P-AIR-2', 'P-WAT-1']);
      expect(res.body.pagination).toEqual({ page: 1, pageSize: 25, total: 3 });
      expect(codes(await list({ archived: 'only' }))).toEqual(['P-OLD-1']);
    });

    it('filters by area, equipment, service and occupancy', async () => {
      expect(codes(await list({ areaId }))).toEqual(['P-WAT-1']);
      expect(codes(await list({ equipmentId }))).toEqual(['P-AIR-1', 'P-AIR-2']);
      expect(codes(await list({ serviceCode: 'water-discharge' }))).toEqual(['P-WAT-1']);
      expect(codes(await list({ occupied: 'yes' }))).toEqual(['P-AIR-1']);
      expect(codes(await list({ occupied: 'no' }))).toEqual(['P-AIR-2', 'P-WAT-1']);
    });

    it('searches code, name and notes', async () => {
      expect(codes(await list({ q: 'wat' }))).toEqual(['P-WAT-1']);
      expect(codes(await list({ q: 'feed' }))).toEqual(['P-AIR-2']);
      expect(codes(await list({ q: 'locking pin' }))).toEqual(['P-AIR-2']);
      expect(codes(await list({ q: '100%' }))).toEqual([]);
    });

    it('sorts by criticality, equipment and name, and pages', async () => {
      expect(codes(await list({ sort: 'criticality' }))).toEqual(['P-AIR-2', 'P-WAT-1', 'P-AIR-1']);
      expect(codes(await list({ sort: 'equipment' }))).toEqual(['P-WAT-1', 'P-AIR-1', 'P-AIR-2']);
      const page2 = await list({ sort: 'name', dir: 'desc', pageSize: 2, page: 2 });
      expect(codes(page2)).toEqual(['P-WAT-1']);
      expect(page2.body.pagination).toEqual({ page: 2, pageSize: 2, total: 3 });
    });

    it('shows each position with its equipment, area and site', async () => {
      const res = await list({ q: 'P-AIR-1' });
      expect(res.body.data[0]).toMatchObject({ equipmentAssetNumber: 'RIG-3', siteName: site.name, currentAssembly: { status: 'installed' } });
    });

    it('names a bad filter', async () => {
      const res = await list({ occupied: 'maybe' });
      expect(res.status).toBe(400);
      expect(res.body.error.field).toBe('occupied');
    });
  });

  it('audits a change of design conditions with before, after and the reason', async () => {
    const position = await buildPosition(server.ctx, { siteId: siteA.id });
    const res = await call(server.app, 'patch', `/api/positions/${position.id}`, engineer).send({
      maxOperatingPressure: { value: 8.5, unit: 'bar' },
      criticality: 'high',
      reason: 'Compressor set-point raised after the receiver was replaced',
    });
    expect(res.status).toBe(200);
    expect(res.body.data).toMatchObject({ maxOperatingPressureKpa: 850, criticality: 'high', effectiveInspectionIntervalDays: 45 });
    const audit = await auditRows(position.id);
    expect(audit.at(-1)).toMatchObject({
      action: 'position.design_changed',
      before: { maxOperatingPressureKpa: 700, criticality: 'medium' },
      after: { maxOperatingPressureKpa: 850, criticality: 'high', reason: 'Compressor set-point raised after the receiver was replaced' },
      site_id: siteA.id,
    });
  });

  it('audits a change of name alone as an ordinary change', async () => {
    const position = await buildPosition(server.ctx, { siteId: siteA.id });
    await call(server.app, 'patch', `/api/positions/${position.id}`, engineer).send({ name: 'Main air, drifter feed' }).expect(200);
    expect((await auditRows(position.id)).at(-1)).toMatchObject({ action: 'position.updated', before: { name: 'Main air supply' }, after: { name: 'Main air, drifter feed' } });
  });

  it('recomputes the stored outcome of the assembly in it when the design conditions change', async () => {
    const { assembly, position } = await buildInstalledAssembly(server.ctx, { siteId: siteA.id });
    expect(['pass', 'warn']).toContain(assembly.checkOutcome);
    // The hose is good for 20 bar; the position now runs at 25.
    const res = await call(server.app, 'patch', `/api/positions/${position.id}`, engineer).send({ maxOperatingPressure: { value: 25, unit: 'bar' } });
    expect(res.status).toBe(200);
    expect(res.body.data.currentAssembly.checkOutcome).toBe('fail');
    expect((await server.ctx.ds.getRepository(Assembly).findOneByOrFail({ id: assembly.id })).checkOutcome).toBe('fail');
  });

  it('changes nothing when the change is refused', async () => {
    const position = await buildPosition(server.ctx, { siteId: siteA.id });
    const res = await call(server.app, 'patch', `/api/positions/${position.id}`, engineer).send({ name: 'Renamed', minTemp: { value: 60, unit: 'C' } });
    expect(res.status).toBe(400);
    expect(res.body.error.field).toBe('maxTemp');
    expect((await server.ctx.ds.getRepository(Position).findOneByOrFail({ id: position.id })).name).toBe('Main air supply');
    expect(await auditRows(position.id)).toEqual([]);
  });

  it('moves a position to other equipment of its site only', async () => {
    const position = await buildPosition(server.ctx, { siteId: siteA.id });
    const elsewhere = await buildEquipment(server.ctx, { siteId: siteB.id });
    const res = await call(server.app, 'patch', `/api/positions/${position.id}`, engineer).send({ equipmentId: elsewhere.id });
    expect(res.status).toBe(400);
    expect(res.body.error.field).toBe('equipmentId');
    const nearby = await buildEquipment(server.ctx, { siteId: siteA.id });
    const moved = await call(server.app, 'patch', `/api/positions/${position.id}`, engineer).send({ equipmentId: nearby.id });
    expect(moved.body.data).toMatchObject({ equipmentId: nearby.id, areaId: nearby.areaId });
  });

  it('refuses to archive a position with an assembly installed, and archives an empty one', async () => {
    const { position } = await buildInstalledAssembly(server.ctx, { siteId: siteA.id });
    const refused = await call(server.app, 'post', `/api/positions/${position.id}/archive`, engineer);
    expect(refused.status).toBe(409);
    expect(refused.body.error.code).toBe('position_occupied');
    const empty = await buildPosition(server.ctx, { siteId: siteA.id });
    await call(server.app, 'post', `/api/positions/${empty.id}/archive`, engineer).expect(204);
    const read = await call(server.app, 'get', `/api/positions/${empty.id}`, engineer);
    expect(read.body.data.archivedAt).not.toBeNull();
    expect((await auditRows(empty.id)).at(-1)).toMatchObject({ action: 'position.archived', before: { archivedAt: null } });
  });
});
