import { Router, type Response } from "express";
import { apiRoutes } from "../../../shared/schemas/api-paths";
import { mapIdParamsSchema, shareQuerySchema } from "../../../shared/schemas/maps";
import type { Actor } from "../../lib/actor";
import { validate } from "../../lib/validate";
import type { MapEvent, MapEventsHub } from "./map-events.hub";

export interface MapEventsRouterDeps {
  hub: MapEventsHub;
  /** Resolves when the reader may read the map; throws (401 / 404) otherwise — MapsService.getReadable. */
  canRead: (actor: Actor | null | undefined, id: string, token?: string) => Promise<unknown>;
  /** Milliseconds between heartbeat comments (default 15 000). */
  heartbeatMs?: number;
}

function write(res: Response, event: MapEvent): void {
  res.write(`event: ${event.type}\ndata: ${JSON.stringify(event.data)}\n\n`);
}

/**
 * GET /api/maps/:id/events — server-sent events of one map (shared/maps/map-events.ts): on
 * connect the current `progress` and `status`, then `cell`, `progress` and `status` as the
 * workers finish cells, and a heartbeat comment. Readable with `?share=TOKEN` like every read
 * route. The stream ends when the client disconnects.
 */
export function createMapEventsRouter(deps: MapEventsRouterDeps): Router {
  const router = Router();
  const heartbeatMs = deps.heartbeatMs ?? 15_000;

  router.get(apiRoutes.maps.events, validate({ params: mapIdParamsSchema, query: shareQuerySchema }), async (req, res) => {
    await deps.canRead(req.actor, req.params.id, req.query.share);
    const buffered: MapEvent[] = [];
    let live = false;
    let heartbeat: NodeJS.Timeout | undefined;
    // Subscribed before the snapshot is read, so nothing between the two is missed; events
    // that arrive meanwhile are sent after the snapshot.
    const unsubscribe = await deps.hub.subscribe(req.params.id, (e) => (live ? write(res, e) : buffered.push(e)));
    res.on("close", () => {
      clearInterval(heartbeat);
      unsubscribe();
    });
    let snapshot: MapEvent[];
    try {
      snapshot = await deps.hub.snapshot(req.params.id);
    } catch (err) {
      unsubscribe();
      throw err;
    }
    res.writeHead(200, {
      "Content-Type": "text/event-stream; charset=utf-8",
      "Cache-Control": "no-cache, no-transform",
      Connection: "keep-alive",
      "X-Accel-Buffering": "no",
    });
    res.write("retry: 3000\n\n");
    for (const e of [...snapshot, ...buffered.splice(0)]) write(res, e);
    live = true;
    heartbeat = setInterval(() => res.write(": heartbeat\n\n"), heartbeatMs);
  });

  return router;
}
