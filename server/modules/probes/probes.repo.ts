import { and, desc, eq, getTableColumns, or, sql } from "drizzle-orm";
import type { Executor } from "../../db/client";
import { groupMembers, groups, probes, users } from "../../db/schema/index";

export type ProbeRow = typeof probes.$inferSelect;
export type NewProbeRow = typeof probes.$inferInsert;

const { matrix: _matrix, result: _result, ...light } = getTableColumns(probes);

/** Every column but the matrix bytes; the result without its state vectors (`states`). */
const viewColumns = { ...light, result: sql<unknown>`${probes.result} - 'states'`.as("result") };

function recordQuery(db: Executor, readerId: string) {
  return db
    .select({ ...viewColumns, ownerName: users.name, groupName: groups.name, readerRole: groupMembers.role })
    .from(probes)
    .innerJoin(users, eq(users.id, probes.ownerId))
    .leftJoin(groups, eq(groups.id, probes.groupId))
    .leftJoin(groupMembers, and(eq(groupMembers.groupId, probes.groupId), eq(groupMembers.userId, readerId)));
}

/** A probe (no matrix bytes, no state vectors) with names and the reader's role in its group. */
export type ProbeRecord = NonNullable<Awaited<ReturnType<typeof findProbe>>>;

export async function findProbe(db: Executor, id: string, readerId: string) {
  const [row] = await recordQuery(db, readerId).where(eq(probes.id, id));
  return row;
}

/** Probes the reader owns or reads as a member of their group, newest first. */
export function listProbes(db: Executor, readerId: string) {
  return recordQuery(db, readerId)
    .where(or(eq(probes.ownerId, readerId), eq(groupMembers.userId, readerId)))
    .orderBy(desc(probes.createdAt), desc(probes.id))
    .limit(500);
}

export async function insertProbe(db: Executor, values: NewProbeRow): Promise<string> {
  const [row] = await db.insert(probes).values(values).returning({ id: probes.id });
  return row.id;
}

/** Locks a probe row for a status change; returns its status and search state. */
export async function lockProbe(db: Executor, id: string) {
  const [row] = await db.select({ status: probes.status, search: probes.search }).from(probes).where(eq(probes.id, id)).for("update");
  return row;
}

export async function updateProbe(db: Executor, id: string, patch: Partial<NewProbeRow>): Promise<void> {
  await db.update(probes).set({ ...patch, updatedAt: new Date() }).where(eq(probes.id, id));
}

/**
 * Updates a probe only while `searchId` is its current search (a superseded or deleted search
 * changes nothing).
 * @returns whether a row was updated
 */
export async function updateSearch(db: Executor, id: string, searchId: string, patch: Partial<NewProbeRow>): Promise<boolean> {
  const rows = await db
    .update(probes)
    .set({ ...patch, updatedAt: new Date() })
    .where(and(eq(probes.id, id), sql`${probes.search}->>'id' = ${searchId}`))
    .returning({ id: probes.id });
  return rows.length > 0;
}

export async function deleteProbe(db: Executor, id: string): Promise<void> {
  await db.delete(probes).where(eq(probes.id, id));
}

/** What a search job needs: the matrix and input bytes, N, μ, φ, statistics and search state. */
export async function findProbeForSearch(db: Executor, id: string) {
  const [row] = await db
    .select({ n: probes.n, matrix: probes.matrix, input: probes.input, mu: probes.mu, nonlinearity: probes.nonlinearity, stats: probes.stats, search: probes.search, status: probes.status })
    .from(probes)
    .where(eq(probes.id, id));
  return row;
}

/** The state vector x* of equilibrium e of the last search, or null. */
export async function findEquilibriumState(db: Executor, id: string, e: number): Promise<number[] | null> {
  const [row] = await db
    .select({ x: sql<number[] | null>`${probes.result}->'states'->${sql.raw(String(Math.trunc(e)))}` })
    .from(probes)
    .where(eq(probes.id, id));
  return row?.x ?? null;
}
