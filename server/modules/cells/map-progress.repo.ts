import { sql } from "drizzle-orm";
import type { MapProgress } from "../../../shared/maps/map-events";
import type { Executor } from "../../db/client";
import type { MapStatus } from "./map-fill.repo";

/** Seconds of recent computing over which throughput is measured. */
export const THROUGHPUT_WINDOW_SECONDS = 300;

export type { MapProgress } from "../../../shared/maps/map-events";

interface ProgressRow extends Record<string, unknown> {
  id: string;
  status: MapStatus;
  failure: string | null;
  cells_total: number;
  cells_done: number;
  cells_computed: number;
  cells_from_cache: number;
  started_at: Date | null;
  finished_at: Date | null;
  recent: number;
  span: number;
}

/**
 * Throughput = cells computed (not served from the cache) whose done_at falls in the last
 * THROUGHPUT_WINDOW_SECONDS before now (or before finished_at), per minute of that window; the
 * window never starts before the map was created. ETA = cells left ÷ throughput.
 */
export function progressFromRow(row: ProgressRow): MapProgress {
  const span = Number(row.span);
  const recent = Number(row.recent);
  const throughput = recent > 0 && span > 0 ? (recent / span) * 60 : null;
  const live = row.status === "queued" || row.status === "running";
  const left = row.cells_total - row.cells_done;
  return {
    mapId: row.id,
    status: row.status,
    failure: row.failure,
    cellsTotal: row.cells_total,
    cellsDone: row.cells_done,
    cellsComputed: row.cells_computed,
    cellsFromCache: row.cells_from_cache,
    throughput,
    etaSeconds: live && throughput ? (left / throughput) * 60 : null,
    startedAt: row.started_at ? new Date(row.started_at).toISOString() : null,
    finishedAt: row.finished_at ? new Date(row.finished_at).toISOString() : null,
  };
}

/** The progress of map `mapId`, or undefined when it does not exist. */
export async function readMapProgress(db: Executor, mapId: string): Promise<MapProgress | undefined> {
  const result = await db.execute<ProgressRow>(sql`
    with m as (
      select *, coalesce(finished_at, now()) as window_end,
        greatest(created_at, coalesce(finished_at, now()) - make_interval(secs => ${THROUGHPUT_WINDOW_SECONDS})) as window_start
      from maps where id = ${mapId}
    )
    select m.id, m.status, m.failure, m.cells_total, m.cells_done, m.cells_computed, m.cells_from_cache,
      m.started_at, m.finished_at,
      extract(epoch from (m.window_end - m.window_start))::float8 as span,
      (select count(*)::int from map_cells c
        where c.map_id = m.id and c.state = 'done' and not c.from_cache
          and c.done_at > m.window_start and c.done_at <= m.window_end) as recent
    from m`);
  const row = result.rows[0];
  return row ? progressFromRow(row) : undefined;
}
