import { createHash } from 'node:crypto';
import type { EntityManager } from 'typeorm';
import type { AppContext } from '../context.js';
import { ConflictError } from '../errors.js';
import type { Actor } from '../policies/actor.js';

export interface StoredAnswer<T> {
  status: number;
  body: T;
  /** True when this answer was stored by an earlier submission with the same key. */
  replayed: boolean;
}

function hashOf(value: unknown): string {
  return createHash('sha256').update(JSON.stringify(value ?? null)).digest('hex');
}

/**
 * Runs a field submission once per key. The key row is inserted in the same transaction as the
 * work, so a retry that arrives while the first is still running waits for it and then gets its
 * stored answer; a first attempt that fails leaves no key behind and may be retried.
 */
export async function onceForKey<T>(
  ctx: AppContext,
  actor: Actor,
  action: string,
  key: string | undefined,
  request: unknown,
  work: (manager: EntityManager) => Promise<{ status: number; body: T }>,
): Promise<StoredAnswer<T>> {
  if (!key) {
    const answer = await ctx.ds.transaction(work);
    return { ...answer, replayed: false };
  }
  const scopedKey = `${actor.id}:${key}`;
  const requestHash = hashOf(request);
  return ctx.ds.transaction(async (manager) => {
    const inserted: unknown[] = await manager.query(
      `INSERT INTO idempotency_records (key, user_id, action, request_hash, response_status, response_body)
       VALUES ($1, $2, $3, $4, 0, 'null') ON CONFLICT (key) DO NOTHING RETURNING key`,
      [scopedKey, actor.id, action, requestHash],
    );
    if (inserted.length === 0) {
      const [stored] = await manager.query(
        `SELECT action, request_hash AS "requestHash", response_status AS "status", response_body AS "body" FROM idempotency_records WHERE key = $1`,
        [scopedKey],
      );
      if (!stored || stored.action !== action || stored.requestHash !== requestHash) {
        throw new ConflictError('submission_key_reused', 'This submission key was already used for a different request');
      }
      return { status: stored.status as number, body: stored.body as T, replayed: true };
    }
    const answer = await work(manager);
    await manager.query(`UPDATE idempotency_records SET response_status = $2, response_body = $3 WHERE key = $1`, [
      scopedKey,
      answer.status,
      JSON.stringify(answer.body),
    ]);
    return { ...answer, replayed: false };
  });
}
