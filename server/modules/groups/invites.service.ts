import { pagePaths } from "../../../shared/schemas/api-paths";
import {
  groupRoleRank,
  type Group,
  type GroupInvite,
  type Invitation,
  type InvitationStatus,
  type Invite,
} from "../../../shared/schemas/groups";
import type { Db } from "../../db/client";
import { requireActor, type Actor } from "../../lib/actor";
import { iso } from "../../lib/dto";
import { ConflictError, ForbiddenError, NotFoundError } from "../../lib/errors";
import { hashToken, newToken } from "../../lib/tokens";
import type { Mailer } from "../../mail/mailer";
import { groupInviteMail } from "../../mail/templates";
import { toGroup, type GroupsService } from "./groups.service";
import * as repo from "./groups.repo";

export const INVITE_TTL_MS = 7 * 24 * 60 * 60_000;

export interface InvitesServiceDeps {
  db: Db;
  mailer: Mailer;
  appUrl: string;
  groups: GroupsService;
}

function invitationStatus(invite: repo.InviteRow): InvitationStatus {
  if (invite.acceptedAt) return "accepted";
  return invite.expiresAt.getTime() <= Date.now() ? "expired" : "pending";
}

/** Invitations by e-mail: send, withdraw, show, accept. */
export class InvitesService {
  constructor(private readonly deps: InvitesServiceDeps) {}

  /**
   * Editors and owners invite an address with a role (only owners may invite owners). The
   * e-mail is sent inside the transaction: if it cannot be sent, no invitation is stored.
   * A new invitation replaces a pending one for the same address.
   */
  async invite(actor: Actor | null | undefined, groupId: string, input: Invite): Promise<GroupInvite> {
    const membership = await this.deps.groups.requireGroupRole(actor, groupId, "editor");
    if (groupRoleRank[input.role] > groupRoleRank[membership.role]) {
      throw new ForbiddenError(`Only owners can invite someone as ${input.role}`);
    }
    const me = requireActor(actor);
    return this.deps.db.transaction(async (tx) => {
      const group = await repo.findGroup(tx, groupId);
      if (!group) throw new NotFoundError("Group not found");
      if (await repo.isMemberByEmail(tx, groupId, input.email)) {
        throw new ConflictError("This address already belongs to a member", [{ path: "email", message: "Already a member" }]);
      }
      await repo.deletePendingInvitesFor(tx, groupId, input.email);
      const { token, hash } = newToken();
      const expiresAt = new Date(Date.now() + INVITE_TTL_MS);
      const row = await repo.insertInvite(tx, { groupId, email: input.email, role: input.role, tokenHash: hash, invitedBy: me.id, expiresAt });
      const url = `${this.deps.appUrl}${pagePaths.invite(token)}`;
      await this.deps.mailer.send(groupInviteMail({ email: input.email, groupName: group.name, role: input.role, inviterName: me.name }, url));
      return { id: row.id, email: row.email, role: row.role, invitedByName: me.name, createdAt: iso(row.createdAt), expiresAt: iso(row.expiresAt) };
    });
  }

  /** Editors and owners withdraw a pending invitation. */
  async revoke(actor: Actor | null | undefined, groupId: string, inviteId: string): Promise<void> {
    await this.deps.groups.requireGroupRole(actor, groupId, "editor");
    if (!(await repo.deletePendingInvite(this.deps.db, groupId, inviteId))) throw new NotFoundError("Invitation not found");
  }

  /** What an invitation link shows (no sign-in needed: holding the link is the permission). */
  async preview(token: string): Promise<Invitation> {
    const row = await repo.findInviteByHash(this.deps.db, hashToken(token));
    if (!row) throw new NotFoundError("Invitation not found");
    const { invite } = row;
    return {
      groupId: invite.groupId,
      groupName: row.groupName,
      role: invite.role,
      email: invite.email,
      invitedByName: row.invitedByName,
      expiresAt: iso(invite.expiresAt),
      status: invitationStatus(invite),
    };
  }

  /** The signed-in account whose e-mail the invitation names joins with its role (once). */
  async accept(actor: Actor | null | undefined, token: string): Promise<Group> {
    const me = requireActor(actor);
    return this.deps.db.transaction(async (tx) => {
      const row = await repo.findInviteByHash(tx, hashToken(token), true);
      if (!row) throw new NotFoundError("Invitation not found");
      const { invite } = row;
      const status = invitationStatus(invite);
      if (status === "accepted") throw new ConflictError("This invitation has already been used");
      if (status === "expired") throw new ConflictError("This invitation has expired; ask for a new one");
      if (invite.email !== me.email) {
        throw new ForbiddenError(`This invitation was sent to ${invite.email}; sign in with that address to accept it`);
      }
      await repo.lockGroup(tx, invite.groupId);
      if (await repo.findMembership(tx, invite.groupId, me.id)) throw new ConflictError("You are already a member of this group");
      await repo.insertMember(tx, { groupId: invite.groupId, userId: me.id, role: invite.role });
      await repo.markInviteAccepted(tx, invite.id, me.id);
      const [group] = await repo.listGroupsOf(tx, me.id, invite.groupId);
      return toGroup(group);
    });
  }
}

export function createInvitesService(deps: InvitesServiceDeps): InvitesService {
  return new InvitesService(deps);
}
