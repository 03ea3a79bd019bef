import { z } from "zod";
import { theoryColumnsSchema } from "./theory";

/**
 * Contract of one computed cell: what the engine's cell runner returns for one (ensemble,
 * parameters, μ, τ, budget, seed), stored once per cell key and shown by the map and cell views.
 * Found counts are lower bounds of the true numbers; every estimate carries its sample size.
 */

/** Per-cell compute budget. */
export const cellBudgetSchema = z.object({
  /** Networks sampled per cell (K). */
  networks: z.number().int().min(1).max(10_000),
  /** Random starts per network (S). */
  starts: z.number().int().min(1).max(10_000),
  /** Time limit of one run. */
  tMax: z.number().positive().max(1e6),
  rtol: z.number().positive().max(0.1),
  atol: z.number().positive().max(0.1),
  /** Also search all equilibria (stable and unstable) by deflated Newton; N ≤ 10 only. */
  exhaustive: z.boolean().optional(),
});
export type CellBudget = z.infer<typeof cellBudgetSchema>;

export const cellInputSchema = z.object({
  ensemble: z.string().min(1),
  params: z.record(z.string(), z.unknown()),
  mu: z.number().positive(),
  tau: z.number().min(0).max(1),
  budget: cellBudgetSchema,
  seed: z.number().int().min(0).max(Number.MAX_SAFE_INTEGER),
});
export type CellInput = z.infer<typeof cellInputSchema>;

/** Estimate with a two-sided interval; null bounds mean unbounded (e.g. one sample). */
export const intervalSchema = z.object({
  estimate: z.number(),
  lower: z.number().nullable(),
  upper: z.number().nullable(),
  n: z.number().int().nonnegative(),
  level: z.number().gt(0).lt(1),
});
export type IntervalJson = z.infer<typeof intervalSchema>;

export const runClassSchema = z.enum(["settled", "unverified", "slow", "periodic", "irregular", "escaping", "unclassified"]);
export type RunClassName = z.infer<typeof runClassSchema>;
export const runClassCountsSchema = z.record(runClassSchema, z.number().int().nonnegative());

export const equilibriumSummarySchema = z.object({
  normInf: z.number().nonnegative(),
  /** ‖x*‖₂/√N. */
  normRms: z.number().nonnegative(),
  index: z.number().int().nonnegative(),
  maxRealPart: z.number(),
  stable: z.boolean(),
  residual: z.number().nonnegative(),
  /** Starts that reached it, and their share of the network's starts. */
  hits: z.number().int().nonnegative(),
  basinShare: z.number().min(0).max(1),
  /** Mean time to settle of the runs that reached it (null when none settled on it). */
  meanSettleTime: z.number().nonnegative().nullable(),
});
export type EquilibriumSummary = z.infer<typeof equilibriumSummarySchema>;

export const countersSchema = z.object({
  steps: z.number().int().nonnegative(),
  accepted: z.number().int().nonnegative(),
  rejected: z.number().int().nonnegative(),
  evaluations: z.number().int().nonnegative(),
  newtonIterations: z.number().int().nonnegative(),
  refinements: z.number().int().nonnegative(),
  probeEvaluations: z.number().int().nonnegative(),
});
export type EngineCounters = z.infer<typeof countersSchema>;

export const richnessSchema = z.object({
  estimate: z.number().nonnegative(),
  observed: z.number().int().nonnegative(),
  f1: z.number().int().nonnegative(),
  f2: z.number().int().nonnegative(),
  form: z.enum(["classic", "bias-corrected"]),
});

export const exhaustiveSummarySchema = z.object({
  total: z.number().int().nonnegative(),
  stable: z.number().int().nonnegative(),
  /** byIndex[i] = equilibria with i unstable directions. */
  byIndex: z.array(z.number().int().nonnegative()),
  box: z.number().positive(),
  starts: z.number().int().positive(),
});

export const networkSummarySchema = z.object({
  k: z.number().int().nonnegative(),
  /** Distinct stable equilibria reached, most visited first. */
  stable: z.array(equilibriumSummarySchema),
  /** Distinct unstable equilibria that runs reached (stalled near them), most visited first. */
  unstable: z.array(equilibriumSummarySchema),
  runs: runClassCountsSchema,
  chao1: richnessSchema,
  /** Mean and median settle time of settled runs (null when none settled). */
  meanSettleTime: z.number().nonnegative().nullable(),
  medianSettleTime: z.number().nonnegative().nullable(),
  /** Largest finite-time Lyapunov exponent measured on this network (null when no probe ran). */
  maxLyapunov: z.number().nullable(),
  exhaustive: exhaustiveSummarySchema.nullable(),
  counters: countersSchema,
});
export type NetworkSummary = z.infer<typeof networkSummarySchema>;

export const traceSchema = z.object({
  start: z.number().int().nonnegative(),
  units: z.array(z.number().int().nonnegative()),
  t: z.array(z.number()),
  x: z.array(z.array(z.number())),
});

export const spectrumSchema = z.object({
  network: z.number().int().nonnegative(),
  /** Which equilibrium: the first stable one found, else the most visited one. */
  choice: z.enum(["first-stable", "most-visited"]),
  stable: z.boolean(),
  re: z.array(z.number()),
  im: z.array(z.number()),
});

export const cellAggregateSchema = z.object({
  /** Distinct stable equilibria found per network (a lower bound), mean with 95 % t-interval. */
  meanStable: intervalSchema,
  /** Chao1 estimate of stable equilibria per network, mean with 95 % t-interval. */
  meanChao1: intervalSchema,
  /** Share of all runs that settled on a verified equilibrium (Wilson 95 %). */
  convergedShare: intervalSchema,
  /** Share of networks with exactly one stable equilibrium found (Wilson 95 %). */
  oneStableShare: intervalSchema,
  /** Distinct unstable equilibria reached per network (mean, 95 % t-interval). */
  meanUnstableReached: intervalSchema,
  /** Exhaustive totals per network (mean, 95 % t-interval), when the budget asked for them. */
  meanTotal: intervalSchema.nullable(),
  runs: runClassCountsSchema,
  settleHistogram: z.object({ edges: z.array(z.number()), counts: z.array(z.number().int().nonnegative()) }),
});

export const cellResultSchema = z.object({
  ensemble: z.string(),
  ensembleVersion: z.string(),
  engineVersion: z.string(),
  params: z.record(z.string(), z.unknown()),
  n: z.number().int().positive(),
  mu: z.number().positive(),
  tau: z.number().min(0).max(1),
  seed: z.number().int().nonnegative(),
  budget: cellBudgetSchema,
  networks: z.array(networkSummarySchema),
  aggregate: cellAggregateSchema,
  traces: z.array(traceSchema),
  spectrum: spectrumSchema.nullable(),
  counters: countersSchema,
  /** Filled per τ row by a later step; the cell runner leaves it null. */
  theory: theoryColumnsSchema.nullable(),
  /** Wall-clock figures: excluded from bit-identity (everything else is deterministic). */
  timing: z.object({ wallSeconds: z.number().nonnegative(), threads: z.number().int().positive() }),
});
export type CellResult = z.infer<typeof cellResultSchema>;
