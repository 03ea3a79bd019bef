import { and, asc, count, eq, gt, isNull, sql } from "drizzle-orm";
import type { GroupRole } from "../../../shared/schemas/groups";
import type { Executor } from "../../db/client";
import { groupInvites, groupMembers, groups, users } from "../../db/schema/index";

export type GroupRow = typeof groups.$inferSelect;
export type InviteRow = typeof groupInvites.$inferSelect;

// Correlated subqueries name the outer table explicitly: drizzle writes a bare "id" for a
// column of a single-table select, which inside the subquery would bind to the inner table.
const memberCount = sql<number>`(select count(*)::int from ${groupMembers} m where m.group_id = ${groups}.id)`;

/** Groups the user belongs to (or just `onlyGroupId`), with their role and the member count, by name. */
export function listGroupsOf(db: Executor, userId: string, onlyGroupId?: string) {
  const mine = eq(groupMembers.userId, userId);
  return db
    .select({ id: groups.id, name: groups.name, createdAt: groups.createdAt, myRole: groupMembers.role, memberCount })
    .from(groupMembers)
    .innerJoin(groups, eq(groups.id, groupMembers.groupId))
    .where(onlyGroupId ? and(mine, eq(groups.id, onlyGroupId)) : mine)
    .orderBy(asc(groups.name), asc(groups.id));
}

export async function insertGroup(db: Executor, values: { name: string; createdBy: string }): Promise<GroupRow> {
  const [row] = await db.insert(groups).values(values).returning();
  return row;
}

export async function findGroup(db: Executor, groupId: string): Promise<GroupRow | undefined> {
  const [row] = await db.select().from(groups).where(eq(groups.id, groupId));
  return row;
}

/** Locks the group row: membership changes of one group run one at a time (owner-count rules). */
export async function lockGroup(db: Executor, groupId: string): Promise<void> {
  await db.select({ id: groups.id }).from(groups).where(eq(groups.id, groupId)).for("update");
}

export async function findMembership(db: Executor, groupId: string, userId: string) {
  const [row] = await db
    .select()
    .from(groupMembers)
    .where(and(eq(groupMembers.groupId, groupId), eq(groupMembers.userId, userId)));
  return row;
}

export function listMembers(db: Executor, groupId: string) {
  return db
    .select({ userId: users.id, email: users.email, name: users.name, role: groupMembers.role, joinedAt: groupMembers.joinedAt })
    .from(groupMembers)
    .innerJoin(users, eq(users.id, groupMembers.userId))
    .where(eq(groupMembers.groupId, groupId))
    .orderBy(asc(groupMembers.joinedAt), asc(users.id));
}

export async function countOwners(db: Executor, groupId: string): Promise<number> {
  const [row] = await db
    .select({ n: count() })
    .from(groupMembers)
    .where(and(eq(groupMembers.groupId, groupId), eq(groupMembers.role, "owner")));
  return row.n;
}

export async function insertMember(db: Executor, values: { groupId: string; userId: string; role: GroupRole }) {
  await db.insert(groupMembers).values(values);
}

export async function updateMemberRole(db: Executor, groupId: string, userId: string, role: GroupRole) {
  await db
    .update(groupMembers)
    .set({ role })
    .where(and(eq(groupMembers.groupId, groupId), eq(groupMembers.userId, userId)));
}

export async function deleteMember(db: Executor, groupId: string, userId: string) {
  await db.delete(groupMembers).where(and(eq(groupMembers.groupId, groupId), eq(groupMembers.userId, userId)));
}

export async function isMemberByEmail(db: Executor, groupId: string, email: string): Promise<boolean> {
  const [row] = await db
    .select({ id: users.id })
    .from(groupMembers)
    .innerJoin(users, eq(users.id, groupMembers.userId))
    .where(and(eq(groupMembers.groupId, groupId), eq(users.email, email)));
  return row !== undefined;
}

const pending = (groupId: string) => and(eq(groupInvites.groupId, groupId), isNull(groupInvites.acceptedAt));

/** Pending, unexpired invitations of a group with the inviter's name, newest first. */
export function listPendingInvites(db: Executor, groupId: string) {
  return db
    .select({
      id: groupInvites.id,
      email: groupInvites.email,
      role: groupInvites.role,
      invitedByName: users.name,
      createdAt: groupInvites.createdAt,
      expiresAt: groupInvites.expiresAt,
    })
    .from(groupInvites)
    .leftJoin(users, eq(users.id, groupInvites.invitedBy))
    .where(and(pending(groupId), gt(groupInvites.expiresAt, new Date())))
    .orderBy(sql`${groupInvites.createdAt} desc`, asc(groupInvites.id));
}

/** Removes earlier pending invitations of the same address (a new invite replaces them). */
export async function deletePendingInvitesFor(db: Executor, groupId: string, email: string) {
  await db.delete(groupInvites).where(and(pending(groupId), eq(groupInvites.email, email)));
}

export async function insertInvite(
  db: Executor,
  values: { groupId: string; email: string; role: GroupRole; tokenHash: string; invitedBy: string; expiresAt: Date },
): Promise<InviteRow> {
  const [row] = await db.insert(groupInvites).values(values).returning();
  return row;
}

/** Deletes a pending invitation; returns whether one was deleted. */
export async function deletePendingInvite(db: Executor, groupId: string, inviteId: string): Promise<boolean> {
  const rows = await db
    .delete(groupInvites)
    .where(and(pending(groupId), eq(groupInvites.id, inviteId)))
    .returning({ id: groupInvites.id });
  return rows.length > 0;
}

/** An invitation by token hash with its group name and inviter; `lock` holds the row for the transaction. */
export async function findInviteByHash(db: Executor, tokenHash: string, lock = false) {
  const query = db
    .select({ invite: groupInvites, groupName: groups.name, invitedByName: users.name })
    .from(groupInvites)
    .innerJoin(groups, eq(groups.id, groupInvites.groupId))
    .leftJoin(users, eq(users.id, groupInvites.invitedBy))
    .where(eq(groupInvites.tokenHash, tokenHash));
  const [row] = lock ? await query.for("update", { of: groupInvites }) : await query;
  return row;
}

export async function markInviteAccepted(db: Executor, inviteId: string, userId: string) {
  await db.update(groupInvites).set({ acceptedAt: new Date(), acceptedBy: userId }).where(eq(groupInvites.id, inviteId));
}
