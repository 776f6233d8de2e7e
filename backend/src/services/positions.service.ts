import type { EntityManager } from 'typeorm';
import type { CheckOutcome } from '../../../shared/src/checks/types.js';
import { canSeeSite } from '../../../shared/src/permissions.js';
import type { PositionCreateInput, PositionListQuery, PositionUpdateInput } from '../../../shared/src/schemas/register.schema.js';
import type { ServiceSettings } from '../../../shared/src/services/service-catalogue.js';
import type { AppContext } from '../context.js';
import { Equipment, Position } from '../entities/index.js';
import { ConflictError, NotFoundError, ValidationError } from '../errors.js';
import type { Actor } from '../policies/actor.js';
import { loadAreaInScope } from './areas.service.js';
import { effectiveInterval, recomputeStoredOutcomes, serviceSettingsAt } from './assembly-checks.service.js';
import { recordAudit } from './audit.service.js';
import { loadEquipmentInScope } from './equipment.service.js';
import { codeTaken, Conditions, containsPattern, filterArchived, guardUniqueCodes, loadSiteInScope, pageSql, scopeToSites } from './sites-admin.service.js';

/** The assembly in a position now: installed, or tagged out awaiting replacement. */
export interface CurrentAssembly {
  id: string;
  number: string;
  status: string;
  checkOutcome: CheckOutcome | null;
}

/** A position with what the register shows beside it. */
export interface PositionView {
  position: Position;
  siteName: string;
  equipmentName: string;
  equipmentAssetNumber: string;
  areaId: string;
  areaName: string;
  currentAssembly: CurrentAssembly | null;
  /** Days: the position's own interval, or the service's at its site adjusted by criticality. */
  effectiveInspectionIntervalDays: number;
}

/** The position, when it exists and lies in one of the actor's sites; otherwise a 404. */
export async function loadPositionInScope(manager: EntityManager, actor: Pick<Actor, 'allSites' | 'siteIds'>, id: string, lock = false): Promise<Position> {
  const position = await manager.getRepository(Position).findOne({ where: { id }, ...(lock ? { lock: { mode: 'pessimistic_write' as const } } : {}) });
  if (!position || !canSeeSite(actor, position.siteId)) throw new NotFoundError('Position');
  return position;
}

interface ViewRow {
  id: string;
  siteName: string;
  equipmentName: string;
  equipmentAssetNumber: string;
  areaId: string;
  areaName: string;
  assemblyId: string | null;
  assemblyNumber: string | null;
  assemblyStatus: string | null;
  assemblyCheckOutcome: CheckOutcome | null;
}

/** The views of these positions, in the order of `ids`. */
export async function loadPositionViews(manager: EntityManager, ids: string[]): Promise<PositionView[]> {
  if (ids.length === 0) return [];
  const positions = await manager.getRepository(Position).findBy(ids.map((id) => ({ id })));
  const rows: ViewRow[] = await manager.query(
    `SELECT p.id, s.name AS "siteName", e.name AS "equipmentName", e.asset_number AS "equipmentAssetNumber", ar.id AS "areaId", ar.name AS "areaName",
            a.id AS "assemblyId", a.number AS "assemblyNumber", a.status AS "assemblyStatus", a.check_outcome AS "assemblyCheckOutcome"
       FROM positions p
       JOIN sites s ON s.id = p.site_id
       JOIN equipment e ON e.id = p.equipment_id
       JOIN areas ar ON ar.id = e.area_id
       LEFT JOIN assemblies a ON a.position_id = p.id AND a.status IN ('installed', 'tagged_out')
      WHERE p.id = ANY($1::uuid[])`,
    [ids],
  );
  const extras = new Map(rows.map((r) => [r.id, r]));
  // One look-up per site and service on the page, not per position.
  const settings = new Map<string, ServiceSettings | null>();
  for (const p of positions) {
    const key = `${p.siteId} ${p.serviceCode}`;
    if (!settings.has(key)) settings.set(key, await serviceSettingsAt(manager, p.siteId, p.serviceCode));
  }
  const byId = new Map(positions.map((p) => [p.id, p]));
  return ids.flatMap((id) => {
    const position = byId.get(id);
    const extra = extras.get(id);
    if (!position || !extra) return [];
    return [
      {
        position,
        siteName: extra.siteName,
        equipmentName: extra.equipmentName,
        equipmentAssetNumber: extra.equipmentAssetNumber,
        areaId: extra.areaId,
        areaName: extra.areaName,
        currentAssembly: extra.assemblyId
          ? { id: extra.assemblyId, number: extra.assemblyNumber ?? '', status: extra.assemblyStatus ?? '', checkOutcome: extra.assemblyCheckOutcome }
          : null,
        effectiveInspectionIntervalDays: effectiveInterval(position, settings.get(`${position.siteId} ${position.serviceCode}`) ?? null),
      },
    ];
  });
}

async function viewOf(manager: EntityManager, id: string): Promise<PositionView> {
  const [view] = await loadPositionViews(manager, [id]);
  if (!view) throw new NotFoundError('Position');
  return view;
}

const SORT_COLUMNS: Record<PositionListQuery['sort'], string> = {
  code: 'p.code',
  name: 'lower(p.name)',
  equipment: 'e.asset_number',
  serviceCode: 'p.service_code',
  criticality: `CASE p.criticality WHEN 'high' THEN 1 WHEN 'medium' THEN 2 WHEN 'low' THEN 3 ELSE 4 END`,
  updatedAt: 'p.updated_at',
};

const OCCUPIED = `EXISTS (SELECT 1 FROM assemblies a WHERE a.position_id = p.id AND a.status IN ('installed', 'tagged_out'))`;

export async function listPositions(ctx: AppContext, actor: Actor, query: PositionListQuery): Promise<{ rows: PositionView[]; total: number }> {
  const manager = ctx.ds.manager;
  const where = new Conditions();
  scopeToSites(where, actor, 'p.site_id');
  if (query.siteId) {
    await loadSiteInScope(manager, actor, query.siteId);
    where.add(`p.site_id = ${where.param(query.siteId)}`);
  }
  if (query.areaId) {
    await loadAreaInScope(manager, actor, query.areaId);
    where.add(`e.area_id = ${where.param(query.areaId)}`);
  }
  if (query.equipmentId) {
    await loadEquipmentInScope(manager, actor, query.equipmentId);
    where.add(`p.equipment_id = ${where.param(query.equipmentId)}`);
  }
  if (query.serviceCode) where.add(`p.service_code = ${where.param(query.serviceCode)}`);
  if (query.occupied === 'yes') where.add(OCCUPIED);
  if (query.occupied === 'no') where.add(`NOT ${OCCUPIED}`);
  filterArchived(where, 'p.archived_at', query.archived);
  if (query.q) {
    const q = where.param(containsPattern(query.q));
    where.add(`(p.code ILIKE ${q} OR p.name ILIKE ${q} OR p.notes ILIKE ${q})`);
  }
  const from = `positions p JOIN equipment e ON e.id = p.equipment_id`;
  const order = `${SORT_COLUMNS[query.sort]} ${query.dir === 'desc' ? 'DESC' : 'ASC'}, p.code, p.id`;
  const [count] = await manager.query(`SELECT count(*)::int AS n FROM ${from} WHERE ${where.sql}`, where.params);
  const ids: Array<{ id: string }> = await manager.query(`SELECT p.id FROM ${from} WHERE ${where.sql} ORDER BY ${order} ${pageSql(query)}`, where.params);
  return { rows: await loadPositionViews(manager, ids.map((r) => r.id)), total: (count as { n: number }).n };
}

export async function getPosition(ctx: AppContext, actor: Actor, id: string): Promise<PositionView> {
  await loadPositionInScope(ctx.ds.manager, actor, id);
  return viewOf(ctx.ds.manager, id);
}

/** The columns of a position's design conditions: changing one changes the checks of the assembly in it. */
const DESIGN_COLUMNS = [
  'serviceCode',
  'mediumCode',
  'maxOperatingPressureKpa',
  'minTempC',
  'maxTempC',
  'sizeCode',
  'requiredLengthMm',
  'endAConnection',
  'endBConnection',
  'suctionDuty',
  'routedBendRadiusMm',
  'criticality',
  'inspectionIntervalDays',
] as const satisfies ReadonlyArray<keyof Position>;
type DesignColumn = (typeof DESIGN_COLUMNS)[number];

/** The design conditions given in an input, as stored columns (kPa, mm, °C); fields left out are left out. */
function designColumns(input: Partial<PositionUpdateInput>): Partial<Pick<Position, DesignColumn>> {
  const out: Partial<Pick<Position, DesignColumn>> = {};
  if (input.serviceCode !== undefined) out.serviceCode = input.serviceCode;
  if (input.mediumCode !== undefined) out.mediumCode = input.mediumCode;
  if (input.maxOperatingPressure !== undefined) out.maxOperatingPressureKpa = input.maxOperatingPressure;
  if (input.minTemp !== undefined) out.minTempC = input.minTemp;
  if (input.maxTemp !== undefined) out.maxTempC = input.maxTemp;
  if (input.sizeCode !== undefined) out.sizeCode = input.sizeCode;
  if (input.requiredLength !== undefined) out.requiredLengthMm = input.requiredLength;
  if (input.endAConnection !== undefined) out.endAConnection = input.endAConnection;
  if (input.endBConnection !== undefined) out.endBConnection = input.endBConnection;
  if (input.suctionDuty !== undefined) out.suctionDuty = input.suctionDuty;
  if (input.routedBendRadius !== undefined) out.routedBendRadiusMm = input.routedBendRadius;
  if (input.criticality !== undefined) out.criticality = input.criticality;
  if (input.inspectionIntervalDays !== undefined) out.inspectionIntervalDays = input.inspectionIntervalDays;
  return out;
}

function assertTemperatureOrder(v: Pick<Position, 'minTempC' | 'maxTempC'>): void {
  if (v.minTempC != null && v.maxTempC != null && v.minTempC > v.maxTempC) {
    throw new ValidationError('The highest temperature must be at least the lowest', 'maxTemp');
  }
}

/** The equipment a position is put on: one of the actor's, not archived. */
async function targetEquipment(manager: EntityManager, actor: Actor, equipmentId: string): Promise<Equipment> {
  const equipment = await loadEquipmentInScope(manager, actor, equipmentId);
  if (equipment.archivedAt) throw new ValidationError('This equipment is archived', 'equipmentId', 'parent_archived');
  return equipment;
}

async function assertCodeFree(manager: EntityManager, siteId: string, code: string): Promise<void> {
  if (await manager.getRepository(Position).existsBy({ siteId, code })) throw codeTaken('positions_site_code_key');
}

export async function createPosition(ctx: AppContext, actor: Actor, input: PositionCreateInput): Promise<PositionView> {
  return guardUniqueCodes(() =>
    ctx.ds.transaction(async (manager) => {
      const equipment = await targetEquipment(manager, actor, input.equipmentId);
      await assertCodeFree(manager, equipment.siteId, input.code);
      const { id } = await manager.getRepository(Position).save({
        siteId: equipment.siteId,
        equipmentId: equipment.id,
        code: input.code,
        name: input.name,
        notes: input.notes ?? null,
        mediumCode: null,
        maxOperatingPressureKpa: null,
        minTempC: null,
        maxTempC: null,
        requiredLengthMm: null,
        endAConnection: null,
        endBConnection: null,
        suctionDuty: null,
        routedBendRadiusMm: null,
        criticality: 'medium',
        inspectionIntervalDays: null,
        ...designColumns(input),
        serviceCode: input.serviceCode,
        sizeCode: input.sizeCode,
      });
      const position = await manager.getRepository(Position).findOneByOrFail({ id });
      await recordAudit(manager, { actorId: actor.id, action: 'position.created', entityType: 'position', entityId: id, siteId: position.siteId, after: position });
      return viewOf(manager, id);
    }),
  );
}

/**
 * Changes a position. A change of its design conditions is audited as such, with the reason
 * given, and the stored check outcome of the assembly in it is recomputed in the same transaction.
 */
export async function updatePosition(ctx: AppContext, actor: Actor, id: string, input: PositionUpdateInput): Promise<PositionView> {
  return ctx.ds.transaction(async (manager) => {
    const before = await loadPositionInScope(manager, actor, id, true);
    const next: Partial<Position> = {};
    if (input.name !== undefined) next.name = input.name;
    if (input.notes !== undefined) next.notes = input.notes;
    if (input.equipmentId !== undefined && input.equipmentId !== before.equipmentId) {
      const equipment = await targetEquipment(manager, actor, input.equipmentId);
      // The position's code, events and assembly belong to its site: it moves only within the site.
      if (equipment.siteId !== before.siteId) throw new ValidationError('A position can move only to other equipment of the same site', 'equipmentId');
      next.equipmentId = equipment.id;
    }
    const design = designColumns(input);
    const designChanged = DESIGN_COLUMNS.some((c) => c in design && design[c] !== before[c]);
    Object.assign(next, design);
    assertTemperatureOrder({ minTempC: next.minTempC !== undefined ? next.minTempC : before.minTempC, maxTempC: next.maxTempC !== undefined ? next.maxTempC : before.maxTempC });
    if (Object.keys(next).length) await manager.getRepository(Position).update({ id }, next);
    const after = await manager.getRepository(Position).findOneByOrFail({ id });
    if (designChanged) {
      await recordAudit(manager, {
        actorId: actor.id,
        action: 'position.design_changed',
        entityType: 'position',
        entityId: id,
        siteId: after.siteId,
        before,
        after: { ...after, reason: input.reason ?? null },
      });
      await recomputeStoredOutcomes(manager, { positionIds: [id] }, ctx.clock.now());
    } else {
      await recordAudit(manager, { actorId: actor.id, action: 'position.updated', entityType: 'position', entityId: id, siteId: after.siteId, before, after });
    }
    return viewOf(manager, id);
  });
}

/** Archives an empty position; one with an assembly in it (installed or tagged out) is refused. */
export async function archivePosition(ctx: AppContext, actor: Actor, id: string): Promise<void> {
  await ctx.ds.transaction(async (manager) => {
    const before = await loadPositionInScope(manager, actor, id, true);
    if (before.archivedAt) return;
    const current: Array<{ number: string }> = await manager.query(
      `SELECT number FROM assemblies WHERE position_id = $1 AND status IN ('installed', 'tagged_out') FOR UPDATE`,
      [id],
    );
    if (current[0]) {
      throw new ConflictError('position_occupied', `Assembly ${current[0].number} is in this position; remove it before archiving the position`);
    }
    await manager.getRepository(Position).update({ id }, { archivedAt: ctx.clock.now() });
    const after = await manager.getRepository(Position).findOneByOrFail({ id });
    await recordAudit(manager, { actorId: actor.id, action: 'position.archived', entityType: 'position', entityId: id, siteId: after.siteId, before, after });
  });
}
