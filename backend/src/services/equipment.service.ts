import type { EntityManager } from 'typeorm';
import { canSeeSite } from '../../../shared/src/permissions.js';
import type { EquipmentCreateInput, EquipmentListQuery, EquipmentUpdateInput } from '../../../shared/src/schemas/register.schema.js';
import type { AppContext } from '../context.js';
import { Area, Equipment } from '../entities/index.js';
import { ConflictError, NotFoundError, ValidationError } from '../errors.js';
import type { Actor } from '../policies/actor.js';
import { loadAreaInScope } from './areas.service.js';
import { recordAudit } from './audit.service.js';
import { codeTaken, Conditions, containsPattern, filterArchived, guardUniqueCodes, loadSiteInScope, pageSql, scopeToSites } from './sites-admin.service.js';

/** A piece of equipment with the name of its area, as the register shows it. */
export interface EquipmentView {
  equipment: Equipment;
  areaName: string;
}

/** The equipment, when it exists and lies in one of the actor's sites; otherwise a 404. */
export async function loadEquipmentInScope(manager: EntityManager, actor: Pick<Actor, 'allSites' | 'siteIds'>, id: string, lock = false): Promise<Equipment> {
  const equipment = await manager.getRepository(Equipment).findOne({ where: { id }, ...(lock ? { lock: { mode: 'pessimistic_write' as const } } : {}) });
  if (!equipment || !canSeeSite(actor, equipment.siteId)) throw new NotFoundError('Equipment');
  return equipment;
}

async function views(manager: EntityManager, ids: string[]): Promise<EquipmentView[]> {
  if (ids.length === 0) return [];
  const rows = await manager.getRepository(Equipment).findBy(ids.map((id) => ({ id })));
  const areas = await manager.getRepository(Area).findBy([...new Set(rows.map((e) => e.areaId))].map((id) => ({ id })));
  const areaNames = new Map(areas.map((a) => [a.id, a.name]));
  const byId = new Map(rows.map((e) => [e.id, e]));
  return ids.flatMap((id) => {
    const equipment = byId.get(id);
    return equipment ? [{ equipment, areaName: areaNames.get(equipment.areaId) ?? '' }] : [];
  });
}

const SORT_COLUMNS: Record<EquipmentListQuery['sort'], string> = { assetNumber: 'e.asset_number', name: 'lower(e.name)' };

export async function listEquipment(ctx: AppContext, actor: Actor, query: EquipmentListQuery): Promise<{ rows: EquipmentView[]; total: number }> {
  const where = new Conditions();
  scopeToSites(where, actor, 'e.site_id');
  if (query.siteId) {
    await loadSiteInScope(ctx.ds.manager, actor, query.siteId);
    where.add(`e.site_id = ${where.param(query.siteId)}`);
  }
  if (query.areaId) {
    await loadAreaInScope(ctx.ds.manager, actor, query.areaId);
    where.add(`e.area_id = ${where.param(query.areaId)}`);
  }
  filterArchived(where, 'e.archived_at', query.archived);
  if (query.q) {
    const q = where.param(containsPattern(query.q));
    where.add(`(e.asset_number ILIKE ${q} OR e.name ILIKE ${q})`);
  }
  const order = `${SORT_COLUMNS[query.sort]} ${query.dir === 'desc' ? 'DESC' : 'ASC'}, e.id`;
  const [count] = await ctx.ds.query(`SELECT count(*)::int AS n FROM equipment e WHERE ${where.sql}`, where.params);
  const ids: Array<{ id: string }> = await ctx.ds.query(`SELECT e.id FROM equipment e WHERE ${where.sql} ORDER BY ${order} ${pageSql(query)}`, where.params);
  return { rows: await views(ctx.ds.manager, ids.map((r) => r.id)), total: (count as { n: number }).n };
}

export async function getEquipment(ctx: AppContext, actor: Actor, id: string): Promise<EquipmentView> {
  const equipment = await loadEquipmentInScope(ctx.ds.manager, actor, id);
  const [view] = await views(ctx.ds.manager, [equipment.id]);
  return view!;
}

async function assertAssetNumberFree(manager: EntityManager, siteId: string, assetNumber: string): Promise<void> {
  if (await manager.getRepository(Equipment).existsBy({ siteId, assetNumber })) throw codeTaken('equipment_site_asset_number_key');
}

/** The area new or moved equipment goes into: one of the actor's, not archived. */
async function targetArea(manager: EntityManager, actor: Actor, areaId: string): Promise<Area> {
  const area = await loadAreaInScope(manager, actor, areaId);
  if (area.archivedAt) throw new ValidationError('This area is archived', 'areaId', 'parent_archived');
  return area;
}

export async function createEquipment(ctx: AppContext, actor: Actor, input: EquipmentCreateInput): Promise<EquipmentView> {
  return guardUniqueCodes(() =>
    ctx.ds.transaction(async (manager) => {
      const area = await targetArea(manager, actor, input.areaId);
      await assertAssetNumberFree(manager, area.siteId, input.assetNumber);
      const { id } = await manager.getRepository(Equipment).save({
        siteId: area.siteId,
        areaId: area.id,
        assetNumber: input.assetNumber,
        name: input.name,
        hasHourMeter: input.hasHourMeter,
      });
      const equipment = await manager.getRepository(Equipment).findOneByOrFail({ id });
      await recordAudit(manager, { actorId: actor.id, action: 'equipment.created', entityType: 'equipment', entityId: id, siteId: area.siteId, after: equipment });
      return { equipment, areaName: area.name };
    }),
  );
}

export async function updateEquipment(ctx: AppContext, actor: Actor, id: string, input: EquipmentUpdateInput): Promise<EquipmentView> {
  return guardUniqueCodes(() =>
    ctx.ds.transaction(async (manager) => {
      const before = await loadEquipmentInScope(manager, actor, id, true);
      const next: Partial<Equipment> = {};
      if (input.areaId !== undefined && input.areaId !== before.areaId) {
        const area = await targetArea(manager, actor, input.areaId);
        // Its positions, their codes and the assemblies in them belong to the site: equipment stays in its site.
        if (area.siteId !== before.siteId) throw new ValidationError('Equipment can move only to another area of the same site', 'areaId');
        next.areaId = area.id;
      }
      if (input.assetNumber !== undefined && input.assetNumber !== before.assetNumber) {
        await assertAssetNumberFree(manager, before.siteId, input.assetNumber);
        next.assetNumber = input.assetNumber;
      }
      if (input.name !== undefined) next.name = input.name;
      if (input.hasHourMeter !== undefined) next.hasHourMeter = input.hasHourMeter;
      if (Object.keys(next).length) await manager.getRepository(Equipment).update({ id }, next);
      const after = await manager.getRepository(Equipment).findOneByOrFail({ id });
      await recordAudit(manager, { actorId: actor.id, action: 'equipment.updated', entityType: 'equipment', entityId: id, siteId: after.siteId, before, after });
      const [view] = await views(manager, [id]);
      return view!;
    }),
  );
}

/** Archives equipment whose positions are archived already; archiving twice changes nothing. */
export async function archiveEquipment(ctx: AppContext, actor: Actor, id: string): Promise<void> {
  await ctx.ds.transaction(async (manager) => {
    const before = await loadEquipmentInScope(manager, actor, id, true);
    if (before.archivedAt) return;
    const [live] = await manager.query(`SELECT count(*)::int AS n FROM positions WHERE equipment_id = $1 AND archived_at IS NULL`, [id]);
    const n = (live as { n: number }).n;
    if (n > 0) throw new ConflictError('equipment_in_use', `Archive the ${n} position${n === 1 ? '' : 's'} on this equipment first`);
    await manager.getRepository(Equipment).update({ id }, { archivedAt: ctx.clock.now() });
    const after = await manager.getRepository(Equipment).findOneByOrFail({ id });
    await recordAudit(manager, { actorId: actor.id, action: 'equipment.archived', entityType: 'equipment', entityId: id, siteId: after.siteId, before, after });
  });
}
