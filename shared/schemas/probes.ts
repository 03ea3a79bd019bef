import { z } from "zod";
import { cellAggregateSchema, equilibriumSummarySchema, runClassCountsSchema, traceSchema } from "./cell-result";
import { idSchema, timestampSchema } from "./common";
import { nonlinearitySchema } from "./maps";

/**
 * Probes: one uploaded coupling matrix J of the rate network dx/dt = −μx + J φ(x) + I, its
 * estimated ensemble parameters, its spectrum, an equilibrium search from many random starts
 * and the same search on random networks with the estimated g and τ. Found equilibria are lower
 * bounds of the true numbers; every estimate carries its standard error and sample size.
 */

/** Upload limits, stated on the upload page and enforced by the server. */
export const probeLimits = Object.freeze({
  /** Largest upload (matrix or input file), bytes. */
  maxFileBytes: 40 * 1024 * 1024,
  /** Largest N. */
  maxN: 2000,
  /** Accepted file extensions. */
  extensions: [".csv", ".npy", ".mtx"] as const,
  /** Largest starts per search. */
  maxStarts: 512,
  /** Largest number of comparison networks. */
  maxCompareNetworks: 16,
  /**
   * Largest search work N² × starts × (1 + comparison networks), by site role. Measured with
   * `node --import tsx scripts/bench-probe.ts` on this 2-core machine (2026-12-01, 2 threads, g = 1.5,
   * τ = 0.4, μ = 1, runs that never settle and so use the whole tMax = 200): about 1.5e7 units of
   * work per minute; the member limit is then about 40 minutes, the admin limit about 2 hours
   * (the probe-search queue lets a job run 3 hours).
   */
  maxSearchWork: { member: 6e8, admin: 1.8e9 } as const,
});

export const probeFormatSchema = z.enum(["csv", "npy", "mtx"]);
export type ProbeFormat = z.infer<typeof probeFormatSchema>;

const emptyToUndefined = (v: unknown) => (v === "" || v === null ? undefined : v);

/** Text fields of POST /api/probes (multipart/form-data; numbers arrive as strings). */
export const probeUploadFieldsSchema = z.object({
  mu: z.preprocess(emptyToUndefined, z.coerce.number({ error: "Enter μ, the relaxation rate" }).finite().positive("μ must be > 0").max(1e4, "μ at most 10 000")),
  nonlinearity: z.preprocess(emptyToUndefined, nonlinearitySchema.default("tanh")),
  title: z.preprocess(emptyToUndefined, z.string().trim().min(1).max(120).optional()),
  groupId: z.preprocess(emptyToUndefined, idSchema.optional()),
});
export type ProbeUploadFields = z.infer<typeof probeUploadFieldsSchema>;

/** POST /api/probes/:id/search body. */
export const probeSearchSchema = z.object({
  /** Random starts on the uploaded matrix (and on each comparison network). */
  starts: z.number().int().min(1, "At least 1 start").max(probeLimits.maxStarts, `At most ${probeLimits.maxStarts} starts`).default(64),
  tMax: z.number().positive().max(5000).default(200),
  rtol: z.number().min(1e-12).max(1e-2).default(1e-6),
  atol: z.number().min(1e-14).max(1e-2).default(1e-9),
  /** Random rate networks with the estimated g and τ (0: no comparison). */
  compareNetworks: z.number().int().min(0).max(probeLimits.maxCompareNetworks, `At most ${probeLimits.maxCompareNetworks} comparison networks`).default(8),
  /** Seed of the random starts and of the comparison networks. */
  seed: z.number().int().min(0).max(2 ** 31 - 1).default(1),
});
export type ProbeSearchInput = z.input<typeof probeSearchSchema>;
export type ProbeSearchSettings = z.output<typeof probeSearchSchema>;

/** An estimate with its standard error; null when the matrix is too small to estimate it. */
export const estimateSchema = z.object({ estimate: z.number(), se: z.number().nonnegative(), lower: z.number(), upper: z.number() });
export type Estimate = z.infer<typeof estimateSchema>;

/** What the uploaded matrix looks like, entry-wise and as an ensemble member. */
export const probeStatsSchema = z.object({
  n: z.number().int().positive(),
  /** ĝ = √(N · var(J_ij, i ≠ j)), 95 % interval. */
  g: estimateSchema.nullable(),
  /** τ̂ = corr(J_ij, J_ji) over pairs i < j, Fisher-z 95 % interval. */
  tau: estimateSchema.nullable(),
  /** Pairs i < j used for τ̂ (N(N−1)/2). */
  pairs: z.number().int().nonnegative(),
  offDiagonal: z.object({ count: z.number().int(), mean: z.number(), meanSe: z.number().nonnegative(), sd: z.number().nonnegative() }),
  diagonal: z.object({ count: z.number().int(), mean: z.number(), sd: z.number().nonnegative(), min: z.number(), max: z.number() }),
  /** Diagonal standard deviation the rate ensemble would have at ĝ, τ̂: ĝ √((1 + τ̂)/N). */
  ensembleDiagonalSd: z.number().nonnegative().nullable(),
  /** Mean row sum Σ_j J_ij over rows (the mean input a unit receives when every φ = 1). */
  rowSumMean: z.number(),
  frobenius: z.number().nonnegative(),
});
export type ProbeStats = z.infer<typeof probeStatsSchema>;

export const probeStatusSchema = z.enum(["ready", "searching", "done", "failed"]);
export type ProbeStatus = z.infer<typeof probeStatusSchema>;

export const probeAccessSchema = z.enum(["owner", "editor", "viewer"]);
export type ProbeAccess = z.infer<typeof probeAccessSchema>;

/** One distinct equilibrium of the uploaded matrix (the state vector is downloaded apart). */
export const probeEquilibriumSchema = equilibriumSummarySchema.extend({
  /** Position in the list; the download route takes it. */
  e: z.number().int().nonnegative(),
});
export type ProbeEquilibrium = z.infer<typeof probeEquilibriumSchema>;

export const shareIntervalSchema = z.object({ estimate: z.number(), lower: z.number(), upper: z.number(), n: z.number().int() });

/** The search on the uploaded matrix. */
export const probeResultSchema = z.object({
  starts: z.number().int().positive(),
  equilibria: z.array(probeEquilibriumSchema),
  stableFound: z.number().int().nonnegative(),
  unstableReached: z.number().int().nonnegative(),
  runs: runClassCountsSchema,
  /** Share of starts that settled on a verified equilibrium (Wilson 95 %). */
  convergedShare: shareIntervalSchema,
  traces: z.array(traceSchema),
  counters: z.object({ steps: z.number().int(), evaluations: z.number().int(), newtonIterations: z.number().int() }),
  wallSeconds: z.number().nonnegative(),
});
export type ProbeResult = z.infer<typeof probeResultSchema>;

/** The same search on K random rate networks with the estimated g and τ. */
export const probeComparisonSchema = z.object({
  params: z.object({ N: z.number().int(), g: z.number(), nonlinearity: z.string(), input: z.number() }),
  mu: z.number(),
  tau: z.number(),
  /** Notes on how the ensemble differs from the matrix (τ̂ clamped to [0, 1], input averaged…). */
  notes: z.array(z.string()),
  networks: z.number().int(),
  starts: z.number().int(),
  seed: z.number().int(),
  aggregate: cellAggregateSchema,
  perNetwork: z.array(z.object({ k: z.number().int(), stableFound: z.number().int(), unstableReached: z.number().int(), settled: z.number().int() })),
  wallSeconds: z.number().nonnegative(),
});
export type ProbeComparison = z.infer<typeof probeComparisonSchema>;

/** Settings and live progress of the latest search. */
export const probeSearchStateSchema = z.object({
  /** Names this search; a job of a superseded search does nothing. */
  id: idSchema,
  settings: probeSearchSchema,
  requestedAt: timestampSchema,
  startedAt: timestampSchema.nullable(),
  finishedAt: timestampSchema.nullable(),
  startsDone: z.number().int().nonnegative(),
  networksDone: z.number().int().nonnegative(),
  /** Notes on the comparison when it cannot run (e.g. ĝ undefined). */
  skippedComparison: z.string().nullable(),
});
export type ProbeSearchState = z.infer<typeof probeSearchStateSchema>;

/** A probe in lists. */
export const probeSummarySchema = z.object({
  id: idSchema,
  title: z.string(),
  fileName: z.string(),
  format: probeFormatSchema,
  n: z.number().int(),
  mu: z.number(),
  nonlinearity: z.string(),
  gEstimate: z.number().nullable(),
  tauEstimate: z.number().nullable(),
  ownerId: idSchema,
  ownerName: z.string(),
  groupId: idSchema.nullable(),
  groupName: z.string().nullable(),
  access: probeAccessSchema,
  status: probeStatusSchema,
  createdAt: timestampSchema,
});
export type ProbeSummary = z.infer<typeof probeSummarySchema>;

/** GET /api/probes/:id (and the 201 answer of an upload). */
export const probeViewSchema = probeSummarySchema.extend({
  /** The constant input: null (zero), or its mean, sd, min and max when a vector was uploaded. */
  input: z.object({ mean: z.number(), sd: z.number(), min: z.number(), max: z.number() }).nullable(),
  stats: probeStatsSchema,
  /** Eigenvalues of J. */
  spectrum: z.object({ re: z.array(z.number()), im: z.array(z.number()) }),
  failure: z.string().nullable(),
  search: probeSearchStateSchema.nullable(),
  result: probeResultSchema.nullable(),
  comparison: probeComparisonSchema.nullable(),
  updatedAt: timestampSchema,
});
export type ProbeView = z.infer<typeof probeViewSchema>;

export const probeListSchema = z.object({ items: z.array(probeSummarySchema) });

export const probeIdParamsSchema = z.object({ id: idSchema });
export const probeEquilibriumParamsSchema = z.object({ id: idSchema, e: z.coerce.number().int().min(0).max(100_000) });
export const probeDownloadQuerySchema = z.object({ format: z.enum(["csv", "json"]).default("json") });

/** GET /api/probes/:id/equilibria/:e?format=json */
export const probeEquilibriumDownloadSchema = probeEquilibriumSchema.extend({
  probeId: idSchema,
  title: z.string(),
  mu: z.number(),
  nonlinearity: z.string(),
  n: z.number().int(),
  x: z.array(z.number()),
});
export type ProbeEquilibriumDownload = z.infer<typeof probeEquilibriumDownloadSchema>;
