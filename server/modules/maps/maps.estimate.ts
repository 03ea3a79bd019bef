import { axisPoints } from "../../../shared/schemas/maps";
import type { MapSpec } from "./cell-key";

/**
 * Cost model of one cell, in CPU seconds on one core (the worker pool divides the wall time by
 * its threads). A cell runs networks × starts integrations; one run costs a + b × size^p
 * seconds, size = N² for the rate network (one matrix-vector product per evaluation) and M·N
 * for the field network (M random features). Two kinds of cell:
 * - quiet, where theory predicts one stable state (rate: μ > g(1+τ), the elliptic-law edge;
 *   field: m = μ/(σ√N) > 1): runs settle after a few hundred evaluations;
 * - busy, elsewhere: many runs integrate to tMax (cost scaled linearly with tMax / 200).
 * The exhaustive search adds a per-network cost growing like N³ (Newton with deflation).
 *
 * Constants printed by `node --import tsx scripts/bench-estimate.ts` on 2026-12-01 on this
 * machine (2 cores, Node 20.20; rate measured at N = 6 and 100, field at N = 6 and 20). Rough by
 * nature: busy cells vary by a factor of a few, and sizes outside the measured ones are
 * extrapolated. Re-run the command after engine changes and copy its figures here.
 */
export const COST_MODEL = Object.freeze({
  rate: { quiet: { a: 2.23e-3, b: 7.81e-7, p: 1 }, busy: { a: 1.68e-3, b: 5.58e-6, p: 1 } },
  field: { quiet: { a: 0, b: 7.31e-6, p: 0.89 }, busy: { a: 0, b: 5.62e-9, p: 2.01 } },
  /** Exhaustive search per network at N = 8 (scaled by (N/8)³). */
  exhaustivePerNetwork: 0.05,
  /** The tMax the figures were measured at. */
  referenceTMax: 200,
});

interface CellCostInput {
  ensemble: string;
  N: number;
  /** Rate: g; field: σ. */
  scale: number;
  /** Field: random features M (default 40·N). */
  features: number;
  mu: number;
  tau: number;
  networks: number;
  starts: number;
  tMax: number;
  exhaustive: boolean;
}

function quiet(c: CellCostInput): boolean {
  if (c.ensemble === "field") return c.mu / (c.scale * Math.sqrt(c.N)) > 1;
  return c.mu > c.scale * (1 + c.tau);
}

/** CPU seconds of one cell under COST_MODEL (see there). */
export function cellSeconds(c: CellCostInput): number {
  const model = c.ensemble === "field" ? COST_MODEL.field : COST_MODEL.rate;
  const size = c.ensemble === "field" ? c.features * c.N : c.N * c.N;
  const calm = quiet(c);
  const k = calm ? model.quiet : model.busy;
  const perRun = (k.a + k.b * size ** k.p) * (calm ? 1 : c.tMax / COST_MODEL.referenceTMax);
  const exhaustive = c.exhaustive ? c.networks * COST_MODEL.exhaustivePerNetwork * (c.N / 8) ** 3 : 0;
  return c.networks * c.starts * perRun + exhaustive;
}

/**
 * Estimated CPU seconds of a map's missing cells.
 * @param map the map's settings, axes, budget
 * @param missing grid positions (i along μ, j along τ) still to compute
 * @returns seconds, rounded up to a tenth
 */
export function estimateSeconds(map: MapSpec, missing: ReadonlyArray<{ i: number; j: number }>): number {
  const mus = axisPoints(map.mu);
  const taus = axisPoints(map.tau);
  const s = map.settings as { N: number; g?: number; sigma?: number; features?: number };
  const base = {
    ensemble: map.ensemble,
    N: s.N,
    scale: (map.ensemble === "field" ? s.sigma : s.g) ?? 1,
    features: s.features ?? 40 * s.N,
    networks: map.budget.networks,
    starts: map.budget.starts,
    tMax: map.budget.tMax ?? COST_MODEL.referenceTMax,
    exhaustive: map.budget.exhaustive ?? false,
  };
  let total = 0;
  for (const p of missing) total += cellSeconds({ ...base, mu: mus[p.i], tau: taus[p.j] });
  return Math.ceil(total * 10) / 10;
}
