import type PgBoss from "pg-boss";
import type { CellInput, CellResult } from "../../../shared/schemas/cell-result";
import type { TheoryColumns } from "../../../shared/schemas/theory";
import type { Db, Tx } from "../../db/client";
import { MAP_FINISHED_QUEUE, type TheoryRowPayload } from "../../queue/queues";
import { sendInTransaction } from "../../queue/send";
import { storeCell, storeTheoryRow } from "./cells.repo";
import {
  cancelPendingPositions, countFinishedCell, failMap, lockMapForFill, markPositionDone, markPositionFailed,
} from "./map-fill.repo";
import { notifyMapEvent } from "./map-notify.repo";

export interface CellsServiceDeps {
  db: Db;
  /** Started pg-boss: map-finished is enqueued in the transaction of a map's last cell. */
  boss: PgBoss;
}

export interface Position {
  mapId: string;
  i: number;
  j: number;
}

/** What recording a cell did. */
export interface Recorded {
  /** This call stored the cell in the cache (false: the key was stored already). */
  stored: boolean;
  /** The map position went from pending to done or failed. */
  counted: boolean;
  /** The map reached done (its last cell). */
  finished: boolean;
}

const LIVE = new Set(["queued", "running"]);

/**
 * Writes of the fill: each runs in one transaction that stores the cell (once), marks the map
 * position, moves the map's counters and status, enqueues map-finished after the last cell and
 * queues the pg_notify for live listeners, so all of it commits or none of it does.
 */
export class CellsService {
  constructor(private readonly deps: CellsServiceDeps) {}

  /** Stores a computed cell and marks the position done (from cache when another job stored the key first). */
  recordComputed(p: Position & { key: string; input: CellInput; result: CellResult; worker: string }): Promise<Recorded> {
    return this.deps.db.transaction(async (tx) => {
      const stored = await storeCell(tx, { key: p.key, input: p.input, result: p.result, worker: p.worker });
      return { stored, ...(await this.finishPosition(tx, p, !stored)) };
    });
  }

  /** Marks a position done with a result another map (or an earlier attempt) already stored. */
  recordCached(p: Position): Promise<Recorded> {
    return this.deps.db.transaction(async (tx) => ({ stored: false, ...(await this.finishPosition(tx, p, true)) }));
  }

  /**
   * Records a permanent failure: the position failed with `message`, the map failed naming the
   * cell (the first failure wins), its other pending positions cancelled.
   */
  recordFailed(p: Position & { message: string }): Promise<Recorded> {
    return this.deps.db.transaction(async (tx) => {
      const map = await lockMapForFill(tx, p.mapId);
      if (!map || !LIVE.has(map.status)) return { stored: false, counted: false, finished: false };
      const counted = await markPositionFailed(tx, p);
      await failMap(tx, p.mapId, `Cell (${p.i}, ${p.j}) failed: ${p.message}`);
      await cancelPendingPositions(tx, p.mapId);
      if (counted) await notifyMapEvent(tx, { mapId: p.mapId, i: p.i, j: p.j });
      await notifyMapEvent(tx, { mapId: p.mapId, status: "failed" });
      return { stored: false, counted, finished: false };
    });
  }

  /** Stores a theory row once and tells listeners; false when it was stored already. */
  recordTheoryRow(payload: TheoryRowPayload, columns: TheoryColumns[]): Promise<boolean> {
    return this.deps.db.transaction(async (tx) => {
      const stored = await storeTheoryRow(tx, { key: payload.theoryKey, ensemble: payload.ensemble, tau: payload.tau, mus: payload.mus, columns });
      if (stored) await notifyMapEvent(tx, { theoryKey: payload.theoryKey });
      return stored;
    });
  }

  private async finishPosition(tx: Tx, p: Position, fromCache: boolean): Promise<Omit<Recorded, "stored">> {
    const map = await lockMapForFill(tx, p.mapId);
    if (!map || !LIVE.has(map.status)) return { counted: false, finished: false };
    if (!(await markPositionDone(tx, { ...p, fromCache }))) return { counted: false, finished: false };
    const progress = await countFinishedCell(tx, p.mapId, fromCache);
    if (progress.finished) await sendInTransaction(this.deps.boss, tx, MAP_FINISHED_QUEUE, { mapId: p.mapId });
    await notifyMapEvent(tx, { mapId: p.mapId, i: p.i, j: p.j });
    return { counted: true, finished: progress.finished };
  }
}

export function createCellsService(deps: CellsServiceDeps): CellsService {
  return new CellsService(deps);
}
