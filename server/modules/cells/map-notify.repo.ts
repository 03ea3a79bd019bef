import { sql } from "drizzle-orm";
import { z } from "zod";
import type { Executor } from "../../db/client";

/**
 * PostgreSQL NOTIFY channel of map fill events. Workers notify inside the transaction that
 * stores a cell, so listeners hear of it only once it is committed (PostgreSQL delivers
 * notifications at commit). Payloads are tiny: listeners read the rest from the tables.
 */
export const MAP_EVENTS_CHANNEL = "map_events";

export const mapNotificationSchema = z.union([
  /** A grid position finished (done, failed) — including cells served from the cache. */
  z.object({ mapId: z.uuid(), i: z.number().int().min(0), j: z.number().int().min(0) }),
  /** The map's status changed without a cell finishing (cancel, failure, a later edit). */
  z.object({ mapId: z.uuid(), status: z.string() }),
  /** A theory row was stored: every map whose positions use the key gains theory columns. */
  z.object({ theoryKey: z.string().min(16) }),
]);
export type MapNotification = z.infer<typeof mapNotificationSchema>;

/**
 * Queues a notification on map_events with pg_notify; it is delivered when `tx` commits (and
 * dropped if it rolls back).
 * @throws ZodError on a malformed payload
 */
export async function notifyMapEvent(tx: Executor, event: MapNotification): Promise<void> {
  const payload = JSON.stringify(mapNotificationSchema.parse(event));
  await tx.execute(sql`select pg_notify(${MAP_EVENTS_CHANNEL}, ${payload})`);
}
