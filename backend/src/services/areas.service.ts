import type { EntityManager } from 'typeorm';
import { canSeeSite } from '../../../shared/src/permissions.js';
import type { AreaCreateInput, AreaListQuery, AreaUpdateInput } from '../../../shared/src/schemas/register.schema.js';
import type { AppContext } from '../context.js';
import { Area } from '../entities/index.js';
import { ConflictError, NotFoundError, ValidationError } from '../errors.js';
import type { Actor } from '../policies/actor.js';
import { recordAudit } from './audit.service.js';
import { codeTaken, Conditions, containsPattern, filterArchived, guardUniqueCodes, loadSiteInScope, pageSql, scopeToSites } from './sites-admin.service.js';

/** The area, when it exists and lies in one of the actor's sites; otherwise a 404. */
export async function loadAreaInScope(manager: EntityManager, actor: Pick<Actor, 'allSites' | 'siteIds'>, id: string, lock = false): Promise<Area> {
  const area = await manager.getRepository(Area).findOne({ where: { id }, ...(lock ? { lock: { mode: 'pessimistic_write' as const } } : {}) });
  if (!area || !canSeeSite(actor, area.siteId)) throw new NotFoundError('Area');
  return area;
}

const SORT_COLUMNS: Record<AreaListQuery['sort'], string> = { code: 'ar.code', name: 'lower(ar.name)' };

export async function listAreas(ctx: AppContext, actor: Actor, query: AreaListQuery): Promise<{ rows: Area[]; total: number }> {
  const where = new Conditions();
  scopeToSites(where, actor, 'ar.site_id');
  if (query.siteId) {
    await loadSiteInScope(ctx.ds.manager, actor, query.siteId);
    where.add(`ar.site_id = ${where.param(query.siteId)}`);
  }
  filterArchived(where, 'ar.archived_at', query.archived);
  if (query.q) {
    const q = where.param(containsPattern(query.q));
    where.add(`(ar.code ILIKE ${q} OR ar.name ILIKE ${q})`);
  }
  const order = `${SORT_COLUMNS[query.sort]} ${query.dir === 'desc' ? 'DESC' : 'ASC'}, ar.id`;
  const [count] = await ctx.ds.query(`SELECT count(*)::int AS n FROM areas ar WHERE ${where.sql}`, where.params);
  const ids: Array<{ id: string }> = await ctx.ds.query(`SELECT ar.id FROM areas ar WHERE ${where.sql} ORDER BY ${order} ${pageSql(query)}`, where.params);
  const areas = ids.length ? await ctx.ds.getRepository(Area).findBy(ids.map((r) => ({ id: r.id }))) : [];
  const byId = new Map(areas.map((a) => [a.id, a]));
  return { rows: ids.flatMap((r) => byId.get(r.id) ?? []), total: (count as { n: number }).n };
}

async function assertCodeFree(manager: EntityManager, siteId: string, code: string): Promise<void> {
  if (await manager.getRepository(Area).existsBy({ siteId, code })) throw codeTaken('areas_site_code_key');
}

export async function createArea(ctx: AppContext, actor: Actor, input: AreaCreateInput): Promise<Area> {
  return guardUniqueCodes(() =>
    ctx.ds.transaction(async (manager) => {
      const site = await loadSiteInScope(manager, actor, input.siteId);
      if (site.archivedAt) throw new ValidationError('This site is archived', 'siteId', 'parent_archived');
      await assertCodeFree(manager, site.id, input.code);
      const { id } = await manager.getRepository(Area).save({ siteId: site.id, code: input.code, name: input.name });
      const area = await manager.getRepository(Area).findOneByOrFail({ id });
      await recordAudit(manager, { actorId: actor.id, action: 'area.created', entityType: 'area', entityId: id, siteId: site.id, after: area });
      return area;
    }),
  );
}

export async function updateArea(ctx: AppContext, actor: Actor, id: string, input: AreaUpdateInput): Promise<Area> {
  return guardUniqueCodes(() =>
    ctx.ds.transaction(async (manager) => {
      const before = await loadAreaInScope(manager, actor, id, true);
      const next: Partial<Area> = {};
      if (input.code !== undefined && input.code !== before.code) {
        await assertCodeFree(manager, before.siteId, input.code);
        next.code = input.code;
      }
      if (input.name !== undefined) next.name = input.name;
      if (Object.keys(next).length) await manager.getRepository(Area).update({ id }, next);
      const after = await manager.getRepository(Area).findOneByOrFail({ id });
      await recordAudit(manager, { actorId: actor.id, action: 'area.updated', entityType: 'area', entityId: id, siteId: after.siteId, before, after });
      return after;
    }),
  );
}

/** Archives an area whose equipment is archived already; archiving twice changes nothing. */
export async function archiveArea(ctx: AppContext, actor: Actor, id: string): Promise<void> {
  await ctx.ds.transaction(async (manager) => {
    const before = await loadAreaInScope(manager, actor, id, true);
    if (before.archivedAt) return;
    const [live] = await manager.query(`SELECT count(*)::int AS n FROM equipment WHERE area_id = $1 AND archived_at IS NULL`, [id]);
    const n = (live as { n: number }).n;
    if (n > 0) throw new ConflictError('area_in_use', `Archive the ${n} piece${n === 1 ? '' : 's'} of equipment in this area first`);
    await manager.getRepository(Area).update({ id }, { archivedAt: ctx.clock.now() });
    const after = await manager.getRepository(Area).findOneByOrFail({ id });
    await recordAudit(manager, { actorId: actor.id, action: 'area.archived', entityType: 'area', entityId: id, siteId: after.siteId, before, after });
  });
}
