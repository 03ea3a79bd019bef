import { eq, lt, sql } from "drizzle-orm";
import type { Executor } from "../../db/client";
import { rateLimits } from "../../db/schema/index";

/**
 * Counts one hit on `key` in a fixed window of `windowMs`, atomically (one upsert), so several
 * server processes share the count. A window that has ended restarts at 1.
 */
export async function hitRateLimit(db: Executor, key: string, windowMs: number): Promise<{ hits: number; resetAt: Date }> {
  const resetAt = new Date(Date.now() + windowMs);
  const [row] = await db
    .insert(rateLimits)
    .values({ key, hits: 1, resetAt })
    .onConflictDoUpdate({
      target: rateLimits.key,
      set: {
        hits: sql`case when ${rateLimits.resetAt} <= now() then 1 else ${rateLimits.hits} + 1 end`,
        resetAt: sql`case when ${rateLimits.resetAt} <= now() then excluded.reset_at else ${rateLimits.resetAt} end`,
      },
    })
    .returning({ hits: rateLimits.hits, resetAt: rateLimits.resetAt });
  return row;
}

export async function clearRateLimit(db: Executor, key: string): Promise<void> {
  await db.delete(rateLimits).where(eq(rateLimits.key, key));
}

/** Deletes counters whose window ended; returns how many. */
export async function pruneRateLimits(db: Executor): Promise<number> {
  const rows = await db.delete(rateLimits).where(lt(rateLimits.resetAt, new Date())).returning({ key: rateLimits.key });
  return rows.length;
}
