import { Router, type RequestHandler } from "express";
import { apiRoutes } from "../../../shared/schemas/api-paths";
import {
  probeDownloadQuerySchema, probeEquilibriumParamsSchema, probeIdParamsSchema, probeSearchSchema, probeUploadFieldsSchema,
} from "../../../shared/schemas/probes";
import { requireActor } from "../../lib/actor";
import { validate } from "../../lib/validate";
import { receiveProbeFiles, uploadedFiles } from "./probes.upload";
import type { ProbesService } from "./probes.service";

const paths = apiRoutes.probes;
const byId = { params: probeIdParamsSchema };

/** Probes: upload, list, read, search, download an equilibrium, delete. */
export function createProbesRouter(probes: ProbesService): Router {
  const router = Router();

  // Signed-out uploads are refused before multer reads the body.
  const signedIn: RequestHandler = (req, _res, next) => {
    requireActor(req.actor);
    next();
  };

  router.post(paths.list, signedIn, receiveProbeFiles, validate({ body: probeUploadFieldsSchema }), async (req, res) => {
    res.status(201).json(await probes.upload(req.actor, uploadedFiles(req.files), req.body));
  });

  router.get(paths.list, async (req, res) => {
    res.json({ items: await probes.list(req.actor) });
  });

  router.get(paths.detail, validate(byId), async (req, res) => {
    res.json(await probes.get(req.actor, req.params.id));
  });

  router.delete(paths.detail, validate(byId), async (req, res) => {
    await probes.remove(req.actor, req.params.id);
    res.status(204).end();
  });

  router.post(paths.search, validate({ ...byId, body: probeSearchSchema }), async (req, res) => {
    res.status(202).json(await probes.search(req.actor, req.params.id, req.body));
  });

  router.get(paths.equilibrium, validate({ params: probeEquilibriumParamsSchema, query: probeDownloadQuerySchema }), async (req, res) => {
    const { fileName, body } = await probes.equilibrium(req.actor, req.params.id, req.params.e, req.query.format);
    res.attachment(fileName);
    if (typeof body === "string") res.type("text/csv; charset=utf-8").send(body);
    else res.json(body);
  });

  return router;
}
