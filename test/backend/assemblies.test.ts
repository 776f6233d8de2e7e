import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { parseTagCode } from '../../shared/src/tags/tag-code.js';
import type { Equipment, FittingType, Construction, Site } from '../../backend/src/entities/index.js';
import { Position } from '../../backend/src/entities/index.js';
import { call, startTestServer, type TestServer } from '../support/api.js';
import { buildConstruction, buildFittingType } from '../support/register-factories.js';
import { buildAirPosition, buildPlace, key, stockAssembly } from '../support/assembly-factories.js';
import { buildUser, signIn } from '../support/factories.js';

let server: TestServer;
let site: Site;
let equipment: Equipment;
let construction: Construction;
let fitting: FittingType;
let technician: string;
let engineer: string;
let secondTechnician: string;

beforeAll(async () => {
  server = await startTestServer();
  ({ site, equipment } = await buildPlace(server.ctx));
  construction = await buildConstruction(server.ctx);
  fitting = await buildFittingType(server.ctx);
  const sites = { allSites: false, siteIds: [site.id] };
  technician = await signIn(server.app, (await buildUser(server.ctx, { role: 'technician', ...sites })).email);
  secondTechnician = await signIn(server.app, (await buildUser(server.ctx, { role: 'technician', ...sites })).email);
  engineer = await signIn(server.app, (await buildUser(server.ctx, { role: 'reliability_engineer', ...sites })).email);
});
afterAll(() => server.close());

const stock = (cookie = technician, extra: { proofTest?: boolean; constructionId?: string } = {}) =>
  stockAssembly(server.app, cookie, { siteId: site.id, constructionId: extra.constructionId ?? construction.id, fittingId: fitting.id, proofTest: extra.proofTest });
const install = (id: string, positionId: string, cookie = technician, extra: Record<string, unknown> = {}) =>
  call(server.app, 'post', `/api/assemblies/${id}/install`, cookie).send({ positionId, idempotencyKey: key(), ...extra });
const events = async (id: string) => (await call(server.app, 'get', `/api/assemblies/${id}/events`, technician)).body.data as Array<{ kind: string; data: Record<string, unknown> }>;

describe('building and proof-testing', () => {
  it('gives a new assembly a tag-code number, records the build, and the proof test at half the burst pressure puts it in stock', async () => {
    const id = await stock(technician, { proofTest: false });
    const built = (await call(server.app, 'get', `/api/assemblies/${id}`, technician)).body.data;
    expect(built.status).toBe('built');
    expect(parseTagCode(built.number)).toBe(built.number);
    expect(built.overallLengthMm).toBe(5000);
    const res = await call(server.app, 'post', `/api/assemblies/${id}/proof-tests`, technician).send({
      testedOn: '2026-01-11',
      medium: 'water',
      heldPressure: { value: 581, unit: 'psi' }, // 4005.9 kPa: 580 psi (3999.0 kPa) would fall short
      holdSeconds: 60,
      result: 'pass',
      tester: 'Hose shop',
    });
    expect(res.status).toBe(200);
    // RMA IP-2 (2003), test methods: proof test usually 50 % of the minimum burst: 8000 kPa burst → 4000 kPa.
    expect(res.body.data.proofTest.requiredPressureKpa).toBe(4000);
    expect(res.body.data.status).toBe('in_stock');
    expect((await events(id)).map((e) => e.kind)).toEqual(['proof_test', 'build']);
  });

  it('refuses a proof test with air or gas, on the medium field', async () => {
    const id = await stock(technician, { proofTest: false });
    const res = await call(server.app, 'post', `/api/assemblies/${id}/proof-tests`, technician).send({
      testedOn: '2026-01-11',
      medium: 'compressed-air',
      heldPressure: { value: 40, unit: 'bar' },
      holdSeconds: 60,
      result: 'pass',
      tester: 'Hose shop',
    });
    expect(res.status).toBe(400);
    expect(res.body.error.field).toBe('medium');
    expect(res.body.error.message).toMatch(/Never test with air or gas/);
  });

  it('keeps a failed proof test from putting the assembly in stock', async () => {
    const id = await stock(technician, { proofTest: false });
    const res = await call(server.app, 'post', `/api/assemblies/${id}/proof-tests`, technician).send({
      testedOn: '2026-01-11', medium: 'water', heldPressure: { value: 40, unit: 'bar' }, holdSeconds: 60, result: 'fail', tester: 'Hose shop',
    });
    expect(res.body.data.status).toBe('built');
  });
});

describe('installing with the selection checks', () => {
  it('installs at a vacant position and stores the outcome and the next inspection due date', async () => {
    const position = await buildAirPosition(server.ctx, equipment);
    const id = await stock();
    const res = await install(id, position.id, technician, { hourMeterHours: 1234.5 });
    expect(res.status).toBe(200);
    expect(res.body.data).toMatchObject({ status: 'installed', checkOutcome: 'pass', position: { id: position.id } });
    expect(res.body.data.nextInspectionDue).toMatch(/^\d{4}-\d{2}-\d{2}$/);
    expect(res.body.data.checkResults).toHaveLength(11);
    // Allowable = lowest of 2000 kPa working, 8000 ÷ 4 (RMA IP-2 air 4:1) = 2000 and the 2000 kPa fittings.
    expect(res.body.data.allowablePressureKpa).toBe(2000);
    const [row] = await server.ctx.ds.query(`SELECT hour_meter_hours FROM equipment WHERE id = $1`, [equipment.id]);
    expect(row.hour_meter_hours).toBe(1234.5);
  });

  it('refuses a second assembly at an occupied position', async () => {
    const position = await buildAirPosition(server.ctx, equipment);
    await install(await stock(), position.id).expect(200);
    const res = await install(await stock(), position.id);
    expect(res.status).toBe(409);
    expect(res.body.error.code).toBe('position_occupied');
  });

  it('blocks a failing check; a technician cannot override it; an engineer can, with a reason and a review date, and the override shows on the assembly', async () => {
    const position = await buildAirPosition(server.ctx, equipment, { routedBendRadiusMm: 100 });
    const id = await stock();
    const blocked = await install(id, position.id);
    expect(blocked.status).toBe(409);
    expect(blocked.body.error.code).toBe('checks_failed');
    expect(blocked.body.error.details.overridable).toBe(true);
    expect(blocked.body.error.details.results.find((r: { check: string }) => r.check === 'bend-radius').outcome).toBe('fail');
    const override = { checks: ['bend-radius'], reason: 'Temporary routing until the new guard is fitted next shutdown', reviewOn: '2026-09-30' };
    const byTechnician = await install(id, position.id, technician, { override });
    expect(byTechnician.status).toBe(409);
    expect(byTechnician.body.error.message).toMatch(/Only a reliability engineer or administrator/);
    const byEngineer = await install(id, position.id, engineer, { override });
    expect(byEngineer.status).toBe(200);
    expect(byEngineer.body.data.overridden).toBe(true);
    expect(byEngineer.body.data.checkOutcome).toBe('warn');
    expect(byEngineer.body.data.overrides).toEqual([expect.objectContaining({ checkCode: 'bend-radius', reason: override.reason, reviewOn: '2026-09-30' })]);
    expect((await events(id)).map((e) => e.kind)).toContain('override');
  });

  it('never overrides the allowable-pressure check', async () => {
    const position = await buildAirPosition(server.ctx, equipment, { maxOperatingPressureKpa: 2500 });
    const id = await stock();
    const res = await install(id, position.id, engineer, { override: { checks: ['allowable-pressure'], reason: 'We accept the pressure for now, honestly', reviewOn: '2026-09-30' } });
    expect(res.status).toBe(409);
    expect(res.body.error.details.overridable).toBe(false);
    expect(res.body.error.message).toMatch(/cannot be overridden/);
    const [row] = await server.ctx.ds.query(`SELECT status FROM assemblies WHERE id = $1`, [id]);
    expect(row.status).toBe('in_stock');
  });

  it('cannot install an assembly that was never proof-tested', async () => {
    const position = await buildAirPosition(server.ctx, equipment);
    const id = await stock(technician, { proofTest: false });
    const res = await install(id, position.id, engineer);
    expect(res.status).toBe(409);
    expect(res.body.error.code).toBe('wrong_status');
  });

  it('records an install at another site as a cross-site move', async () => {
    const other = await buildPlace(server.ctx);
    const position = await buildAirPosition(server.ctx, other.equipment);
    const admin = await signIn(server.app, (await buildUser(server.ctx, { role: 'administrator' })).email);
    const id = await stock(admin);
    const res = await install(id, position.id, admin);
    expect(res.status).toBe(200);
    expect(res.body.data.siteId).toBe(other.site.id);
    const install_ = (await call(server.app, 'get', `/api/assemblies/${id}/events`, admin)).body.data.find((e: { kind: string }) => e.kind === 'install');
    expect(install_.data).toMatchObject({ crossSite: true, fromSiteId: site.id, toSiteId: other.site.id });
    const [audit] = await server.ctx.ds.query(`SELECT action FROM audit_entries WHERE entity_id = $1 AND action LIKE 'assembly.installed%'`, [id]);
    expect(audit.action).toBe('assembly.installed_from_other_site');
  });
});

describe('replacing', () => {
  async function installedAt() {
    const position = await buildAirPosition(server.ctx, equipment);
    const oldId = await stock();
    await install(oldId, position.id).expect(200);
    return { position, oldId };
  }

  it('removes the old assembly with its reason and installs the new one in one step, with the cautions', async () => {
    const { position, oldId } = await installedAt();
    const newId = await stock();
    const res = await call(server.app, 'post', `/api/assemblies/${oldId}/replace`, technician).send({ newAssemblyId: newId, reason: 'failure', workOrder: 'WO-88120', idempotencyKey: key() });
    expect(res.status).toBe(200);
    expect(res.body.data).toMatchObject({ id: newId, status: 'installed', position: { id: position.id } });
    expect(res.body.cautions.join(' ')).toMatch(/bleed the line down/);
    expect(res.body.cautions.join(' ')).toMatch(/Never feel for a leak/);
    const removal = (await events(oldId)).find((e) => e.kind === 'remove')!;
    expect(removal.data).toMatchObject({ reason: 'failure', lifeOutcome: 'failure' });
    const history = (await call(server.app, 'get', `/api/positions/${position.id}/history`, technician)).body.data;
    expect(history.map((h: { assemblyId: string }) => h.assemblyId)).toEqual([newId, oldId]);
    expect(history[1]).toMatchObject({ removalReason: 'failure', lifeOutcome: 'failure', current: false });
  });

  it('stores a double-submitted replace once', async () => {
    const { position, oldId } = await installedAt();
    const newId = await stock();
    const body = { newAssemblyId: newId, reason: 'planned-replacement', idempotencyKey: key() };
    const [first, second] = await Promise.all([
      call(server.app, 'post', `/api/assemblies/${oldId}/replace`, technician).send(body),
      call(server.app, 'post', `/api/assemblies/${oldId}/replace`, technician).send(body),
    ]);
    expect([first.status, second.status]).toEqual([200, 200]);
    expect([first.headers['idempotent-replayed'], second.headers['idempotent-replayed']].filter(Boolean)).toEqual(['true']);
    const third = await call(server.app, 'post', `/api/assemblies/${oldId}/replace`, technician).send(body);
    expect(third.status).toBe(200);
    const [counts] = await server.ctx.ds.query(
      `SELECT count(*) FILTER (WHERE kind = 'remove')::int AS removes, count(*) FILTER (WHERE kind = 'install' AND assembly_id = $2)::int AS installs
         FROM assembly_events WHERE position_id = $1`,
      [position.id, newId],
    );
    expect(counts).toEqual({ removes: 1, installs: 1 });
  });

  it('lets one of two technicians replacing at the same moment win; the other gets a clear conflict', async () => {
    const { position, oldId } = await installedAt();
    const [a, b] = [await stock(), await stock()];
    const results = await Promise.all([
      call(server.app, 'post', `/api/assemblies/${oldId}/replace`, technician).send({ newAssemblyId: a, reason: 'failure', idempotencyKey: key() }),
      call(server.app, 'post', `/api/assemblies/${oldId}/replace`, secondTechnician).send({ newAssemblyId: b, reason: 'failure', idempotencyKey: key() }),
    ]);
    expect(results.map((r) => r.status).sort()).toEqual([200, 409]);
    const loser = results.find((r) => r.status === 409)!;
    expect(loser.body.error.code).toBe('wrong_status');
    expect(loser.body.error.message).toMatch(/reload/);
    const installed = await server.ctx.ds.query(`SELECT id FROM assemblies WHERE position_id = $1 AND status IN ('installed', 'tagged_out')`, [position.id]);
    expect(installed).toHaveLength(1);
  });

  it('refuses a key reused for a different request', async () => {
    const { oldId } = await installedAt();
    const k = key();
    await call(server.app, 'post', `/api/assemblies/${oldId}/tag-out`, technician).send({ note: 'Cover worn through at clamp', idempotencyKey: k }).expect(200);
    const res = await call(server.app, 'post', `/api/assemblies/${oldId}/tag-out`, technician).send({ note: 'Something else entirely', idempotencyKey: k });
    expect(res.status).toBe(409);
    expect(res.body.error.code).toBe('submission_key_reused');
  });
});

describe('removal, re-test and scrapping', () => {
  it('goes back into stock only after an inspection and a passed proof test since the removal', async () => {
    const position = await buildAirPosition(server.ctx, equipment);
    const id = await stock();
    await install(id, position.id, technician, { occurredAt: '2026-02-01T08:00:00Z' }).expect(200);
    const removed = await call(server.app, 'post', `/api/assemblies/${id}/remove`, technician).send({ reason: 'relocated', occurredAt: '2026-03-01T08:00:00Z' });
    expect(removed.status).toBe(200);
    expect(removed.body.cautions.length).toBeGreaterThan(2);
    const early = await call(server.app, 'post', `/api/assemblies/${id}/return-to-stock`, technician).send({ inspectionNote: 'Cover and fittings sound' });
    expect(early.status).toBe(409);
    expect(early.body.error.code).toBe('retest_required');
    await call(server.app, 'post', `/api/assemblies/${id}/proof-tests`, technician)
      .send({ testedOn: '2026-03-02', medium: 'water', heldPressure: { value: 40, unit: 'bar' }, holdSeconds: 60, result: 'pass', tester: 'Hose shop' })
      .expect(200);
    const back = await call(server.app, 'post', `/api/assemblies/${id}/return-to-stock`, technician).send({ inspectionNote: 'Cover and fittings sound', storeLocation: 'Rack B4' });
    expect(back.status).toBe(200);
    expect(back.body.data.status).toBe('in_stock');
    expect((await events(id)).find((e) => e.kind === 'remove')!.data).toMatchObject({ reason: 'relocated', lifeOutcome: 'suspension' });
  });

  it('scraps a removed assembly and then refuses to install it', async () => {
    const position = await buildAirPosition(server.ctx, equipment);
    const id = await stock();
    await install(id, position.id).expect(200);
    await call(server.app, 'post', `/api/assemblies/${id}/remove`, technician).send({ reason: 'damaged' }).expect(200);
    await call(server.app, 'post', `/api/assemblies/${id}/scrap`, technician).send({ note: 'Reinforcement exposed' }).expect(200);
    const res = await install(id, (await buildAirPosition(server.ctx, equipment)).id);
    expect(res.status).toBe(409);
  });
});

describe('records that cannot be lost', () => {
  it('refuses an update or delete of an event at the database', async () => {
    const id = await stock();
    await expect(server.ctx.ds.query(`UPDATE assembly_events SET note = 'edited' WHERE assembly_id = $1`, [id])).rejects.toThrow(/append_only/);
    await expect(server.ctx.ds.query(`DELETE FROM assembly_events WHERE assembly_id = $1`, [id])).rejects.toThrow(/append_only/);
    await expect(server.ctx.ds.query(`DELETE FROM check_overrides`)).rejects.toThrow(/append_only/);
  });

  it('voids a proof test with a reason, keeps it, and puts back the earlier test', async () => {
    const id = await stock();
    const retest = await call(server.app, 'post', `/api/assemblies/${id}/proof-tests`, technician).send({
      testedOn: '2026-01-12', medium: 'water', heldPressure: { value: 41, unit: 'bar' }, holdSeconds: 60, result: 'pass', tester: 'Wrong rig',
    });
    const eventId = retest.body.data.proofTest.eventId;
    const byTechnician = await call(server.app, 'post', `/api/events/${eventId}/void`, technician).send({ reason: 'Recorded against the wrong assembly' });
    expect(byTechnician.status).toBe(403);
    const res = await call(server.app, 'post', `/api/events/${eventId}/void`, engineer).send({ reason: 'Recorded against the wrong assembly' });
    expect(res.status).toBe(200);
    expect(res.body.data.proofTest.tester).toBe('Hose shop');
    const list = (await call(server.app, 'get', `/api/assemblies/${id}/events`, technician)).body.data;
    expect(list.find((e: { id: string }) => e.id === eventId).voidedBy.reason).toBe('Recorded against the wrong assembly');
    const again = await call(server.app, 'post', `/api/events/${eventId}/void`, engineer).send({ reason: 'Recorded against the wrong assembly' });
    expect(again.status).toBe(409);
  });

  it('does not void a move', async () => {
    const position = await buildAirPosition(server.ctx, equipment);
    const id = await stock();
    await install(id, position.id).expect(200);
    const installEvent = (await call(server.app, 'get', `/api/assemblies/${id}/events`, technician)).body.data.find((e: { kind: string }) => e.kind === 'install');
    const res = await call(server.app, 'post', `/api/events/${installEvent.id}/void`, engineer).send({ reason: 'Trying to undo an install' });
    expect(res.status).toBe(409);
    expect(res.body.error.code).toBe('not_voidable');
  });
});

describe('the register list', () => {
  it('filters, sorts and pages in SQL, finds a typed tag code, and hides other sites', async () => {
    const position = await buildAirPosition(server.ctx, equipment, { routedBendRadiusMm: 100 });
    const id = await stock();
    await install(id, position.id, engineer, { override: { checks: ['bend-radius'], reason: 'Temporary routing until the new guard is fitted', reviewOn: '2026-09-30' } }).expect(200);
    const number = (await call(server.app, 'get', `/api/assemblies/${id}`, technician)).body.data.number as string;
    const typed = `${number.slice(0, 3)}-${number.slice(3)}`.toLowerCase();
    const found = await call(server.app, 'get', '/api/assemblies', technician).query({ q: typed });
    expect(found.body.data.map((a: { id: string }) => a.id)).toEqual([id]);
    const filtered = await call(server.app, 'get', '/api/assemblies', technician).query({ status: 'installed', checkOutcome: 'warn', sort: 'position', dir: 'desc', pageSize: 2 });
    expect(filtered.status).toBe(200);
    expect(filtered.body.pagination.total).toBeGreaterThanOrEqual(1);
    expect(filtered.body.data.every((a: { status: string; checkOutcome: string }) => a.status === 'installed' && a.checkOutcome === 'warn')).toBe(true);
    const outsider = await signIn(server.app, (await buildUser(server.ctx, { role: 'viewer', allSites: false, siteIds: [(await buildPlace(server.ctx)).site.id] })).email);
    expect((await call(server.app, 'get', '/api/assemblies', outsider).query({ q: typed })).body.data).toEqual([]);
    expect((await call(server.app, 'get', `/api/assemblies/${id}`, outsider)).status).toBe(404);
  });

  it('changing the position’s design conditions recomputes the stored outcome', async () => {
    const position = await buildAirPosition(server.ctx, equipment);
    const id = await stock();
    await install(id, position.id).expect(200);
    const { recomputeStoredOutcomes } = await import('../../backend/src/services/assembly-checks.service.js');
    await server.ctx.ds.transaction(async (m) => {
      await m.getRepository(Position).update({ id: position.id }, { maxOperatingPressureKpa: 2600 });
      await recomputeStoredOutcomes(m, { positionIds: [position.id] }, new Date());
    });
    const [row] = await server.ctx.ds.query(`SELECT check_outcome FROM assemblies WHERE id = $1`, [id]);
    expect(row.check_outcome).toBe('fail');
  });
});

describe('how removals count in life data', () => {
  it('lets the plant count a removal reason differently, and records each removal with the outcome in force', async () => {
    const defaults = (await call(server.app, 'get', '/api/removal-outcomes', technician)).body.data;
    expect(defaults.find((r: { reason: string }) => r.reason === 'worn-at-inspection')).toMatchObject({ lifeOutcome: 'failure', defaultLifeOutcome: 'failure' });
    const outcomes = Object.fromEntries(defaults.map((r: { reason: string; lifeOutcome: string }) => [r.reason, r.lifeOutcome]));
    const bad = await call(server.app, 'put', '/api/removal-outcomes', engineer).send({ outcomes: { ...outcomes, relocated: 'maybe' } });
    expect(bad.status).toBe(400);
    expect(bad.body.error.field).toBe('outcomes.relocated');
    await call(server.app, 'put', '/api/removal-outcomes', engineer).send({ outcomes: { ...outcomes, relocated: 'failure' } }).expect(200);
    try {
      const position = await buildAirPosition(server.ctx, equipment);
      const id = await stock();
      await install(id, position.id).expect(200);
      await call(server.app, 'post', `/api/assemblies/${id}/remove`, technician).send({ reason: 'relocated' }).expect(200);
      expect((await events(id)).find((e) => e.kind === 'remove')!.data).toMatchObject({ reason: 'relocated', lifeOutcome: 'failure' });
    } finally {
      await call(server.app, 'put', '/api/removal-outcomes', engineer).send({ outcomes }).expect(200);
    }
  });
});

describe('inspection due filters', () => {
  it('keeps overdue assemblies apart from those due within the coming days', async () => {
    const today = new Date().toISOString().slice(0, 10);
    const day = (offset: number) => new Date(Date.parse(`${today}T00:00:00Z`) + offset * 86_400_000).toISOString().slice(0, 10);
    const ids: Record<string, string> = {};
    for (const [name, offset] of [['overdue', -3], ['soon', 3], ['later', 20]] as const) {
      const position = await buildAirPosition(server.ctx, equipment);
      const id = await stock();
      await install(id, position.id).expect(200);
      await server.ctx.ds.query(`UPDATE assemblies SET next_inspection_due = $2 WHERE id = $1`, [id, day(offset)]);
      ids[name] = id;
    }
    const found = async (due: string) =>
      new Set(((await call(server.app, 'get', '/api/assemblies', technician).query({ due, pageSize: 200 })).body.data as Array<{ id: string }>).map((a) => a.id));
    const overdue = await found('overdue');
    const week = await found('within-7-days');
    const month = await found('within-30-days');
    expect([overdue.has(ids.overdue!), overdue.has(ids.soon!), overdue.has(ids.later!)]).toEqual([true, false, false]);
    expect([week.has(ids.overdue!), week.has(ids.soon!), week.has(ids.later!)]).toEqual([false, true, false]);
    expect([month.has(ids.overdue!), month.has(ids.soon!), month.has(ids.later!)]).toEqual([false, true, true]);
  });
});

describe('check sentences', () => {
  it('speak in the reader’s own units', async () => {
    const position = await buildAirPosition(server.ctx, equipment);
    const id = await stock();
    await install(id, position.id).expect(200);
    const reader = await buildUser(server.ctx, { role: 'viewer', allSites: false, siteIds: [site.id], preferences: { pressureUnit: 'psi', lengthUnit: 'in', temperatureUnit: 'F' } });
    const cookie = await signIn(server.app, reader.email);
    const results = (await call(server.app, 'get', `/api/assemblies/${id}`, cookie)).body.data.checkResults as Array<{ check: string; sentence: string }>;
    const pressure = results.find((r) => r.check === 'allowable-pressure')!.sentence;
    // 2000 kPa = 290 psi (NIST SP 811: 1 psi = 6.894757 kPa); 700 kPa = 102 psi.
    expect(pressure).toMatch(/290 psi/);
    expect(pressure).not.toMatch(/bar/);
    expect(results.find((r) => r.check === 'temperature-range')!.sentence).toMatch(/°F/);
  });
});
