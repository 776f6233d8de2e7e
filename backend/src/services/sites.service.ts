import type { SiteSummary } from '../../../shared/src/schemas/auth.schema.js';
import type { AppContext } from '../context.js';
import type { Actor } from '../policies/actor.js';

/** Every site by id, for presenting users' access. */
export async function siteDirectory(ctx: AppContext): Promise<Map<string, SiteSummary>> {
  const rows: SiteSummary[] = await ctx.ds.query(`SELECT id, code, name FROM sites WHERE archived_at IS NULL ORDER BY name`);
  return new Map(rows.map((r) => [r.id, r]));
}

/** The sites the actor may see. */
export async function listVisibleSites(ctx: AppContext, actor: Pick<Actor, 'allSites' | 'siteIds'>): Promise<SiteSummary[]> {
  const all = [...(await siteDirectory(ctx)).values()];
  return actor.allSites ? all : all.filter((s) => actor.siteIds.includes(s.id));
}
