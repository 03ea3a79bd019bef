import { Router } from "express";
import { apiRoutes } from "../../../shared/schemas/api-paths";
import { mapIdParamsSchema, shareQuerySchema } from "../../../shared/schemas/maps";
import { compareParamsSchema, compareQuerySchema, importMapSchema, replicateBodySchema } from "../../../shared/schemas/review";
import { validate } from "../../lib/validate";
import { readAbout } from "./about";
import type { ReviewService } from "./review.service";

const paths = apiRoutes.review;
const byId = { params: mapIdParamsSchema, query: shareQuerySchema };

/** Review: replicate, import, compare, boundary, the report's facts and what software answers. */
export function createReviewRouter(review: ReviewService): Router {
  const router = Router();
  readAbout(); // the version and git commit are read once, when the server starts

  router.get(paths.about, (_req, res) => {
    res.json(readAbout());
  });

  router.post(paths.import, validate({ body: importMapSchema }), async (req, res) => {
    res.status(201).json(await review.importMap(req.actor, req.body));
  });

  router.post(paths.replicate, validate({ ...byId, body: replicateBodySchema }), async (req, res) => {
    res.status(201).json(await review.replicate(req.actor, req.params.id, req.body, req.query.share));
  });

  router.get(paths.compare, validate({ params: compareParamsSchema, query: compareQuerySchema }), async (req, res) => {
    const { id, otherId } = req.params;
    res.json(await review.compare(req.actor, id, otherId, req.query.share, req.query.otherShare));
  });

  router.get(paths.boundary, validate(byId), async (req, res) => {
    res.json(await review.boundary(req.actor, req.params.id, req.query.share));
  });

  router.get(paths.report, validate(byId), async (req, res) => {
    res.json(await review.report(req.actor, req.params.id, req.query.share));
  });

  return router;
}
