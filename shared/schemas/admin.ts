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

/** Hours of finished jobs (completed, failed, cancelled) counted per queue, and of worker activity listed. */
export const QUEUE_HISTORY_HOURS = 24;

/** One pg-boss queue: jobs waiting or running now, and jobs finished in the last QUEUE_HISTORY_HOURS. */
export const queueCountsSchema = z.object({
  name: z.string(),
  created: z.number().int().nonnegative(),
  retry: z.number().int().nonnegative(),
  active: z.number().int().nonnegative(),
  completed: z.number().int().nonnegative(),
  failed: z.number().int().nonnegative(),
  cancelled: z.number().int().nonnegative(),
});
export type QueueCounts = z.infer<typeof queueCountsSchema>;

/** A job a worker holds now. Map fields are null for jobs that name no map (or a deleted one). */
export const activeJobSchema = z.object({
  /** pg-boss job id. */
  id: idSchema,
  queue: z.string(),
  mapId: idSchema.nullable(),
  mapTitle: z.string().nullable(),
  i: z.number().int().nonnegative().nullable(),
  j: z.number().int().nonnegative().nullable(),
  startedOn: timestampSchema,
  retryCount: z.number().int().nonnegative(),
});
export type ActiveJob = z.infer<typeof activeJobSchema>;

/** A worker process seen storing cells in the last QUEUE_HISTORY_HOURS (name from WORKER_NAME or host:pid). */
export const workerActivitySchema = z.object({
  name: z.string(),
  cellsLastHour: z.number().int().nonnegative(),
  lastCellAt: timestampSchema,
});
export type WorkerActivity = z.infer<typeof workerActivitySchema>;

/** A map still queued or running. */
export const inFlightMapSchema = z.object({
  id: idSchema,
  title: z.string(),
  ownerName: z.string(),
  status: z.enum(["queued", "running"]),
  cellsDone: z.number().int().nonnegative(),
  cellsTotal: z.number().int().nonnegative(),
});
export type InFlightMap = z.infer<typeof inFlightMapSchema>;

/** GET /api/admin/queue: the compute queue, the workers, and the maps being filled. */
export const adminQueueSchema = z.object({
  queues: z.array(queueCountsSchema),
  activeJobs: z.array(activeJobSchema),
  workers: z.array(workerActivitySchema),
  inFlightMaps: z.array(inFlightMapSchema),
});
export type AdminQueue = z.infer<typeof adminQueueSchema>;
