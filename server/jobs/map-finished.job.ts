import { pagePaths } from "../../shared/schemas/api-paths";
import type { Db } from "../db/client";
import type { Logger } from "../lib/logger";
import type { Mailer } from "../mail/mailer";
import { mapFinishedMail } from "../mail/templates";
import { findMapOwnerContact } from "../modules/account/account.repo";
import { readMapProgress, type MapProgress } from "../modules/cells/map-progress.repo";
import { mapFinishedPayloadSchema } from "../queue/queues";

/** Follow-up of a finished map (the owner's "map finished" e-mail: mapFinishedMailHook). */
export type MapFinishedHook = (progress: MapProgress) => Promise<void>;

export interface MapFinishedDeps {
  db: Db;
  logger: Logger;
  /** Called once per finished map (worker.ts passes mapFinishedMailHook). */
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

export interface MapFinishedMailDeps {
  db: Db;
  mailer: Mailer;
  /** Public origin of the product; the e-mail links to `${appUrl}/maps/:id`. */
  appUrl: string;
  logger: Logger;
}

/**
 * The hook that e-mails a map's owner when the map is finished, if they opted in (account
 * preference notify_map_finished). Sending failures throw, so pg-boss retries the job.
 */
export function mapFinishedMailHook(deps: MapFinishedMailDeps): MapFinishedHook {
  return async (progress) => {
    if (progress.status === "queued" || progress.status === "running") return;
    const owner = await findMapOwnerContact(deps.db, progress.mapId);
    if (!owner?.notifyMapFinished) return;
    const started = progress.startedAt ? Date.parse(progress.startedAt) : NaN;
    const finished = progress.finishedAt ? Date.parse(progress.finishedAt) : NaN;
    const seconds = Number.isFinite(started) && Number.isFinite(finished) ? Math.max(0, (finished - started) / 1000) : null;
    const url = `${deps.appUrl.replace(/\/+$/, "")}${pagePaths.map(progress.mapId)}`;
    await deps.mailer.send(mapFinishedMail(owner, { ...progress, title: owner.title, seconds }, url));
    deps.logger.info("map finished e-mail sent", { mapId: progress.mapId, to: owner.email });
  };
}
