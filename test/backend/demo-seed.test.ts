import { createHash } from 'node:crypto';
import { readFileSync } from 'node:fs';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { SERVICE_CODES } from '../../shared/src/services/service-catalogue.js';
import { DEMO_COMPANY, DEMO_FAMILY_NAMES, DEMO_GIVEN_NAMES, DEMO_SEED, DEMO_SIGN_INS, DEMO_SITES, seedDemo } from '../../backend/src/seed/demo-scenario.js';
import { LIFE_MODELS } from '../../backend/src/seed/register-life.js';
import { OVERRIDDEN_POSITION, planRegister, PRESSURE_RAISED_POSITION, RECORDS_BEGAN_DAYS, type RegisterPlan } from '../../backend/src/seed/register-plan.js';
import { startTestServer, type TestServer } from '../support/api.js';

const ANCHOR = new Date('2026-06-15T12:00:00Z');
const SITE_CODES = DEMO_SITES.map((s) => s.code);
const DAY_MS = 86_400_000;
/** The first day of records: three years before the anchor's day. */
const RECORDS_BEGAN = new Date(Date.UTC(2026, 5, 15) - RECORDS_BEGAN_DAYS * DAY_MS);
const FAILURE_REASONS = ['failure', 'damaged', 'worn-at-inspection'];

/**
 * Words of well-known hose, coupling, compound, mining, quarrying and plant brands and companies,
 * as salted SHA-256 prefixes so that the names themselves appear nowhere in the project.
 */
const BRAND_WORD_HASHES = new Set([
  '102f7b6b6599c45d', '0c1b1964f4c5775d', '299201c8ef81eacd', 'b1c457204c38325f', '04bcadcf2001bc0c', '8eed1996b502277e', 'f69835d737680316', '6311907c6cc92a6a',
  '2bb7cd7d93a40770', '9fd32d68712431aa', 'cb0c48dd707069f2', '4d0d89a30e63aeea', 'cb531dc85d99ae19', '0a4dc4be24a26d34', 'cafc307ea065b832', 'b0d8b4c6c184ce11',
  '1129fa4138fe3b9e', '53768c6e822c7b98', '4ccac186d9a6c975', '32df8f8a7abd9f9d', '6e8da24dd7a1f022', '68cbd9bbf6ed6c1a', '78214d492e982d56', '48ede3b8a5da9395',
  '207e110b84b8f2bf', 'f392a58d95f951fe', '4873f8816e568c6a', '0a29e60ff63fd91e', '14b66bb4c5f3e24e', 'ff1b8b6b27f5a0e1', '38ac36312e90ca69', '22051936ae4f19ec',
  'eb0b23a3c68768d8', '6d04d4d933c80665', '66b7a616dedcf49c', 'd1fee5b2d98a623d', '4fe05652d97f62c9', 'b774645a15da330d', 'd7db912ed92e14b5', 'cfccb081476f061a',
  '7cc7a2ee0920331c', '6e9541f5ed8bb946', '6f97073ba0c81cae', 'ad22f41c3759bfc1', '8f864b0010539764', 'bfeb621e89f649b9', 'e1a3dcbce787b069', '15c2a0d2b6070f04',
  '8976908b655e0bee', '860cbb9fe66a62e7', '3726af705386135a', 'dd8dee4ede1bedc3', '5ba3752033e3c33a', '1e4310316d0b3fbf', '6101dd231435e2ba', '36f537ab39308073',
  '9f63e48e6f2cb832', 'e2a5f4c19b7c0b44', '7a3b36fd367788e5', 'a6c92b8b2bb7ebac', 'd2a356ee35661338', '40735d4b4c61d290', '0f6d0ea8ce2cf9d1', '31f4ddbd395cbd8c',
  'fb6c5ebca4e5e574', 'f3e24463c1086a36', '602cce8ed82573f2', '41947623269252a0', '3780418e44a7be0f', '62c0740410380a21', 'dc2f92db078cdc47', '82b517be7126a743',
  '00b2c77817680100', '9010dfed8a26acf6', 'e90649074823ade2', 'd79436efce70d2c8', '8f709a2ec14d2c17', '08a07bcb05ce35f9', '5acff58fe7b56515', '1de107c8076ee629',
  '27fc7190dee100c9', '8b87adbb34117b91', '97d5459c7a7ca9c1', '07f9da65ddab2641', 'ef2ba488cc376f93', '8c9297fe67d16d5e', '96da446029184033', 'e4ba8c4723f95f0c',
  '4c53d2d9b70bbe30', '3633d72f34133e68', '7ab8557621935975', '4627eb5e01ed8873', '8d75e58ccbc76e45', '9e0656cd9295516e', '198fbae58ba0357d', '80dc2c47e3e4bb6d',
  'a4f262ad34dcf790', 'de9cbd618ba2f3e2', '82aef24b6e606295', 'f01aa3463901666c', 'fe63f7a334cd3fd7', '28ad89c68865eb73', '708aa083092d72bf', '5e94a73576b807a4',
  '0d8ffce31f93de61', '49f92147fff82260', '792af7a6533ffcd6', '4d2e480697bf9d58', '38cf797ac0e7acb6', 'f95b3857679cc0cb', '5f62727a169a69d2', 'fadf4137dfde03d6',
  'cdfea4f336e91123', '2ac5dadcf31f1997', 'c6f83830bc11130d', '10a11de983f99044',
]);
const brandHash = (word: string) => createHash('sha256').update(`ferrule-demo:${word}`).digest('hex').slice(0, 16);

/** Every string in a value, however deep. */
function stringsOf(value: unknown, out: string[] = []): string[] {
  if (typeof value === 'string') out.push(value);
  else if (Array.isArray(value)) value.forEach((v) => stringsOf(v, out));
  else if (value && typeof value === 'object') Object.values(value).forEach((v) => stringsOf(v, out));
  return out;
}

let server: TestServer;
let plan: RegisterPlan;

/** Runs a query over the demo's two sites only: the test database holds other files' sites too. */
async function rows<T>(sql: string, params: unknown[] = []): Promise<T[]> {
  return server.ctx.ds.query(sql.replaceAll(':sites', `(SELECT id FROM sites WHERE code = ANY($${params.length + 1}))`), [...params, SITE_CODES]);
}
async function scalar(sql: string, params: unknown[] = []): Promise<number> {
  const [row] = await rows<object>(sql, params);
  return Number(Object.values(row!)[0]);
}

/** One assembly's time in one position, read from its install and remove events as the position history reads them. */
interface Life {
  assemblyId: string;
  positionId: string;
  equipmentId: string;
  construction: string;
  hoseBatch: string | null;
  installedAt: Date;
  estimated: boolean;
  removedAt: Date | null;
  reason: string | null;
  lifeOutcome: string | null;
  recordedInstalledAt: string | null;
  days: number;
}

async function lives(): Promise<Life[]> {
  const found = await rows<Omit<Life, 'days'>>(
    `SELECT i.assembly_id AS "assemblyId", i.position_id AS "positionId", p.equipment_id AS "equipmentId", c.code AS construction, a.hose_batch AS "hoseBatch",
            i.occurred_at AS "installedAt", i.occurred_at_estimated AS estimated, r.occurred_at AS "removedAt", r.data->>'reason' AS reason,
            r.data->>'lifeOutcome' AS "lifeOutcome", r.data->>'installedAt' AS "recordedInstalledAt"
       FROM assembly_events i
       JOIN assemblies a ON a.id = i.assembly_id
       JOIN constructions c ON c.id = a.construction_id
       JOIN positions p ON p.id = i.position_id
       LEFT JOIN LATERAL (
         SELECT * FROM assembly_events r
          WHERE r.assembly_id = i.assembly_id AND r.position_id = i.position_id AND r.kind = 'remove' AND r.occurred_at >= i.occurred_at
          ORDER BY r.occurred_at LIMIT 1) r ON TRUE
      WHERE i.kind = 'install' AND i.site_id IN :sites
      ORDER BY i.occurred_at`,
  );
  return found.map((l) => ({ ...l, days: ((l.removedAt ?? ANCHOR).getTime() - l.installedAt.getTime()) / DAY_MS }));
}

function median(values: number[]): number {
  const sorted = [...values].sort((a, b) => a - b);
  const mid = Math.floor(sorted.length / 2);
  return sorted.length % 2 ? sorted[mid]! : (sorted[mid - 1]! + sorted[mid]!) / 2;
}

const failed = (l: Life) => l.reason != null && FAILURE_REASONS.includes(l.reason);

beforeAll(async () => {
  server = await startTestServer();
  plan = planRegister(DEMO_SEED, ANCHOR);
  const present: unknown[] = await server.ctx.ds.query(`SELECT code FROM sites WHERE code = ANY($1)`, [SITE_CODES]);
  if (present.length === 0) await seedDemo(server.ctx.ds, { anchor: ANCHOR, bcryptCost: 4 });
}, 120_000);
afterAll(() => server.close());

describe('the demo register', () => {
  it('holds about 150 positions over every service of the catalogue', async () => {
    expect(await scalar(`SELECT count(*) FROM positions WHERE site_id IN :sites`)).toBeGreaterThanOrEqual(140);
    expect(await scalar(`SELECT count(*) FROM positions WHERE site_id IN :sites`)).toBeLessThanOrEqual(165);
    const rows: Array<{ service_code: string }> = await server.ctx.ds.query(
      `SELECT DISTINCT service_code FROM positions WHERE site_id IN (SELECT id FROM sites WHERE code = ANY($1)) ORDER BY 1`,
      [SITE_CODES],
    );
    expect(rows.map((r) => r.service_code)).toEqual([...SERVICE_CODES].sort());
    expect(await scalar(`SELECT count(*) FROM site_services WHERE site_id IN :sites`)).toBe(SERVICE_CODES.length * SITE_CODES.length);
  });

  it('holds three years of assemblies: most positions filled, a stock, removals awaiting re-test, scrap and a few tagged out', async () => {
    const byStatus = async (status: string) => scalar(`SELECT count(*) FROM assemblies WHERE site_id IN :sites AND status = $1`, [status]);
    const total = await scalar(`SELECT count(*) FROM assemblies WHERE site_id IN :sites`);
    expect(total).toBeGreaterThanOrEqual(450);
    expect(total).toBeLessThanOrEqual(800);
    expect(await byStatus('installed')).toBeGreaterThanOrEqual(120);
    expect(await byStatus('in_stock')).toBeGreaterThanOrEqual(50);
    expect(await byStatus('in_stock')).toBeLessThanOrEqual(75);
    expect(await byStatus('removed')).toBeGreaterThanOrEqual(12);
    expect(await byStatus('removed')).toBeLessThanOrEqual(40);
    expect(await byStatus('scrapped')).toBeGreaterThanOrEqual(200);
    expect(await byStatus('scrapped')).toBeLessThanOrEqual(500);
    expect(await byStatus('tagged_out')).toBeGreaterThanOrEqual(3);
    expect(await byStatus('tagged_out')).toBeLessThanOrEqual(10);
    const vacant = await scalar(
      `SELECT count(*) FROM positions p WHERE p.site_id IN :sites
         AND NOT EXISTS (SELECT 1 FROM assemblies a WHERE a.position_id = p.id AND a.status IN ('installed', 'tagged_out'))`,
    );
    expect(vacant).toBeGreaterThanOrEqual(1);
    expect(vacant).toBeLessThanOrEqual(15);
  });

  it('plans the same register for the same seed and anchor, and another for another seed', () => {
    const again = planRegister(DEMO_SEED, ANCHOR);
    expect(again).toEqual(plan);
    expect(JSON.parse(JSON.stringify(plan))).toEqual(plan);
    expect(planRegister(DEMO_SEED + 1, ANCHOR).assemblies).not.toEqual(plan.assemblies);
  });

  it('writes the plan it draws: every install, removal and inspection of the history', async () => {
    const planned = (kind: string) => plan.assemblies.reduce((n, a) => n + a.steps.filter((s) => s.kind === kind).length, 0);
    const stored = (kind: string) => scalar(`SELECT count(*) FROM assembly_events WHERE site_id IN :sites AND kind = $1`, [kind]);
    expect(await stored('install')).toBe(planned('install'));
    expect(await stored('remove')).toBe(planned('remove'));
    expect(await stored('inspection')).toBe(planned('inspection'));
    expect(await scalar(`SELECT count(*) FROM assemblies WHERE site_id IN :sites`)).toBe(plan.assemblies.length);
  });

  it('stores warnings and failures, and exactly one accepted failed check, with its reason', async () => {
    expect(await scalar(`SELECT count(*) FROM assemblies WHERE site_id IN :sites AND check_outcome = 'warn'`)).toBeGreaterThan(0);
    expect(await scalar(`SELECT count(*) FROM assemblies WHERE site_id IN :sites AND check_outcome = 'fail'`)).toBeGreaterThan(0);
    const overrides: Array<{ check_code: string; reason: string; code: string }> = await server.ctx.ds.query(
      `SELECT o.check_code, o.reason, p.code FROM check_overrides o JOIN positions p ON p.id = o.position_id
        WHERE p.site_id IN (SELECT id FROM sites WHERE code = ANY($1))`,
      [SITE_CODES],
    );
    expect(overrides).toHaveLength(1);
    expect(overrides[0]).toMatchObject({ check_code: 'bend-radius', code: OVERRIDDEN_POSITION });
    expect(overrides[0]!.reason.length).toBeGreaterThan(60);
  });

  it('shows the raised air pressure as a failed allowable pressure that cannot be overridden', async () => {
    const [row] = await server.ctx.ds.query(
      `SELECT a.check_outcome, a.check_results FROM assemblies a JOIN positions p ON p.id = a.position_id
        WHERE p.code = $1 AND a.status IN ('installed', 'tagged_out') AND p.site_id IN (SELECT id FROM sites WHERE code = ANY($2))`,
      [PRESSURE_RAISED_POSITION, SITE_CODES],
    );
    expect(row.check_outcome).toBe('fail');
    expect(row.check_results).toContainEqual(expect.objectContaining({ check: 'allowable-pressure', outcome: 'fail', overridable: false }));
  });

  it('gives every installed assembly a next inspection due date', async () => {
    expect(await scalar(`SELECT count(*) FROM assemblies WHERE site_id IN :sites AND status IN ('installed', 'tagged_out') AND next_inspection_due IS NULL`)).toBe(0);
  });

  it('never has two assemblies in one position', async () => {
    expect(
      await scalar(
        `SELECT count(*) FROM (SELECT position_id FROM assemblies WHERE site_id IN :sites AND status IN ('installed', 'tagged_out')
          GROUP BY position_id HAVING count(*) > 1) doubled`,
      ),
    ).toBe(0);
  });

  it('flags assemblies from before records began and marks their builds estimated', async () => {
    expect(await scalar(`SELECT count(*) FROM assemblies WHERE site_id IN :sites AND status = 'installed' AND predates_records`)).toBeGreaterThan(0);
    expect(await scalar(`SELECT count(*) FROM assemblies WHERE site_id IN :sites AND predates_records AND NOT built_on_estimated`)).toBe(0);
  });

  it('dates everything it records no later than the anchor', async () => {
    expect(await scalar(`SELECT count(*) FROM assembly_events WHERE site_id IN :sites AND occurred_at > $1`, [ANCHOR])).toBe(0);
  });

  it('uses no name of a real company or brand, and only invented people', () => {
    const text = [...stringsOf(plan), DEMO_COMPANY, ...DEMO_SITES.map((s) => s.name), ...DEMO_SIGN_INS.map((s) => s.name)];
    const words = new Set(text.flatMap((t) => t.toLowerCase().replace(/[\u2019']/g, '').match(/[a-z0-9]+/g) ?? []));
    expect([...words].filter((w) => BRAND_WORD_HASHES.has(brandHash(w)))).toEqual([]);
    expect(plan.constructions.every((c) => c.maker === null && (c.partNumber === null || /^stores item \d+$/.test(c.partNumber)))).toBe(true);
    const people = new Set(plan.assemblies.flatMap((a) => [a.builder, ...a.steps.map((s) => (s.kind === 'proof_test' ? s.tester : null))]).filter((n): n is string => n !== null));
    for (const person of people) {
      if (person === 'Hose shop') continue;
      const [given, family] = person.split(' ');
      expect(DEMO_GIVEN_NAMES).toContain(given);
      expect(DEMO_FAMILY_NAMES).toContain(family);
    }
  });
});

describe('the demo history', () => {
  let all: Life[];
  beforeAll(async () => {
    all = await lives();
  });

  it('keeps three years of records at every position, with the hoses already in place flagged as predating them', async () => {
    const recorded = all.filter((l) => !l.estimated);
    const firstRecorded = Math.min(...recorded.map((l) => l.installedAt.getTime()));
    expect(firstRecorded).toBeGreaterThanOrEqual(RECORDS_BEGAN.getTime());
    expect(firstRecorded).toBeLessThan(RECORDS_BEGAN.getTime() + 30 * DAY_MS);
    for (let year = 0; year < 3; year++) {
      const from = RECORDS_BEGAN.getTime() + year * 365 * DAY_MS;
      const removals = all.filter((l) => l.removedAt && l.removedAt.getTime() >= from && l.removedAt.getTime() < from + 365 * DAY_MS);
      expect(removals.length, `removals in year ${year + 1} of the records`).toBeGreaterThanOrEqual(50);
    }
    const estimated = all.filter((l) => l.estimated);
    expect(estimated.length).toBeGreaterThanOrEqual(100);
    expect(estimated.every((l) => l.installedAt < RECORDS_BEGAN)).toBe(true);
    expect(
      await scalar(
        `SELECT count(*) FROM assemblies a WHERE a.site_id IN :sites AND EXISTS (SELECT 1 FROM assembly_events e WHERE e.assembly_id = a.id AND e.kind = 'install' AND e.occurred_at_estimated)
           AND NOT (a.predates_records AND a.built_on_estimated)`,
      ),
    ).toBe(0);
    const positions = await scalar(`SELECT count(*) FROM positions WHERE site_id IN :sites`);
    const served = new Set(all.map((l) => l.positionId));
    expect(served.size).toBe(positions);
    // Only equipment first run after records began starts with a recorded, new hose.
    const firstLives = [...served].map((id) => all.find((l) => l.positionId === id)!);
    expect(firstLives.filter((l) => !l.estimated).length).toBeLessThanOrEqual(12);
  });

  it('never has two lives at one position at once, and every removal names the install it ends', () => {
    const byPosition = new Map<string, Life[]>();
    for (const l of all) byPosition.set(l.positionId, [...(byPosition.get(l.positionId) ?? []), l]);
    for (const list of byPosition.values()) {
      list.forEach((l, i) => {
        if (l.removedAt) {
          expect(l.removedAt.getTime()).toBeGreaterThan(l.installedAt.getTime());
          expect(l.recordedInstalledAt).toBe(l.installedAt.toISOString());
        }
        const next = list[i + 1];
        if (next) {
          expect(l.removedAt, 'a hose comes out before the next goes in').not.toBeNull();
          expect(next.installedAt.getTime()).toBeGreaterThanOrEqual(l.removedAt!.getTime());
        }
      });
    }
  });

  it('tells the stories of its life distributions', () => {
    const failures = (code: string) => all.filter((l) => l.construction === code && failed(l)).map((l) => l.days);
    // Blast hoses wear out in weeks; drill air hoses fail at random over about a year.
    expect(median(failures('BLS-32-SD'))).toBeLessThan(120);
    expect(median(failures('BLS-32-SD')) * 2.5).toBeLessThan(median(failures('AIR-25-TX')));
    // The bad slurry batch wore through in weeks, where the same construction's other batches last months.
    const { hoseBatch, constructionCode } = plan.history.badBatch;
    const slurry = all.filter((l) => l.construction === constructionCode && failed(l));
    const bad = slurry.filter((l) => l.hoseBatch === hoseBatch);
    const others = slurry.filter((l) => l.hoseBatch !== hoseBatch);
    expect(bad.length).toBeGreaterThanOrEqual(3);
    expect(new Set(bad.map((l) => l.positionId)).size).toBeGreaterThanOrEqual(2);
    expect(median(bad.map((l) => l.days))).toBeLessThan(0.5 * median(others.map((l) => l.days)));
    // Hydraulic return lines come out on schedule at 4 years when they last that long.
    const planned = all.filter((l) => l.construction === 'HYD-25-SR' && l.reason === 'planned-replacement');
    expect(planned.length).toBeGreaterThan(0);
    for (const l of planned) expect(Math.abs(l.days - LIFE_MODELS['HYD-25-SR']!.plannedReplacementDays!)).toBeLessThan(1);
    // Water discharge lines are lost mostly to damage.
    const water = all.filter((l) => l.construction === 'WDH-25-TX' && failed(l));
    expect(water.filter((l) => l.reason === 'damaged').length).toBeGreaterThan(water.length / 2);
  });

  it('has failures and suspensions for every construction, counted as the plant counts them', () => {
    for (const { code } of plan.constructions) {
      const mine = all.filter((l) => l.construction === code);
      expect(mine.filter(failed).length, `failures of ${code}`).toBeGreaterThan(0);
      expect(mine.filter((l) => l.removedAt == null || l.lifeOutcome === 'suspension').length, `suspensions of ${code}`).toBeGreaterThan(0);
    }
    for (const l of all.filter((x) => x.removedAt)) expect(l.lifeOutcome).toBe(failed(l) ? 'failure' : 'suspension');
  });

  it('inspects at about each position’s interval, so some hoses are overdue and some due this week', async () => {
    const inPlace = await scalar(`SELECT count(*) FROM assemblies WHERE site_id IN :sites AND status IN ('installed', 'tagged_out')`);
    const overdue = await scalar(`SELECT count(*) FROM assemblies WHERE site_id IN :sites AND status IN ('installed', 'tagged_out') AND next_inspection_due < $1::date`, [
      ANCHOR.toISOString().slice(0, 10),
    ]);
    expect(overdue / inPlace).toBeGreaterThanOrEqual(0.05);
    expect(overdue / inPlace).toBeLessThanOrEqual(0.3);
    expect(
      await scalar(
        `SELECT count(*) FROM assemblies WHERE site_id IN :sites AND status IN ('installed', 'tagged_out') AND next_inspection_due >= $1::date AND next_inspection_due <= $1::date + 7`,
        [ANCHOR.toISOString().slice(0, 10)],
      ),
    ).toBeGreaterThan(0);
    // The stored last inspection is the latest inspection since the hose went in.
    expect(
      await scalar(
        `SELECT count(*) FROM assemblies a WHERE a.site_id IN :sites AND a.status IN ('installed', 'tagged_out')
           AND a.last_inspected_at IS DISTINCT FROM (SELECT max(e.occurred_at) FROM assembly_events e
                 WHERE e.assembly_id = a.id AND e.kind = 'inspection' AND e.occurred_at >= a.installed_at)`,
      ),
    ).toBe(0);
    const shapes = await rows<{ result: string; findings: unknown; inside: boolean }>(
      `SELECT e.data->>'result' AS result, e.data->'findings' AS findings, e.position_id IS NOT NULL AS inside FROM assembly_events e WHERE e.site_id IN :sites AND e.kind = 'inspection'`,
    );
    expect(shapes.length).toBeGreaterThan(2000);
    for (const i of shapes) {
      expect(['pass', 'defects']).toContain(i.result);
      expect(Array.isArray(i.findings) && (i.result === 'pass' ? i.findings.length === 0 : i.findings.length > 0)).toBe(true);
      expect(i.inside).toBe(true);
    }
  });

  it('removes a hose worn at inspection only after an inspection found the defect', async () => {
    const unfound = await rows<{ id: string }>(
      `SELECT r.id FROM assembly_events r WHERE r.site_id IN :sites AND r.kind = 'remove' AND r.data->>'reason' = 'worn-at-inspection'
         AND NOT EXISTS (SELECT 1 FROM assembly_events i WHERE i.assembly_id = r.assembly_id AND i.position_id = r.position_id AND i.kind = 'inspection'
                           AND i.data->>'result' = 'defects' AND i.occurred_at <= r.occurred_at AND i.occurred_at > r.occurred_at - interval '7 days')`,
    );
    expect(unfound).toEqual([]);
    expect(all.filter((l) => l.reason === 'worn-at-inspection').length).toBeGreaterThan(50);
  });

  it('reads hour meters that never go backwards, at a plausible pace for each machine', async () => {
    const readings = await rows<{ equipment: string; at: Date; hours: number }>(
      `SELECT p.equipment_id AS equipment, e.occurred_at AS at, e.hour_meter_hours AS hours FROM assembly_events e JOIN positions p ON p.id = e.position_id
        WHERE e.site_id IN :sites AND e.hour_meter_hours IS NOT NULL ORDER BY p.equipment_id, e.occurred_at, e.hour_meter_hours`,
    );
    expect(readings.length).toBeGreaterThan(1000);
    for (let i = 1; i < readings.length; i++) {
      const [before, after] = [readings[i - 1]!, readings[i]!];
      if (before.equipment !== after.equipment) continue;
      expect(after.hours).toBeGreaterThanOrEqual(before.hours);
      const days = (after.at.getTime() - before.at.getTime()) / DAY_MS;
      if (days >= 1) expect((after.hours - before.hours) / days).toBeLessThanOrEqual(24);
    }
    // Every install and removal on a machine with a meter, since records began, carries a reading.
    expect(
      await scalar(
        `SELECT count(*) FROM assembly_events e JOIN positions p ON p.id = e.position_id JOIN equipment q ON q.id = p.equipment_id
          WHERE e.site_id IN :sites AND q.has_hour_meter AND e.kind IN ('install', 'remove') AND NOT e.occurred_at_estimated AND e.hour_meter_hours IS NULL`,
      ),
    ).toBe(0);
  });

  it('documents every life distribution in the README', () => {
    const readme = readFileSync(new URL('../../README.md', import.meta.url), 'utf8');
    for (const [code, model] of Object.entries(LIFE_MODELS)) {
      const row = readme.split('\n').find((line) => line.startsWith(`| ${code} |`));
      expect(row, code).toBeDefined();
      const cells = row!.split('|').map((c) => c.trim());
      expect(Number(cells[3]), `β of ${code}`).toBe(model.beta);
      expect(Number(cells[4]), `η of ${code}`).toBe(model.etaDays);
      expect(cells[5], `planned replacement of ${code}`).toBe(model.plannedReplacementDays == null ? '—' : String(model.plannedReplacementDays));
    }
  });
});
