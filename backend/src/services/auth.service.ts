import type { Preferences, SetupInput, SignInInput, TokenPasswordInput } from '../../../shared/src/schemas/auth.schema.js';
import type { AppContext } from '../context.js';
import { User } from '../entities/index.js';
import { ConflictError, ForbiddenError, TooManyAttemptsError, UnauthenticatedError, ValidationError } from '../errors.js';
import { assertAcceptablePassword } from '../lib/common-passwords.js';
import { hashPassword, newToken, sha256, verifyPassword } from '../lib/crypto.js';
import { resetMail } from '../mail/templates.js';
import type { Actor } from '../policies/actor.js';
import {
  clearAttempts,
  countAttempt,
  SIGN_IN_ACCOUNT_RULE,
  SIGN_IN_ADDRESS_RULE,
  waitRequired,
  withinLimit,
} from './attempts.service.js';
import { recordAudit } from './audit.service.js';
import { consumeLinkToken, issueLinkToken, LINK_LIFETIME_MINUTES, linkUrl } from './link-tokens.service.js';
import { openSession, revokeAllSessions, revokeSession } from './session.service.js';
import { getSetting, putSetting } from './settings.service.js';

export interface RequestMeta {
  ip: string | null;
  userAgent: string | null;
}

function today(ctx: AppContext): string {
  return ctx.clock.now().toISOString().slice(0, 10);
}

/** Signs in, slowed progressively per account and per address after repeated failures. */
export async function signIn(ctx: AppContext, input: SignInInput, meta: RequestMeta) {
  const keys: Array<[string, typeof SIGN_IN_ACCOUNT_RULE]> = [
    [`sign-in:account:${input.email}`, SIGN_IN_ACCOUNT_RULE],
    [`sign-in:address:${meta.ip ?? 'unknown'}`, SIGN_IN_ADDRESS_RULE],
  ];
  const wait = await waitRequired(ctx, keys);
  if (wait > 0) throw new TooManyAttemptsError(wait);

  const user = await ctx.ds.getRepository(User).findOneBy({ email: input.email });
  const passwordOk = await verifyPassword(input.password, user?.passwordHash ?? null);
  if (!user || !user.passwordHash || !passwordOk) {
    await countAttempt(ctx, keys);
    throw new UnauthenticatedError('The e-mail or password is not right', 'invalid_credentials');
  }
  if (!user.active) throw new UnauthenticatedError('This account has been deactivated. Ask an administrator.', 'account_inactive');
  if (user.accessExpiresOn && user.accessExpiresOn < today(ctx)) {
    throw new UnauthenticatedError('Your access to Ferrule has expired. Ask an administrator to extend it.', 'access_expired');
  }
  await clearAttempts(ctx, keys[0]![0]);
  user.lastSignInAt = ctx.clock.now();
  await ctx.ds.getRepository(User).update({ id: user.id }, { lastSignInAt: user.lastSignInAt });
  const session = await openSession(ctx, user, meta);
  return { user, ...session };
}


export async function signOut(ctx: AppContext, actor: Actor): Promise<void> {
  await revokeSession(ctx, actor.sessionId);
}

export async function signOutEverywhere(ctx: AppContext, actor: Actor): Promise<void> {
  await ctx.ds.transaction(async (manager) => {
    await revokeAllSessions(ctx, actor.id, manager);
    await recordAudit(manager, { actorId: actor.id, action: 'user.signed_out_everywhere', entityType: 'user', entityId: actor.id });
  });
}

export async function getSelf(ctx: AppContext, actor: Actor): Promise<User> {
  return ctx.ds.getRepository(User).findOneByOrFail({ id: actor.id });
}

export async function updatePreferences(ctx: AppContext, actor: Actor, preferences: Preferences): Promise<User> {
  await ctx.ds.getRepository(User).update({ id: actor.id }, { preferences });
  return getSelf(ctx, actor);
}

/**
 * Sends a reset link when an active account has this e-mail. The answer never says whether it
 * does, and the mail is sent after the answer so timing does not tell either.
 */
export async function requestPasswordReset(ctx: AppContext, email: string, meta: RequestMeta): Promise<void> {
  if (!(await withinLimit(ctx, `reset:address:${meta.ip ?? 'unknown'}`, 10, 1))) throw new TooManyAttemptsError(3600);
  if (!(await withinLimit(ctx, `reset:account:${email}`, 3, 1))) return;
  const user = await ctx.ds.getRepository(User).findOneBy({ email });
  if (!user || !user.active) return;
  const token = await ctx.ds.transaction(async (manager) => {
    const t = await issueLinkToken(ctx, manager, user.id, 'reset');
    await recordAudit(manager, { actorId: null, action: 'user.password_reset_requested', entityType: 'user', entityId: user.id });
    return t;
  });
  const mail = resetMail({ name: user.name, link: linkUrl(ctx, '/reset-password', token), minutes: LINK_LIFETIME_MINUTES.reset });
  ctx.mailer.send({ to: user.email, ...mail }).catch((err: unknown) => ctx.logger.error({ err }, 'reset mail not sent'));
}

async function setPasswordWithToken(ctx: AppContext, input: TokenPasswordInput, purpose: 'reset' | 'invite'): Promise<void> {
  assertAcceptablePassword(input.password);
  const hash = await hashPassword(input.password, ctx.config.bcryptCost);
  await ctx.ds.transaction(async (manager) => {
    const userId = await consumeLinkToken(ctx, manager, input.token, purpose);
    const user = await manager.getRepository(User).findOne({ where: { id: userId }, lock: { mode: 'pessimistic_write' } });
    if (!user || !user.active) throw new ValidationError('This account is not active.', 'token', 'invalid_token');
    await manager.getRepository(User).update({ id: userId }, { passwordHash: hash });
    await revokeAllSessions(ctx, userId, manager);
    await recordAudit(manager, {
      actorId: userId,
      action: purpose === 'reset' ? 'user.password_reset' : 'user.invitation_accepted',
      entityType: 'user',
      entityId: userId,
    });
  });
}

export const completePasswordReset = (ctx: AppContext, input: TokenPasswordInput) => setPasswordWithToken(ctx, input, 'reset');
export const acceptInvitation = (ctx: AppContext, input: TokenPasswordInput) => setPasswordWithToken(ctx, input, 'invite');

const SETUP_KEY = 'setup_token_hash';

export async function userCount(ctx: AppContext): Promise<number> {
  return ctx.ds.getRepository(User).count();
}

/** In production with no users yet, makes a one-time set-up token; the caller prints it once. */
export async function issueSetupToken(ctx: AppContext): Promise<string | null> {
  if ((await userCount(ctx)) > 0) return null;
  const token = newToken();
  await putSetting(ctx, SETUP_KEY, { hash: sha256(token), issuedAt: ctx.clock.now().toISOString() });
  return token;
}

/** Creates the first administrator (all sites) with the one-time set-up token. */
export async function completeSetup(ctx: AppContext, input: SetupInput): Promise<User> {
  assertAcceptablePassword(input.password);
  const stored = await getSetting<{ hash: string }>(ctx, SETUP_KEY);
  if (!stored || stored.hash !== sha256(input.token)) throw new ForbiddenError('The set-up token is not right', 'invalid_setup_token');
  const hash = await hashPassword(input.password, ctx.config.bcryptCost);
  return ctx.ds.transaction(async (manager) => {
    const existing: Array<{ n: number }> = await manager.query(`SELECT count(*)::int AS n FROM users`);
    if ((existing[0]?.n ?? 0) > 0) throw new ConflictError('already_set_up', 'Ferrule already has an administrator');
    await manager.query(`LOCK TABLE users IN EXCLUSIVE MODE`);
    const user = await manager.getRepository(User).save({
      email: input.email,
      name: input.name,
      role: 'administrator',
      allSites: true,
      siteIds: [],
      passwordHash: hash,
      active: true,
    });
    await manager.query(`DELETE FROM app_settings WHERE key = $1`, [SETUP_KEY]);
    await recordAudit(manager, { actorId: user.id, action: 'user.first_administrator_created', entityType: 'user', entityId: user.id, after: user });
    return user;
  });
}
