import { QueryFailedError, type EntityManager } from 'typeorm';
import { canSeeSite } from '../../../shared/src/permissions.js';
import type { ArchivedFilter, SiteCreateInput, SiteUpdateInput } from '../../../shared/src/schemas/register.schema.js';
import { defaultServiceSettings, SERVICE_CATALOGUE } from '../../../shared/src/services/service-catalogue.js';
import type { AppContext } from '../context.js';
import { Site, SiteService } from '../entities/index.js';
import { ConflictError, ForbiddenError, NotFoundError } from '../errors.js';
import type { Actor } from '../policies/actor.js';
import { recordAudit } from './audit.service.js';

// ── Shared by the register's services ─────────────────────────────────────────────────────────

/** The conditions and parameters of one SQL query, built up filter by filter. */
export class Conditions {
  readonly parts: string[] = [];
  readonly params: unknown[] = [];

  /** Adds a parameter and answers its placeholder. */
  param(value: unknown): string {
    this.params.push(value);
    return `$${this.params.length}`;
  }

  add(sql: string): void {
    this.parts.push(sql);
  }

  get sql(): string {
    return this.parts.length ? this.parts.join(' AND ') : 'TRUE';
  }
}

/** Keeps only rows of the actor's sites; `column` is the row's site id. */
export function scopeToSites(where: Conditions, actor: Pick<Actor, 'allSites' | 'siteIds'>, column: string): void {
  if (!actor.allSites) where.add(`${column} = ANY(${where.param(actor.siteIds)}::uuid[])`);
}

/** Archived rows are left out unless asked for. */
export function filterArchived(where: Conditions, column: string, archived: ArchivedFilter): void {
  if (archived === 'exclude') where.add(`${column} IS NULL`);
  if (archived === 'only') where.add(`${column} IS NOT NULL`);
}

/** An ILIKE pattern that matches `q` anywhere, with the wildcards in `q` taken literally. */
export function containsPattern(q: string): string {
  return `%${q.replace(/[\\%_]/g, (c) => `\\${c}`)}%`;
}

/** LIMIT and OFFSET of a page; both numbers come from the parsed query. */
export function pageSql(query: { page: number; pageSize: number }): string {
  return `LIMIT ${Math.trunc(query.pageSize)} OFFSET ${Math.trunc((query.page - 1) * query.pageSize)}`;
}

/** The unique indexes of the register, the field each protects and what a person is told. */
const UNIQUE_CODES = {
  sites_code_key: { field: 'code', message: 'Another site has this code' },
  areas_site_code_key: { field: 'code', message: 'Another area of this site has this code' },
  equipment_site_asset_number_key: { field: 'assetNumber', message: 'Other equipment at this site has this asset number' },
  positions_site_code_key: { field: 'code', message: 'Another position at this site has this code' },
  constructions_code_key: { field: 'code', message: 'Another construction has this code' },
  fitting_types_code_key: { field: 'code', message: 'Another fitting type has this code' },
} as const;
export type UniqueCode = keyof typeof UNIQUE_CODES;

export function codeTaken(index: UniqueCode): ConflictError {
  const { field, message } = UNIQUE_CODES[index];
  return new ConflictError('code_taken', message, field);
}

/**
 * Runs `work` and answers a unique violation (PostgreSQL 23505) of one of the register's codes as
 * the same 409 the check before the insert gives: two people saving the same code at once.
 */
export async function guardUniqueCodes<T>(work: () => Promise<T>): Promise<T> {
  try {
    return await work();
  } catch (err) {
    if (err instanceof QueryFailedError) {
      const driver = err.driverError as { code?: string; constraint?: string };
      if (driver.code === '23505' && driver.constraint && driver.constraint in UNIQUE_CODES) throw codeTaken(driver.constraint as UniqueCode);
    }
    throw err;
  }
}

/** The site, when it exists and is one of the actor's; otherwise a 404, never a 403. */
export async function loadSiteInScope(manager: EntityManager, actor: Pick<Actor, 'allSites' | 'siteIds'>, id: string, lock = false): Promise<Site> {
  if (!canSeeSite(actor, id)) throw new NotFoundError('Site');
  const site = await manager.getRepository(Site).findOne({ where: { id }, ...(lock ? { lock: { mode: 'pessimistic_write' as const } } : {}) });
  if (!site) throw new NotFoundError('Site');
  return site;
}

// ── Sites ─────────────────────────────────────────────────────────────────────────────────────

export const getSite = (ctx: AppContext, actor: Actor, id: string) => loadSiteInScope(ctx.ds.manager, actor, id);

/**
 * Adds a site with every catalogue service at its default settings. Only an administrator with
 * access to all sites adds one: anyone limited to some sites could not see the site they made.
 */
export async function createSite(ctx: AppContext, actor: Actor, input: SiteCreateInput): Promise<Site> {
  if (!actor.allSites) throw new ForbiddenError('Only an administrator with access to all sites can add a site', 'all_sites_required');
  return guardUniqueCodes(() =>
    ctx.ds.transaction(async (manager) => {
      const repo = manager.getRepository(Site);
      if (await repo.existsBy({ code: input.code })) throw codeTaken('sites_code_key');
      const { id } = await repo.save({
        code: input.code,
        name: input.name,
        timeZone: input.timeZone,
        currency: input.currency,
        defaultUnits: input.defaultUnits,
      });
      const site = await repo.findOneByOrFail({ id });
      await recordAudit(manager, { actorId: actor.id, action: 'site.created', entityType: 'site', entityId: id, siteId: id, after: site });
      const services = await manager
        .getRepository(SiteService)
        .save(SERVICE_CATALOGUE.map((definition) => ({ siteId: id, serviceCode: definition.code, settings: defaultServiceSettings(definition) })));
      for (const service of services) {
        await recordAudit(manager, { actorId: actor.id, action: 'site_service.created', entityType: 'site_service', entityId: service.id, siteId: id, after: service });
      }
      return site;
    }),
  );
}

export async function updateSite(ctx: AppContext, actor: Actor, id: string, input: SiteUpdateInput): Promise<Site> {
  return ctx.ds.transaction(async (manager) => {
    const before = await loadSiteInScope(manager, actor, id, true);
    const next: Partial<Site> = {};
    if (input.name !== undefined) next.name = input.name;
    if (input.timeZone !== undefined) next.timeZone = input.timeZone;
    if (input.currency !== undefined) next.currency = input.currency;
    if (input.defaultUnits !== undefined) next.defaultUnits = input.defaultUnits;
    if (Object.keys(next).length) await manager.getRepository(Site).update({ id }, next);
    const after = await manager.getRepository(Site).findOneByOrFail({ id });
    await recordAudit(manager, { actorId: actor.id, action: 'site.updated', entityType: 'site', entityId: id, siteId: id, before, after });
    return after;
  });
}
