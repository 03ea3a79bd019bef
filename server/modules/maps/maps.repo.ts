import { and, asc, count, desc, eq, getTableColumns, ilike, inArray, ne, or, sql, type SQL } from "drizzle-orm";
import type { Executor } from "../../db/client";
import { containsPattern } from "../../db/like";
import { groupMembers, groups, maps, users } from "../../db/schema/index";

export type MapRow = typeof maps.$inferSelect;
export type NewMapRow = typeof maps.$inferInsert;

/** A map with its owner's and group's names and the reader's role in that group (null: none). */
export type MapRecord = NonNullable<Awaited<ReturnType<typeof findMapById>>>;

function mapRecordQuery(db: Executor, readerId: string | null) {
  const mine = readerId ? eq(groupMembers.userId, readerId) : sql`false`;
  return db
    .select({ ...getTableColumns(maps), ownerName: users.name, groupName: groups.name, readerRole: groupMembers.role })
    .from(maps)
    .innerJoin(users, eq(users.id, maps.ownerId))
    .leftJoin(groups, eq(groups.id, maps.groupId))
    .leftJoin(groupMembers, and(eq(groupMembers.groupId, maps.groupId), mine));
}

/** One map with names and the reader's group role. */
export async function findMapById(db: Executor, id: string, readerId: string | null) {
  const [row] = await mapRecordQuery(db, readerId).where(eq(maps.id, id));
  return row;
}

/** The map whose read-only link carries `token`. */
export async function findMapByToken(db: Executor, token: string) {
  const [row] = await mapRecordQuery(db, null).where(eq(maps.shareToken, token));
  return row;
}

export interface MapListFilter {
  scope: "mine" | "group" | "shared" | "all";
  q?: string;
  sort: "newest" | "oldest" | "title";
}

/** Maps the reader owns or reads through a group (visibility group or link), filtered and sorted. */
export function listMaps(db: Executor, readerId: string, filter: MapListFilter) {
  const own = eq(maps.ownerId, readerId);
  const throughGroup = and(ne(maps.visibility, "private"), eq(groupMembers.userId, readerId));
  const scopes: Record<MapListFilter["scope"], SQL | undefined> = {
    mine: own,
    group: throughGroup,
    shared: and(throughGroup, ne(maps.ownerId, readerId)),
    all: or(own, throughGroup),
  };
  const text = filter.q ? or(ilike(maps.title, containsPattern(filter.q)), ilike(maps.description, containsPattern(filter.q))) : undefined;
  const order = { newest: [desc(maps.createdAt)], oldest: [asc(maps.createdAt)], title: [asc(maps.title)] }[filter.sort];
  return mapRecordQuery(db, readerId)
    .where(and(scopes[filter.scope], text))
    .orderBy(...order, asc(maps.id))
    .limit(500);
}

/** Maps of the owner still filling (queued or running). */
export async function countInFlight(db: Executor, ownerId: string): Promise<number> {
  const [row] = await db
    .select({ n: count() })
    .from(maps)
    .where(and(eq(maps.ownerId, ownerId), inArray(maps.status, ["queued", "running"])));
  return row.n;
}

/** Locks the account row: one account's creates run one at a time (the in-flight limit). */
export async function lockOwner(db: Executor, ownerId: string): Promise<void> {
  await db.select({ id: users.id }).from(users).where(eq(users.id, ownerId)).for("update");
}

/** Locks a map row for a status change. */
export async function lockMap(db: Executor, id: string): Promise<MapRow | undefined> {
  const [row] = await db.select().from(maps).where(eq(maps.id, id)).for("update");
  return row;
}

export async function insertMap(db: Executor, values: NewMapRow): Promise<MapRow> {
  const [row] = await db.insert(maps).values(values).returning();
  return row;
}

export async function updateMap(db: Executor, id: string, patch: Partial<NewMapRow>): Promise<void> {
  await db.update(maps).set({ ...patch, updatedAt: new Date() }).where(eq(maps.id, id));
}

export async function deleteMap(db: Executor, id: string): Promise<void> {
  await db.delete(maps).where(eq(maps.id, id));
}
