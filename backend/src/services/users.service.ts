import type { EntityManager } from 'typeorm';
import { mayGrantSites, type SiteAccess } from '../../../shared/src/permissions.js';
import type { UserInviteInput, UserListQuery, UserUpdateInput } from '../../../shared/src/schemas/users.schema.js';
import type { AppContext } from '../context.js';
import { User } from '../entities/index.js';
import { ConflictError, ForbiddenError, NotFoundError, ValidationError } from '../errors.js';
import { invitationMail } from '../mail/templates.js';
import type { Actor } from '../policies/actor.js';
import { recordAudit } from './audit.service.js';
import { issueLinkToken, LINK_LIFETIME_MINUTES, linkUrl } from './link-tokens.service.js';
import { revokeAllSessions } from './session.service.js';
import { getSetting } from './settings.service.js';

/**
 * An administrator limited to some sites manages only users whose access lies within theirs;
 * an unlimited administrator manages everyone.
 */
function scopeSql(actor: Actor, param: number): { sql: string; params: unknown[] } {
  if (actor.allSites) return { sql: 'TRUE', params: [] };
  return { sql: `(NOT u.all_sites AND u.site_ids <@ $${param}::uuid[])`, params: [actor.siteIds] };
}

const SORT_COLUMNS: Record<UserListQuery['sort'], string> = {
  name: 'lower(u.name)',
  email: 'u.email',
  role: 'u.role',
  lastSignInAt: 'u.last_sign_in_at',
  createdAt: 'u.created_at',
};

export async function listUsers(ctx: AppContext, actor: Actor, query: UserListQuery): Promise<{ rows: User[]; total: number }> {
  const where: string[] = [];
  const params: unknown[] = [];
  const scope = scopeSql(actor, 1);
  where.push(scope.sql);
  params.push(...scope.params);
  if (query.q) {
    params.push(`%${query.q.replace(/[\\%_]/g, (c) => `\\${c}`)}%`);
    where.push(`(u.name ILIKE $${params.length} OR u.email ILIKE $${params.length})`);
  }
  if (query.role) {
    params.push(query.role);
    where.push(`u.role = $${params.length}`);
  }
  const notExpired = `(u.access_expires_on IS NULL OR u.access_expires_on >= $${params.length + 1}::date)`;
  const today = ctx.clock.now().toISOString().slice(0, 10);
  if (query.status === 'inactive') where.push('NOT u.active');
  if (query.status === 'expired') where.push(`u.active AND NOT ${notExpired}`);
  if (query.status === 'invited') where.push(`u.active AND u.password_hash IS NULL AND ${notExpired}`);
  if (query.status === 'active') where.push(`u.active AND u.password_hash IS NOT NULL AND ${notExpired}`);
  if (query.status && query.status !== 'inactive') params.push(today);
  const whereSql = where.join(' AND ');
  const order = `${SORT_COLUMNS[query.sort]} ${query.dir === 'desc' ? 'DESC' : 'ASC'} NULLS LAST, u.id`;
  const [countRow] = await ctx.ds.query(`SELECT count(*)::int AS n FROM users u WHERE ${whereSql}`, params);
  const ids: Array<{ id: string }> = await ctx.ds.query(
    `SELECT u.id FROM users u WHERE ${whereSql} ORDER BY ${order} LIMIT ${query.pageSize} OFFSET ${(query.page - 1) * query.pageSize}`,
    params,
  );
  const users = await ctx.ds.getRepository(User).findBy(ids.map((r) => ({ id: r.id })));
  const byId = new Map(users.map((u) => [u.id, u]));
  return { rows: ids.flatMap((r) => byId.get(r.id) ?? []), total: (countRow as { n: number }).n };
}

async function loadInScope(ctx: AppContext, actor: Actor, id: string, manager: EntityManager = ctx.ds.manager, lock = false): Promise<User> {
  const scope = scopeSql(actor, 2);
  const rows: Array<{ id: string }> = await manager.query(
    `SELECT u.id FROM users u WHERE u.id = $1 AND ${scope.sql}${lock ? ' FOR UPDATE' : ''}`,
    [id, ...scope.params],
  );
  if (!rows[0]) throw new NotFoundError('User');
  return manager.getRepository(User).findOneByOrFail({ id });
}

export const getUser = (ctx: AppContext, actor: Actor, id: string) => loadInScope(ctx, actor, id);

async function assertSitesExist(manager: EntityManager, siteIds: readonly string[]): Promise<void> {
  if (siteIds.length === 0) return;
  const rows: Array<{ n: number }> = await manager.query(`SELECT count(*)::int AS n FROM sites WHERE id = ANY($1::uuid[]) AND archived_at IS NULL`, [siteIds]);
  if ((rows[0]?.n ?? 0) !== new Set(siteIds).size) throw new ValidationError('One of the chosen sites does not exist', 'siteIds');
}

function assertMayGrant(actor: Actor, grant: SiteAccess): void {
  if (!mayGrantSites(actor, grant)) {
    throw new ForbiddenError(
      grant.allSites ? 'Only an administrator with access to all sites can grant all sites' : 'You can only grant access to your own sites',
      'grant_beyond_scope',
    );
  }
}

/** Refuses a change that would leave no active administrator with access to all sites. */
async function assertAnotherUnlimitedAdministrator(manager: EntityManager, target: User): Promise<void> {
  if (!(target.role === 'administrator' && target.allSites && target.active)) return;
  const rows: Array<{ id: string }> = await manager.query(
    `SELECT id FROM users WHERE role = 'administrator' AND all_sites AND active AND id <> $1 FOR UPDATE`,
    [target.id],
  );
  if (rows.length === 0) {
    throw new ConflictError('last_administrator', 'Ferrule needs at least one active administrator with access to all sites');
  }
}

async function sendInvitation(ctx: AppContext, actor: Actor, user: User, token: string): Promise<void> {
  const companyName = (await getSetting<string>(ctx, 'company_name')) ?? '';
  const mail = invitationMail({
    name: user.name,
    invitedBy: actor.name,
    companyName,
    link: linkUrl(ctx, '/accept-invite', token),
    hours: LINK_LIFETIME_MINUTES.invite / 60,
  });
  await ctx.mailer.send({ to: user.email, ...mail });
}

export async function inviteUser(ctx: AppContext, actor: Actor, input: UserInviteInput): Promise<User> {
  const grant = { allSites: input.allSites, siteIds: input.allSites ? [] : [...new Set(input.siteIds)] };
  assertMayGrant(actor, grant);
  const { user, token } = await ctx.ds.transaction(async (manager) => {
    await assertSitesExist(manager, grant.siteIds);
    const taken = await manager.getRepository(User).existsBy({ email: input.email });
    if (taken) throw new ConflictError('email_taken', 'A user with this e-mail already exists', 'email');
    const created = await manager.getRepository(User).save({
      email: input.email,
      name: input.name,
      role: input.role,
      ...grant,
      accessExpiresOn: input.accessExpiresOn,
      passwordHash: null,
      active: true,
    });
    const t = await issueLinkToken(ctx, manager, created.id, 'invite');
    await recordAudit(manager, { actorId: actor.id, action: 'user.invited', entityType: 'user', entityId: created.id, after: created });
    return { user: created, token: t };
  });
  await sendInvitation(ctx, actor, user, token);
  return user;
}

export async function resendInvitation(ctx: AppContext, actor: Actor, id: string): Promise<void> {
  const { user, token } = await ctx.ds.transaction(async (manager) => {
    const target = await loadInScope(ctx, actor, id, manager, true);
    if (!target.active || target.passwordHash) throw new ConflictError('not_invited', 'This user has already accepted the invitation');
    const t = await issueLinkToken(ctx, manager, target.id, 'invite');
    await recordAudit(manager, { actorId: actor.id, action: 'user.invitation_resent', entityType: 'user', entityId: target.id });
    return { user: target, token: t };
  });
  await sendInvitation(ctx, actor, user, token);
}

export async function updateUser(ctx: AppContext, actor: Actor, id: string, input: UserUpdateInput): Promise<User> {
  return ctx.ds.transaction(async (manager) => {
    const before = await loadInScope(ctx, actor, id, manager, true);
    const next: Partial<User> = {};
    if (input.name !== undefined) next.name = input.name;
    if (input.role !== undefined) next.role = input.role;
    if (input.accessExpiresOn !== undefined) next.accessExpiresOn = input.accessExpiresOn;
    if (input.allSites !== undefined || input.siteIds !== undefined) {
      const allSites = input.allSites ?? before.allSites;
      const siteIds = allSites ? [] : [...new Set(input.siteIds ?? before.siteIds)];
      if (!allSites && siteIds.length === 0) throw new ValidationError('Choose at least one site, or all sites', 'siteIds');
      assertMayGrant(actor, { allSites, siteIds });
      await assertSitesExist(manager, siteIds);
      next.allSites = allSites;
      next.siteIds = siteIds;
    }
    const losesUnlimitedAdmin = (next.role !== undefined && next.role !== 'administrator') || next.allSites === false;
    if (losesUnlimitedAdmin) await assertAnotherUnlimitedAdministrator(manager, before);
    await manager.getRepository(User).update({ id }, next);
    const accessChanged =
      (next.role !== undefined && next.role !== before.role) ||
      (next.allSites !== undefined && (next.allSites !== before.allSites || next.siteIds?.join() !== before.siteIds.join()));
    if (accessChanged) await revokeAllSessions(ctx, id, manager);
    const after = await manager.getRepository(User).findOneByOrFail({ id });
    await recordAudit(manager, { actorId: actor.id, action: 'user.updated', entityType: 'user', entityId: id, before, after });
    return after;
  });
}

export async function setUserActive(ctx: AppContext, actor: Actor, id: string, active: boolean): Promise<User> {
  return ctx.ds.transaction(async (manager) => {
    const before = await loadInScope(ctx, actor, id, manager, true);
    if (!active && before.id === actor.id) throw new ConflictError('cannot_deactivate_self', 'You cannot deactivate your own account');
    if (!active) await assertAnotherUnlimitedAdministrator(manager, before);
    if (active && !before.allSites) assertMayGrant(actor, { allSites: false, siteIds: before.siteIds });
    await manager.getRepository(User).update({ id }, { active });
    if (!active) {
      await revokeAllSessions(ctx, id, manager);
      await manager.query(`UPDATE link_tokens SET used_at = $2 WHERE user_id = $1 AND used_at IS NULL`, [id, ctx.clock.now()]);
    }
    const after = await manager.getRepository(User).findOneByOrFail({ id });
    await recordAudit(manager, { actorId: actor.id, action: active ? 'user.reactivated' : 'user.deactivated', entityType: 'user', entityId: id, before, after });
    return after;
  });
}
