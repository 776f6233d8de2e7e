import { createHash } from 'node:crypto';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { SERVICE_CODES } from '../../shared/src/services/service-catalogue.js';
import { DEMO_COMPANY, DEMO_FAMILY_NAMES, DEMO_GIVEN_NAMES, DEMO_SEED, DEMO_SIGN_INS, DEMO_SITES, seedDemo } from '../../backend/src/seed/demo-scenario.js';
import { OVERRIDDEN_POSITION, planRegister, PRESSURE_RAISED_POSITION, type RegisterPlan } from '../../backend/src/seed/register-plan.js';
import { startTestServer, type TestServer } from '../support/api.js';

const ANCHOR = new Date('2026-06-15T12:00:00Z');
const SITE_CODES = DEMO_SITES.map((s) => s.code);

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
async function scalar(sql: string, params: unknown[] = []): Promise<number> {
  const [row] = await server.ctx.ds.query(sql.replaceAll(':sites', `(SELECT id FROM sites WHERE code = ANY($${params.length + 1}))`), [...params, SITE_CODES]);
  return Number(Object.values(row as object)[0]);
}

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

  it('holds about 300 assemblies: most positions filled, a stock, removals awaiting re-test, scrap and a few tagged out', async () => {
    const byStatus = async (status: string) => scalar(`SELECT count(*) FROM assemblies WHERE site_id IN :sites AND status = $1`, [status]);
    const total = await scalar(`SELECT count(*) FROM assemblies WHERE site_id IN :sites`);
    expect(total).toBeGreaterThanOrEqual(270);
    expect(total).toBeLessThanOrEqual(320);
    expect(await byStatus('installed')).toBeGreaterThanOrEqual(120);
    expect(await byStatus('in_stock')).toBeGreaterThanOrEqual(50);
    expect(await byStatus('in_stock')).toBeLessThanOrEqual(75);
    expect(await byStatus('removed')).toBeGreaterThanOrEqual(25);
    expect(await byStatus('removed')).toBeLessThanOrEqual(40);
    expect(await byStatus('scrapped')).toBeGreaterThanOrEqual(32);
    expect(await byStatus('scrapped')).toBeLessThanOrEqual(50);
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
