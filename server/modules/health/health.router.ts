import { Router } from "express";
import { apiRoutes } from "../../../shared/schemas/api-paths";
import type { HealthService } from "./health.service";

export function createHealthRouter(health: HealthService): Router {
  const router = Router();
  router.get(apiRoutes.health, async (_req, res) => {
    res.setHeader("Cache-Control", "no-store");
    res.json(await health.check());
  });
  return router;
}
