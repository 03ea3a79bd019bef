import type { Db } from "../db/client";
import type { Logger } from "../lib/logger";
import { readMapProgress, type MapProgress } from "../modules/cells/map-progress.repo";
import { mapFinishedPayloadSchema } from "../queue/queues";

/** Follow-up of a finished map (the owner's "map finished" e-mail plugs in here). */
export type MapFinishedHook = (progress: MapProgress) => Promise<void>;

export interface MapFinishedDeps {
  db: Db;
  logger: Logger;
  /** Called once per finished map; none yet (the log line is all). */
  onFinished?: MapFinishedHook;
}

/** One map-finished job: log the map's final counters and run the hook. Throws to retry. */
export async function mapFinished(deps: MapFinishedDeps, data: unknown): Promise<void> {
  const parsed = mapFinishedPayloadSchema.safeParse(data);
  if (!parsed.success) return;
  const progress = await readMapProgress(deps.db, parsed.data.mapId);
  if (!progress) return;
  deps.logger.info("map finished", {
    mapId: progress.mapId, status: progress.status, cells: progress.cellsTotal,
    computed: progress.cellsComputed, fromCache: progress.cellsFromCache,
  });
  if (deps.onFinished) await deps.onFinished(progress);
}
