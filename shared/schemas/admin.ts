import { z } from "zod";
import { idSchema, pageQuerySchema, timestampSchema } from "./common";
import { siteRoleSchema, userSchema } from "./auth";

/** GET /api/admin/users?limit&offset&q (q matches e-mail or name). */
export const adminUserListQuerySchema = pageQuerySchema;
export type AdminUserListQuery = z.infer<typeof adminUserListQuerySchema>;

export const adminUserSchema = userSchema.extend({
  groupCount: z.number().int().nonnegative(),
});
export type AdminUser = z.infer<typeof adminUserSchema>;

export const adminUserListSchema = z.object({
  items: z.array(adminUserSchema),
  total: z.number().int().nonnegative(),
});
export type AdminUserList = z.infer<typeof adminUserListSchema>;

/** PATCH /api/admin/users/:userId. The last admin cannot be demoted. */
export const changeSiteRoleSchema = z.object({ siteRole: siteRoleSchema });
export type ChangeSiteRole = z.infer<typeof changeSiteRoleSchema>;

export const userIdParamsSchema = z.object({ userId: idSchema });

/** GET /api/admin/groups?limit&offset&q. */
export const adminGroupListQuerySchema = pageQuerySchema;
export type AdminGroupListQuery = z.infer<typeof adminGroupListQuerySchema>;

export const adminGroupSchema = z.object({
  id: idSchema,
  name: z.string(),
  createdAt: timestampSchema,
  memberCount: z.number().int().nonnegative(),
  ownerNames: z.array(z.string()),
});
export type AdminGroup = z.infer<typeof adminGroupSchema>;

export const adminGroupListSchema = z.object({
  items: z.array(adminGroupSchema),
  total: z.number().int().nonnegative(),
});
export type AdminGroupList = z.infer<typeof adminGroupListSchema>;

/** GET /api/admin/outbox?limit&offset&q (newest first; q matches recipient or subject). */
export const outboxListQuerySchema = pageQuerySchema;
export type OutboxListQuery = z.infer<typeof outboxListQuerySchema>;

/** One e-mail caught by the local SMTP fake. */
export const outboxMessageSchema = z.object({
  id: idSchema,
  to: z.string(),
  from: z.string(),
  subject: z.string(),
  text: z.string(),
  html: z.string().nullable(),
  createdAt: timestampSchema,
});
export type OutboxMessage = z.infer<typeof outboxMessageSchema>;

export const outboxListSchema = z.object({
  items: z.array(outboxMessageSchema),
  total: z.number().int().nonnegative(),
});
export type OutboxList = z.infer<typeof outboxListSchema>;
