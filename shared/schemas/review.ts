import { z } from "zod";
import { idSchema, timestampSchema } from "./common";
import { createMapSchema, mapSchema, shareQuerySchema } from "./maps";

/**
 * Review of maps: replicate a map with a new seed, compare two maps cell by cell, estimate the
 * phase boundary per τ row, recreate a map from a manifest, and the facts a printed report needs.
 */

/** POST /api/maps/:id/replicate — body optional; without a seed a new random one is drawn. */
export const replicateBodySchema = z.object({
  seed: z.number().int().min(0).max(2 ** 31 - 1).optional(),
  title: z.string().trim().min(1).max(120).optional(),
});
export type ReplicateBody = z.infer<typeof replicateBodySchema>;

/**
 * POST /api/maps/import — `manifest` is the `manifest` block of a map's export.json. The
 * imported map belongs to the importer and starts private (the manifest's group and visibility
 * are dropped: the importer may not belong to that group); share it afterwards.
 */
export const importMapSchema = z.object({
  manifest: z
    .looseObject({})
    .transform((m) => ({ ...m, visibility: "private", groupId: null, estimateOnly: undefined }) as unknown as z.input<typeof createMapSchema>)
    .pipe(createMapSchema),
  title: z.string().trim().min(1).max(120).optional(),
});
export type ImportMap = z.infer<typeof importMapSchema>;

/** GET /api/maps/:id/compare/:otherId — `otherShare` is a share token for the second map. */
export const compareParamsSchema = z.object({ id: idSchema, otherId: idSchema });
export const compareQuerySchema = shareQuerySchema.extend({ otherShare: z.string().trim().min(1).max(100).optional() });

/** One map's side of a compared cell. */
export const compareSideSchema = z.object({
  /** Mean distinct stable equilibria found per network (the stable-found layer; a lower bound). */
  stableFound: z.number().nullable(),
  /** Share of networks with exactly one stable equilibrium found. */
  oneStable: z.number().nullable(),
  /** Networks behind the numbers (0 while the cell is not done). */
  networks: z.number().int(),
});

export const compareCellSchema = z.object({
  i: z.number().int(),
  j: z.number().int(),
  mu: z.number(),
  tau: z.number(),
  a: compareSideSchema,
  b: compareSideSchema,
  /** a − b of each layer (null unless both cells are done). */
  difference: z.object({ stableFound: z.number().nullable(), oneStable: z.number().nullable() }),
  /** Welch's t test on the per-network counts of stable equilibria found (null: not testable). */
  welch: z.object({ t: z.number().nullable(), df: z.number(), pValue: z.number() }).nullable(),
  /** Exact permutation test of the same counts, when the split count is small enough. */
  permutationP: z.number().nullable(),
  /** p ≥ 0.05 under Welch's test (null when not testable). */
  agree: z.boolean().nullable(),
});
export type CompareCell = z.infer<typeof compareCellSchema>;

export const compareMapRefSchema = z.object({ id: idSchema, title: z.string(), seed: z.number().int(), status: z.string(), ensemble: z.string(), settings: z.record(z.string(), z.unknown()) });

export const mapComparisonSchema = z.object({
  a: compareMapRefSchema,
  b: compareMapRefSchema,
  mu: z.array(z.number()),
  tau: z.array(z.number()),
  level: z.number(),
  /** Cells ordered by j, then i. */
  cells: z.array(compareCellSchema),
  summary: z.object({
    cells: z.number().int(),
    /** Cells where both sides are done and the test applies. */
    tested: z.number().int(),
    agreeing: z.number().int(),
    /** agreeing / tested (null when nothing was tested), with a Wilson 95 % interval. */
    agreeShare: z.number().nullable(),
    agreeLower: z.number().nullable(),
    agreeUpper: z.number().nullable(),
    /** Settings that differ between the two maps (e.g. "seed", "settings.g"). */
    differingSettings: z.array(z.string()),
  }),
});
export type MapComparison = z.infer<typeof mapComparisonSchema>;

export const boundaryStatusSchema = z.enum(["crossed", "above-range", "below-range", "no-trend", "too-few"]);

/** One τ row of GET /api/maps/:id/boundary. */
export const boundaryRowSchema = z.object({
  j: z.number().int(),
  tau: z.number(),
  /** μ where the fitted share of networks with exactly one stable state crosses ½ (null unless status "crossed"). */
  muHalf: z.number().nullable(),
  /** Percentile bootstrap 95 % band of muHalf (null when not determined). */
  low: z.number().nullable(),
  high: z.number().nullable(),
  status: boundaryStatusSchema,
  /** Predicted μ: field m = 1 (μ = σ√N); rate origin line μ = g(1 + τ). */
  predictedMu: z.number().nullable(),
  /** Field only: μ at the m_st(τ) line (σ√N · m_st(τ)); null for the rate network. */
  predictedMuStable: z.number().nullable(),
  /** muHalf − predictedMu. */
  difference: z.number().nullable(),
  /** Smallest grid μ of the top run of cells that found stable equilibria (see JSDoc); null when none. */
  muLost: z.number().nullable(),
  /** The next grid μ below muLost, where no network found a stable equilibrium (null: none below). */
  muLostBelow: z.number().nullable(),
  /** Networks per cell and done cells behind the fit; bootstrap resamples and defined replicates. */
  networks: z.number().int(),
  cellsUsed: z.number().int(),
  resamples: z.number().int(),
  definedResamples: z.number().int(),
});
export type BoundaryRow = z.infer<typeof boundaryRowSchema>;

export const mapBoundarySchema = z.object({
  mapId: idSchema,
  ensemble: z.string(),
  /** How muHalf is fitted, in words (shown under the table). */
  method: z.string(),
  level: z.number(),
  resamples: z.number().int(),
  seed: z.number().int(),
  rows: z.array(boundaryRowSchema),
});
export type MapBoundary = z.infer<typeof mapBoundarySchema>;

/** GET /api/about */
export const aboutSchema = z.object({
  name: z.string(),
  version: z.string(),
  /** Git commit the server runs (read at start), or "unknown". */
  commit: z.string(),
  engineVersion: z.string(),
  ensembles: z.array(z.object({ id: z.string(), version: z.string() })),
  startedAt: timestampSchema,
});
export type About = z.infer<typeof aboutSchema>;

/** GET /api/maps/:id/report — facts of the printed report beyond the map itself. */
export const mapReportSchema = z.object({
  map: mapSchema,
  about: aboutSchema,
  /** Engine seconds summed over the map's stored cells (computed once, possibly by another map). */
  computeSeconds: z.number(),
  cellsStored: z.number().int(),
  /** Settings of the engine that the budget does not carry (verification and merging). */
  engineSettings: z.array(z.object({ name: z.string(), value: z.string(), meaning: z.string() })),
  /** Replicates of this map and the map it replicates, readable by the reader. */
  related: z.array(z.object({ id: idSchema, title: z.string(), seed: z.number().int(), status: z.string(), relation: z.enum(["replicate", "original", "sibling"]) })),
  generatedAt: timestampSchema,
});
export type MapReport = z.infer<typeof mapReportSchema>;
