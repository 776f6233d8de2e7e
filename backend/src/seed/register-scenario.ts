import { In, type DataSource, type EntityManager } from 'typeorm';
import type { ServiceSettings } from '../../../shared/src/services/service-catalogue.js';
import type { Config } from '../config.js';
import type { AppContext } from '../context.js';
import { Area, Assembly, Construction, Equipment, FittingType, Position, Site, SiteService, User } from '../entities/index.js';
import { createLogger } from '../lib/logger.js';
import type { Actor } from '../policies/actor.js';
import { installAssembly, tagOutAssembly } from '../services/assemblies.service.js';
import { recomputeStoredOutcomes } from '../services/assembly-checks.service.js';
import { recordAudit } from '../services/audit.service.js';
import { lastInstallIndex, stepAtOf, stepsInOrder, writeAssemblies, writeInspections, type BulkContext } from './register-bulk.js';
import { planRegister, RECORDS_BEGAN_DAYS, type AssemblyPlan, type RegisterPlan } from './register-plan.js';

// Writes the demo's register in the seed's transaction: the catalogue, sites' areas, equipment and
// positions straight into their tables; then every assembly in bulk (the three years of past
// lives, the stock, the hose shop's queue, and the hoses in place up to their install); then the
// installs and tag-outs of the hoses in place at the anchor through the same lifecycle functions
// the API uses, with the clock held at the anchor; then their inspections and stored outcomes.

/** Whether an assembly is in a position at the anchor: its install goes through the lifecycle functions. */
const inPlace = (a: AssemblyPlan) => a.status === 'installed' || a.status === 'tagged_out';

/** The session the seed acts in; it is never stored. */
const SEED_SESSION_ID = '00000000-0000-4000-8000-000000000001';

export interface RegisterSeedOptions {
  anchor: Date;
  seed: number;
  /** E-mail of the administrator the seed acts as. */
  actorEmail: string;
}

/** Plans the register from the seed and anchor and writes it with `manager`, inside the caller's transaction. */
export async function seedRegister(ds: DataSource, manager: EntityManager, options: RegisterSeedOptions): Promise<RegisterPlan> {
  const plan = planRegister(options.seed, options.anchor);
  await writeRegister(ds, manager, plan, options);
  return plan;
}

export async function writeRegister(ds: DataSource, manager: EntityManager, plan: RegisterPlan, options: RegisterSeedOptions): Promise<void> {
  const { anchor } = options;
  const ctx: AppContext = {
    config: {} as Config,
    ds,
    clock: { now: () => anchor },
    mailer: { send: async () => {} },
    logger: createLogger('test'),
  };
  const admin = await manager.getRepository(User).findOneByOrFail({ email: options.actorEmail });
  const actor: Actor = { id: admin.id, email: admin.email, name: admin.name, role: 'administrator', allSites: true, siteIds: [], sessionId: SEED_SESSION_ID };

  const sites = await manager.getRepository(Site).find();
  const siteId = (code: string) => {
    const site = sites.find((s) => s.code === code);
    if (!site) throw new Error(`The demo site ${code} is not seeded`);
    return site.id;
  };

  await manager.getRepository(SiteService).insert(plan.siteServices.map((s) => ({ siteId: siteId(s.siteCode), serviceCode: s.serviceCode, settings: s.settings })));

  const areaIds = await insertAll(manager, Area, plan.areas.map((a) => ({ siteId: siteId(a.siteCode), code: a.code, name: a.name })));
  const areaId = new Map(plan.areas.map((a, i) => [`${a.siteCode}:${a.code}`, areaIds[i]!]));
  const equipmentIds = await insertAll(
    manager,
    Equipment,
    plan.equipment.map((e) => ({
      siteId: siteId(e.siteCode),
      areaId: areaId.get(`${e.siteCode}:${e.areaCode}`)!,
      assetNumber: e.assetNumber,
      name: e.name,
      hasHourMeter: e.hasHourMeter,
      hourMeterHours: e.hourMeterHours,
      hourMeterReadAt: e.hourMeterReadAt ? new Date(e.hourMeterReadAt) : null,
    })),
  );
  const equipmentId = new Map(plan.equipment.map((e, i) => [e.assetNumber, equipmentIds[i]!]));
  const positionIds = await insertAll(
    manager,
    Position,
    plan.positions.map(({ siteCode, assetNumber, ...p }) => ({ ...p, siteId: siteId(siteCode), equipmentId: equipmentId.get(assetNumber)! })),
  );
  const positionId = new Map(plan.positions.map((p, i) => [p.code, positionIds[i]!]));
  const constructionIds = await insertAll(manager, Construction, plan.constructions.map((c) => ({ ...c })));
  const constructionId = new Map(plan.constructions.map((c, i) => [c.code, constructionIds[i]!]));
  const fittingIds = await insertAll(manager, FittingType, plan.fittingTypes.map((f) => ({ ...f })));
  const fittingId = new Map(plan.fittingTypes.map((f, i) => [f.code, fittingIds[i]!]));

  const bulk = await bulkContext(manager, plan, { siteId, positionIds: positionId, constructionIds: constructionId, fittingIds: fittingId, anchor, fallbackActorId: actor.id });
  const assemblyId = await writeAssemblies(manager, bulk, plan.assemblies, inPlace);

  // The hoses in place at the anchor go in through the lifecycle functions, in the order they went in.
  const installed = plan.assemblies.filter(inPlace).map((a) => {
    const steps = stepsInOrder(a);
    return { plan: a, id: assemblyId.get(a.ref)!, tail: steps.slice(lastInstallIndex(steps)) };
  });
  installed.sort((x, y) => Date.parse(stepAtOf(x.tail[0]!)) - Date.parse(stepAtOf(y.tail[0]!)) || x.plan.ref - y.plan.ref);
  for (const { id, tail } of installed) {
    for (const step of tail) {
      if (step.kind === 'install') {
        await installAssembly(ctx, manager, actor, id, {
          positionId: positionId.get(step.positionCode)!,
          occurredAt: step.at,
          occurredAtEstimated: step.estimated,
          workOrder: step.workOrder,
          hourMeterHours: step.hourMeterHours,
          note: step.note,
          ...(step.override ? { override: step.override } : {}),
        });
        // Nothing in the lifecycle says a hose was there before records began: the register marks it afterwards.
        if (step.estimated) await manager.getRepository(Assembly).update({ id }, { predatesRecords: true });
      } else if (step.kind === 'tag_out') {
        await tagOutAssembly(ctx, manager, actor, id, { occurredAtEstimated: false, hourMeterHours: null, occurredAt: step.at, workOrder: step.workOrder, note: step.note });
      } else if (step.kind !== 'inspection') {
        throw new Error(`A hose in place at the anchor takes the step ${step.kind} after its install`);
      }
    }
  }
  await writeInspections(manager, bulk, installed);

  // Later changes of design conditions and records, as an engineer would make them: audited, then the stored outcomes recomputed.
  for (const change of plan.positionChanges) {
    const id = positionId.get(change.positionCode)!;
    const repo = manager.getRepository(Position);
    const before = await repo.findOneByOrFail({ id });
    await repo.update({ id }, change.set);
    const after = await repo.findOneByOrFail({ id });
    await recordAudit(manager, {
      actorId: actor.id, action: 'position.design_changed', entityType: 'position', entityId: id, siteId: after.siteId,
      before, after: { ...after, reason: change.reason }, at: new Date(change.at),
    });
    await recomputeStoredOutcomes(manager, { positionIds: [id] }, anchor);
  }
  for (const change of plan.constructionChanges) {
    const id = constructionId.get(change.constructionCode)!;
    const repo = manager.getRepository(Construction);
    const before = await repo.findOneByOrFail({ id });
    await repo.update({ id }, change.set);
    const after = await repo.findOneByOrFail({ id });
    await recordAudit(manager, { actorId: actor.id, action: 'construction.updated', entityType: 'construction', entityId: id, before, after: { ...after, reason: change.reason }, at: new Date(change.at) });
    await recomputeStoredOutcomes(manager, { constructionIds: [id] }, anchor);
  }

  // With the inspections in, every hose in place gets its stored outcome and next inspection due date afresh.
  await recomputeStoredOutcomes(manager, { assemblyIds: installed.map(({ id }) => id) }, anchor);
}

/** The ids, catalogue rows and people the bulk writer needs, loaded once. */
async function bulkContext(
  manager: EntityManager,
  plan: RegisterPlan,
  ids: {
    siteId: (code: string) => string;
    positionIds: Map<string, string>;
    constructionIds: Map<string, string>;
    fittingIds: Map<string, string>;
    anchor: Date;
    fallbackActorId: string;
  },
): Promise<BulkContext> {
  const byId = <T extends { id: string }>(rows: T[]) => new Map(rows.map((r) => [r.id, r]));
  const positionRows = byId(await manager.getRepository(Position).findBy({ id: In([...ids.positionIds.values()]) }));
  const constructionRows = byId(await manager.getRepository(Construction).findBy({ id: In([...ids.constructionIds.values()]) }));
  const fittingRows = byId(await manager.getRepository(FittingType).findBy({ id: In([...ids.fittingIds.values()]) }));
  const siteIds = [...new Set(plan.positions.map((p) => ids.siteId(p.siteCode)))];
  const services = new Map<string, ServiceSettings>();
  for (const row of await manager.getRepository(SiteService).findBy({ siteId: In(siteIds) })) services.set(`${row.siteId}:${row.serviceCode}`, row.settings);
  const technicians: Array<{ id: string; site_ids: string[] }> = await manager.query(
    `SELECT id, site_ids FROM users WHERE role = 'technician' AND password_hash IS NOT NULL AND site_ids && $1::uuid[] ORDER BY email`,
    [siteIds],
  );
  const recorders = new Map(siteIds.map((site) => [site, technicians.filter((t) => t.site_ids.includes(site)).map((t) => t.id)]));
  const day0 = Date.UTC(ids.anchor.getUTCFullYear(), ids.anchor.getUTCMonth(), ids.anchor.getUTCDate());
  return {
    siteId: ids.siteId,
    positions: new Map([...ids.positionIds].map(([code, id]) => [code, positionRows.get(id)!])),
    constructions: new Map([...ids.constructionIds].map(([code, id]) => [code, constructionRows.get(id)!])),
    fittings: new Map([...ids.fittingIds].map(([code, id]) => [code, fittingRows.get(id)!])),
    services,
    recorders,
    fallbackActorId: ids.fallbackActorId,
    recordsBegan: new Date(day0 - RECORDS_BEGAN_DAYS * 86_400_000 + 9 * 3_600_000),
    anchor: ids.anchor,
  };
}

/** Inserts rows in one statement and returns their new ids, in order. */
async function insertAll<T extends { id: string }>(manager: EntityManager, entity: new () => T, rows: object[]): Promise<string[]> {
  const result = await manager.getRepository(entity).insert(rows as never);
  return result.identifiers.map((i) => i.id as string);
}
