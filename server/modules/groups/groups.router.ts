import { Router } from "express";
import { apiRoutes } from "../../../shared/schemas/api-paths";
import {
  changeRoleSchema,
  createGroupSchema,
  groupIdParamsSchema,
  inviteParamsSchema,
  inviteSchema,
  inviteTokenParamsSchema,
  memberParamsSchema,
} from "../../../shared/schemas/groups";
import { validate } from "../../lib/validate";
import type { GroupsService } from "./groups.service";
import type { InvitesService } from "./invites.service";

const paths = apiRoutes.groups;

export function createGroupsRouter(groups: GroupsService, invites: InvitesService): Router {
  const router = Router();

  router.get(paths.list, async (req, res) => {
    res.json({ items: await groups.listMine(req.actor) });
  });

  router.post(paths.list, validate({ body: createGroupSchema }), async (req, res) => {
    res.status(201).json(await groups.create(req.actor, req.body));
  });

  router.get(paths.detail, validate({ params: groupIdParamsSchema }), async (req, res) => {
    res.json(await groups.get(req.actor, req.params.groupId));
  });

  router.post(paths.invites, validate({ params: groupIdParamsSchema, body: inviteSchema }), async (req, res) => {
    res.status(201).json(await invites.invite(req.actor, req.params.groupId, req.body));
  });

  router.delete(paths.invite, validate({ params: inviteParamsSchema }), async (req, res) => {
    await invites.revoke(req.actor, req.params.groupId, req.params.inviteId);
    res.status(204).end();
  });

  router.patch(paths.member, validate({ params: memberParamsSchema, body: changeRoleSchema }), async (req, res) => {
    res.json(await groups.changeRole(req.actor, req.params.groupId, req.params.userId, req.body));
  });

  router.delete(paths.member, validate({ params: memberParamsSchema }), async (req, res) => {
    await groups.removeMember(req.actor, req.params.groupId, req.params.userId);
    res.status(204).end();
  });

  router.post(paths.leave, validate({ params: groupIdParamsSchema }), async (req, res) => {
    await groups.leave(req.actor, req.params.groupId);
    res.status(204).end();
  });

  router.get(apiRoutes.invites.detail, validate({ params: inviteTokenParamsSchema }), async (req, res) => {
    res.json(await invites.preview(req.params.token));
  });

  router.post(apiRoutes.invites.accept, validate({ params: inviteTokenParamsSchema }), async (req, res) => {
    res.json(await invites.accept(req.actor, req.params.token));
  });

  return router;
}
