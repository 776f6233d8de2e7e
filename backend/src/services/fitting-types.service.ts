import type { EntityManager } from 'typeorm';
import type { FittingTypeCreateInput, FittingTypeListQuery, FittingTypeUpdateInput } from '../../../shared/src/schemas/register.schema.js';
import type { AppContext } from '../context.js';
import { FittingType } from '../entities/index.js';
import type { FittingSize } from '../entities/fitting-type.entity.js';
import { NotFoundError } from '../errors.js';
import type { Actor } from '../policies/actor.js';
import { recomputeStoredOutcomes } from './assembly-checks.service.js';
import { recordAudit } from './audit.service.js';
import { codeTaken, Conditions, containsPattern, filterArchived, guardUniqueCodes, pageSql } from './sites-admin.service.js';

// Fitting types are plant-wide, like constructions: no site scope.

async function load(manager: EntityManager, id: string, lock = false): Promise<FittingType> {
  const fitting = await manager.getRepository(FittingType).findOne({ where: { id }, ...(lock ? { lock: { mode: 'pessimistic_write' as const } } : {}) });
  if (!fitting) throw new NotFoundError('Fitting type');
  return fitting;
}

export const getFittingType = (ctx: AppContext, _actor: Actor, id: string) => load(ctx.ds.manager, id);

const SORT_COLUMNS: Record<FittingTypeListQuery['sort'], string> = { code: 'f.code', name: 'lower(f.name)', style: 'f.style' };

export async function listFittingTypes(ctx: AppContext, _actor: Actor, query: FittingTypeListQuery): Promise<{ rows: FittingType[]; total: number }> {
  const where = new Conditions();
  filterArchived(where, 'f.archived_at', query.archived);
  if (query.style) where.add(`f.style = ${where.param(query.style)}`);
  if (query.q) {
    const q = where.param(containsPattern(query.q));
    where.add(`(f.code ILIKE ${q} OR f.name ILIKE ${q} OR f.material ILIKE ${q})`);
  }
  const order = `${SORT_COLUMNS[query.sort]} ${query.dir === 'desc' ? 'DESC' : 'ASC'}, f.code, f.id`;
  const [count] = await ctx.ds.query(`SELECT count(*)::int AS n FROM fitting_types f WHERE ${where.sql}`, where.params);
  const ids: Array<{ id: string }> = await ctx.ds.query(`SELECT f.id FROM fitting_types f WHERE ${where.sql} ORDER BY ${order} ${pageSql(query)}`, where.params);
  const rows = ids.length ? await ctx.ds.getRepository(FittingType).findBy(ids.map((r) => ({ id: r.id }))) : [];
  const byId = new Map(rows.map((f) => [f.id, f]));
  return { rows: ids.flatMap((r) => byId.get(r.id) ?? []), total: (count as { n: number }).n };
}

/** The sizes as stored: rating kPa, crimp diameter and tolerance mm. */
function storedSizes(sizes: FittingTypeCreateInput['sizes']): FittingSize[] {
  return sizes.map((s) => ({ sizeCode: s.sizeCode, ratingKpa: s.rating, crimpDiameterMm: s.crimpDiameter, crimpToleranceMm: s.crimpTolerance }));
}

export async function createFittingType(ctx: AppContext, actor: Actor, input: FittingTypeCreateInput): Promise<FittingType> {
  return guardUniqueCodes(() =>
    ctx.ds.transaction(async (manager) => {
      const repo = manager.getRepository(FittingType);
      if (await repo.existsBy({ code: input.code })) throw codeTaken('fitting_types_code_key');
      const { id } = await repo.save({
        code: input.code,
        name: input.name,
        style: input.style,
        material: input.material,
        sizes: storedSizes(input.sizes),
        notes: input.notes,
      });
      const fitting = await repo.findOneByOrFail({ id });
      await recordAudit(manager, { actorId: actor.id, action: 'fitting_type.created', entityType: 'fitting_type', entityId: id, after: fitting });
      return fitting;
    }),
  );
}

/** Changes a fitting type and recomputes the stored outcomes of the assemblies that carry it. */
export async function updateFittingType(ctx: AppContext, actor: Actor, id: string, input: FittingTypeUpdateInput): Promise<FittingType> {
  return ctx.ds.transaction(async (manager) => {
    const before = await load(manager, id, true);
    const next: Partial<FittingType> = {};
    if (input.name !== undefined) next.name = input.name;
    if (input.style !== undefined) next.style = input.style;
    if (input.material !== undefined) next.material = input.material;
    if (input.sizes !== undefined) next.sizes = storedSizes(input.sizes);
    if (input.notes !== undefined) next.notes = input.notes;
    const repo = manager.getRepository(FittingType);
    if (Object.keys(next).length) await repo.update({ id }, next);
    const after = await repo.findOneByOrFail({ id });
    await recordAudit(manager, { actorId: actor.id, action: 'fitting_type.updated', entityType: 'fitting_type', entityId: id, before, after });
    await recomputeStoredOutcomes(manager, { fittingTypeIds: [id] }, ctx.clock.now());
    return after;
  });
}

/** Archives a fitting type: it leaves the pickers; assemblies that carry it keep it. Archiving twice changes nothing. */
export async function archiveFittingType(ctx: AppContext, actor: Actor, id: string): Promise<void> {
  await ctx.ds.transaction(async (manager) => {
    const before = await load(manager, id, true);
    if (before.archivedAt) return;
    const repo = manager.getRepository(FittingType);
    await repo.update({ id }, { archivedAt: ctx.clock.now() });
    const after = await repo.findOneByOrFail({ id });
    await recordAudit(manager, { actorId: actor.id, action: 'fitting_type.archived', entityType: 'fitting_type', entityId: id, before, after });
  });
}
