import type { CellInput, CellResult } from "../../../../shared/schemas/cell-result";
import type { ProbeComparison, ProbeSearchSettings, ProbeStats } from "../../../../shared/schemas/probes";

/** What a comparison needs to know of the probe. */
export interface ProbeFacts {
  n: number;
  mu: number;
  nonlinearity: string;
  /** Constant input: null (zero) or one value per unit. */
  input: Float64Array | null;
  stats: ProbeStats;
}

export type ComparisonPlan = { input: CellInput; notes: string[] } | { skipped: string };

const fmt = (v: number) => Number(v.toPrecision(4)).toString();

/**
 * The cell input of the comparison: K rate-ensemble networks (science.md §2) with g = ĝ and
 * τ = τ̂ clamped to [0, 1] (the ensemble's range), at the probe's μ, N and φ, with the search's
 * starts, tolerances and seed. A vector input is replaced by its mean (the ensemble takes one
 * constant). Each difference from the matrix is stated in `notes`.
 * @returns the plan, or why no comparison runs (K = 0, ĝ or τ̂ undefined)
 */
export function planComparison(probe: ProbeFacts, settings: ProbeSearchSettings): ComparisonPlan {
  if (settings.compareNetworks === 0) return { skipped: "No comparison networks were asked for." };
  const { g, tau } = probe.stats;
  if (!g || g.estimate <= 0) return { skipped: "ĝ is undefined for this matrix (N < 3 or constant off-diagonal entries), so there is no ensemble to compare with." };
  if (!tau) return { skipped: "τ̂ is undefined for this matrix (N < 4 or constant pair entries), so there is no ensemble to compare with." };
  const notes: string[] = [];
  const t = Math.min(1, Math.max(0, tau.estimate));
  if (t !== tau.estimate) notes.push(`τ̂ = ${fmt(tau.estimate)} lies outside the ensemble's range [0, 1]; the comparison uses τ = ${t}.`);
  let input = 0;
  if (probe.input) {
    input = probe.input.reduce((a, b) => a + b, 0) / probe.input.length;
    notes.push(`The uploaded input vector is replaced by its mean I = ${fmt(input)} (the ensemble's input is one constant).`);
  }
  if (Math.abs(probe.stats.offDiagonal.mean) > 3 * probe.stats.offDiagonal.meanSe) {
    notes.push(`The matrix's off-diagonal mean ${fmt(probe.stats.offDiagonal.mean)} differs from 0 by more than 3 standard errors; the ensemble's mean is 0.`);
  }
  return {
    notes,
    input: {
      ensemble: "rate",
      params: { N: probe.n, g: g.estimate, nonlinearity: probe.nonlinearity, input },
      mu: probe.mu,
      tau: t,
      budget: { networks: settings.compareNetworks, starts: settings.starts, tMax: settings.tMax, rtol: settings.rtol, atol: settings.atol },
      seed: settings.seed,
    },
  };
}

/**
 * The stored comparison: the cell's aggregate (means with 95 % intervals over K networks) and
 * per-network counts, with the settings used and the notes of planComparison.
 */
export function compactComparison(input: CellInput, cell: CellResult, notes: string[], wallSeconds: number): ProbeComparison {
  const p = input.params as { N: number; g: number; nonlinearity: string; input: number };
  return {
    params: { N: p.N, g: p.g, nonlinearity: p.nonlinearity, input: p.input },
    mu: input.mu,
    tau: input.tau,
    notes,
    networks: input.budget.networks,
    starts: input.budget.starts,
    seed: input.seed,
    aggregate: cell.aggregate,
    perNetwork: cell.networks.map((s) => ({ k: s.k, stableFound: s.stable.length, unstableReached: s.unstable.length, settled: s.runs.settled })),
    wallSeconds,
  };
}
