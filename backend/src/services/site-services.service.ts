import type { EntityManager } from 'typeorm';
import type { ServiceSettingsInput } from '../../../shared/src/schemas/register.schema.js';
import { defaultServiceSettings, SERVICE_CATALOGUE, serviceByCode, type ServiceDefinition, type ServiceSettings } from '../../../shared/src/services/service-catalogue.js';
import type { AppContext } from '../context.js';
import { SiteService } from '../entities/index.js';
import { NotFoundError } from '../errors.js';
import type { Actor } from '../policies/actor.js';
import { recomputeStoredOutcomes } from './assembly-checks.service.js';
import { recordAudit } from './audit.service.js';
import { loadSiteInScope } from './sites-admin.service.js';

/** A catalogue service as one site has it: its settings there, the catalogue's defaults, and whether they differ. */
export interface SiteServiceView {
  siteId: string;
  definition: ServiceDefinition;
  settings: ServiceSettings;
  defaults: ServiceSettings;
  customised: boolean;
}

/** The same JSON whatever the order of keys (jsonb keeps its own order). */
function canonical(value: unknown): string {
  if (Array.isArray(value)) return `[${value.map(canonical).join(',')}]`;
  if (value && typeof value === 'object') {
    const entries = Object.entries(value as Record<string, unknown>)
      .filter(([, v]) => v !== undefined)
      .sort(([a], [b]) => (a < b ? -1 : a > b ? 1 : 0));
    return `{${entries.map(([k, v]) => `${JSON.stringify(k)}:${canonical(v)}`).join(',')}}`;
  }
  return JSON.stringify(value);
}

function viewOf(siteId: string, definition: ServiceDefinition, row: SiteService | null): SiteServiceView {
  const defaults = defaultServiceSettings(definition);
  const settings = row?.settings ?? defaults;
  return { siteId, definition, settings, defaults, customised: canonical(settings) !== canonical(defaults) };
}

function definitionOf(serviceCode: string): ServiceDefinition {
  const definition = serviceByCode(serviceCode);
  if (!definition) throw new NotFoundError('Service');
  return definition;
}

/** Every catalogue service with the site's settings, in the catalogue's order. */
export async function listSiteServices(ctx: AppContext, actor: Actor, siteId: string): Promise<SiteServiceView[]> {
  await loadSiteInScope(ctx.ds.manager, actor, siteId);
  const rows = await ctx.ds.getRepository(SiteService).findBy({ siteId });
  const byCode = new Map(rows.map((r) => [r.serviceCode, r]));
  return SERVICE_CATALOGUE.map((definition) => viewOf(siteId, definition, byCode.get(definition.code) ?? null));
}

/** Stores a service's settings at a site (making the row when the site has none yet), audits it and recomputes what depends on it. */
async function storeSettings(
  ctx: AppContext,
  manager: EntityManager,
  actor: Actor,
  siteId: string,
  definition: ServiceDefinition,
  settings: ServiceSettings,
  action: string,
): Promise<SiteServiceView> {
  const repo = manager.getRepository(SiteService);
  const before = await repo.findOne({ where: { siteId, serviceCode: definition.code }, lock: { mode: 'pessimistic_write' } });
  let id: string;
  if (before) {
    id = before.id;
    await repo.update({ id }, { settings });
  } else {
    // Two first edits at once meet at the unique index: the loser waits, then updates.
    await manager.query(
      `INSERT INTO site_services (site_id, service_code, settings) VALUES ($1, $2, $3) ON CONFLICT (site_id, service_code) DO UPDATE SET settings = EXCLUDED.settings, updated_at = now()`,
      [siteId, definition.code, JSON.stringify(settings)],
    );
    id = (await repo.findOneByOrFail({ siteId, serviceCode: definition.code })).id;
  }
  const after = await repo.findOneByOrFail({ id });
  await recordAudit(manager, { actorId: actor.id, action, entityType: 'site_service', entityId: id, siteId, before, after });
  await recomputeStoredOutcomes(manager, { siteId, serviceCode: definition.code }, ctx.clock.now());
  return viewOf(siteId, definition, after);
}

export async function updateSiteService(ctx: AppContext, actor: Actor, siteId: string, serviceCode: string, input: ServiceSettingsInput): Promise<SiteServiceView> {
  return ctx.ds.transaction(async (manager) => {
    await loadSiteInScope(manager, actor, siteId);
    const definition = definitionOf(serviceCode);
    const settings: ServiceSettings = {
      designFactorBands: input.designFactorBands.map((b) => ({ upToKpa: b.upToKpa, factor: b.factor, source: b.source })),
      defaultInspectionIntervalDays: input.defaultInspectionIntervalDays,
      conductivityRequired: input.conductivityRequired,
      periodicTest: input.periodicTest ? { kind: input.periodicTest.kind, intervalDays: input.periodicTest.intervalDays } : null,
      suctionDuty: input.suctionDuty,
      foodContactRequired: input.foodContactRequired,
    };
    return storeSettings(ctx, manager, actor, siteId, definition, settings, 'site_service.updated');
  });
}

/** Puts a service at a site back to the catalogue's defaults. */
export async function resetSiteService(ctx: AppContext, actor: Actor, siteId: string, serviceCode: string): Promise<SiteServiceView> {
  return ctx.ds.transaction(async (manager) => {
    await loadSiteInScope(manager, actor, siteId);
    const definition = definitionOf(serviceCode);
    return storeSettings(ctx, manager, actor, siteId, definition, defaultServiceSettings(definition), 'site_service.reset');
  });
}
