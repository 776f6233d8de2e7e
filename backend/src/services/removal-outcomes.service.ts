import { REMOVAL_REASON_DEFINITIONS, type LifeOutcome, type RemovalReason } from '../../../shared/src/services/removal-reasons.js';
import type { RemovalOutcomeDto, RemovalOutcomesInput } from '../../../shared/src/schemas/assemblies.schema.js';
import type { AppContext } from '../context.js';
import type { Actor } from '../policies/actor.js';
import { recordAudit } from './audit.service.js';
import { getSetting } from './settings.service.js';

const KEY = 'removal_outcomes';

/** Each removal reason with how the plant counts it in life data (its own mapping, else the default). */
export async function listRemovalOutcomes(ctx: AppContext): Promise<RemovalOutcomeDto[]> {
  const mapping = (await getSetting<Partial<Record<RemovalReason, LifeOutcome>>>(ctx, KEY)) ?? {};
  return REMOVAL_REASON_DEFINITIONS.map((r) => ({
    reason: r.code,
    label: r.label,
    description: r.description,
    lifeOutcome: mapping[r.code] ?? r.defaultLifeOutcome,
    defaultLifeOutcome: r.defaultLifeOutcome,
  }));
}

/** Sets the plant's mapping; removals already recorded keep the outcome they were recorded with. */
export async function updateRemovalOutcomes(ctx: AppContext, actor: Actor, input: RemovalOutcomesInput): Promise<RemovalOutcomeDto[]> {
  await ctx.ds.transaction(async (manager) => {
    const [before] = await manager.query(`SELECT value FROM app_settings WHERE key = $1 FOR UPDATE`, [KEY]);
    await manager.query(`INSERT INTO app_settings (key, value) VALUES ($1, $2) ON CONFLICT (key) DO UPDATE SET value = EXCLUDED.value`, [KEY, JSON.stringify(input.outcomes)]);
    await recordAudit(manager, { actorId: actor.id, action: 'removal_outcomes.updated', entityType: 'setting', entityId: null, before: before?.value ?? null, after: input.outcomes });
  });
  return listRemovalOutcomes(ctx);
}
