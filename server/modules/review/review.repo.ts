import { and, asc, eq, ne, or, sql } from "drizzle-orm";
import type { Executor } from "../../db/client";
import { cells, mapCells, maps } from "../../db/schema/index";

/**
 * One grid position with what the review statistics need of its stored result: the number of
 * distinct stable equilibria found in each network (networks[k].stable.length), read inside
 * PostgreSQL so the full results never leave the database.
 */
export interface PositionCounts {
  i: number;
  j: number;
  mu: number;
  tau: number;
  state: "pending" | "done" | "failed" | "cancelled";
  /** stable.length of each network k (null while the cell is not stored). */
  stableCounts: number[] | null;
}

/** Every position of a map with its per-network stable counts, ordered by j then i. */
export async function listPositionCounts(db: Executor, mapId: string): Promise<PositionCounts[]> {
  const rows = await db
    .select({
      i: mapCells.i,
      j: mapCells.j,
      mu: mapCells.mu,
      tau: mapCells.tau,
      state: mapCells.state,
      stableCounts: sql<number[] | null>`jsonb_path_query_array(${cells.result}, '$.networks[*].stable.size()')`,
    })
    .from(mapCells)
    .leftJoin(cells, eq(cells.key, mapCells.cellKey))
    .where(eq(mapCells.mapId, mapId))
    .orderBy(asc(mapCells.j), asc(mapCells.i));
  return rows.map((r) => ({ ...r, stableCounts: r.state === "done" ? r.stableCounts : null }));
}

/** Engine seconds summed over the map's stored cells, and how many are stored. */
export async function computeTotals(db: Executor, mapId: string): Promise<{ seconds: number; stored: number }> {
  const [row] = await db
    .select({
      seconds: sql<number>`coalesce(sum(${cells.computeSeconds}), 0)::float8`,
      stored: sql<number>`count(${cells.key})::int`,
    })
    .from(mapCells)
    .innerJoin(cells, eq(cells.key, mapCells.cellKey))
    .where(eq(mapCells.mapId, mapId));
  return { seconds: Number(row?.seconds ?? 0), stored: Number(row?.stored ?? 0) };
}

/**
 * Ids of the maps linked to `id` by replication: its replicates, the map it replicates and that
 * map's other replicates (access is checked by the caller).
 */
export async function relatedMapIds(db: Executor, id: string, replicateOf: string | null): Promise<{ id: string; replicateOf: string | null }[]> {
  const links = [eq(maps.replicateOf, id)];
  if (replicateOf) links.push(eq(maps.id, replicateOf), eq(maps.replicateOf, replicateOf));
  return db
    .select({ id: maps.id, replicateOf: maps.replicateOf })
    .from(maps)
    .where(and(or(...links), ne(maps.id, id)))
    .orderBy(asc(maps.createdAt))
    .limit(50);
}
