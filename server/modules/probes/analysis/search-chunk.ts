import { rateNetworkFromMatrix } from "../../../engine/ensembles/rate/rate-network";
import { runStarts, type RunClass } from "../../../engine/equilibria/run-starts";
import type { Trace } from "../../../engine/equilibria/trace";
import { createRng } from "../../../engine/random/rng";

/** Substream of the probe's random starts: createRng(seed, PROBE_STARTS_STREAM, s). */
export const PROBE_STARTS_STREAM = 0x70726f62;

/** A slice of the starts of one probe search, run in a worker thread. */
export interface StartsChunkTask {
  /** Couplings J, row-major n × n (a SharedArrayBuffer view is not copied between threads). */
  couplings: Float64Array;
  n: number;
  mu: number;
  /** Constant input: one number or one value per unit. */
  input: number | Float64Array;
  nonlinearity: string;
  seed: number;
  /** Global index of the chunk's first start, and how many starts it runs. */
  first: number;
  count: number;
  tMax: number;
  rtol: number;
  atol: number;
  /** Global starts 0 … traceStarts−1 are traced (units 0–3). */
  traceStarts: number;
}

/** A distinct equilibrium a chunk reached, with the settle times of its runs. */
export interface ChunkEquilibrium {
  x: number[];
  normInf: number;
  normRms: number;
  index: number;
  maxRealPart: number;
  stable: boolean;
  residual: number;
  hits: number;
  settleTimes: number[];
}

export interface StartsChunkResult {
  first: number;
  count: number;
  equilibria: ChunkEquilibrium[];
  runs: Record<RunClass, number>;
  traces: Trace[];
  counters: { steps: number; evaluations: number; newtonIterations: number };
}

/**
 * Start s of a probe search: x0 = stateScale · z, z standard normal from the stream
 * (seed, PROBE_STARTS_STREAM, s), so a start depends only on the seed, s and N.
 */
export function drawProbeStart(seed: number, s: number, n: number, scale: number): Float64Array {
  const x = new Float64Array(n);
  createRng(seed, PROBE_STARTS_STREAM, s).fillNormal(x);
  for (let i = 0; i < n; i++) x[i] *= scale;
  return x;
}

/**
 * Runs starts first … first+count−1 of the rate network dx/dt = −μx + J φ(x) + I built from the
 * uploaded J (rateNetworkFromMatrix), through the engine's run loop (runStarts: integrate →
 * nearly still → Newton → verify → merge; science.md §4).
 * @param task couplings, μ, input, φ, seed, the slice of starts, tolerances, traced starts
 * @returns the chunk's distinct equilibria with hits and settle times, run classes, traces
 *   (with global start indices) and counters
 * @throws RangeError/TypeError from the engine on a bad matrix, μ or option
 */
export function runStartsChunk(task: StartsChunkTask): StartsChunkResult {
  const network = rateNetworkFromMatrix(task.couplings, task.mu, task.input, task.nonlinearity);
  const starts = Array.from({ length: task.count }, (_, k) => drawProbeStart(task.seed, task.first + k, task.n, network.stateScale));
  const traced = Math.max(0, Math.min(task.count, task.traceStarts - task.first));
  const run = runStarts(network, starts, { tMax: task.tMax, rtol: task.rtol, atol: task.atol, traceStarts: traced });
  const times = run.equilibria.items.map(() => [] as number[]);
  const runs = { settled: 0, unverified: 0, slow: 0, periodic: 0, irregular: 0, escaping: 0, unclassified: 0 } satisfies Record<RunClass, number>;
  for (const o of run.outcomes) {
    runs[o.class] += 1;
    if (o.class === "settled") times[o.equilibrium].push(o.time);
  }
  return {
    first: task.first,
    count: task.count,
    equilibria: run.equilibria.items.map((e, i) => ({
      x: Array.from(e.x), normInf: e.normInf, normRms: e.normRms, index: e.index, maxRealPart: e.maxRealPart,
      stable: e.stable, residual: e.residual, hits: run.equilibria.hits[i], settleTimes: times[i],
    })),
    runs,
    traces: run.traces.map((t) => ({ ...t, start: t.start + task.first })),
    counters: { steps: run.counters.steps, evaluations: run.counters.evaluations, newtonIterations: run.counters.newtonIterations },
  };
}
