import type { AppContext } from '../context.js';

/**
 * Failed sign-ins slow down progressively rather than lock: after `free` failures each further
 * attempt must wait 2^(n − free) seconds, up to `maxDelaySeconds`. Counters live in PostgreSQL
 * so every server instance agrees, and are forgotten `windowHours` after the first failure.
 */
export interface SlowdownRule {
  free: number;
  maxDelaySeconds: number;
  windowHours: number;
}

export const SIGN_IN_ACCOUNT_RULE: SlowdownRule = { free: 5, maxDelaySeconds: 900, windowHours: 24 };
export const SIGN_IN_ADDRESS_RULE: SlowdownRule = { free: 20, maxDelaySeconds: 900, windowHours: 24 };

/** Seconds to wait before another attempt after `count` failures (0 = may try now). */
export function delaySeconds(rule: SlowdownRule, count: number): number {
  if (count < rule.free) return 0;
  return Math.min(2 ** (count - rule.free), rule.maxDelaySeconds);
}

interface CounterRow {
  key: string;
  count: number;
  lastAt: Date;
  windowStartedAt: Date;
}

/** Seconds the caller must still wait, the longest over the keys. */
export async function waitRequired(ctx: AppContext, keys: Array<[string, SlowdownRule]>): Promise<number> {
  const rows: CounterRow[] = await ctx.ds.query(
    `SELECT key, count, last_at AS "lastAt", window_started_at AS "windowStartedAt" FROM attempt_counters WHERE key = ANY($1)`,
    [keys.map(([k]) => k)],
  );
  const now = ctx.clock.now().getTime();
  let wait = 0;
  for (const [key, rule] of keys) {
    const row = rows.find((r) => r.key === key);
    if (!row || now - row.windowStartedAt.getTime() > rule.windowHours * 3600_000) continue;
    const until = row.lastAt.getTime() + delaySeconds(rule, row.count) * 1000;
    wait = Math.max(wait, Math.ceil((until - now) / 1000));
  }
  return wait;
}

/** Counts one attempt against each key; a counter older than its window starts again. Returns the new counts. */
export async function countAttempt(ctx: AppContext, keys: Array<[string, SlowdownRule]>): Promise<number[]> {
  const now = ctx.clock.now();
  const counts: number[] = [];
  for (const [key, rule] of keys) {
    const windowStart = new Date(now.getTime() - rule.windowHours * 3600_000);
    const rows: Array<{ count: number }> = await ctx.ds.query(
      `INSERT INTO attempt_counters (key, count, window_started_at, last_at) VALUES ($1, 1, $2, $2)
       ON CONFLICT (key) DO UPDATE SET
         count = CASE WHEN attempt_counters.window_started_at < $3 THEN 1 ELSE attempt_counters.count + 1 END,
         window_started_at = CASE WHEN attempt_counters.window_started_at < $3 THEN $2 ELSE attempt_counters.window_started_at END,
         last_at = $2
       RETURNING count`,
      [key, now, windowStart],
    );
    counts.push(rows[0]?.count ?? 1);
  }
  return counts;
}

export async function clearAttempts(ctx: AppContext, key: string): Promise<void> {
  await ctx.ds.query(`DELETE FROM attempt_counters WHERE key = $1`, [key]);
}

/** Counts within a fixed window (for rate limits on mail-sending endpoints). */
export async function withinLimit(ctx: AppContext, key: string, limit: number, windowHours: number): Promise<boolean> {
  const [count] = await countAttempt(ctx, [[key, { free: limit, maxDelaySeconds: 0, windowHours }]]);
  return (count ?? 0) <= limit;
}
