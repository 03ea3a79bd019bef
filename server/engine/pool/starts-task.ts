import { rateNetworkFromMatrix } from "../ensembles/rate/rate-network";
import type { Equilibrium } from "../equilibria/equilibrium";
import { EquilibriumSet } from "../equilibria/equilibrium-set";
import { runStarts, type NetworkRun, type RunOutcome, type RunStartsOptions } from "../equilibria/run-starts";
import { threadId } from "node:worker_threads";
import { threadCpuSeconds } from "./thread-cpu";

/** A share of the starts of one rate network dx/dt = −μx + J tanh(x) + I, for one worker. */
export interface RateStartsTask {
  couplings: Float64Array;
  mu: number;
  input: Float64Array | number;
  starts: Float64Array[];
  /** Index of each start of this share within the whole list. */
  indices: number[];
  options: RunStartsOptions;
}

/** What a share sends back: its equilibria (spectra included, plain data) with hits, and outcomes. */
export interface RateStartsShare {
  equilibria: Equilibrium[];
  hits: number[];
  outcomes: RunOutcome[];
  counters: NetworkRun["counters"];
  /** Where and how long the share ran: worker thread id, wall and thread-CPU seconds (null where unknown). */
  timing: ShareTiming;
}

export interface ShareTiming {
  threadId: number;
  wallSeconds: number;
  cpuSeconds: number | null;
}

/** Worker side: runs one share of the starts (runStarts). */
export function runRateStarts(task: RateStartsTask): RateStartsShare {
  const t0 = performance.now();
  const c0 = threadCpuSeconds();
  const network = rateNetworkFromMatrix(task.couplings, task.mu, task.input);
  const run = runStarts(network, task.starts, task.options);
  return {
    equilibria: run.equilibria.items,
    hits: [...run.equilibria.hits],
    outcomes: run.outcomes.map((o) => ({ ...o, start: task.indices[o.start] })),
    counters: run.counters,
    timing: { threadId, wallSeconds: (performance.now() - t0) / 1000, cpuSeconds: cpuSince(c0) },
  };
}

function cpuSince(c0: number | null): number | null {
  const c1 = threadCpuSeconds();
  return c0 === null || c1 === null ? null : c1 - c0;
}

/**
 * Joins the shares of one network's starts, in share order: equilibria are merged by the same
 * relative distance as within a share (first occurrence kept, hits added), outcomes put back in
 * start order; each equilibrium keeps the spectrum its worker computed (the same bits as
 * recomputing it here, without the main thread's eigenvalue work).
 * @param task any task of the network (for mergeTol)
 * @param shares the shares in start order
 * @returns the combined NetworkRun (no traces)
 */
export function joinRateShares(task: RateStartsTask, shares: RateStartsShare[]): NetworkRun {
  const set = new EquilibriumSet(task.options.mergeTol);
  const outcomes: RunOutcome[] = [];
  const counters = { steps: 0, accepted: 0, rejected: 0, evaluations: 0, newtonIterations: 0, refinements: 0, probeEvaluations: 0 };
  for (const share of shares) {
    const map = share.equilibria.map((e, i) => {
      let j = set.find(e.x);
      if (j < 0) j = set.add(e);
      set.hits[j] += share.hits[i];
      return j;
    });
    for (const o of share.outcomes) outcomes[o.start] = { ...o, equilibrium: o.equilibrium < 0 ? -1 : map[o.equilibrium] };
    for (const key of Object.keys(counters) as (keyof typeof counters)[]) counters[key] += share.counters[key];
  }
  return { equilibria: set, outcomes, counters, traces: [] };
}
