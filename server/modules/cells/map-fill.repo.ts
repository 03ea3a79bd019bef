import { and, eq, sql } from "drizzle-orm";
import type { Executor } from "../../db/client";
import { mapCells, maps } from "../../db/schema/index";

// How a map's grid fills: grid positions pass pending → done | failed | cancelled, and the
// map's counters and status follow in the same transaction. Callers lock the map row first
// (lockMapForFill), so a cell finishing and a cancel never take the two rows in opposite order.

export type MapStatus = (typeof maps.$inferSelect)["status"];
export type PositionRow = typeof mapCells.$inferSelect;

/** What a fill-cell job needs of its map: status and the manifest parts that name cells. */
export interface MapForFill {
  id: string;
  status: MapStatus;
  ensemble: string;
  settings: unknown;
  muAxis: unknown;
  tauAxis: unknown;
  budget: unknown;
  seed: number;
  cellsTotal: number;
}

const fillColumns = {
  id: maps.id, status: maps.status, ensemble: maps.ensemble, settings: maps.settings, muAxis: maps.muAxis,
  tauAxis: maps.tauAxis, budget: maps.budget, seed: maps.seed, cellsTotal: maps.cellsTotal,
};

/** The map of a job (undefined when it was deleted). */
export async function findMapForFill(db: Executor, mapId: string): Promise<MapForFill | undefined> {
  const [row] = await db.select(fillColumns).from(maps).where(eq(maps.id, mapId));
  return row;
}

/** Locks the map row (SELECT … FOR UPDATE) and returns it; call inside a transaction. */
export async function lockMapForFill(tx: Executor, mapId: string): Promise<MapForFill | undefined> {
  const [row] = await tx.select(fillColumns).from(maps).where(eq(maps.id, mapId)).for("update");
  return row;
}

/** One grid position of a map. */
export async function findPosition(db: Executor, mapId: string, i: number, j: number): Promise<PositionRow | undefined> {
  const [row] = await db.select().from(mapCells).where(and(eq(mapCells.mapId, mapId), eq(mapCells.i, i), eq(mapCells.j, j)));
  return row;
}

const at = (mapId: string, i: number, j: number) => and(eq(mapCells.mapId, mapId), eq(mapCells.i, i), eq(mapCells.j, j), eq(mapCells.state, "pending"));

/**
 * Marks a pending position done.
 * @param fromCache true when the result was already stored (not computed for this map)
 * @returns false when the position was not pending (done before, cancelled or failed)
 */
export async function markPositionDone(tx: Executor, p: { mapId: string; i: number; j: number; fromCache: boolean }): Promise<boolean> {
  const rows = await tx
    .update(mapCells)
    .set({ state: "done", fromCache: p.fromCache, doneAt: sql`now()`, failure: null })
    .where(at(p.mapId, p.i, p.j))
    .returning({ i: mapCells.i });
  return rows.length === 1;
}

/** Marks a pending position failed with the engine's message; false when it was not pending. */
export async function markPositionFailed(tx: Executor, p: { mapId: string; i: number; j: number; message: string }): Promise<boolean> {
  const rows = await tx
    .update(mapCells)
    .set({ state: "failed", failure: p.message, doneAt: sql`now()` })
    .where(at(p.mapId, p.i, p.j))
    .returning({ i: mapCells.i });
  return rows.length === 1;
}

/** Marks every still-pending position of a map cancelled (after a failure or a cancel). */
export async function cancelPendingPositions(tx: Executor, mapId: string): Promise<number> {
  const rows = await tx
    .update(mapCells)
    .set({ state: "cancelled" })
    .where(and(eq(mapCells.mapId, mapId), eq(mapCells.state, "pending")))
    .returning({ i: mapCells.i });
  return rows.length;
}

export interface CountedProgress {
  status: MapStatus;
  cellsDone: number;
  cellsTotal: number;
  /** True when this cell was the map's last one (status became done). */
  finished: boolean;
}

/**
 * Counts one finished position on the map: cells_done + 1 and computed or from-cache + 1;
 * status queued → running (started_at set) and → done with finished_at when the last cell
 * lands. A cancelled or failed map keeps its status.
 */
export async function countFinishedCell(tx: Executor, mapId: string, fromCache: boolean): Promise<CountedProgress> {
  const live = sql`${maps.status} in ('queued', 'running')`;
  const last = sql`${maps.cellsDone} + 1 >= ${maps.cellsTotal}`;
  const [row] = await tx
    .update(maps)
    .set({
      cellsDone: sql`${maps.cellsDone} + 1`,
      cellsComputed: sql`${maps.cellsComputed} + ${fromCache ? 0 : 1}`,
      cellsFromCache: sql`${maps.cellsFromCache} + ${fromCache ? 1 : 0}`,
      status: sql`case when ${live} then (case when ${last} then 'done' else 'running' end)::map_status else ${maps.status} end`,
      startedAt: sql`coalesce(${maps.startedAt}, now())`,
      finishedAt: sql`case when ${live} and ${last} then now() else ${maps.finishedAt} end`,
      updatedAt: sql`now()`,
    })
    .where(eq(maps.id, mapId))
    .returning({ status: maps.status, cellsDone: maps.cellsDone, cellsTotal: maps.cellsTotal });
  return { ...row, finished: row.status === "done" && row.cellsDone === row.cellsTotal };
}

/** Fails a queued or running map with `message` (the first failure wins); false otherwise. */
export async function failMap(tx: Executor, mapId: string, message: string): Promise<boolean> {
  const rows = await tx
    .update(maps)
    .set({ status: "failed", failure: message, finishedAt: sql`now()`, updatedAt: sql`now()` })
    .where(and(eq(maps.id, mapId), sql`${maps.status} in ('queued', 'running')`))
    .returning({ id: maps.id });
  return rows.length === 1;
}
