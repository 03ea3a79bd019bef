import { eq } from "drizzle-orm";
import type { CellInput, CellResult } from "../../../shared/schemas/cell-result";
import type { TheoryColumns } from "../../../shared/schemas/theory";
import type { Executor } from "../../db/client";
import { cells, theoryRows } from "../../db/schema/index";

// The cache of computed cells and theory rows, shared by every map of every account. Rows are
// written once (INSERT … ON CONFLICT DO NOTHING) and never updated: a key names one result.

export interface NewCell {
  key: string;
  input: CellInput;
  result: CellResult;
  /** Name of the worker process that computed it (hostname:pid). */
  worker: string;
}

/** Whether a cell is stored under `key` (reads the key only, not the result). */
export async function hasCell(db: Executor, key: string): Promise<boolean> {
  const [row] = await db.select({ key: cells.key }).from(cells).where(eq(cells.key, key));
  return row !== undefined;
}

/**
 * Stores a computed cell once: INSERT … ON CONFLICT (key) DO NOTHING, so two workers racing on
 * the same key leave one row. The wall time and the engine's counters travel inside `result`;
 * compute_seconds repeats the wall time for queries.
 * @returns true when this call stored the row, false when the key was already stored
 */
export async function storeCell(db: Executor, cell: NewCell): Promise<boolean> {
  const rows = await db
    .insert(cells)
    .values({
      key: cell.key,
      ensemble: cell.result.ensemble,
      ensembleVersion: cell.result.ensembleVersion,
      input: cell.input,
      result: cell.result,
      computeSeconds: cell.result.timing.wallSeconds,
      worker: cell.worker,
    })
    .onConflictDoNothing({ target: cells.key })
    .returning({ key: cells.key });
  return rows.length === 1;
}

/** Whether a theory row is stored under `key`. */
export async function hasTheoryRow(db: Executor, key: string): Promise<boolean> {
  const [row] = await db.select({ key: theoryRows.key }).from(theoryRows).where(eq(theoryRows.key, key));
  return row !== undefined;
}

/**
 * Stores a theory row once (ON CONFLICT (key) DO NOTHING).
 * @returns true when this call stored it
 */
export async function storeTheoryRow(
  db: Executor, row: { key: string; ensemble: string; tau: number; mus: number[]; columns: TheoryColumns[] },
): Promise<boolean> {
  const rows = await db.insert(theoryRows).values(row).onConflictDoNothing({ target: theoryRows.key }).returning({ key: theoryRows.key });
  return rows.length === 1;
}
