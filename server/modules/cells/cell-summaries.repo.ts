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

/** One position's summary with its cell key and the engine version of its stored result. */
export interface StoredCellSummary {
  summary: CellSummary;
  cellKey: string;
  /** `engineVersion` of the cache row under the position's key (null while none is stored). */
  engineVersion: string | null;
}

function where(mapId: string, f: SummaryFilter): SQL | undefined {
  const parts: SQL[] = [eq(mapCells.mapId, mapId)];
  if (f.i !== undefined) parts.push(eq(mapCells.i, f.i));
  if (f.j !== undefined) parts.push(eq(mapCells.j, f.j));
  if (f.theoryKey !== undefined) parts.push(eq(mapCells.theoryKey, f.theoryKey));
  return and(...parts);
}

/**
 * The one way to build CellSummaries of a map's positions (summarizeCell), for the grid, the
 * exports and live `cell` events. Only the stored result's aggregate and column i of the τ
 * row's theory (the row lists every μ of the map in order) leave the database. The dynamics
 * part is filled once the position is done, the theory part once its row is stored. Ordered by
 * j, then i.
 */
export async function listCellSummaries(db: Executor, mapId: string, filter: SummaryFilter = {}): Promise<StoredCellSummary[]> {
  const rows = await db
    .select({
      i: mapCells.i, j: mapCells.j, mu: mapCells.mu, tau: mapCells.tau, state: mapCells.state,
      fromCache: mapCells.fromCache, cellKey: mapCells.cellKey, budget: maps.budget,
      theory: sql<TheoryColumns | null>`${theoryRows.columns} -> ${mapCells.i}`,
      aggregate: sql<CellResult["aggregate"] | null>`${cells.result} -> 'aggregate'`,
      engineVersion: sql<string | null>`${cells.result} ->> 'engineVersion'`,
    })
    .from(mapCells)
    .innerJoin(maps, eq(maps.id, mapCells.mapId))
    .leftJoin(cells, eq(cells.key, mapCells.cellKey))
    .leftJoin(theoryRows, eq(theoryRows.key, mapCells.theoryKey))
    .where(where(mapId, filter))
    .orderBy(asc(mapCells.j), asc(mapCells.i));
  return rows.map((r) => {
    const budget = r.budget as { networks: number; starts: number };
    const position = { i: r.i, j: r.j, mu: r.mu, tau: r.tau, state: r.state, fromCache: r.fromCache, networks: budget.networks, starts: budget.starts };
    const aggregate = r.state === "done" ? r.aggregate : null;
    return { summary: summarizeCell(position, aggregate ? { aggregate } : null, r.theory), cellKey: r.cellKey, engineVersion: r.engineVersion };
  });
}
