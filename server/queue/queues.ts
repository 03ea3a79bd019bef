import { z } from "zod";

/**
 * pg-boss queue names beside their payload schemas. Payloads are validated when dequeued.
 * - fill-cell: compute (or take from the cache) one grid position of one map.
 * - theory-row: compute the theory columns of one τ row (Kac–Rice eigenvalues reused across μ).
 * - fill-cell-exhausted: dead letter of fill-cell; receives the payload of a job whose retries
 *   are used up, so the cell and its map are marked failed instead of waiting forever.
 * - map-finished: follow-up work when a map completes (e-mail to the owner).
 * - probe-search: the equilibrium search of one uploaded coupling matrix (and its comparison
 *   with random networks); `searchId` names the search, so a superseded job does nothing.
 */
export const FILL_CELL_QUEUE = "fill-cell";
export const FILL_CELL_EXHAUSTED_QUEUE = "fill-cell-exhausted";
export const THEORY_ROW_QUEUE = "theory-row";
export const MAP_FINISHED_QUEUE = "map-finished";
export const PROBE_SEARCH_QUEUE = "probe-search";
export type QueueName =
  | typeof FILL_CELL_QUEUE | typeof FILL_CELL_EXHAUSTED_QUEUE | typeof THEORY_ROW_QUEUE | typeof MAP_FINISHED_QUEUE | typeof PROBE_SEARCH_QUEUE;

export const fillCellPayloadSchema = z.object({
  mapId: z.uuid(),
  i: z.number().int().min(0),
  j: z.number().int().min(0),
  cellKey: z.string().min(16),
});
export type FillCellPayload = z.infer<typeof fillCellPayloadSchema>;

export const theoryRowPayloadSchema = z.object({
  theoryKey: z.string().min(16),
  ensemble: z.string(),
  params: z.object({ N: z.number().int().positive(), sigma: z.number().optional(), g: z.number().optional() }),
  tau: z.number().min(0).max(1),
  mus: z.array(z.number().positive()).min(1),
  kacRice: z.object({ samples: z.number().int().min(2), seed: z.number().int().min(0) }).optional(),
});
export type TheoryRowPayload = z.infer<typeof theoryRowPayloadSchema>;

export const mapFinishedPayloadSchema = z.object({ mapId: z.uuid() });
export type MapFinishedPayload = z.infer<typeof mapFinishedPayloadSchema>;

export const probeSearchPayloadSchema = z.object({ probeId: z.uuid(), searchId: z.uuid() });
export type ProbeSearchPayload = z.infer<typeof probeSearchPayloadSchema>;

/** Payload type of each queue (fill-cell-exhausted carries the fill-cell payload). */
export interface QueuePayloads {
  [FILL_CELL_QUEUE]: FillCellPayload;
  [FILL_CELL_EXHAUSTED_QUEUE]: FillCellPayload;
  [THEORY_ROW_QUEUE]: TheoryRowPayload;
  [MAP_FINISHED_QUEUE]: MapFinishedPayload;
  [PROBE_SEARCH_QUEUE]: ProbeSearchPayload;
}
