import jwt from 'jsonwebtoken';
import type { AppContext } from '../context.js';
import { Session, User } from '../entities/index.js';
import type { Actor } from '../policies/actor.js';

export const SESSION_COOKIE = 'ferrule_session';

interface SessionClaims {
  sub: string;
  sid: string;
  sv: number;
}

export async function openSession(ctx: AppContext, user: User, meta: { ip: string | null; userAgent: string | null }): Promise<{ token: string; expiresAt: Date }> {
  const now = ctx.clock.now();
  const expiresAt = new Date(now.getTime() + ctx.config.sessionHours * 3600_000);
  const session = await ctx.ds.getRepository(Session).save({
    userId: user.id,
    expiresAt,
    ipAddress: meta.ip,
    userAgent: meta.userAgent?.slice(0, 300) ?? null,
  });
  const claims: SessionClaims = { sub: user.id, sid: session.id, sv: user.sessionVersion };
  const token = jwt.sign(claims, ctx.config.sessionSecret, {
    algorithm: 'HS256',
    expiresIn: ctx.config.sessionHours * 3600,
  });
  return { token, expiresAt };
}

/**
 * The actor behind a session token, re-read from the database: null when the token is bad or
 * expired, the session revoked, the user inactive or past their access expiry, or the user's
 * session version raised since the token was issued.
 */
export async function resolveSession(ctx: AppContext, token: string | undefined): Promise<Actor | null> {
  if (!token) return null;
  let claims: SessionClaims;
  try {
    claims = jwt.verify(token, ctx.config.sessionSecret, { algorithms: ['HS256'], clockTimestamp: Math.floor(ctx.clock.now().getTime() / 1000) }) as SessionClaims;
  } catch {
    return null;
  }
  const now = ctx.clock.now();
  const rows: Array<User & { sessionId: string }> = await ctx.ds.query(
    `SELECT u.id, u.email, u.name, u.role, u.all_sites AS "allSites", u.site_ids AS "siteIds",
            u.active, u.session_version AS "sessionVersion", u.access_expires_on::text AS "accessExpiresOn", s.id AS "sessionId"
       FROM sessions s JOIN users u ON u.id = s.user_id
      WHERE s.id = $1 AND s.user_id = $2 AND s.revoked_at IS NULL AND s.expires_at > $3`,
    [claims.sid, claims.sub, now],
  );
  const row = rows[0];
  if (!row || !row.active || row.sessionVersion !== claims.sv) return null;
  if (row.accessExpiresOn && row.accessExpiresOn < now.toISOString().slice(0, 10)) return null;
  return { id: row.id, email: row.email, name: row.name, role: row.role, allSites: row.allSites, siteIds: row.siteIds, sessionId: row.sessionId };
}

export async function revokeSession(ctx: AppContext, sessionId: string): Promise<void> {
  await ctx.ds.getRepository(Session).update({ id: sessionId }, { revokedAt: ctx.clock.now() });
}

/** Ends every session of a user at once (sign out everywhere, password reset, deactivation, access change). */
export async function revokeAllSessions(ctx: AppContext, userId: string, manager = ctx.ds.manager): Promise<void> {
  await manager.query(`UPDATE users SET session_version = session_version + 1 WHERE id = $1`, [userId]);
  await manager.query(`UPDATE sessions SET revoked_at = $2 WHERE user_id = $1 AND revoked_at IS NULL`, [userId, ctx.clock.now()]);
}
