import type { EntityManager } from 'typeorm';
import type { AppContext } from '../context.js';
import { LinkToken } from '../entities/index.js';
import type { LinkTokenPurpose } from '../entities/link-token.entity.js';
import { ValidationError } from '../errors.js';
import { newToken, sha256 } from '../lib/crypto.js';
import { returnedRows } from '../lib/sql.js';

export const LINK_LIFETIME_MINUTES: Record<LinkTokenPurpose, number> = { invite: 72 * 60, reset: 60 };

/** Issues a new single-use link token; earlier unused tokens of the same purpose stop working. */
export async function issueLinkToken(ctx: AppContext, manager: EntityManager, userId: string, purpose: LinkTokenPurpose): Promise<string> {
  const now = ctx.clock.now();
  await manager.query(`UPDATE link_tokens SET used_at = $3 WHERE user_id = $1 AND purpose = $2 AND used_at IS NULL`, [userId, purpose, now]);
  const token = newToken();
  await manager.getRepository(LinkToken).insert({
    userId,
    purpose,
    tokenHash: sha256(token),
    expiresAt: new Date(now.getTime() + LINK_LIFETIME_MINUTES[purpose] * 60_000),
  });
  return token;
}

/** Uses a token once, in the caller's transaction; every other outstanding token of the user is withdrawn too. */
export async function consumeLinkToken(ctx: AppContext, manager: EntityManager, token: string, purpose: LinkTokenPurpose): Promise<string> {
  const now = ctx.clock.now();
  const rows = returnedRows<{ user_id: string }>(
    await manager.query(
      `UPDATE link_tokens SET used_at = $3 WHERE token_hash = $1 AND purpose = $2 AND used_at IS NULL AND expires_at > $3 RETURNING user_id`,
      [sha256(token), purpose, now],
    ),
  );
  const userId = rows[0]?.user_id;
  if (!userId) throw new ValidationError('This link has expired or has already been used. Ask for a new one.', 'token', 'invalid_token');
  await manager.query(`UPDATE link_tokens SET used_at = $2 WHERE user_id = $1 AND used_at IS NULL`, [userId, now]);
  return userId;
}

export function linkUrl(ctx: AppContext, path: string, token: string): string {
  const url = new URL(path, ctx.config.publicBaseUrl);
  url.searchParams.set('token', token);
  return url.toString();
}
