import { eq, inArray } from "drizzle-orm";
import type { CellInput, CellResult } from "../../../shared/schemas/cell-result";
import type { TheoryColumns } from "../../../shared/schemas/theory";
import type { Executor } from "../../db/client";
import { cells, theoryRows } from "../../db/schema/index";

// The cache of computed cells and theory rows, shared by every map of every account. Rows are
// written once (INSERT … ON CONFLICT DO NOTHING) and never updated: a key names one result.

export type CellRow = typeof cells.$inferSelect;
export type TheoryRowRow = typeof theoryRows.$inferSelect;

export interface NewCell {
  key: string;
  input: CellInput;
  result: CellResult;
  /** Name of the worker process that computed it (hostname:pid). */
  worker: string;
}

/** The stored cell of `key`, or undefined. */
export async function findCell(db: Executor, key: string): Promise<CellRow | undefined> {
  const [row] = await db.select().from(cells).where(eq(cells.key, key));
  return row;
}

/** Whether a cell is stored under `key` (reads the key only, not the result). */
export async function hasCell(db: Executor, key: string): Promise<boolean> {
  const [row] = await db.select({ key: cells.key }).from(cells).where(eq(cells.key, key));
  return row !== undefined;
}

/** Which of `keys` are stored (one query; for marking cached cells at map creation). */
export async function storedCellKeys(db: Executor, keys: readonly string[]): Promise<Set<string>> {
  if (keys.length === 0) return new Set();
  const rows = await db.select({ key: cells.key }).from(cells).where(inArray(cells.key, [...new Set(keys)]));
  return new Set(rows.map((r) => r.key));
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

/** The stored theory row of `key`, or undefined. */
export async function findTheoryRow(db: Executor, key: string): Promise<TheoryRowRow | undefined> {
  const [row] = await db.select().from(theoryRows).where(eq(theoryRows.key, key));
  return row;
}

/** Stored theory rows by key (one query). */
export async function findTheoryRows(db: Executor, keys: readonly string[]): Promise<Map<string, TheoryColumns[]>> {
  if (keys.length === 0) return new Map();
  const rows = await db.select({ key: theoryRows.key, columns: theoryRows.columns }).from(theoryRows).where(inArray(theoryRows.key, [...new Set(keys)]));
  return new Map(rows.map((r) => [r.key, r.columns as TheoryColumns[]]));
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
