import type { CellInput, NetworkSummary } from "../../../shared/schemas/cell-result";
import { getEnsemble } from "../ensembles/registry";
import { networkStream } from "../random/rng";
import { runStarts, type NetworkRun } from "../equilibria/run-starts";
import { findAllEquilibria } from "../equilibria/exhaustive";
import type { Trace } from "../equilibria/trace";
import { summariseNetwork } from "./summarise";

/** Display extras of network 0: a few traces and one spectrum. */
export interface NetworkDisplay {
  traces: Trace[];
  spectrum: { network: number; choice: "first-stable" | "most-visited"; stable: boolean; re: number[]; im: number[] } | null;
}

/** What one network contributes to a cell (plain data: safe to send between threads). */
export interface NetworkOutput {
  summary: NetworkSummary;
  /** Settle times of the settled runs, in start order (for the cell's histogram). */
  settleTimes: number[];
  /** Present for network 0 only. */
  display: NetworkDisplay | null;
}

/** Substream index of the random starts within a network's stream family. */
const STARTS_STREAM = 1;

/**
 * Start s of network k: x0 = stateScale · z, z standard normal from its own stream, which depends
 * only on (ensemble, seed, k, N, s) — not on μ or τ — so every cell of a map starts network k
 * from the same normalised points (common random numbers).
 */
export function drawStart(input: CellInput, n: number, k: number, s: number, scale: number): Float64Array {
  const rng = networkStream(input.ensemble, input.seed, k, n, STARTS_STREAM, s);
  const x = new Float64Array(n);
  rng.fillNormal(x);
  for (let i = 0; i < n; i++) x[i] *= scale;
  return x;
}

function displayOf(run: NetworkRun): NetworkDisplay {
  const { items, hits } = run.equilibria;
  let pick = items.findIndex((e) => e.stable);
  const choice = pick >= 0 ? "first-stable" : "most-visited";
  if (pick < 0 && items.length > 0) pick = hits.reduce((best, h, i) => (h > hits[best] ? i : best), 0);
  const e = pick >= 0 ? items[pick] : null;
  return {
    traces: run.traces,
    spectrum: e ? { network: 0, choice, stable: e.stable, re: Array.from(e.re), im: Array.from(e.im) } : null,
  };
}

/**
 * Runs network k of a cell: draws its common random numbers (ensemble.draw(params, seed, k)),
 * builds it at (μ, τ), runs the S starts (runStarts) and, when asked, the exhaustive search;
 * network 0 also returns 3 traces of units 0–3 (≤ 100 points) and a spectrum for display.
 * @param input a validated cell input (validateCellInput)
 * @param k network index in [0, budget.networks)
 * @returns the network's summary and display extras
 * @throws RangeError on a bad k
 */
export function runNetwork(input: CellInput, k: number): NetworkOutput {
  if (!Number.isSafeInteger(k) || k < 0 || k >= input.budget.networks) {
    throw new RangeError(`k must be an integer in [0, ${input.budget.networks}), got ${k}`);
  }
  const ensemble = getEnsemble(input.ensemble);
  const draws = ensemble.draw(input.params, input.seed, k);
  const network = ensemble.build(input.params, draws, input.mu, input.tau);
  const n = network.n;
  const starts = Array.from({ length: input.budget.starts }, (_, s) => drawStart(input, n, k, s, network.stateScale));
  const { tMax, rtol, atol } = input.budget;
  const run = runStarts(network, starts, { tMax, rtol, atol, traceStarts: k === 0 ? 3 : 0 });
  const exhaustive = input.budget.exhaustive ? findAllEquilibria(network, { seed: input.seed, stream: k }) : null;
  return {
    summary: summariseNetwork(k, run, exhaustive),
    settleTimes: run.outcomes.filter((o) => o.class === "settled").map((o) => o.time),
    display: k === 0 ? displayOf(run) : null,
  };
}
