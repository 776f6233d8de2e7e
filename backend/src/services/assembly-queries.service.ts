import type { AssemblyEventDto, AssemblyListItemDto, AssemblyListQuery, OverrideDto, PositionLifeDto } from '../../../shared/src/schemas/assemblies.schema.js';
import { parseTagCode } from '../../../shared/src/tags/tag-code.js';
import type { AppContext } from '../context.js';
import { NotFoundError } from '../errors.js';
import type { Actor } from '../policies/actor.js';

/** The register's sort columns in SQL; the list and the export order alike. */
export const REGISTER_SORTS: Record<AssemblyListQuery['sort'], string> = {
  number: 'a.number',
  construction: 'c.code',
  position: 'p.code',
  status: 'a.status',
  checkOutcome: `CASE a.check_outcome WHEN 'fail' THEN 0 WHEN 'warn' THEN 1 WHEN 'pass' THEN 2 ELSE 3 END`,
  nextInspectionDue: 'a.next_inspection_due',
  installedAt: 'a.installed_at',
  updatedAt: 'a.updated_at',
};

const LIST_COLUMNS = `a.id, a.number, a.status, a.site_id AS "siteId", s.name AS "siteName",
  c.id AS "constructionId", c.code AS "constructionCode", c.name AS "constructionName", c.size_code AS "sizeCode",
  p.id AS "positionId", p.code AS "positionCode", p.name AS "positionName", e.name AS "equipmentName", e.asset_number AS "equipmentAssetNumber", ar.name AS "areaName", p.service_code AS "serviceCode",
  a.check_outcome AS "checkOutcome",
  EXISTS (SELECT 1 FROM check_overrides o WHERE o.assembly_id = a.id AND o.position_id = a.position_id) AS overridden,
  a.next_inspection_due::text AS "nextInspectionDue", a.installed_at AS "installedAt", a.updated_at AS "updatedAt"`;

const LIST_FROM = `FROM assemblies a
  JOIN sites s ON s.id = a.site_id
  JOIN constructions c ON c.id = a.construction_id
  LEFT JOIN positions p ON p.id = a.position_id
  LEFT JOIN equipment e ON e.id = p.equipment_id
  LEFT JOIN areas ar ON ar.id = e.area_id`;

interface ListRow {
  id: string;
  number: string;
  status: AssemblyListItemDto['status'];
  siteId: string;
  siteName: string;
  constructionId: string;
  constructionCode: string;
  constructionName: string;
  sizeCode: string;
  positionId: string | null;
  positionCode: string | null;
  positionName: string | null;
  equipmentName: string | null;
  equipmentAssetNumber: string | null;
  areaName: string | null;
  serviceCode: string | null;
  checkOutcome: AssemblyListItemDto['checkOutcome'];
  overridden: boolean;
  nextInspectionDue: string | null;
  installedAt: Date | null;
  updatedAt: Date;
}

export function presentListRow(r: ListRow): AssemblyListItemDto {
  return {
    id: r.id,
    number: r.number,
    status: r.status,
    siteId: r.siteId,
    siteName: r.siteName,
    construction: { id: r.constructionId, code: r.constructionCode, name: r.constructionName, sizeCode: r.sizeCode },
    position: r.positionId
      ? { id: r.positionId, code: r.positionCode!, name: r.positionName!, equipmentName: r.equipmentName!, equipmentAssetNumber: r.equipmentAssetNumber!, areaName: r.areaName!, serviceCode: r.serviceCode! }
      : null,
    checkOutcome: r.checkOutcome,
    overridden: r.overridden,
    nextInspectionDue: r.nextInspectionDue,
    installedAt: r.installedAt?.toISOString() ?? null,
    updatedAt: r.updatedAt.toISOString(),
  };
}

/** The WHERE clause of the register for a query, scoped to the actor's sites. */
export function registerWhere(actor: Actor, query: Omit<AssemblyListQuery, 'page' | 'pageSize' | 'sort' | 'dir'>, today: string): { sql: string; params: unknown[] } {
  const where: string[] = [];
  const params: unknown[] = [];
  const add = (sql: (n: string) => string, value: unknown) => {
    params.push(value);
    where.push(sql(`$${params.length}`));
  };
  if (!actor.allSites) add((n) => `a.site_id = ANY(${n}::uuid[])`, actor.siteIds);
  if (query.siteId) add((n) => `a.site_id = ${n}`, query.siteId);
  if (query.areaId) add((n) => `e.area_id = ${n}`, query.areaId);
  if (query.equipmentId) add((n) => `p.equipment_id = ${n}`, query.equipmentId);
  if (query.positionId) add((n) => `a.position_id = ${n}`, query.positionId);
  if (query.serviceCode) add((n) => `p.service_code = ${n}`, query.serviceCode);
  if (query.constructionId) add((n) => `a.construction_id = ${n}`, query.constructionId);
  if (query.sizeCode) add((n) => `c.size_code = ${n}`, query.sizeCode);
  if (query.status?.length) add((n) => `a.status = ANY(${n}::text[])`, query.status);
  if (query.checkOutcome) add((n) => `a.check_outcome = ${n}`, query.checkOutcome);
  if (query.due) {
    const days = query.due === 'overdue' ? 0 : query.due === 'within-7-days' ? 7 : 30;
    const limit = new Date(new Date(`${today}T00:00:00Z`).getTime() + days * 86_400_000).toISOString().slice(0, 10);
    // Overdue is before today; "within N days" is from today to N days on, overdue ones apart.
    if (days === 0) add((n) => `a.next_inspection_due < ${n}::date`, limit);
    else {
      add((n) => `a.next_inspection_due >= ${n}::date`, today);
      add((n) => `a.next_inspection_due <= ${n}::date`, limit);
    }
  }
  if (query.q) {
    const like = `%${query.q.replace(/[\\%_]/g, (c) => `\\${c}`)}%`;
    const tag = parseTagCode(query.q);
    params.push(like, tag ?? '');
    const l = `$${params.length - 1}`;
    const t = `$${params.length}`;
    where.push(
      `(a.number = ${t} OR a.number ILIKE ${l} OR c.code ILIKE ${l} OR p.code ILIKE ${l} OR p.name ILIKE ${l} OR e.asset_number ILIKE ${l} OR e.name ILIKE ${l} OR a.notes ILIKE ${l} OR a.hose_batch ILIKE ${l})`,
    );
  }
  return { sql: where.length ? `WHERE ${where.join(' AND ')}` : '', params };
}

export async function listAssemblies(ctx: AppContext, actor: Actor, query: AssemblyListQuery): Promise<{ rows: AssemblyListItemDto[]; total: number }> {
  const today = ctx.clock.now().toISOString().slice(0, 10);
  const { sql, params } = registerWhere(actor, query, today);
  const dir = query.dir === 'desc' ? 'DESC' : 'ASC';
  const order = `${REGISTER_SORTS[query.sort]} ${dir} NULLS LAST, a.number ${dir}`;
  const [count] = await ctx.ds.query(`SELECT count(*)::int AS n ${LIST_FROM} ${sql}`, params);
  const rows: ListRow[] = await ctx.ds.query(
    `SELECT ${LIST_COLUMNS} ${LIST_FROM} ${sql} ORDER BY ${order} LIMIT ${query.pageSize} OFFSET ${(query.page - 1) * query.pageSize}`,
    params,
  );
  return { rows: rows.map(presentListRow), total: count.n };
}

export async function listEvents(ctx: AppContext, actor: Actor, assemblyId: string): Promise<AssemblyEventDto[]> {
  const [assembly] = await ctx.ds.query(`SELECT site_id AS "siteId" FROM assemblies WHERE id = $1`, [assemblyId]);
  if (!assembly || !(actor.allSites || actor.siteIds.includes(assembly.siteId))) throw new NotFoundError('Assembly');
  return eventsWhere(ctx, 'ev.assembly_id = $1', [assemblyId]);
}

export async function eventsWhere(ctx: AppContext, where: string, params: unknown[]): Promise<AssemblyEventDto[]> {
  const rows = await ctx.ds.query(
    `SELECT ev.id, ev.kind, ev.occurred_at AS "occurredAt", ev.occurred_at_estimated AS "occurredAtEstimated", ev.recorded_at AS "recordedAt",
            u.name AS "actorName", ev.position_id AS "positionId", p.code AS "positionCode", ev.site_id AS "siteId", ev.work_order AS "workOrder",
            ev.hour_meter_hours AS "hourMeterHours", ev.note, ev.data, ev.voids_event_id AS "voidsEventId",
            v.id AS "voidId", v.note AS "voidReason", v.recorded_at AS "voidAt"
       FROM assembly_events ev
       LEFT JOIN users u ON u.id = ev.actor_id
       LEFT JOIN positions p ON p.id = ev.position_id
       LEFT JOIN assembly_events v ON v.voids_event_id = ev.id
      WHERE ${where}
      ORDER BY ev.occurred_at DESC, ev.recorded_at DESC,
               array_position(ARRAY['void','note','inspection','scrap','return_to_stock','remove','tag_out','override','install','proof_test','build']::text[], ev.kind), ev.id`,
    params,
  );
  return rows.map((r: Record<string, any>) => ({
    id: r.id,
    kind: r.kind,
    occurredAt: r.occurredAt.toISOString(),
    occurredAtEstimated: r.occurredAtEstimated,
    recordedAt: r.recordedAt.toISOString(),
    actorName: r.actorName,
    positionId: r.positionId,
    positionCode: r.positionCode,
    siteId: r.siteId,
    workOrder: r.workOrder,
    hourMeterHours: r.hourMeterHours,
    note: r.note,
    data: r.data,
    voidsEventId: r.voidsEventId,
    voidedBy: r.voidId ? { eventId: r.voidId, reason: r.voidReason, at: r.voidAt.toISOString() } : null,
  }));
}

export async function overridesOf(ctx: AppContext, assemblyId: string, positionId: string | null): Promise<OverrideDto[]> {
  if (!positionId) return [];
  const rows = await ctx.ds.query(
    `SELECT o.id, o.check_code AS "checkCode", o.reason, o.review_on::text AS "reviewOn", u.name AS "actorName", o.created_at AS "createdAt"
       FROM check_overrides o LEFT JOIN users u ON u.id = o.actor_id
      WHERE o.assembly_id = $1 AND o.position_id = $2 ORDER BY o.created_at`,
    [assemblyId, positionId],
  );
  return rows.map((r: Record<string, any>) => ({ ...r, createdAt: r.createdAt.toISOString() }));
}

/** Every assembly that has been at a position, newest first, with its life there. */
export async function positionHistory(ctx: AppContext, actor: Actor, positionId: string): Promise<PositionLifeDto[]> {
  const [position] = await ctx.ds.query(`SELECT site_id AS "siteId" FROM positions WHERE id = $1`, [positionId]);
  if (!position || !(actor.allSites || actor.siteIds.includes(position.siteId))) throw new NotFoundError('Position');
  const rows = await ctx.ds.query(
    `SELECT i.assembly_id AS "assemblyId", a.number AS "assemblyNumber", c.code AS "constructionCode",
            i.occurred_at AS "installedAt", i.occurred_at_estimated AS "installedAtEstimated", i.hour_meter_hours AS "hoursIn",
            r.occurred_at AS "removedAt", r.hour_meter_hours AS "hoursOut", r.data->>'reason' AS "removalReason", r.data->>'lifeOutcome' AS "lifeOutcome"
       FROM assembly_events i
       JOIN assemblies a ON a.id = i.assembly_id
       JOIN constructions c ON c.id = a.construction_id
       LEFT JOIN LATERAL (
         SELECT * FROM assembly_events r
          WHERE r.assembly_id = i.assembly_id AND r.position_id = i.position_id AND r.kind = 'remove' AND r.occurred_at >= i.occurred_at
            AND NOT EXISTS (SELECT 1 FROM assembly_events v WHERE v.voids_event_id = r.id)
          ORDER BY r.occurred_at LIMIT 1) r ON TRUE
      WHERE i.position_id = $1 AND i.kind = 'install' AND NOT EXISTS (SELECT 1 FROM assembly_events v WHERE v.voids_event_id = i.id)
      ORDER BY i.occurred_at DESC`,
    [positionId],
  );
  const now = ctx.clock.now();
  return rows.map((r: Record<string, any>) => {
    const end: Date = r.removedAt ?? now;
    return {
      assemblyId: r.assemblyId,
      assemblyNumber: r.assemblyNumber,
      constructionCode: r.constructionCode,
      installedAt: r.installedAt.toISOString(),
      installedAtEstimated: r.installedAtEstimated,
      removedAt: r.removedAt?.toISOString() ?? null,
      daysInService: Math.max(0, Math.round(((end.getTime() - r.installedAt.getTime()) / 86_400_000) * 10) / 10),
      hoursInService: r.hoursIn != null && r.hoursOut != null ? r.hoursOut - r.hoursIn : null,
      removalReason: r.removalReason,
      lifeOutcome: r.lifeOutcome,
      current: r.removedAt == null,
    };
  });
}
