import { Router } from "express";
import {
  adminGroupListQuerySchema,
  adminUserListQuerySchema,
  changeSiteRoleSchema,
  outboxListQuerySchema,
  userIdParamsSchema,
} from "../../../shared/schemas/admin";
import { apiRoutes } from "../../../shared/schemas/api-paths";
import { validate } from "../../lib/validate";
import type { AdminService } from "./admin.service";

const paths = apiRoutes.admin;

export function createAdminRouter(admin: AdminService): Router {
  const router = Router();

  router.get(paths.users, validate({ query: adminUserListQuerySchema }), async (req, res) => {
    res.json(await admin.listUsers(req.actor, req.query));
  });

  router.patch(paths.user, validate({ params: userIdParamsSchema, body: changeSiteRoleSchema }), async (req, res) => {
    res.json(await admin.changeSiteRole(req.actor, req.params.userId, req.body));
  });

  router.get(paths.groups, validate({ query: adminGroupListQuerySchema }), async (req, res) => {
    res.json(await admin.listGroups(req.actor, req.query));
  });

  router.get(paths.outbox, validate({ query: outboxListQuerySchema }), async (req, res) => {
    res.json(await admin.listOutbox(req.actor, req.query));
  });

  router.get(paths.queue, async (req, res) => {
    res.json(await admin.queueOverview(req.actor));
  });

  return router;
}
