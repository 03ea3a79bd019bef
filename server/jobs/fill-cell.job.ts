import type PgBoss from "pg-boss";
import type { CellInput } from "../../shared/schemas/cell-result";
import type { Db } from "../db/client";
import type { Logger } from "../lib/logger";
import { hasCell } from "../modules/cells/cells.repo";
import type { CellsService } from "../modules/cells/cells.service";
import { findMapForFill, findPosition } from "../modules/cells/map-fill.repo";
import { cellInputFor, cellKey, mapSpecFromRow } from "../modules/maps/cell-key";
import { fillCellPayloadSchema, type FillCellPayload } from "../queue/queues";
import { isPermanentEngineError, type ComputePool } from "./compute-pool";

export interface FillCellDeps {
  db: Db;
  cells: CellsService;
  compute: ComputePool;
  /** This worker process's name (hostname:pid), stored with the cells it computes. */
  workerName: string;
  logger: Logger;
}

/** What one fill-cell job ended with (returned as the job's output, and for tests). */
export type FillOutcome = "computed" | "cached" | "raced" | "skipped" | "failed";

const LIVE = new Set(["queued", "running"]);

function errorMessage(err: unknown): string {
  return err instanceof Error ? `${err.name}: ${err.message}` : String(err);
}

/** The input of the position, or the reason it cannot be computed (a permanent failure). */
function inputFor(map: NonNullable<Awaited<ReturnType<typeof findMapForFill>>>, p: FillCellPayload): CellInput | string {
  try {
    const input = cellInputFor(mapSpecFromRow(map), p.i, p.j);
    if (cellKey(input) !== p.cellKey) return "the engine or ensemble version changed since the map was created; replicate the map to recompute it";
    return input;
  } catch (err) {
    if (isPermanentEngineError(err)) return errorMessage(err);
    throw err;
  }
}

/**
 * One fill-cell job: parse the payload → skip unless the map is queued/running and the position
 * pending → take the cell from the cache if any map stored it meanwhile → compute it in the
 * pool → store it once and mark the position (CellsService). Engine refusals (RangeError,
 * TypeError) fail the cell and the map with the message; other errors are thrown so pg-boss
 * retries the job.
 */
export async function fillCell(deps: FillCellDeps, data: unknown): Promise<FillOutcome> {
  const parsed = fillCellPayloadSchema.safeParse(data);
  if (!parsed.success) {
    deps.logger.error("fill-cell: malformed payload dropped", { issues: parsed.error.issues.map((i) => i.message) });
    return "skipped";
  }
  const p = parsed.data;
  const map = await findMapForFill(deps.db, p.mapId);
  if (!map || !LIVE.has(map.status)) return "skipped";
  const position = await findPosition(deps.db, p.mapId, p.i, p.j);
  if (!position || position.state !== "pending") return "skipped";
  if (await hasCell(deps.db, p.cellKey)) {
    await deps.cells.recordCached(p);
    return "cached";
  }
  const input = inputFor(map, p);
  if (typeof input === "string") {
    await deps.cells.recordFailed({ ...p, message: input });
    return "failed";
  }
  let result;
  try {
    result = await deps.compute.runCell(input);
  } catch (err) {
    if (!isPermanentEngineError(err)) throw err;
    await deps.cells.recordFailed({ ...p, message: errorMessage(err) });
    return "failed";
  }
  const recorded = await deps.cells.recordComputed({ ...p, key: p.cellKey, input, result, worker: deps.workerName });
  deps.logger.debug("fill-cell", { mapId: p.mapId, i: p.i, j: p.j, seconds: result.timing.wallSeconds, stored: recorded.stored });
  return recorded.stored ? "computed" : "raced";
}

/**
 * Dead letter of fill-cell: the job failed on every attempt (retryable errors each time), so
 * the cell and its map are marked failed with the last error instead of waiting forever.
 */
export async function giveUpCell(deps: Pick<FillCellDeps, "cells" | "logger">, job: PgBoss.JobWithMetadata<unknown>): Promise<void> {
  const parsed = fillCellPayloadSchema.safeParse(job.data);
  if (!parsed.success) return;
  const output = job.output as { message?: unknown; value?: { message?: unknown } } | null;
  const last = output?.message ?? output?.value?.message ?? "unknown error";
  const attempts = job.retryLimit + 1;
  const message = `gave up after ${attempts} attempt${attempts === 1 ? "" : "s"}; last error: ${String(last)}`;
  deps.logger.warn("fill-cell exhausted its retries", { ...parsed.data, message });
  await deps.cells.recordFailed({ ...parsed.data, message });
}
