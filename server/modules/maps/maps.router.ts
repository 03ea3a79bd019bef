import { Router } from "express";
import { apiRoutes } from "../../../shared/schemas/api-paths";
import {
  cellParamsSchema, couplingsParamsSchema, createMapSchema, gridQuerySchema, mapIdParamsSchema, mapListQuerySchema,
  shareQuerySchema, shareTokenParamsSchema, updateMapSchema,
} from "../../../shared/schemas/maps";
import { validate } from "../../lib/validate";
import type { MapReadsService } from "./map-reads.service";
import { writeNpy } from "../../engine/io/npy-write";
import { couplingsCsv, exportFileName } from "./maps.export";
import type { MapsService } from "./maps.service";

const paths = apiRoutes.maps;
const byId = { params: mapIdParamsSchema, query: shareQuerySchema };

/** Maps: create (or estimate), list, read, change, cancel, delete, grids, cells, exports, links. */
export function createMapsRouter(maps: MapsService, reads: MapReadsService): Router {
  const router = Router();

  router.post(paths.list, validate({ body: createMapSchema }), async (req, res) => {
    const answer = await maps.create(req.actor, req.body);
    res.status(req.body.estimateOnly ? 200 : 201).json(answer);
  });

  router.get(paths.list, validate({ query: mapListQuerySchema }), async (req, res) => {
    res.json({ items: await maps.list(req.actor, req.query) });
  });

  router.get(paths.detail, validate(byId), async (req, res) => {
    res.json(await maps.get(req.actor, req.params.id, req.query.share));
  });

  router.patch(paths.detail, validate({ ...byId, body: updateMapSchema }), async (req, res) => {
    res.json(await maps.update(req.actor, req.params.id, req.body, req.query.share));
  });

  router.delete(paths.detail, validate(byId), async (req, res) => {
    await maps.remove(req.actor, req.params.id, req.query.share);
    res.status(204).end();
  });

  router.post(paths.cancel, validate(byId), async (req, res) => {
    res.json(await maps.cancel(req.actor, req.params.id, req.query.share));
  });

  router.get(paths.grid, validate({ params: mapIdParamsSchema, query: gridQuerySchema }), async (req, res) => {
    res.json(await reads.grid(req.actor, req.params.id, req.query.layer, req.query.share));
  });

  router.get(paths.cell, validate({ params: cellParamsSchema, query: shareQuerySchema }), async (req, res) => {
    const { id, i, j } = req.params;
    res.json(await reads.cell(req.actor, id, i, j, req.query.share));
  });

  router.get(paths.couplings, validate({ params: couplingsParamsSchema, query: shareQuerySchema }), async (req, res) => {
    const { id, i, j, k, format } = req.params;
    const { title, n, data } = await reads.couplings(req.actor, id, i, j, k, req.query.share);
    res.attachment(exportFileName(`${title} couplings`, format));
    if (format === "npy") res.type("application/octet-stream").send(Buffer.from(writeNpy(data, [n, n])));
    else res.type("text/csv; charset=utf-8").send(couplingsCsv(data, n));
  });

  router.get(paths.exportCsv, validate(byId), async (req, res) => {
    const { title, text } = await reads.exportCsv(req.actor, req.params.id, req.query.share);
    res.attachment(exportFileName(title, "csv")).type("text/csv; charset=utf-8").send(text);
  });

  router.get(paths.exportJson, validate(byId), async (req, res) => {
    const { title, body } = await reads.exportJson(req.actor, req.params.id, req.query.share);
    res.attachment(exportFileName(title, "json")).json(body);
  });

  router.post(paths.share, validate(byId), async (req, res) => {
    res.json(await maps.share(req.actor, req.params.id, req.query.share));
  });

  router.delete(paths.share, validate(byId), async (req, res) => {
    res.json(await maps.unshare(req.actor, req.params.id, req.query.share));
  });

  router.get(paths.shared, validate({ params: shareTokenParamsSchema }), async (req, res) => {
    res.json(await maps.getShared(req.actor, req.params.token));
  });

  return router;
}
