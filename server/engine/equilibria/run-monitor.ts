import type { Network } from "../ensembles/ensemble";
import { estimateLyapunov } from "./lyapunov";
import type { EquilibriumSet } from "./equilibrium-set";
import type { RunSettings } from "./run-settings";
import { emptyCounters, addCounters, type BatchRhs, type OdeSystem } from "../integrate/types";
import { normInf, distInf } from "../linalg/vector";
import { RunHistory } from "./run-history";
import type { TraceRecorder } from "./trace";
import type { RunJump } from "../integrate/integrate-many";

/** Why the monitor stopped a run, or null while it runs. */
export type RunStop = "still" | "basin" | "escaping" | "irregular" | null;

/** Minimum kept log-growth (e-folds) for a run to be called irregular. */
const MIN_GROWTH = 3;

/**
 * Watches one run after each accepted step (science.md §4): stops it when nearly still
 * (‖dx/dt‖∞ < stillTol), when it enters the ball of a known stable equilibrium of the same
 * network (basin shortcut: counted there without refinement), when it escapes (‖x‖∞ beyond the
 * bound or non-finite), or — once, at lyapunovStart — when a finite-time Lyapunov probe
 * (Benettin et al. 1980) is clearly positive (irregular). Records the history needed to classify
 * a run that reaches tMax unsettled.
 */
export class RunMonitor {
  stop: RunStop = null;
  basinIndex = -1;
  lyapunov: number | null = null;
  lyapunovGrowth = 0;
  readonly probeCounters = emptyCounters();
  readonly history: RunHistory;
  private probed = false;
  private probeAt: number;
  private speedAtHalf = -1;
  private jump: RunJump | null = null;

  constructor(
    private readonly network: Network,
    private readonly settings: RunSettings,
    private readonly known: EquilibriumSet,
    private readonly trace: TraceRecorder | null = null,
    /** The system the Lyapunov probe integrates (the network, or its batched form). */
    private readonly probeSystem: OdeSystem & Partial<BatchRhs> = network,
    /**
     * True when the integrator can move the run to the probe's end state (integrateMany's
     * RunJump): the probe's own trajectory of x then replaces the window instead of being
     * integrated twice. Default false (the run continues from where the probe began).
     */
    private readonly jumps = false,
  ) {
    this.history = new RunHistory(network.n, settings.tMax);
    this.probeAt = settings.lyapunovStart ?? Infinity;
  }

  /** StepObserver: returns true to stop the run. */
  observe(t: number, x: Float64Array, dxdt: Float64Array): boolean {
    this.trace?.record(t, x);
    const size = normInf(x);
    if (!(size <= this.settings.escapeBound)) return this.halt("escaping");
    const speed = normInf(dxdt);
    if (!Number.isFinite(speed)) return this.halt("escaping");
    if (speed < this.settings.stillTol) return this.halt("still");
    if (this.inKnownBasin(x)) return this.halt("basin");
    this.history.record(t, x, speed);
    if (!this.probed) return this.maybeProbe(t, x, speed);
    return false;
  }

  /**
   * Probes once the run reaches probeAt, unless it is visibly converging (speed fell more than
   * 10× since half that time): then the probe is postponed to twice the time, up to 0.75 tMax.
   */
  private maybeProbe(t: number, x: Float64Array, speed: number): boolean {
    if (this.speedAtHalf < 0 && t >= this.probeAt / 2) this.speedAtHalf = speed;
    if (t < this.probeAt) return false;
    if (speed < 0.1 * this.speedAtHalf && 2 * this.probeAt <= 0.75 * this.settings.tMax) {
      this.probeAt *= 2;
      this.speedAtHalf = speed;
      return false;
    }
    return this.probe(t, x);
  }

  private halt(reason: Exclude<RunStop, null>): boolean {
    this.stop = reason;
    return true;
  }

  private inKnownBasin(x: Float64Array): boolean {
    const { items } = this.known;
    const r = this.settings.basinRadius;
    for (let i = 0; i < items.length; i++) {
      if (items[i].stable && distInf(x, items[i].x) <= r) {
        this.basinIndex = i;
        return true;
      }
    }
    return false;
  }

  /**
   * The move a jumping integrator should make after the step just observed (the probe's end
   * state and window), once; null otherwise.
   */
  takeJump(): RunJump | null {
    const j = this.jump;
    this.jump = null;
    return j;
  }

  /**
   * Runs the Lyapunov probe from x at time t. If it is not irregular the run continues from x,
   * or — when the integrator jumps and the window ends before tMax — from the probe's end
   * state, the window's interval ends having been recorded in the history and trace.
   */
  private probe(t: number, x: Float64Array): boolean {
    this.probed = true;
    const jump = this.jumps && t + this.settings.lyapunovDuration < this.settings.tMax;
    const est = estimateLyapunov(this.probeSystem, x, {
      duration: this.settings.lyapunovDuration,
      interval: 2 / this.network.mu,
      rtol: this.settings.rtol,
      atol: this.settings.atol,
      onInterval: jump ? (dt, xi, fi) => this.recordInterval(t + dt, xi, fi) : undefined,
    });
    addCounters(this.probeCounters, est.counters);
    if (est.exponent === null) return false;
    this.lyapunov = est.exponent;
    this.lyapunovGrowth = est.growth;
    if (est.exponent > this.settings.lyapunovThreshold && est.growth > MIN_GROWTH) return this.halt("irregular");
    if (jump) this.jump = { x: est.x, dt: est.elapsed };
    return false;
  }

  private recordInterval(t: number, x: Float64Array, dxdt: Float64Array): void {
    this.trace?.record(t, x);
    this.history.record(t, x, normInf(dxdt));
  }

  /** True when the probe ran and its exponent is within ±lyapunovThreshold of 0 (neutral, as on a cycle or torus). */
  neutralExponent(): boolean {
    return this.lyapunov !== null && Math.abs(this.lyapunov) <= this.settings.lyapunovThreshold;
  }

  /** True when the probe (if it ran) found a clearly positive exponent. */
  clearlyPositive(): boolean {
    return this.lyapunov !== null && this.lyapunov > this.settings.lyapunovThreshold && this.lyapunovGrowth > MIN_GROWTH;
  }
}
