import type { DataSource, EntityManager } from 'typeorm';
import type { Role } from '../../../shared/src/roles.js';
import { Site, User } from '../entities/index.js';
import { hashPassword } from '../lib/crypto.js';
import { Random } from './random.js';
import { seedRegister } from './register-scenario.js';

/** The invented company of the demo, its sites and people. No real company or person is meant. */
export const DEMO_COMPANY = 'Kestrel Ridge Aggregates';
export const DEMO_PASSWORD = 'ridge-demo-hoses';
export const DEMO_SEED = 20261201;

export const DEMO_SITES = [
  { code: 'BFQ', name: 'Brackenfold Quarry', timeZone: 'Europe/London' },
  { code: 'CWM', name: 'Coldwater Drift Mine', timeZone: 'Europe/London' },
] as const;

/** One sign-in per role, shown by `npm start`. */
export const DEMO_SIGN_INS: ReadonlyArray<{ role: Role; email: string; name: string; sites: 'all' | string[] }> = [
  { role: 'administrator', email: 'admin@kestrel-ridge.example', name: 'Morwenna Hale', sites: 'all' },
  { role: 'reliability_engineer', email: 'engineer@kestrel-ridge.example', name: 'Tobias Renwick', sites: 'all' },
  { role: 'technician', email: 'technician@kestrel-ridge.example', name: 'Dylan Pryce', sites: ['BFQ'] },
  { role: 'safety_officer', email: 'safety@kestrel-ridge.example', name: 'Imogen Sallow', sites: ['BFQ', 'CWM'] },
  { role: 'viewer', email: 'viewer@kestrel-ridge.example', name: 'Ashok Varden', sites: ['CWM'] },
];

const GIVEN = ['Aled', 'Bryony', 'Cai', 'Delyth', 'Ewan', 'Ffion', 'Gethin', 'Hollis', 'Ianto', 'Juno', 'Kit', 'Lowri', 'Madoc', 'Nia', 'Osian', 'Petra', 'Rhodri', 'Seren', 'Tamsin', 'Wyn'];
const FAMILY = ['Ashgrove', 'Brindle', 'Carrow', 'Dunmere', 'Elsworth', 'Fenwick', 'Garroway', 'Holloway', 'Ilsley', 'Jessop', 'Kennard', 'Lathom', 'Marrick', 'Norland', 'Oakes', 'Penrose'];
/** The invented names people in the demo are drawn from. */
export { GIVEN as DEMO_GIVEN_NAMES, FAMILY as DEMO_FAMILY_NAMES };

export interface DemoOptions {
  /** The day the demo's "today" falls on; history is drawn before it. */
  anchor: Date;
  seed?: number;
  bcryptCost: number;
}

/** Fills an empty database with the demo scenario. */
export async function seedDemo(ds: DataSource, options: DemoOptions): Promise<void> {
  const random = new Random(options.seed ?? DEMO_SEED);
  const passwordHash = await hashPassword(DEMO_PASSWORD, options.bcryptCost);
  await ds.transaction(async (manager) => {
    await manager.query(`INSERT INTO app_settings (key, value) VALUES ('company_name', $1)`, [JSON.stringify(DEMO_COMPANY)]);
    const sites = await manager.getRepository(Site).save(DEMO_SITES.map((s) => ({ ...s })));
    const siteId = (code: string) => sites.find((s) => s.code === code)!.id;
    await seedUsers(manager, random, options, passwordHash, siteId);
    await seedRegister(ds, manager, { anchor: options.anchor, seed: options.seed ?? DEMO_SEED, actorEmail: DEMO_SIGN_INS[0]!.email });
  });
}

async function seedUsers(manager: EntityManager, random: Random, options: DemoOptions, passwordHash: string, siteId: (code: string) => string) {
  const repo = manager.getRepository(User);
  const lastSignIn = (daysAgo: number) => new Date(options.anchor.getTime() - daysAgo * 86_400_000 - random.int(0, 36_000) * 1000);
  await repo.save(
    DEMO_SIGN_INS.map((u) => ({
      email: u.email,
      name: u.name,
      role: u.role,
      allSites: u.sites === 'all',
      siteIds: u.sites === 'all' ? [] : u.sites.map(siteId),
      passwordHash,
      lastSignInAt: lastSignIn(random.int(0, 3)),
    })),
  );
  const roles: Role[] = ['technician', 'technician', 'technician', 'technician', 'reliability_engineer', 'safety_officer', 'viewer'];
  const used = new Set<string>();
  const more = [];
  for (let i = 0; i < 22; i++) {
    let given: string;
    let family: string;
    do {
      given = random.pick(GIVEN);
      family = random.pick(FAMILY);
    } while (used.has(given + family));
    used.add(given + family);
    const role = random.pick(roles);
    const site = random.chance(0.7) ? 'BFQ' : 'CWM';
    const invited = i % 9 === 4;
    const inactive = i % 11 === 7;
    const contractor = i % 6 === 2;
    more.push({
      email: `${given}.${family}@kestrel-ridge.example`.toLowerCase(),
      name: `${given} ${family}`,
      role,
      allSites: false,
      siteIds: role === 'safety_officer' ? [siteId('BFQ'), siteId('CWM')] : [siteId(site)],
      passwordHash: invited ? null : passwordHash,
      active: !inactive,
      accessExpiresOn: contractor ? new Date(options.anchor.getTime() + random.int(20, 200) * 86_400_000).toISOString().slice(0, 10) : null,
      lastSignInAt: invited ? null : lastSignIn(random.int(0, 60)),
    });
  }
  await repo.save(more);
}
