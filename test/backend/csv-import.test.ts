import { readFileSync } from 'node:fs';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { IMPORT_KINDS, IMPORT_LIMITS, type ImportJobDto } from '../../shared/src/schemas/csv.schema.js';
import { formatTagCode, tagCodeForSerial } from '../../shared/src/tags/tag-code.js';
import { KPA_PER_PSI } from '../../shared/src/units/units.js';
import { Assembly, AssemblyEvent, Construction, Position, type Site } from '../../backend/src/entities/index.js';
import { settleImportWork } from '../../backend/src/services/csv-import.service.js';
import { call, startTestServer, type TestServer } from '../support/api.js';
import { buildSite, buildUser, signIn } from '../support/factories.js';
import { buildConstruction, buildEquipment, buildFittingType, buildInstalledAssembly, buildPosition } from '../support/register-factories.js';

let server: TestServer;
let siteA: Site;
let siteB: Site;
let engineer: string;
let admin: string;
let limited: string;
beforeAll(async () => {
  server = await startTestServer();
  siteA = await buildSite(server.ctx, { name: 'Hollin Bank Quarry' });
  siteB = await buildSite(server.ctx);
  engineer = await signIn(server.app, (await buildUser(server.ctx, { role: 'reliability_engineer' })).email);
  admin = await signIn(server.app, (await buildUser(server.ctx, { role: 'administrator' })).email);
  limited = await signIn(server.app, (await buildUser(server.ctx, { role: 'reliability_engineer', allSites: false, siteIds: [siteA.id] })).email);
});
afterAll(async () => {
  await settleImportWork();
  await server.close();
});

let sequence = 0;
const code = (prefix: string) => `${prefix}-${Date.now().toString(36)}${(++sequence).toString(36)}`.toUpperCase();

function upload(cookie: string, fields: Record<string, string>, content: string | Buffer, name = 'import.csv') {
  let req = call(server.app, 'post', '/api/imports', cookie);
  for (const [key, value] of Object.entries(fields)) req = req.field(key, value);
  return req.attach('file', Buffer.isBuffer(content) ? content : Buffer.from(content, 'utf8'), name);
}

/** Polls the job as the import page does until it stops checking or writing. */
async function waitForJob(cookie: string, id: string, timeoutMs = 15_000): Promise<ImportJobDto> {
  const started = Date.now();
  for (;;) {
    const res = await call(server.app, 'get', `/api/imports/${id}`, cookie);
    expect(res.status, JSON.stringify(res.body)).toBe(200);
    const job = res.body.data as ImportJobDto;
    if (job.status !== 'checking' && job.status !== 'writing') return job;
    if (Date.now() - started > timeoutMs) throw new Error(`Import ${id} still ${job.status} after ${timeoutMs} ms`);
    await new Promise((r) => setTimeout(r, 50));
  }
}

/** Uploads a file and waits for its check. */
async function check(cookie: string, fields: Record<string, string>, content: string | Buffer): Promise<ImportJobDto> {
  const res = await upload(cookie, fields, content);
  expect(res.status, JSON.stringify(res.body)).toBe(202);
  expect(res.body.data.status).toBe('checking');
  return waitForJob(cookie, res.body.data.id);
}

/** Asks for the write and waits for it to finish. */
async function write(cookie: string, job: ImportJobDto): Promise<ImportJobDto> {
  const res = await call(server.app, 'post', `/api/imports/${job.id}/write`, cookie);
  expect(res.status, JSON.stringify(res.body)).toBe(202);
  expect(res.body.data.status).toBe('writing');
  return waitForJob(cookie, job.id);
}

const problemAt = (job: ImportJobDto, row: number, column: string | null) => job.problems.find((p) => p.row === row && p.column === column);
const constructionsWithCodes = (codes: string[]) => server.ctx.ds.getRepository(Construction).findBy(codes.map((c) => ({ code: c })));

describe('checking an import', () => {
  it('reports both bad rows by row and column, and writes nothing', async () => {
    const codes = [code('AIR'), code('AIR'), code('WAT'), code('WAT')];
    const file = [
      'code,name,size,working_pressure_bar,burst_pressure_bar',
      `${codes[0]},Air hose 19,19 mm,20,80`,
      `${codes[1]},Air hose 25,1 in,twenty,80`,
      `${codes[2]},Water hose 51,2 in,10,40`,
      `${codes[3]},Water hose odd,7/8 in,10,40`,
    ].join('\n');
    const job = await check(engineer, { kind: 'constructions' }, file);
    expect(job).toMatchObject({ status: 'checked', totalRows: 4, processedRows: 4, errorCount: 2, moreProblems: 0, abilities: { write: false } });
    expect(problemAt(job, 2, 'working_pressure_bar')?.message).toMatch(/"twenty" is not a number/);
    expect(problemAt(job, 4, 'size')?.message).toMatch(/"7\/8 in" is not a known nominal size/);

    const refused = await call(server.app, 'post', `/api/imports/${job.id}/write`, engineer);
    expect(refused.status).toBe(409);
    expect(refused.body.error.code).toBe('import_has_problems');
    expect(await constructionsWithCodes(codes)).toHaveLength(0);
  });

  it('writes the corrected file in full, converted to stored units, and the rows are there', async () => {
    const codes = [code('AIR'), code('AIR')];
    const file = ['code,name,size,tube_compound,reinforcement,working_pressure_psi,min_bend_radius [in]', `${codes[0]},Air hose 19,3/4 in,nbr,textile,300,6`, `${codes[1]},Air hose 25,-16,NBR,Textile helical wire,250,8`].join('\r\n');
    const checked = await check(engineer, { kind: 'constructions' }, file);
    expect(checked).toMatchObject({ status: 'checked', errorCount: 0, abilities: { write: true } });
    expect(checked.preview.map((p) => p.values.code)).toEqual(codes);

    const done = await write(engineer, checked);
    expect(done).toMatchObject({ status: 'done', writtenRows: 2, processedRows: 2, errorCount: 0 });
    expect(done.finishedAt).not.toBeNull();
    const [first, second] = (await constructionsWithCodes(codes)).sort((a, b) => a.code.localeCompare(b.code));
    expect(first).toMatchObject({ sizeCode: 'bore-19', tubeCompound: 'NBR', reinforcement: 'textile' });
    expect(first!.workingPressureKpa).toBeCloseTo(300 * KPA_PER_PSI, 9);
    expect(first!.minBendRadiusMm).toBeCloseTo(6 * 25.4, 9);
    expect(second).toMatchObject({ sizeCode: 'bore-25', reinforcement: 'textile-helical-wire' });
    const audits = await server.ctx.ds.query(`SELECT action FROM audit_entries WHERE entity_id = ANY($1::uuid[])`, [[first!.id, second!.id]]);
    expect(audits.map((a: { action: string }) => a.action)).toEqual(['construction.imported', 'construction.imported']);

    const again = await call(server.app, 'post', `/api/imports/${checked.id}/write`, engineer);
    expect(again.status).toBe(409);
  });

  it('reports a code already in the register, and one given twice, without overwriting anything', async () => {
    const existing = await buildConstruction(server.ctx, { name: 'Original name' });
    const twice = code('DUP');
    const file = ['code,name,size', `${existing.code},New name,19`, `${twice},First,25`, `${twice.toLowerCase()},Second,25`].join('\n');
    const job = await check(engineer, { kind: 'constructions' }, file);
    expect(job.errorCount).toBe(2);
    expect(problemAt(job, 1, 'code')?.message).toMatch(/already in the catalogue/);
    expect(problemAt(job, 3, 'code')?.message).toMatch(/also in row 2/);
    expect((await server.ctx.ds.getRepository(Construction).findOneByOrFail({ id: existing.id })).name).toBe('Original name');
  });

  it('reads a byte-order mark, semicolons and decimal commas', async () => {
    const c = code('SEMI');
    const file = `\uFEFFcode;name;size;working_pressure_bar;burst_pressure_bar;max_temp_c\n${c};"Water hose; discharge";2";10,5;42;70,5\n`;
    const job = await check(engineer, { kind: 'constructions' }, file);
    expect(job.problems).toEqual([]);
    await write(engineer, job);
    const [saved] = await constructionsWithCodes([c]);
    expect(saved).toMatchObject({ name: 'Water hose; discharge', sizeCode: 'bore-51', workingPressureKpa: 1050, burstPressureKpa: 4200, maxTempC: 70.5 });
  });

  it('takes each row’s unit from a unit column and a unit written in the header', async () => {
    const codes = [code('U'), code('U'), code('U')];
    const file = [
      'code,name,size,working_pressure,working_pressure_unit,burst_pressure [psi],min_temp,min_temp_unit',
      `${codes[0]},A,19,20,bar,1200,-40,F`,
      `${codes[1]},B,19,300,PSI,1200,-40,°C`,
      `${codes[2]},C,19,2,MPa,1200,5,degC`,
    ].join('\n');
    const job = await check(engineer, { kind: 'constructions' }, file);
    expect(job.problems).toEqual([]);
    await write(engineer, job);
    const saved = new Map((await constructionsWithCodes(codes)).map((c) => [c.code, c]));
    expect(saved.get(codes[0]!)!.workingPressureKpa).toBe(2000);
    expect(saved.get(codes[1]!)!.workingPressureKpa).toBeCloseTo(300 * KPA_PER_PSI, 9);
    expect(saved.get(codes[2]!)!.workingPressureKpa).toBe(2000);
    expect(saved.get(codes[0]!)!.burstPressureKpa).toBeCloseTo(1200 * KPA_PER_PSI, 9);
    expect(saved.get(codes[0]!)!.minTempC).toBeCloseTo(-40, 9);
    expect(saved.get(codes[2]!)!.minTempC).toBe(5);
  });

  it('names a quantity without a unit, an unknown unit, an unknown column and a missing required column', async () => {
    const file = ['code,name,working_pressure,burst_pressure,burst_pressure_unit,colour', `${code('X')},A,20,80,furlongs,blue`].join('\n');
    const job = await check(engineer, { kind: 'constructions' }, file);
    expect(problemAt(job, 0, 'working_pressure')?.message).toMatch(/has no unit/);
    expect(problemAt(job, 0, 'colour')?.message).toMatch(/Unknown column "colour"/);
    expect(problemAt(job, 0, 'size')?.message).toMatch(/required column size is missing/);
    expect(problemAt(job, 1, 'burst_pressure_unit')?.message).toMatch(/Unknown unit "furlongs"/);
    expect(job.abilities.write).toBe(false);
  });

  it('keeps at most the first thousand problems and says how many more there are', async () => {
    const rows = Array.from({ length: 1200 }, (_, i) => `${code('M')}${i},Hose,19,abc`);
    const job = await check(engineer, { kind: 'constructions' }, ['code,name,size,working_pressure_bar', ...rows].join('\n'));
    expect(job.errorCount).toBe(1200);
    expect(job.problems).toHaveLength(IMPORT_LIMITS.maxStoredProblems);
    expect(job.moreProblems).toBe(200);
    expect(job.problems[0]!.row).toBe(1);
  });

  it('refuses a file over the size limit, with a 400 on the file field', async () => {
    const big = Buffer.alloc(IMPORT_LIMITS.maxBytes + 1024, 'a');
    const res = await upload(engineer, { kind: 'constructions' }, big);
    expect(res.status).toBe(400);
    expect(res.body.error).toMatchObject({ code: 'file_too_large', field: 'file' });
  });

  it('refuses a file of more than 100,000 rows before checking it', async () => {
    const file = `code,name,size\n${'A,B,19\n'.repeat(IMPORT_LIMITS.maxRows + 1)}`;
    const res = await upload(engineer, { kind: 'constructions' }, file);
    expect(res.status).toBe(400);
    expect(res.body.error).toMatchObject({ code: 'too_many_rows', field: 'file' });
    expect(res.body.error.message).toMatch(/100,001 rows/);
  });

  it('refuses text that is not UTF-8, a workbook, a missing file and a missing site', async () => {
    const latin1 = await upload(engineer, { kind: 'constructions' }, Buffer.from([0x63, 0x6f, 0x64, 0x65, 0x0a, 0xe9, 0x0a]));
    expect(latin1.body.error).toMatchObject({ code: 'not_utf8', field: 'file' });
    const workbook = await upload(engineer, { kind: 'constructions' }, Buffer.from([0x50, 0x4b, 0x03, 0x04, 0x14, 0x00]));
    expect(workbook.body.error).toMatchObject({ code: 'not_csv', field: 'file' });
    const none = await call(server.app, 'post', '/api/imports', engineer).field('kind', 'constructions');
    expect(none.body.error).toMatchObject({ code: 'file_required', field: 'file' });
    const noSite = await upload(engineer, { kind: 'positions' }, 'code\n');
    expect(noSite.status).toBe(400);
    expect(noSite.body.error.field).toBe('siteId');
  });

  it('answers 404 for a site or a job outside my sites', async () => {
    const res = await upload(limited, { kind: 'positions', siteId: siteB.id }, 'code,name,equipment,service,size\n');
    expect(res.status).toBe(404);
    const job = await check(engineer, { kind: 'positions', siteId: siteB.id }, 'code,name,equipment,service,size\n');
    expect((await call(server.app, 'get', `/api/imports/${job.id}`, limited)).status).toBe(404);
    expect((await call(server.app, 'post', `/api/imports/${job.id}/write`, limited)).status).toBe(404);
  });

  it('lists my recent imports, newest first', async () => {
    const me = await signIn(server.app, (await buildUser(server.ctx, { role: 'reliability_engineer' })).email);
    const first = await check(me, { kind: 'constructions' }, 'code,name,size\n');
    const second = await check(me, { kind: 'constructions' }, `code,name,size\n${code('L')},Hose,19\n`);
    const res = await call(server.app, 'get', '/api/imports', me);
    expect(res.status).toBe(200);
    expect(res.body.data.map((j: { id: string }) => j.id)).toEqual([second.id, first.id]);
    expect(res.body.data[0]).not.toHaveProperty('problems');
    expect(first.problems[0]?.message).toMatch(/no rows/);
  });

  it('gives a header-only template for each kind that its own check reads without a header problem', async () => {
    for (const kind of IMPORT_KINDS) {
      const res = await call(server.app, 'get', `/api/imports/templates/${kind}`, engineer);
      expect(res.status).toBe(200);
      expect(res.headers['content-type']).toMatch(/^text\/csv/);
      expect(res.headers['content-disposition']).toBe(`attachment; filename="ferrule-${kind}-template.csv"`);
      const job = await check(engineer, { kind, siteId: siteA.id }, res.text);
      expect(job.problems.map((p) => p.message)).toEqual(['The file has a header but no rows under it.']);
    }
    expect((await call(server.app, 'get', '/api/imports/templates/hoses', engineer)).status).toBe(400);
  });
});

describe('importing positions', () => {
  it('adds positions on existing equipment and names unknown equipment, services and taken codes', async () => {
    const equipment = await buildEquipment(server.ctx, { siteId: siteA.id });
    const taken = await buildPosition(server.ctx, { equipmentId: equipment.id });
    const [good, other] = [code('P'), code('P')];
    const file = [
      'code,name,equipment,service,medium,max_operating_pressure,max_operating_pressure_unit,size,routed_bend_radius_mm,criticality',
      `${good},Main air supply,${equipment.assetNumber},Compressed air,compressed-air-oil-mist,7,bar,19 mm,250,high`,
      `${other},Discharge,NO-SUCH-RIG,water-discharge,water,100,psi,-32,400,`,
      `${taken.code},Again,${equipment.assetNumber},steam-ish,,8,bar,19,,`,
    ].join('\n');
    const job = await check(engineer, { kind: 'positions', siteId: siteA.id }, file);
    expect(problemAt(job, 2, 'equipment')?.message).toMatch(/No equipment with asset number NO-SUCH-RIG at Hollin Bank Quarry/);
    expect(problemAt(job, 3, 'code')?.message).toMatch(/already exists/);
    expect(problemAt(job, 3, 'service')?.message).toMatch(/not a known service/);
    expect(job.errorCount).toBe(3);

    const fixed = await check(engineer, { kind: 'positions', siteId: siteA.id }, file.split('\n').slice(0, 2).join('\n'));
    expect(fixed.errorCount).toBe(0);
    const done = await write(engineer, fixed);
    expect(done.writtenRows).toBe(1);
    const position = await server.ctx.ds.getRepository(Position).findOneByOrFail({ siteId: siteA.id, code: good });
    expect(position).toMatchObject({ equipmentId: equipment.id, serviceCode: 'compressed-air', maxOperatingPressureKpa: 700, sizeCode: 'bore-19', routedBendRadiusMm: 250, criticality: 'high' });
  });
});

describe('importing assemblies', () => {
  it('puts historical assemblies in place with estimated, dated install events, and keeps stock in stock', async () => {
    const construction = await buildConstruction(server.ctx);
    const fitting = await buildFittingType(server.ctx);
    const position = await buildPosition(server.ctx, { siteId: siteA.id });
    const [{ last }] = await server.ctx.ds.query(`SELECT last_value::int AS last FROM assembly_serial_seq`);
    const tag = tagCodeForSerial(last + 1000);
    const file = [
      'tag_code,construction,position,overall_length_m,end_a_fitting,end_b_fitting,built_on,built_on_estimated,installed_on,installed_on_estimated,predates_records,proof_test_on,proof_test_pressure_bar,proof_test_result',
      `${formatTagCode(tag).toLowerCase()},${construction.code},${position.code},3,${fitting.code},${fitting.code},2018-05-01,yes,2018-06-01,yes,yes,2018-05-02,40,pass`,
      `,${construction.code},,5,${fitting.code},,2026-01-10,no,,,,2026-01-11,40,pass`,
      `,${construction.code},,5,,,2026-01-10,,,,,,,`,
    ].join('\n');
    const checked = await check(engineer, { kind: 'assemblies', siteId: siteA.id }, file);
    expect(checked.problems).toEqual([]);
    expect(checked.preview.map((p) => p.values.status)).toEqual(['installed', 'in_stock', 'built']);
    expect(checked.preview[0]!.values.tag_code).toBe(formatTagCode(tag));
    const done = await write(engineer, checked);
    expect(done).toMatchObject({ status: 'done', writtenRows: 3 });

    const installed = await server.ctx.ds.getRepository(Assembly).findOneByOrFail({ number: tag });
    expect(installed).toMatchObject({ status: 'installed', positionId: position.id, siteId: siteA.id, installedAtEstimated: true, predatesRecords: true, builtOn: '2018-05-01', builtOnEstimated: true, overallLengthMm: 3000 });
    expect(installed.installedAt?.toISOString()).toBe('2018-06-01T12:00:00.000Z');
    expect(installed.checkOutcome).not.toBeNull();
    expect(installed.checkResults?.length).toBeGreaterThan(0);
    expect(installed.nextInspectionDue).not.toBeNull();
    expect(installed.proofTest).toMatchObject({ testedOn: '2018-05-02', heldPressureKpa: 4000, requiredPressureKpa: 4000, result: 'pass', medium: 'water' });
    const events = await server.ctx.ds.getRepository(AssemblyEvent).find({ where: { assemblyId: installed.id }, order: { occurredAt: 'ASC' } });
    expect(events.map((e) => e.kind)).toEqual(['build', 'proof_test', 'install']);
    expect(events[2]).toMatchObject({ positionId: position.id, occurredAtEstimated: true });
    expect(events[2]!.occurredAt.toISOString()).toBe('2018-06-01T12:00:00.000Z');
    expect(installed.proofTest?.eventId).toBe(events[1]!.id);

    const [{ after }] = await server.ctx.ds.query(`SELECT last_value::int AS after FROM assembly_serial_seq`);
    expect(after).toBeGreaterThanOrEqual(last + 1000);
    const others = await server.ctx.ds.query(`SELECT status FROM assemblies WHERE id IN (SELECT entity_id FROM audit_entries WHERE action = 'assembly.imported' AND after->>'importJobId' = $1) ORDER BY status`, [checked.id]);
    expect(others.map((o: { status: string }) => o.status)).toEqual(['built', 'in_stock', 'installed']);

    const history = await call(server.app, 'get', `/api/positions/${position.id}/history`, engineer);
    expect(history.body.data[0]).toMatchObject({ assemblyNumber: tag, installedAtEstimated: true, current: true });
  });

  it('names unknown codes, an occupied position, a position twice and a tag already in use', async () => {
    const construction = await buildConstruction(server.ctx);
    const { assembly, position: occupied } = await buildInstalledAssembly(server.ctx, { siteId: siteA.id });
    const free = await buildPosition(server.ctx, { siteId: siteA.id });
    const file = [
      'tag_code,construction,position,overall_length_mm,end_a_fitting,built_on,installed_on',
      `,NO-SUCH-HOSE,,3000,,2026-01-10,`,
      `,${construction.code},${occupied.code},3000,,2026-01-10,2026-02-01`,
      `,${construction.code},${free.code},3000,NO-SUCH-FIT,2026-01-10,2026-02-01`,
      `,${construction.code},${free.code},3000,,2026-01-10,2026-02-01`,
      `${assembly.number},${construction.code},,3000,,2026-01-10,`,
      `ABC-DEF-G,${construction.code},NOWHERE,3000,,2026-01-10,`,
      `,${construction.code},,3000,,2099-01-10,`,
    ].join('\n');
    const job = await check(engineer, { kind: 'assemblies', siteId: siteA.id }, file);
    expect(problemAt(job, 1, 'construction')?.message).toMatch(/No construction with the code NO-SUCH-HOSE/);
    expect(problemAt(job, 2, 'position')?.message).toMatch(/already holds assembly/);
    expect(problemAt(job, 3, 'end_a_fitting')?.message).toMatch(/No fitting type with the code NO-SUCH-FIT/);
    expect(problemAt(job, 4, 'position')?.message).toMatch(/also given in row 3/);
    expect(problemAt(job, 5, 'tag_code')?.message).toMatch(/already on an assembly/);
    expect(problemAt(job, 6, 'tag_code')?.message).toMatch(/not a Ferrule tag code/);
    expect(problemAt(job, 6, 'position')?.message).toMatch(/No position NOWHERE/);
    expect(problemAt(job, 6, 'installed_on')?.message).toMatch(/required when a position is given/);
    expect(problemAt(job, 7, 'built_on')?.message).toMatch(/in the future/);
  });

  it('writes nothing when the register changed between the check and the write', async () => {
    const c = code('RACE');
    const job = await check(engineer, { kind: 'constructions' }, `code,name,size\n${code('OK')},Fine,19\n${c},Raced,19\n`);
    expect(job.errorCount).toBe(0);
    await buildConstruction(server.ctx, { code: c });
    const failed = await write(engineer, job);
    expect(failed).toMatchObject({ status: 'failed', writtenRows: 0, errorCount: 1 });
    expect(failed.message).toMatch(/Nothing was written/);
    expect(problemAt(failed, 2, 'code')?.message).toMatch(/already in the catalogue/);
    expect(await constructionsWithCodes([job.preview[0]!.values.code as string])).toHaveLength(0);
  });

  it('checks and writes a few thousand rows with progress kept on the job', async () => {
    const construction = await buildConstruction(server.ctx);
    const rows = Array.from({ length: 2500 }, (_, i) => `${construction.code},${3000 + i},2026-01-10`);
    const checked = await check(admin, { kind: 'assemblies', siteId: siteB.id }, ['construction,overall_length_mm,built_on', ...rows].join('\n'));
    expect(checked).toMatchObject({ status: 'checked', totalRows: 2500, processedRows: 2500, errorCount: 0 });
    expect(checked.preview).toHaveLength(IMPORT_LIMITS.previewRows);
    const done = await write(admin, checked);
    expect(done).toMatchObject({ status: 'done', writtenRows: 2500, processedRows: 2500 });
    const [{ n }] = await server.ctx.ds.query(`SELECT count(*)::int AS n FROM assemblies WHERE construction_id = $1`, [construction.id]);
    expect(n).toBe(2500);
  });
});

describe('the import guide', () => {
  it('has example files that import cleanly, in order', async () => {
    const guide = readFileSync(new URL('../../docs/csv-import.md', import.meta.url), 'utf8');
    const examples = [...guide.matchAll(/```csv\n([\s\S]*?)```/g)].map((m) => m[1]!);
    expect(examples).toHaveLength(3);
    // The guide's codes, made unique to this run.
    const suffix = `-${Date.now().toString(36)}`.toUpperCase();
    const codes = ['AIR-19-NBR', 'WTR-51-EPDM', 'DR3-MAIN-AIR', 'PU2-DISCHARGE', 'DR-03', 'PU-02', 'CLAW-19'];
    const fresh = (text: string) => codes.reduce((t, c) => t.replaceAll(c, `${c}${suffix}`), text);
    const site = await buildSite(server.ctx);
    const rig = await buildEquipment(server.ctx, { siteId: site.id, assetNumber: `DR-03${suffix}` });
    await buildEquipment(server.ctx, { areaId: rig.areaId, assetNumber: `PU-02${suffix}` });
    await buildFittingType(server.ctx, { code: `CLAW-19${suffix}`, style: 'claw' });
    for (const [kind, example] of [['constructions', examples[0]!], ['positions', examples[1]!], ['assemblies', examples[2]!]] as const) {
      const job = await check(engineer, { kind, siteId: site.id }, fresh(example));
      expect(job.problems, kind).toEqual([]);
      expect((await write(engineer, job)).status, kind).toBe('done');
    }
    const installed = await server.ctx.ds.getRepository(Assembly).findBy({ siteId: site.id, status: 'installed' });
    expect(installed).toHaveLength(2);
    expect(installed.every((a) => a.predatesRecords && a.installedAtEstimated)).toBe(true);
    const position = await server.ctx.ds.getRepository(Position).findOneByOrFail({ siteId: site.id, code: `PU2-DISCHARGE${suffix}` });
    expect(position.maxOperatingPressureKpa).toBeCloseTo(150 * KPA_PER_PSI, 9);
    expect(position.requiredLengthMm).toBe(10500);
  });
});
