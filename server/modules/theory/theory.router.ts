import { Router } from "express";
import { apiRoutes } from "../../../shared/schemas/api-paths";
import { boundaryQuerySchema, fieldTheoryQuerySchema, rateTheoryQuerySchema } from "../../../shared/schemas/theory";
import { validate } from "../../lib/validate";
import { createKacRicePool } from "./theory.pool";
import { createTheoryService, type TheoryService } from "./theory.service";

const paths = apiRoutes.theory;

/** Public (no sign-in) theory routes; answers are deterministic, so clients may cache them. */
export function createTheoryRouter(theory: TheoryService = createTheoryService(createKacRicePool())): Router {
  const router = Router();

  router.get(paths.field, validate({ query: fieldTheoryQuerySchema }), async (req, res) => {
    res.setHeader("Cache-Control", "public, max-age=3600");
    res.json(await theory.field(req.query));
  });

  router.get(paths.rate, validate({ query: rateTheoryQuerySchema }), async (req, res) => {
    res.setHeader("Cache-Control", "public, max-age=3600");
    res.json(await theory.rate(req.query));
  });

  router.get(paths.boundary, validate({ query: boundaryQuerySchema }), async (req, res) => {
    res.setHeader("Cache-Control", "public, max-age=3600");
    res.json(await theory.boundary(req.query));
  });

  return router;
}
