import { and, count, eq, gt, inArray } from "drizzle-orm";
import type { CellResult } from "../../../shared/schemas/cell-result";
import type { TheoryColumns } from "../../../shared/schemas/theory";
import type { Executor } from "../../db/client";
import { cells, mapCells, theoryRows } from "../../db/schema/index";

export type NewMapCellRow = typeof mapCells.$inferInsert;

/** Rows per INSERT statement (12 columns each stays far below PostgreSQL's 65 535 parameters). */
const CHUNK = 1000;

export async function insertMapCells(db: Executor, rows: NewMapCellRow[]): Promise<void> {
  for (let k = 0; k < rows.length; k += CHUNK) await db.insert(mapCells).values(rows.slice(k, k + CHUNK));
}

/** The keys among `keys` that `fetch` finds, asked in chunks. */
async function foundKeys(keys: string[], fetch: (part: string[]) => Promise<{ key: string }[]>): Promise<Set<string>> {
  const found = new Set<string>();
  const unique = [...new Set(keys)];
  for (let k = 0; k < unique.length; k += CHUNK) {
    for (const r of await fetch(unique.slice(k, k + CHUNK))) found.add(r.key);
  }
  return found;
}

/** Which of these cell keys are stored in the cache. */
export function storedCellKeys(db: Executor, keys: string[]): Promise<Set<string>> {
  return foundKeys(keys, (part) => db.select({ key: cells.key }).from(cells).where(inArray(cells.key, part)));
}

/** Which of these theory keys are stored. */
export function storedTheoryKeys(db: Executor, keys: string[]): Promise<Set<string>> {
  return foundKeys(keys, (part) => db.select({ key: theoryRows.key }).from(theoryRows).where(inArray(theoryRows.key, part)));
}

/** One position with its full stored result (null while not stored). */
export async function findPosition(db: Executor, mapId: string, i: number, j: number) {
  const [row] = await db
    .select({ cell: mapCells, result: cells.result })
    .from(mapCells)
    .leftJoin(cells, eq(cells.key, mapCells.cellKey))
    .where(and(eq(mapCells.mapId, mapId), eq(mapCells.i, i), eq(mapCells.j, j)));
  return row ? { ...row.cell, result: row.result as CellResult | null } : undefined;
}

/** Theory rows by key: key → { mus, columns } (missing keys are absent). */
export async function findTheoryRows(db: Executor, keys: string[]): Promise<Map<string, { mus: number[]; columns: TheoryColumns[] }>> {
  const out = new Map<string, { mus: number[]; columns: TheoryColumns[] }>();
  const unique = [...new Set(keys)];
  if (unique.length === 0) return out;
  const rows = await db.select().from(theoryRows).where(inArray(theoryRows.key, unique));
  for (const r of rows) out.set(r.key, { mus: r.mus as number[], columns: r.columns as TheoryColumns[] });
  return out;
}

/** Marks the map's pending positions cancelled; returns the job ids they waited on. */
export async function cancelPending(db: Executor, mapId: string): Promise<string[]> {
  const rows = await db
    .update(mapCells)
    .set({ state: "cancelled" })
    .where(and(eq(mapCells.mapId, mapId), eq(mapCells.state, "pending")))
    .returning({ jobId: mapCells.jobId });
  return rows.flatMap((r) => (r.jobId ? [r.jobId] : []));
}

/** Job ids of the map's pending positions (to cancel them before deleting the map). */
export async function pendingJobIds(db: Executor, mapId: string): Promise<string[]> {
  const rows = await db
    .select({ jobId: mapCells.jobId })
    .from(mapCells)
    .where(and(eq(mapCells.mapId, mapId), eq(mapCells.state, "pending")));
  return rows.flatMap((r) => (r.jobId ? [r.jobId] : []));
}

/** Positions of the map computed (not from cache) in the last `seconds`. */
export async function countComputedSince(db: Executor, mapId: string, seconds: number): Promise<number> {
  const since = new Date(Date.now() - seconds * 1000);
  const [row] = await db
    .select({ n: count() })
    .from(mapCells)
    .where(and(eq(mapCells.mapId, mapId), eq(mapCells.fromCache, false), eq(mapCells.state, "done"), gt(mapCells.doneAt, since)));
  return row.n;
}
