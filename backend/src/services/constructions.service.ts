import type { EntityManager } from 'typeorm';
import type { ConstructionCreateInput, ConstructionListQuery, ConstructionUpdateInput } from '../../../shared/src/schemas/register.schema.js';
import { SIZE_CLASS_CODES } from '../../../shared/src/sizes/nominal-sizes.js';
import type { AppContext } from '../context.js';
import { Construction } from '../entities/index.js';
import { NotFoundError, ValidationError } from '../errors.js';
import type { Actor } from '../policies/actor.js';
import { recomputeStoredOutcomes } from './assembly-checks.service.js';
import { recordAudit } from './audit.service.js';
import { codeTaken, Conditions, containsPattern, filterArchived, guardUniqueCodes, pageSql } from './sites-admin.service.js';

// Constructions are plant-wide: every site buys from the same list, so there is no site scope.

async function load(manager: EntityManager, id: string, lock = false): Promise<Construction> {
  const construction = await manager.getRepository(Construction).findOne({ where: { id }, ...(lock ? { lock: { mode: 'pessimistic_write' as const } } : {}) });
  if (!construction) throw new NotFoundError('Construction');
  return construction;
}

export const getConstruction = (ctx: AppContext, _actor: Actor, id: string) => load(ctx.ds.manager, id);

const SORT_COLUMNS: Record<Exclude<ConstructionListQuery['sort'], 'sizeCode'>, string> = {
  code: 'c.code',
  name: 'lower(c.name)',
  workingPressureKpa: 'c.working_pressure_kpa',
  updatedAt: 'c.updated_at',
};

export async function listConstructions(ctx: AppContext, _actor: Actor, query: ConstructionListQuery): Promise<{ rows: Construction[]; total: number }> {
  const where = new Conditions();
  filterArchived(where, 'c.archived_at', query.archived);
  if (query.sizeCode) where.add(`c.size_code = ${where.param(query.sizeCode)}`);
  if (query.tubeCompound) where.add(`c.tube_compound = ${where.param(query.tubeCompound)}`);
  if (query.q) {
    const q = where.param(containsPattern(query.q));
    where.add(`(c.code ILIKE ${q} OR c.name ILIKE ${q} OR c.maker ILIKE ${q} OR c.part_number ILIKE ${q})`);
  }
  const [count] = await ctx.ds.query(`SELECT count(*)::int AS n FROM constructions c WHERE ${where.sql}`, where.params);
  const params = [...where.params];
  // Size classes sort in their own order (smallest bore first), not as text.
  const column = query.sort === 'sizeCode' ? `array_position($${params.push(SIZE_CLASS_CODES)}::text[], c.size_code)` : SORT_COLUMNS[query.sort];
  const order = `${column} ${query.dir === 'desc' ? 'DESC' : 'ASC'} NULLS LAST, c.code, c.id`;
  const ids: Array<{ id: string }> = await ctx.ds.query(`SELECT c.id FROM constructions c WHERE ${where.sql} ORDER BY ${order} ${pageSql(query)}`, params);
  const rows = ids.length ? await ctx.ds.getRepository(Construction).findBy(ids.map((r) => ({ id: r.id }))) : [];
  const byId = new Map(rows.map((c) => [c.id, c]));
  return { rows: ids.flatMap((r) => byId.get(r.id) ?? []), total: (count as { n: number }).n };
}

type ConstructionColumns = Omit<Construction, 'id' | 'code' | 'archivedAt' | 'createdAt' | 'updatedAt'>;

/** The fields given in an input, as stored columns (kPa, mm, °C); fields left out are left out. */
function columns(input: ConstructionUpdateInput): Partial<ConstructionColumns> {
  const out: Partial<ConstructionColumns> = {};
  if (input.name !== undefined) out.name = input.name;
  if (input.tubeCompound !== undefined) out.tubeCompound = input.tubeCompound;
  if (input.reinforcement !== undefined) out.reinforcement = input.reinforcement;
  if (input.coverCompound !== undefined) out.coverCompound = input.coverCompound;
  if (input.sizeCode !== undefined) out.sizeCode = input.sizeCode;
  if (input.workingPressure !== undefined) out.workingPressureKpa = input.workingPressure;
  if (input.burstPressure !== undefined) out.burstPressureKpa = input.burstPressure;
  if (input.vacuumRating !== undefined) out.vacuumRatingKpa = input.vacuumRating;
  if (input.minTemp !== undefined) out.minTempC = input.minTemp;
  if (input.maxTemp !== undefined) out.maxTempC = input.maxTemp;
  if (input.minBendRadius !== undefined) out.minBendRadiusMm = input.minBendRadius;
  if (input.weightKgPerM !== undefined) out.weightKgPerM = input.weightKgPerM;
  if (input.electrical !== undefined) out.electrical = input.electrical;
  if (input.foodContactCertified !== undefined) out.foodContactCertified = input.foodContactCertified;
  if (input.maker !== undefined) out.maker = input.maker;
  if (input.partNumber !== undefined) out.partNumber = input.partNumber;
  if (input.serviceLifeMonths !== undefined) out.serviceLifeMonths = input.serviceLifeMonths;
  if (input.shelfLifeMonths !== undefined) out.shelfLifeMonths = input.shelfLifeMonths;
  if (input.storageLifeMonths !== undefined) out.storageLifeMonths = input.storageLifeMonths;
  if (input.notes !== undefined) out.notes = input.notes;
  return out;
}

/** The rules between fields, on the values the construction will have once changed. */
function assertConsistent(c: Pick<Construction, 'workingPressureKpa' | 'burstPressureKpa' | 'minTempC' | 'maxTempC'>): void {
  if (c.workingPressureKpa != null && c.burstPressureKpa != null && c.burstPressureKpa < c.workingPressureKpa) {
    throw new ValidationError('Burst pressure must be at least the working pressure', 'burstPressure');
  }
  if (c.minTempC != null && c.maxTempC != null && c.minTempC > c.maxTempC) {
    throw new ValidationError('The highest temperature must be at least the lowest', 'maxTemp');
  }
}

const EMPTY: Omit<ConstructionColumns, 'name' | 'sizeCode'> = {
  tubeCompound: null,
  reinforcement: null,
  coverCompound: null,
  workingPressureKpa: null,
  burstPressureKpa: null,
  vacuumRatingKpa: null,
  minTempC: null,
  maxTempC: null,
  minBendRadiusMm: null,
  weightKgPerM: null,
  electrical: null,
  foodContactCertified: null,
  maker: null,
  partNumber: null,
  serviceLifeMonths: null,
  shelfLifeMonths: null,
  storageLifeMonths: null,
  notes: null,
};

export async function createConstruction(ctx: AppContext, actor: Actor, input: ConstructionCreateInput): Promise<Construction> {
  return guardUniqueCodes(() =>
    ctx.ds.transaction(async (manager) => {
      const repo = manager.getRepository(Construction);
      if (await repo.existsBy({ code: input.code })) throw codeTaken('constructions_code_key');
      const { id } = await repo.save({ ...EMPTY, ...columns(input), code: input.code, name: input.name, sizeCode: input.sizeCode });
      const construction = await repo.findOneByOrFail({ id });
      await recordAudit(manager, { actorId: actor.id, action: 'construction.created', entityType: 'construction', entityId: id, after: construction });
      return construction;
    }),
  );
}

/** Changes a construction and recomputes the stored outcomes of the assemblies built from it. */
export async function updateConstruction(ctx: AppContext, actor: Actor, id: string, input: ConstructionUpdateInput): Promise<Construction> {
  return ctx.ds.transaction(async (manager) => {
    const before = await load(manager, id, true);
    const next = columns(input);
    assertConsistent({ ...before, ...next });
    const repo = manager.getRepository(Construction);
    if (Object.keys(next).length) await repo.update({ id }, next);
    const after = await repo.findOneByOrFail({ id });
    await recordAudit(manager, { actorId: actor.id, action: 'construction.updated', entityType: 'construction', entityId: id, before, after });
    await recomputeStoredOutcomes(manager, { constructionIds: [id] }, ctx.clock.now());
    return after;
  });
}

/** Archives a construction: it leaves the pickers; assemblies built from it keep it. Archiving twice changes nothing. */
export async function archiveConstruction(ctx: AppContext, actor: Actor, id: string): Promise<void> {
  await ctx.ds.transaction(async (manager) => {
    const before = await load(manager, id, true);
    if (before.archivedAt) return;
    const repo = manager.getRepository(Construction);
    await repo.update({ id }, { archivedAt: ctx.clock.now() });
    const after = await repo.findOneByOrFail({ id });
    await recordAudit(manager, { actorId: actor.id, action: 'construction.archived', entityType: 'construction', entityId: id, before, after });
  });
}
