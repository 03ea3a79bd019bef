import { z } from "zod";
import { emailSchema, idSchema, timestampSchema } from "./common";

/** Roles inside a group, strongest first: owner ⊃ editor ⊃ viewer. */
export const groupRoleSchema = z.enum(["owner", "editor", "viewer"]);
export type GroupRole = z.infer<typeof groupRoleSchema>;

/** Rank of each role; a role satisfies a requirement when its rank is at least the required one. */
export const groupRoleRank: Record<GroupRole, number> = { viewer: 1, editor: 2, owner: 3 };

export const groupNameSchema = z
  .string()
  .trim()
  .min(1, "Enter a group name")
  .max(80, "At most 80 characters");

/** POST /api/groups. The creator becomes its owner. */
export const createGroupSchema = z.object({ name: groupNameSchema });
export type CreateGroup = z.infer<typeof createGroupSchema>;

/** A group as seen by one of its members. */
export const groupSchema = z.object({
  id: idSchema,
  name: z.string(),
  createdAt: timestampSchema,
  myRole: groupRoleSchema,
  memberCount: z.number().int().nonnegative(),
});
export type Group = z.infer<typeof groupSchema>;

export const groupMemberSchema = z.object({
  userId: idSchema,
  email: z.string(),
  name: z.string(),
  role: groupRoleSchema,
  joinedAt: timestampSchema,
});
export type GroupMember = z.infer<typeof groupMemberSchema>;

/** A pending invitation (shown to editors and owners). */
export const groupInviteSchema = z.object({
  id: idSchema,
  email: z.string(),
  role: groupRoleSchema,
  invitedByName: z.string().nullable(),
  createdAt: timestampSchema,
  expiresAt: timestampSchema,
});
export type GroupInvite = z.infer<typeof groupInviteSchema>;

/** GET /api/groups/:groupId. `invites` is empty for viewers. */
export const groupDetailSchema = groupSchema.extend({
  members: z.array(groupMemberSchema),
  invites: z.array(groupInviteSchema),
});
export type GroupDetail = z.infer<typeof groupDetailSchema>;

export const groupListSchema = z.object({ items: z.array(groupSchema) });
export type GroupList = z.infer<typeof groupListSchema>;

/** POST /api/groups/:groupId/invites. Editors may invite editors and viewers; owners anyone. */
export const inviteSchema = z.object({
  email: emailSchema,
  role: groupRoleSchema,
});
export type Invite = z.infer<typeof inviteSchema>;

/** PATCH /api/groups/:groupId/members/:userId (owners only). */
export const changeRoleSchema = z.object({ role: groupRoleSchema });
export type ChangeRole = z.infer<typeof changeRoleSchema>;

export const invitationStatusSchema = z.enum(["pending", "accepted", "expired"]);
export type InvitationStatus = z.infer<typeof invitationStatusSchema>;

/** GET /api/invites/:token: what the invitation page shows, signed in or not. */
export const invitationSchema = z.object({
  groupId: idSchema,
  groupName: z.string(),
  role: groupRoleSchema,
  email: z.string(),
  invitedByName: z.string().nullable(),
  expiresAt: timestampSchema,
  status: invitationStatusSchema,
});
export type Invitation = z.infer<typeof invitationSchema>;

export const groupIdParamsSchema = z.object({ groupId: idSchema });
export const memberParamsSchema = z.object({ groupId: idSchema, userId: idSchema });
export const inviteParamsSchema = z.object({ groupId: idSchema, inviteId: idSchema });
export const inviteTokenParamsSchema = z.object({
  token: z.string().min(16, "This invitation link is not valid").max(200, "This invitation link is not valid"),
});
