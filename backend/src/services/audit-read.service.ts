import type { AuditEntryDto } from '../../../shared/src/schemas/users.schema.js';
import type { AppContext } from '../context.js';
import type { Actor } from '../policies/actor.js';
import { getUser } from './users.service.js';

const ACTION_WORDS: Record<string, string> = {
  'user.invited': 'Invited',
  'user.invitation_resent': 'Invitation sent again',
  'user.invitation_accepted': 'Accepted the invitation',
  'user.updated': 'Changed',
  'user.deactivated': 'Deactivated',
  'user.reactivated': 'Reactivated',
  'user.password_reset_requested': 'Asked for a password reset',
  'user.password_reset': 'Reset the password',
  'user.signed_out_everywhere': 'Signed out everywhere',
  'user.first_administrator_created': 'Created as the first administrator',
};

const FIELD_WORDS: Record<string, string> = {
  name: 'name',
  role: 'role',
  allSites: 'site access',
  siteIds: 'site access',
  accessExpiresOn: 'access expiry',
  active: 'active',
};

function summarise(action: string, before: Record<string, unknown> | null, after: Record<string, unknown> | null): string {
  const words = ACTION_WORDS[action] ?? action;
  if (action !== 'user.updated' || !before || !after) return words;
  const changed = new Set(
    Object.keys(FIELD_WORDS)
      .filter((k) => JSON.stringify(before[k]) !== JSON.stringify(after[k]))
      .map((k) => FIELD_WORDS[k]!),
  );
  return changed.size ? `${words} ${[...changed].join(', ')}` : words;
}

export async function listAudit(ctx: AppContext, actor: Actor, query: { entityType: 'user'; entityId: string; page: number; pageSize: number }) {
  await getUser(ctx, actor, query.entityId);
  const params = [query.entityType, query.entityId];
  const [count] = await ctx.ds.query(`SELECT count(*)::int AS n FROM audit_entries WHERE entity_type = $1 AND entity_id = $2`, params);
  const rows: Array<{ id: string; at: Date; actorName: string | null; action: string; entityType: string; entityId: string | null; before: Record<string, unknown> | null; after: Record<string, unknown> | null }> =
    await ctx.ds.query(
      `SELECT a.id, a.at, u.name AS "actorName", a.action, a.entity_type AS "entityType", a.entity_id AS "entityId", a.before, a.after
         FROM audit_entries a LEFT JOIN users u ON u.id = a.actor_id
        WHERE a.entity_type = $1 AND a.entity_id = $2
        ORDER BY a.at DESC, a.id LIMIT ${query.pageSize} OFFSET ${(query.page - 1) * query.pageSize}`,
      params,
    );
  const data: AuditEntryDto[] = rows.map((r) => ({
    id: r.id,
    at: r.at.toISOString(),
    actorName: r.actorName,
    action: r.action,
    entityType: r.entityType,
    entityId: r.entityId,
    summary: summarise(r.action, r.before, r.after),
  }));
  return { data, total: (count as { n: number }).n };
}
