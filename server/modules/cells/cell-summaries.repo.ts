import { and, asc, eq, sql, type SQL } from "drizzle-orm";
import { summarizeCell, type CellSummary } from "../../../shared/maps/cell-summary";
import type { CellResult } from "../../../shared/schemas/cell-result";
import type { TheoryColumns } from "../../../shared/schemas/theory";
import type { Executor } from "../../db/client";
import { cells, mapCells, maps, theoryRows } from "../../db/schema/index";

/** Which positions of a map to summarize (all when empty). */
export interface SummaryFilter {
  i?: number;
  j?: number;
  theoryKey?: string;
}

function where(mapId: string, f: SummaryFilter): SQL | undefined {
  const parts: SQL[] = [eq(mapCells.mapId, mapId)];
  if (f.i !== undefined) parts.push(eq(mapCells.i, f.i));
  if (f.j !== undefined) parts.push(eq(mapCells.j, f.j));
  if (f.theoryKey !== undefined) parts.push(eq(mapCells.theoryKey, f.theoryKey));
  return and(...parts);
}

/**
 * CellSummary of map positions (summarizeCell): the dynamics part from the stored result's
 * aggregate (only that leaves the database) once
 * the position is done, the theory part from its τ row once that row is stored (column i, as
 * the row lists every μ of the map in order). Ordered by j, then i.
 */
export async function listCellSummaries(db: Executor, mapId: string, filter: SummaryFilter = {}): Promise<CellSummary[]> {
  const rows = await db
    .select({
      i: mapCells.i, j: mapCells.j, mu: mapCells.mu, tau: mapCells.tau, state: mapCells.state,
      fromCache: mapCells.fromCache, budget: maps.budget, columns: theoryRows.columns,
      aggregate: sql<CellResult["aggregate"] | null>`${cells.result} -> 'aggregate'`,
    })
    .from(mapCells)
    .innerJoin(maps, eq(maps.id, mapCells.mapId))
    .leftJoin(cells, and(eq(cells.key, mapCells.cellKey), eq(mapCells.state, "done")))
    .leftJoin(theoryRows, eq(theoryRows.key, mapCells.theoryKey))
    .where(where(mapId, filter))
    .orderBy(asc(mapCells.j), asc(mapCells.i));
  return rows.map((r) => {
    const budget = r.budget as { networks: number; starts: number };
    const theory = (r.columns as TheoryColumns[] | null)?.[r.i] ?? null;
    const position = { i: r.i, j: r.j, mu: r.mu, tau: r.tau, state: r.state, fromCache: r.fromCache, networks: budget.networks, starts: budget.starts };
    return summarizeCell(position, r.aggregate ? { aggregate: r.aggregate } : null, theory);
  });
}
