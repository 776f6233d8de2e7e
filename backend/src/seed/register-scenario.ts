import type { DataSource, EntityManager } from 'typeorm';
import type { Config } from '../config.js';
import type { AppContext } from '../context.js';
import { Area, Assembly, Construction, Equipment, FittingType, Position, Site, SiteService, User } from '../entities/index.js';
import { createLogger } from '../lib/logger.js';
import type { Actor } from '../policies/actor.js';
import {
  buildAssembly,
  installAssembly,
  recordProofTest,
  removeAssembly,
  returnToStock,
  scrapAssembly,
  tagOutAssembly,
} from '../services/assemblies.service.js';
import { recomputeStoredOutcomes } from '../services/assembly-checks.service.js';
import { recordAudit } from '../services/audit.service.js';
import { planRegister, type AssemblyPlan, type AssemblyStep, type RegisterPlan } from './register-plan.js';

// Writes the demo's register in the seed's transaction: the catalogue, sites' areas, equipment and
// positions straight into their tables, then every assembly's history through the same lifecycle
// functions the API uses, in the order it happened, with the clock held at the anchor.

/** Steps that share a moment run in this order: a removal frees the position the next install takes. */
const STEP_ORDER: Record<AssemblyStep['kind'] | 'build', number> = {
  build: 0,
  proof_test: 1,
  remove: 2,
  scrap: 3,
  return_to_stock: 4,
  install: 5,
  tag_out: 6,
};

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

  // Every assembly's steps, in the order they happened across the whole register.
  const queue: Array<{ atMs: number; order: number; assembly: AssemblyPlan; step: AssemblyStep | null }> = [];
  for (const assembly of plan.assemblies) {
    queue.push({ atMs: Date.parse(`${assembly.builtOn}T12:00:00Z`), order: STEP_ORDER.build, assembly, step: null });
    for (const step of assembly.steps) {
      const at = step.kind === 'proof_test' ? `${step.testedOn}T12:00:00Z` : step.at;
      queue.push({ atMs: Date.parse(at), order: STEP_ORDER[step.kind], assembly, step });
    }
  }
  queue.sort((a, b) => a.atMs - b.atMs || a.order - b.order || a.assembly.ref - b.assembly.ref);

  const assemblyId = new Map<number, string>();
  const fieldDefaults = { occurredAtEstimated: false, workOrder: null, hourMeterHours: null, note: null };
  for (const { assembly, step } of queue) {
    if (step === null) {
      const built = await buildAssembly(ctx, manager, actor, {
        constructionId: constructionId.get(assembly.constructionCode)!,
        siteId: siteId(assembly.siteCode),
        storeLocation: assembly.storeLocation,
        hoseBatch: assembly.hoseBatch,
        hoseManufacturedOn: assembly.hoseManufacturedOn,
        overallLength: assembly.overallLengthMm,
        cutLength: assembly.cutLengthMm,
        endA: { fittingTypeId: fittingId.get(assembly.endA.fittingCode)!, crimpDiameter: assembly.endA.crimpMm },
        endB: { fittingTypeId: fittingId.get(assembly.endB.fittingCode)!, crimpDiameter: assembly.endB.crimpMm },
        builtOn: assembly.builtOn,
        builtOnEstimated: assembly.builtOnEstimated,
        builder: assembly.builder,
        cost: assembly.cost,
        note: assembly.note,
      });
      assemblyId.set(assembly.ref, built.id);
      continue;
    }
    const id = assemblyId.get(assembly.ref)!;
    switch (step.kind) {
      case 'proof_test':
        await recordProofTest(ctx, manager, actor, id, {
          testedOn: step.testedOn,
          medium: step.medium,
          requiredPressure: null,
          heldPressure: step.heldPressureKpa,
          holdSeconds: step.holdSeconds,
          result: step.result,
          tester: step.tester,
          note: step.note,
        });
        break;
      case 'install':
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
        break;
      case 'remove':
        await removeAssembly(ctx, manager, actor, id, {
          reason: step.reason,
          occurredAt: step.at,
          occurredAtEstimated: false,
          workOrder: step.workOrder,
          hourMeterHours: step.hourMeterHours,
          note: step.note,
        });
        break;
      case 'tag_out':
        await tagOutAssembly(ctx, manager, actor, id, { ...fieldDefaults, occurredAt: step.at, workOrder: step.workOrder, note: step.note });
        break;
      case 'scrap':
        await scrapAssembly(ctx, manager, actor, id, { ...fieldDefaults, occurredAt: step.at, note: step.note });
        break;
      case 'return_to_stock':
        await returnToStock(ctx, manager, actor, id, { ...fieldDefaults, occurredAt: step.at, storeLocation: step.storeLocation, inspectionNote: step.inspectionNote });
        break;
    }
  }

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
}

/** Inserts rows in one statement and returns their new ids, in order. */
async function insertAll<T extends { id: string }>(manager: EntityManager, entity: new () => T, rows: object[]): Promise<string[]> {
  const result = await manager.getRepository(entity).insert(rows as never);
  return result.identifiers.map((i) => i.id as string);
}
