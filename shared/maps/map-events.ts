import { z } from "zod";
import { mapSchema, mapStatusSchema } from "../schemas/maps";

/**
 * Server-sent events of GET /api/maps/:id/events (live fill-in). Each SSE message has an
 * `event:` name below and a JSON `data:` line:
 * - `cell`: a CellSummary (shared/maps/cell-summary.ts) of a position that finished, or whose
 *   τ row's theory columns just arrived;
 * - `progress`: the map's counters with throughput and ETA (mapProgressSchema), after every
 *   finished cell and on connect;
 * - `status`: the map's status when it changes (and on connect).
 * A comment line (": heartbeat") every 15 s keeps proxies from closing an idle stream.
 */
export const MAP_EVENT_NAMES = ["cell", "progress", "status"] as const;
export type MapEventName = (typeof MAP_EVENT_NAMES)[number];

/** The map's progress fields as in the map view (throughput and ETA over the same recent window). */
export const mapProgressSchema = mapSchema
  .pick({
    status: true, failure: true, cellsTotal: true, cellsDone: true, cellsComputed: true, cellsFromCache: true,
    throughput: true, etaSeconds: true, startedAt: true, finishedAt: true,
  })
  .extend({ mapId: z.uuid() });
export type MapProgress = z.infer<typeof mapProgressSchema>;

export const mapStatusEventSchema = z.object({ status: mapStatusSchema, failure: z.string().nullable() });
export type MapStatusEvent = z.infer<typeof mapStatusEventSchema>;
