import type { Network } from "../ensembles/ensemble";
import { integrate } from "../integrate/integrate";
import { integrateMany } from "../integrate/integrate-many";
import { batchedSystem } from "../integrate/batched-system";
import {
  addCounters,
  emptyCounters,
  type BatchRhs,
  type IntegrationCounters,
  type IntegrationResult,
  type OdeSystem,
} from "../integrate/types";
import { distInf } from "../linalg/vector";
import { analyseEquilibrium } from "./equilibrium";
import { EquilibriumSet } from "./equilibrium-set";
import { refineEquilibrium, type RefineOptions } from "./newton";
import { RunMonitor } from "./run-monitor";
import { resolveRunSettings, type RunOptions, type RunSettings } from "./run-settings";
import { TraceRecorder, type Trace } from "./trace";

/**
 * How one run ended. "settled": reached a verified equilibrium (by Newton or basin entry);
 * "unverified": nearly still but Newton found no verified equilibrium close by; "slow": still
 * converging at tMax; "periodic": periodic-looking (returns near an earlier state, or a neutral
 * finite-time Lyapunov exponent while the speed does not decay); "irregular": clearly positive
 * exponent; "escaping": blow-up or non-finite values; "unclassified": none of these.
 */
export type RunClass = "settled" | "unverified" | "slow" | "periodic" | "irregular" | "escaping" | "unclassified";

export interface RunOutcome {
  start: number;
  class: RunClass;
  /** Index into the network's equilibria, or −1. */
  equilibrium: number;
  /**
   * How a settled run was counted: "still" (nearly still, then Newton), "basin" (entered a
   * known stable equilibrium's ball; no refinement), "slow" (still converging at tMax, then
   * Newton found the stable equilibrium it approaches); null for other classes.
   */
  via: "still" | "basin" | "slow" | null;
  /** Time the run ended (settle time for settled runs). */
  time: number;
  /** Finite-time Lyapunov exponent when the probe ran, else null. */
  lyapunov: number | null;
}

export interface NetworkRunCounters extends IntegrationCounters {
  newtonIterations: number;
  refinements: number;
  /** Right-hand-side evaluations spent in Lyapunov probes (not in `evaluations`). */
  probeEvaluations: number;
}

export interface NetworkRun {
  equilibria: EquilibriumSet;
  outcomes: RunOutcome[];
  counters: NetworkRunCounters;
  traces: Trace[];
}

export interface RunStartsOptions extends RunOptions {
  refine?: RefineOptions;
  /** Relative merge distance of equilibria. Default 1e-6. */
  mergeTol?: number;
  /** A refined point farther than this × max(1, stateScale) from its still state is not counted. Default 0.1. */
  maxRefineShift?: number;
  /** Starts 0 … traceStarts−1 are traced (default 0), showing traceUnits (default [0, 1, 2, 3] ∩ units). */
  traceStarts?: number;
  traceUnits?: number[];
  traceMaxPoints?: number;
}

/**
 * Runs every start of one network to its end (science.md §4; product.md "What a cell
 * computes"): integrate until nearly still, basin entry, escape, irregularity or tMax; refine
 * still states by Newton and verify them (‖F‖∞ < 1e-10); merge equilibria by relative distance;
 * compute each distinct equilibrium's spectrum once; classify unsettled runs.
 * @param network the system
 * @param starts start states, each of length n
 * @param options run, refinement, merge and trace options (see RunStartsOptions)
 * @returns equilibria with hit counts, one outcome per start, counters and traces
 * @throws RangeError/TypeError on bad options or start lengths
 */
export function runStarts(network: Network, starts: Float64Array[], options: RunStartsOptions = {}): NetworkRun {
  const settings = resolveRunSettings(network, options);
  starts.forEach((s, i) => {
    if (!(s instanceof Float64Array) || s.length !== network.n) {
      throw new RangeError(`starts[${i}] must be a Float64Array of length ${network.n}`);
    }
  });
  const system = batchedSystem(network);
  const ctx = new RunContext(network, system, settings, options);
  const monitors = starts.map((s, i) => ctx.monitorFor(i, s));
  if (settings.method === "odex") {
    starts.forEach((s, i) => {
      const r = integrate(network, s, { ...settings, onStep: (t, x, f) => monitors[i].observe(t, x, f) });
      ctx.finish(i, monitors[i], r);
    });
  } else {
    integrateMany(
      system,
      starts.length,
      {
        start: (i) => starts[i],
        onStep: (i, t, x, f) => monitors[i].observe(t, x, f) || monitors[i].takeJump() || false,
        onEnd: (i, r) => ctx.finish(i, monitors[i], r),
      },
      { ...settings, maxSteps: 1e6, capacity: settings.batch },
    );
  }
  return ctx.result();
}

/** The per-network state shared by the runs of runStarts. */
class RunContext {
  readonly set: EquilibriumSet;
  readonly outcomes: RunOutcome[] = [];
  readonly counters: NetworkRunCounters = { ...emptyCounters(), newtonIterations: 0, refinements: 0, probeEvaluations: 0 };
  private readonly traces = new Map<number, TraceRecorder>();
  private readonly maxShift: number;

  constructor(
    private readonly network: Network,
    private readonly system: OdeSystem & Partial<BatchRhs>,
    private readonly settings: RunSettings,
    private readonly options: RunStartsOptions,
  ) {
    this.set = new EquilibriumSet(options.mergeTol);
    this.maxShift = (options.maxRefineShift ?? 0.1) * Math.max(1, network.stateScale);
  }

  monitorFor(i: number, x0: Float64Array): RunMonitor {
    let trace: TraceRecorder | null = null;
    if (i < (this.options.traceStarts ?? 0)) {
      const units = (this.options.traceUnits ?? [0, 1, 2, 3]).filter((u) => u >= 0 && u < this.network.n);
      trace = new TraceRecorder(i, units, x0, this.options.traceMaxPoints ?? 100);
      this.traces.set(i, trace);
    }
    return new RunMonitor(this.network, this.settings, this.set, trace, this.system, this.settings.method === "dopri5");
  }

  finish(i: number, m: RunMonitor, r: IntegrationResult): void {
    addCounters(this.counters, r.counters);
    this.counters.probeEvaluations += m.probeCounters.evaluations;
    const base = { start: i, equilibrium: -1, via: null, time: r.t, lyapunov: m.lyapunov };
    if (r.status === "stopped" && m.stop === "basin") {
      this.set.hit(m.basinIndex);
      this.outcomes[i] = { ...base, class: "settled", equilibrium: m.basinIndex, via: "basin" };
    } else if (r.status === "stopped" && m.stop === "still") {
      const e = this.refine(r.x, false);
      this.outcomes[i] = e < 0 ? { ...base, class: "unverified" } : { ...base, class: "settled", equilibrium: e, via: "still" };
    } else if (r.status === "non-finite" || m.stop === "escaping") {
      this.outcomes[i] = { ...base, class: "escaping" };
    } else if (m.stop === "irregular" || m.clearlyPositive()) {
      this.outcomes[i] = { ...base, class: "irregular" };
    } else if (m.history.decreasing()) {
      const e = this.refine(r.x, true);
      this.outcomes[i] = e < 0 ? { ...base, class: "slow" } : { ...base, class: "settled", equilibrium: e, via: "slow" };
    } else {
      const periodic = m.history.returns(r.x) || m.neutralExponent();
      this.outcomes[i] = { ...base, class: periodic ? "periodic" : "unclassified" };
    }
  }

  /**
   * Newton from a still (or slowly converging) state; returns the equilibrium index (hit
   * recorded) or −1. A slowly converging run is credited only to a stable equilibrium.
   */
  private refine(x: Float64Array, stableOnly: boolean): number {
    const res = refineEquilibrium(this.network, x, this.options.refine);
    this.counters.newtonIterations += res.iterations;
    this.counters.refinements += 1;
    if (!res.converged || distInf(res.x, x) > this.maxShift) return -1;
    let idx = this.set.find(res.x);
    if (idx < 0) {
      const e = analyseEquilibrium(this.network, res.x, res.residual);
      if (stableOnly && !e.stable) return -1;
      idx = this.set.add(e);
    } else if (stableOnly && !this.set.items[idx].stable) return -1;
    this.set.hit(idx);
    return idx;
  }

  result(): NetworkRun {
    const traces = [...this.traces.keys()].sort((a, b) => a - b).map((k) => this.traces.get(k)!.finish());
    return { equilibria: this.set, outcomes: this.outcomes, counters: this.counters, traces };
  }
}
