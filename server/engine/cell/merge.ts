import type { CellInput, CellResult, EngineCounters, IntervalJson } from "../../../shared/schemas/cell-result";
import { getEnsemble } from "../ensembles/registry";
import { meanInterval, wilsonInterval, type Interval } from "../stats/intervals";
import { ENGINE_VERSION } from "./cell-input";
import type { NetworkOutput } from "./run-network";
import { emptyRunCounts, RUN_CLASSES } from "./summarise";

const HISTOGRAM_BINS = 20;

function json(i: Interval): IntervalJson {
  const bound = (v: number) => (Number.isFinite(v) ? v : null);
  return { estimate: i.estimate, lower: bound(i.lower), upper: bound(i.upper), n: i.n, level: i.level };
}

function sumCounters(outputs: NetworkOutput[]): EngineCounters {
  const total: EngineCounters = { steps: 0, accepted: 0, rejected: 0, evaluations: 0, newtonIterations: 0, refinements: 0, probeEvaluations: 0 };
  for (const o of outputs) for (const key of Object.keys(total) as (keyof EngineCounters)[]) total[key] += o.summary.counters[key];
  return total;
}

/** Histogram of settle times over [0, tMax] in 20 equal bins, from every settled run. */
function settleHistogram(outputs: NetworkOutput[], tMax: number): CellResult["aggregate"]["settleHistogram"] {
  const edges = Array.from({ length: HISTOGRAM_BINS + 1 }, (_, i) => (tMax * i) / HISTOGRAM_BINS);
  const counts = new Array<number>(HISTOGRAM_BINS).fill(0);
  for (const o of outputs) for (const t of o.settleTimes) counts[Math.min(HISTOGRAM_BINS - 1, Math.floor((t / tMax) * HISTOGRAM_BINS))] += 1;
  return { edges, counts };
}

/** The cell aggregates of networks sorted by k (see mergeNetworks). */
function aggregateOf(input: CellInput, sorted: NetworkOutput[]): CellResult["aggregate"] {
  const nets = sorted.map((o) => o.summary);
  const runs = emptyRunCounts();
  for (const s of nets) for (const c of RUN_CLASSES) runs[c] += s.runs[c];
  const exhaustive = nets.every((s) => s.exhaustive !== null) ? nets.map((s) => s.exhaustive!.total) : null;
  return {
    meanStable: json(meanInterval(nets.map((s) => s.stable.length))),
    meanChao1: json(meanInterval(nets.map((s) => s.chao1.estimate))),
    convergedShare: json(wilsonInterval(runs.settled, nets.length * input.budget.starts)),
    oneStableShare: json(wilsonInterval(nets.filter((s) => s.stable.length === 1).length, nets.length)),
    meanUnstableReached: json(meanInterval(nets.map((s) => s.unstable.length))),
    meanTotal: exhaustive ? json(meanInterval(exhaustive)) : null,
    runs,
    settleHistogram: settleHistogram(sorted, input.budget.tMax),
  };
}

/**
 * Aggregates the networks of one cell into its CellResult: mean distinct stable equilibria per
 * network and mean Chao1 with 95 % Student-t intervals, share of converged runs and share of
 * networks with exactly one stable equilibrium with 95 % Wilson intervals, run-class totals,
 * settle-time histogram, display extras of network 0, summed counters. Networks are ordered by
 * k first, so the result is the same whichever thread computed which network.
 * @param input the validated cell input
 * @param outputs one output per network k = 0 … K−1, in any order
 * @param timing wall time and threads (kept apart from the deterministic part)
 * @returns the CellResult (theory left null)
 * @throws RangeError when networks are missing or repeated
 */
export function mergeNetworks(input: CellInput, outputs: NetworkOutput[], timing: CellResult["timing"]): CellResult {
  const K = input.budget.networks;
  const sorted = [...outputs].sort((a, b) => a.summary.k - b.summary.k);
  if (sorted.length !== K || sorted.some((o, i) => o.summary.k !== i)) {
    throw new RangeError(`outputs must hold networks 0 … ${K - 1} exactly once, got ${outputs.length} outputs`);
  }
  const ensemble = getEnsemble(input.ensemble);
  const display = sorted[0].display;
  return {
    ensemble: input.ensemble,
    ensembleVersion: ensemble.version,
    engineVersion: ENGINE_VERSION,
    params: input.params,
    n: ensemble.dimension(input.params),
    mu: input.mu,
    tau: input.tau,
    seed: input.seed,
    budget: input.budget,
    networks: sorted.map((o) => o.summary),
    aggregate: aggregateOf(input, sorted),
    traces: display?.traces ?? [],
    spectrum: display?.spectrum ?? null,
    counters: sumCounters(sorted),
    theory: null,
    timing,
  };
}
