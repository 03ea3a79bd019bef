import { Router } from "express";
import { apiRoutes } from "../../../shared/schemas/api-paths";
import { updatePreferencesSchema } from "../../../shared/schemas/account";
import { validate } from "../../lib/validate";
import type { AccountService } from "./account.service";

/** GET and PATCH /api/account/preferences for the signed-in account. */
export function createAccountRouter(account: AccountService): Router {
  const router = Router();

  router.get(apiRoutes.account.preferences, async (req, res) => {
    res.json(await account.preferences(req.actor));
  });

  router.patch(apiRoutes.account.preferences, validate({ body: updatePreferencesSchema }), async (req, res) => {
    res.json(await account.updatePreferences(req.actor, req.body));
  });

  return router;
}
