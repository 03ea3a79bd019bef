import { eq } from "drizzle-orm";
import type { MapProgress } from "../../../shared/maps/map-events";
import type { Executor } from "../../db/client";
import { maps } from "../../db/schema/index";
import { countComputedSince } from "../maps/map-cells.repo";
import { THROUGHPUT_WINDOW_MINUTES, etaOf, throughputOf } from "../maps/maps.view";

export type { MapProgress } from "../../../shared/maps/map-events";

/**
 * The progress of map `mapId` (the SSE `progress` event, the map-finished log line), or
 * undefined when it does not exist. Throughput and ETA use the map view's definitions
 * (maps.view.ts: throughputOf, etaOf), so the live stream and GET /api/maps/:id agree.
 */
export async function readMapProgress(db: Executor, mapId: string): Promise<MapProgress | undefined> {
  const [row] = await db.select().from(maps).where(eq(maps.id, mapId));
  if (!row) return undefined;
  const live = row.status === "queued" || row.status === "running";
  const recent = live ? await countComputedSince(db, mapId, THROUGHPUT_WINDOW_MINUTES * 60) : null;
  const throughput = throughputOf(row, recent);
  return {
    mapId: row.id,
    status: row.status,
    failure: row.failure,
    cellsTotal: row.cellsTotal,
    cellsDone: row.cellsDone,
    cellsComputed: row.cellsComputed,
    cellsFromCache: row.cellsFromCache,
    throughput: throughput === null ? null : Math.round(throughput * 100) / 100,
    etaSeconds: etaOf(row, throughput),
    startedAt: row.startedAt?.toISOString() ?? null,
    finishedAt: row.finishedAt?.toISOString() ?? null,
  };
}
