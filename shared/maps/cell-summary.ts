import { z } from "zod";
import { intervalSchema, type CellResult } from "../schemas/cell-result";
import { regimeSchema, type TheoryColumns } from "../schemas/theory";

/**
 * The compact numbers of one cell that heatmaps, hover read-outs, filters and CSV exports use.
 * Built from the stored CellResult and the τ row's theory columns by `summarizeCell`; the full
 * result stays behind GET /api/maps/:id/cells/:i/:j.
 */
export const krEstimateSchema = z.object({
  mean: z.number().nullable(),
  se: z.number().nullable(),
  logMean: z.number().nullable(),
});

export const cellTheorySummarySchema = z.object({
  m: z.number().nullable(),
  /** Asymptotic (large-N) complexities; null for ensembles without a closed form. */
  sigmaTotal: z.number().nullable(),
  sigmaStable: z.number().nullable(),
  regime: regimeSchema.nullable(),
  /** Finite-N Kac–Rice expectations (Monte Carlo, with standard errors and sample size). */
  krTotal: krEstimateSchema.nullable(),
  krStable: krEstimateSchema.extend({ upper95: z.number().nullable() }).nullable(),
  krSamples: z.number().int().nullable(),
  exactTotal: z.number().nullable(),
  /** Rate network: whether the origin is linearly stable at this point (zero input). */
  originStable: z.boolean().nullable(),
});
export type CellTheorySummary = z.infer<typeof cellTheorySummarySchema>;

export const cellSummarySchema = z.object({
  i: z.number().int(),
  j: z.number().int(),
  mu: z.number(),
  tau: z.number(),
  state: z.enum(["pending", "done", "failed", "cancelled"]),
  fromCache: z.boolean(),
  networks: z.number().int(),
  starts: z.number().int(),
  stable: intervalSchema.nullable(),
  richness: intervalSchema.nullable(),
  converged: intervalSchema.nullable(),
  oneStable: intervalSchema.nullable(),
  unstableReached: intervalSchema.nullable(),
  total: intervalSchema.nullable(),
  theory: cellTheorySummarySchema.nullable(),
});
export type CellSummary = z.infer<typeof cellSummarySchema>;

export interface CellPosition {
  i: number;
  j: number;
  mu: number;
  tau: number;
  state: CellSummary["state"];
  fromCache: boolean;
  networks: number;
  starts: number;
}

/** Theory part of a summary from the τ row's columns (null when the row is not computed yet). */
export function summarizeTheory(t: TheoryColumns | null): CellTheorySummary | null {
  if (!t) return null;
  const f = t.finiteN;
  return {
    m: t.m,
    sigmaTotal: t.asymptotic?.sigmaTotal ?? null,
    sigmaStable: t.asymptotic?.sigmaStable ?? null,
    regime: t.asymptotic?.regime ?? null,
    krTotal: f ? { mean: f.total.mean, se: f.total.se, logMean: f.total.logMean } : null,
    krStable: f ? { mean: f.stable.mean, se: f.stable.se, logMean: f.stable.logMean, upper95: f.stable.upper95 } : null,
    krSamples: f?.samples ?? null,
    exactTotal: f?.exactTotal ?? null,
    originStable: t.rateLines?.originStable ?? null,
  };
}

/**
 * One cell's summary: the dynamics part from its result (null while pending), theory from its
 * row. Only the result's aggregate is read, so callers may pass just `{ aggregate }`.
 */
export function summarizeCell(pos: CellPosition, result: Pick<CellResult, "aggregate"> | null, theory: TheoryColumns | null): CellSummary {
  const a = result?.aggregate;
  return {
    ...pos,
    stable: a?.meanStable ?? null,
    richness: a?.meanChao1 ?? null,
    converged: a?.convergedShare ?? null,
    oneStable: a?.oneStableShare ?? null,
    unstableReached: a?.meanUnstableReached ?? null,
    total: a?.meanTotal ?? null,
    theory: summarizeTheory(theory),
  };
}
