import {
  groupRoleRank,
  type ChangeRole,
  type CreateGroup,
  type Group,
  type GroupDetail,
  type GroupMember,
  type GroupRole,
} from "../../../shared/schemas/groups";
import type { Db, Executor } from "../../db/client";
import { requireActor, type Actor } from "../../lib/actor";
import { iso } from "../../lib/dto";
import { ConflictError, ForbiddenError, NotFoundError } from "../../lib/errors";
import * as repo from "./groups.repo";

const LAST_OWNER = "A group needs at least one owner: make someone else an owner first";

export interface Membership {
  groupId: string;
  userId: string;
  role: GroupRole;
}

export function toGroup(row: { id: string; name: string; createdAt: Date; myRole: GroupRole; memberCount: number }): Group {
  return { id: row.id, name: row.name, createdAt: iso(row.createdAt), myRole: row.myRole, memberCount: row.memberCount };
}

function toMember(row: { userId: string; email: string; name: string; role: GroupRole; joinedAt: Date }): GroupMember {
  return { ...row, joinedAt: iso(row.joinedAt) };
}

/** Groups and their members. Every membership rule is checked here. */
export class GroupsService {
  private readonly db: Db;

  constructor(deps: { db: Db }) {
    this.db = deps.db;
  }

  /**
   * Checks that `actor` holds at least `minRole` in the group. Non-members get NotFoundError
   * (another group's resources do not reveal that they exist); weaker roles get ForbiddenError.
   * Pass `tx` to check inside a transaction (after `lockGroup`).
   */
  async requireGroupRole(actor: Actor | null | undefined, groupId: string, minRole: GroupRole, tx: Executor = this.db): Promise<Membership> {
    const me = requireActor(actor);
    const row = await repo.findMembership(tx, groupId, me.id);
    if (!row) throw new NotFoundError("Group not found");
    if (groupRoleRank[row.role] < groupRoleRank[minRole]) {
      throw new ForbiddenError(`This needs the ${minRole} role in the group; you are ${row.role}`);
    }
    return { groupId, userId: me.id, role: row.role };
  }

  private async groupFor(tx: Executor, userId: string, groupId: string): Promise<Group> {
    const [row] = await repo.listGroupsOf(tx, userId, groupId);
    if (!row) throw new NotFoundError("Group not found");
    return toGroup(row);
  }

  /** Removes `userId` from a locked group unless that would leave it without an owner. */
  private async removeGuarded(tx: Executor, groupId: string, userId: string): Promise<void> {
    const target = await repo.findMembership(tx, groupId, userId);
    if (!target) throw new NotFoundError("Member not found");
    if (target.role === "owner" && (await repo.countOwners(tx, groupId)) <= 1) throw new ConflictError(LAST_OWNER);
    await repo.deleteMember(tx, groupId, userId);
  }

  /** The actor's groups, by name. */
  async listMine(actor: Actor | null | undefined): Promise<Group[]> {
    return (await repo.listGroupsOf(this.db, requireActor(actor).id)).map(toGroup);
  }

  /** Creates a group; its creator becomes the owner. */
  async create(actor: Actor | null | undefined, input: CreateGroup): Promise<Group> {
    const me = requireActor(actor);
    return this.db.transaction(async (tx) => {
      const group = await repo.insertGroup(tx, { name: input.name, createdBy: me.id });
      await repo.insertMember(tx, { groupId: group.id, userId: me.id, role: "owner" });
      return this.groupFor(tx, me.id, group.id);
    });
  }

  /** Members of a group (any member); pending invitations only for editors and owners. */
  async get(actor: Actor | null | undefined, groupId: string): Promise<GroupDetail> {
    const membership = await this.requireGroupRole(actor, groupId, "viewer");
    const seesInvites = groupRoleRank[membership.role] >= groupRoleRank.editor;
    const [group, members, invites] = await Promise.all([
      this.groupFor(this.db, membership.userId, groupId),
      repo.listMembers(this.db, groupId),
      seesInvites ? repo.listPendingInvites(this.db, groupId) : Promise.resolve([]),
    ]);
    return {
      ...group,
      members: members.map(toMember),
      invites: invites.map((i) => ({ ...i, createdAt: iso(i.createdAt), expiresAt: iso(i.expiresAt) })),
    };
  }

  /** Owners change a member's role; the last owner cannot be demoted. */
  async changeRole(actor: Actor | null | undefined, groupId: string, userId: string, input: ChangeRole): Promise<GroupMember> {
    return this.db.transaction(async (tx) => {
      await repo.lockGroup(tx, groupId);
      await this.requireGroupRole(actor, groupId, "owner", tx);
      const target = await repo.findMembership(tx, groupId, userId);
      if (!target) throw new NotFoundError("Member not found");
      if (target.role === "owner" && input.role !== "owner" && (await repo.countOwners(tx, groupId)) <= 1) {
        throw new ConflictError(LAST_OWNER);
      }
      await repo.updateMemberRole(tx, groupId, userId, input.role);
      const member = (await repo.listMembers(tx, groupId)).find((m) => m.userId === userId);
      if (!member) throw new NotFoundError("Member not found");
      return toMember(member);
    });
  }

  /** Owners remove a member (themselves too, unless they are the last owner). */
  async removeMember(actor: Actor | null | undefined, groupId: string, userId: string): Promise<void> {
    await this.db.transaction(async (tx) => {
      await repo.lockGroup(tx, groupId);
      await this.requireGroupRole(actor, groupId, "owner", tx);
      await this.removeGuarded(tx, groupId, userId);
    });
  }

  /** Any member leaves; the last owner cannot. */
  async leave(actor: Actor | null | undefined, groupId: string): Promise<void> {
    await this.db.transaction(async (tx) => {
      await repo.lockGroup(tx, groupId);
      const membership = await this.requireGroupRole(actor, groupId, "viewer", tx);
      await this.removeGuarded(tx, groupId, membership.userId);
    });
  }
}

export function createGroupsService(deps: { db: Db }): GroupsService {
  return new GroupsService(deps);
}
