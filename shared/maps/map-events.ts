import { z } from "zod";
import { mapStatusSchema } from "../schemas/maps";

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

export const mapProgressSchema = z.object({
  mapId: z.uuid(),
  status: mapStatusSchema,
  failure: z.string().nullable(),
  cellsTotal: z.number().int(),
  cellsDone: z.number().int(),
  cellsComputed: z.number().int(),
  cellsFromCache: z.number().int(),
  /** Cells computed per minute (recent window, as in the map view); null before any. */
  throughput: z.number().nullable(),
  /** Seconds left at that throughput: 0 when done, null when stopped or not yet known. */
  etaSeconds: z.number().nullable(),
  startedAt: z.string().nullable(),
  finishedAt: z.string().nullable(),
});
export type MapProgress = z.infer<typeof mapProgressSchema>;

export const mapStatusEventSchema = z.object({ status: mapStatusSchema, failure: z.string().nullable() });
export type MapStatusEvent = z.infer<typeof mapStatusEventSchema>;
