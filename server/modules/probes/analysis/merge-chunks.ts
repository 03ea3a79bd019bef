import type { ProbeEquilibrium, ProbeResult } from "../../../../shared/schemas/probes";
import { DEFAULT_MERGE_TOL } from "../../../engine/equilibria/equilibrium-set";
import { wilsonInterval } from "../../../engine/stats/intervals";
import type { ChunkEquilibrium, StartsChunkResult } from "./search-chunk";

/** A finished search: the stored result and the state vector x* of each equilibrium, by e. */
export interface MergedSearch {
  result: ProbeResult;
  states: number[][];
}

function distInf(a: number[], b: number[]): number {
  let d = 0;
  for (let i = 0; i < a.length; i++) d = Math.max(d, Math.abs(a[i] - b[i]));
  return d;
}

interface Pooled {
  e: ChunkEquilibrium;
  order: number;
  hits: number;
  times: number[];
}

/** Pools equilibria of every chunk: the same point (EquilibriumSet's rule) counts once. */
function poolEquilibria(chunks: StartsChunkResult[]): Pooled[] {
  const pooled: Pooled[] = [];
  for (const chunk of chunks) {
    for (const e of chunk.equilibria) {
      const tol = DEFAULT_MERGE_TOL * Math.max(1, e.normInf);
      const same = pooled.find((p) => distInf(p.e.x, e.x) <= tol);
      if (same) {
        same.hits += e.hits;
        same.times.push(...e.settleTimes);
      } else pooled.push({ e, order: pooled.length, hits: e.hits, times: [...e.settleTimes] });
    }
  }
  return pooled.sort((a, b) => b.hits - a.hits || a.order - b.order);
}

/**
 * Merges the chunks of one search into its result: distinct equilibria across chunks by the
 * engine's merge rule (‖x − y‖∞ ≤ 1e-6 · max(1, ‖x‖∞), equilibrium-set.ts), most visited first;
 * basin share = hits / starts; run classes and counters summed; the share of settled starts
 * with its Wilson 95 % interval.
 * @param chunks every chunk of the search (any order; they must cover 0 … starts−1 once)
 * @param starts S, the search's number of starts
 * @param wallSeconds wall time of the search
 * @throws RangeError when the chunks do not cover the starts exactly
 */
export function mergeChunks(chunks: StartsChunkResult[], starts: number, wallSeconds: number): MergedSearch {
  const sorted = [...chunks].sort((a, b) => a.first - b.first);
  let next = 0;
  for (const c of sorted) {
    if (c.first !== next) throw new RangeError(`chunks must cover starts 0 … ${starts - 1} once; a chunk starts at ${c.first}, expected ${next}`);
    next += c.count;
  }
  if (next !== starts) throw new RangeError(`chunks cover ${next} starts, expected ${starts}`);
  const pooled = poolEquilibria(sorted);
  const equilibria: ProbeEquilibrium[] = pooled.map((p, e) => ({
    e, normInf: p.e.normInf, normRms: p.e.normRms, index: p.e.index, maxRealPart: p.e.maxRealPart, stable: p.e.stable,
    residual: p.e.residual, hits: p.hits, basinShare: p.hits / starts,
    meanSettleTime: p.times.length ? p.times.reduce((a, b) => a + b, 0) / p.times.length : null,
  }));
  const runs = { settled: 0, unverified: 0, slow: 0, periodic: 0, irregular: 0, escaping: 0, unclassified: 0 };
  const counters = { steps: 0, evaluations: 0, newtonIterations: 0 };
  for (const c of sorted) {
    for (const k of Object.keys(runs) as (keyof typeof runs)[]) runs[k] += c.runs[k];
    counters.steps += c.counters.steps;
    counters.evaluations += c.counters.evaluations;
    counters.newtonIterations += c.counters.newtonIterations;
  }
  const share = wilsonInterval(runs.settled, starts);
  return {
    result: {
      starts, equilibria, runs, counters, wallSeconds,
      stableFound: equilibria.filter((e) => e.stable).length,
      unstableReached: equilibria.filter((e) => !e.stable).length,
      convergedShare: { estimate: share.estimate, lower: share.lower, upper: share.upper, n: share.n },
      traces: sorted.flatMap((c) => c.traces),
    },
    states: pooled.map((p) => p.e.x),
  };
}
