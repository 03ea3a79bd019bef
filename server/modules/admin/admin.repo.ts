import { asc, count, eq, ilike, or, sql } from "drizzle-orm";
import type { SiteRole } from "../../../shared/schemas/auth";
import type { Executor } from "../../db/client";
import { containsPattern } from "../../db/like";
import { groupMembers, groups, users } from "../../db/schema/index";

interface Page {
  limit: number;
  offset: number;
  q?: string;
}

// Correlated subqueries name the outer table explicitly (drizzle writes a bare "id" for a column
// of a single-table select, which inside the subquery would bind to the inner table).
const groupCount = sql<number>`(select count(*)::int from ${groupMembers} m where m.user_id = ${users}.id)`;
const adminUserColumns = { id: users.id, email: users.email, name: users.name, siteRole: users.siteRole, createdAt: users.createdAt, groupCount };

/** Users by creation time with the number of groups each belongs to; `q` matches e-mail or name. */
export async function listUsers(db: Executor, page: Page) {
  const where = page.q ? or(ilike(users.email, containsPattern(page.q)), ilike(users.name, containsPattern(page.q))) : undefined;
  const [items, [{ total }]] = await Promise.all([
    db
      .select(adminUserColumns)
      .from(users)
      .where(where)
      .orderBy(asc(users.createdAt), asc(users.id))
      .limit(page.limit)
      .offset(page.offset),
    db.select({ total: count() }).from(users).where(where),
  ]);
  return { items, total };
}

/** Groups by name with member count and owners' names; `q` matches the name. */
export async function listGroups(db: Executor, page: Page) {
  const where = page.q ? ilike(groups.name, containsPattern(page.q)) : undefined;
  const memberCount = sql<number>`(select count(*)::int from ${groupMembers} m where m.group_id = ${groups}.id)`;
  const ownerNames = sql<string[]>`coalesce((select array_agg(u.name order by u.name) from ${groupMembers} m
    join ${users} u on u.id = m.user_id where m.group_id = ${groups}.id and m.role = 'owner'), '{}')`;
  const [items, [{ total }]] = await Promise.all([
    db
      .select({ id: groups.id, name: groups.name, createdAt: groups.createdAt, memberCount, ownerNames })
      .from(groups)
      .where(where)
      .orderBy(asc(groups.name), asc(groups.id))
      .limit(page.limit)
      .offset(page.offset),
    db.select({ total: count() }).from(groups).where(where),
  ]);
  return { items, total };
}

/** Locks every admin row, so two demotions cannot both pass the last-admin check. */
export async function lockAdmins(db: Executor): Promise<number> {
  const rows = await db.select({ id: users.id }).from(users).where(eq(users.siteRole, "admin")).for("update");
  return rows.length;
}

export async function setSiteRole(db: Executor, userId: string, siteRole: SiteRole) {
  const [row] = await db.update(users).set({ siteRole, updatedAt: new Date() }).where(eq(users.id, userId)).returning();
  return row;
}

export async function findUser(db: Executor, userId: string) {
  const [row] = await db.select().from(users).where(eq(users.id, userId));
  return row;
}

/** One user in the admin list's shape. */
export async function findAdminUser(db: Executor, userId: string) {
  const [row] = await db.select(adminUserColumns).from(users).where(eq(users.id, userId));
  return row;
}
