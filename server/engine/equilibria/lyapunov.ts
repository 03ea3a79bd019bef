import type { OdeSystem } from "../integrate/types";
import { Dopri5Batch, ROW } from "../integrate/dopri5-batch";
import type { BatchRhs, IntegrationCounters } from "../integrate/types";

export interface LyapunovOptions {
  /** Length of the probe window (time units). Default 40. */
  duration?: number;
  /** Renormalisation interval. Default 1. */
  interval?: number;
  /** Initial separation relative to max(1, ‖x‖₂). Default 1e-7. */
  separation?: number;
  /** Share of the first intervals discarded while the separation aligns. Default 0.2. */
  transient?: number;
  rtol?: number;
  atol?: number;
  /** Called after each interval with the time since the probe began, x and F(x) (views valid during the call). */
  onInterval?: (t: number, x: Float64Array, dxdt: Float64Array) => void;
}

export interface LyapunovEstimate {
  /** Finite-time largest Lyapunov exponent (per time unit); null when the probe failed. */
  exponent: number | null;
  /** Total log-growth Σ ln(d_k/d₀) over the intervals kept (e-folds). */
  growth: number;
  /** Time over which the exponent was measured. */
  time: number;
  /** Whole window integrated (transient included): x is the state at x0's time + elapsed. */
  elapsed: number;
  /** State at the end of the probe. */
  x: Float64Array;
  counters: IntegrationCounters;
  /** False when the probe met non-finite values or escaped. */
  finite: boolean;
}

/** The pair system (x, y) ↦ (F(x), F(y)) of dimension 2n (one batch of two rows when possible). */
function pairSystem(system: OdeSystem & Partial<BatchRhs>): OdeSystem {
  const n = system.n;
  const batch = system.rhsBatch?.bind(system);
  return {
    n: 2 * n,
    rhs(z, out) {
      if (batch) return batch(z, out, 2);
      system.rhs(z.subarray(0, n), out.subarray(0, n));
      system.rhs(z.subarray(n), out.subarray(n));
    },
  };
}

/**
 * Finite-time largest Lyapunov exponent by the two-trajectory method with periodic
 * renormalisation of G. Benettin, L. Galgani, A. Giorgilli & J.-M. Strelcyn, Meccanica 15
 * (1980) 9: a companion y = x + d₀ v (v a fixed pseudo-random unit direction) is integrated
 * with x as one 2n-dimensional system (Dormand–Prince, same steps for both, so integration
 * errors largely cancel in y − x); every `interval` the separation d = ‖y − x‖₂ is measured,
 * ln(d/d₀) accumulated and y reset to x + d₀ (y − x)/d. One integration runs through the whole
 * window: after a renormalisation it restarts from the new state with the step size it had
 * (Dopri5Batch.restartRow), instead of choosing a fresh starting step each interval (measured:
 * about a quarter fewer evaluations). The first `transient` share of intervals is discarded
 * while (y − x) aligns with the most unstable direction.
 * @param system the ODE
 * @param x0 starting state (not modified)
 * @param options duration (40), interval (1), separation (1e-7), transient (0.2), rtol/atol
 *   of the probe (1e-8 / 1e-10)
 * @returns the estimate, its window, counters and the final state
 * @throws RangeError on non-positive duration or interval, or a bad x0 length
 */
export function estimateLyapunov(system: OdeSystem & Partial<BatchRhs>, x0: Float64Array, options: LyapunovOptions = {}): LyapunovEstimate {
  const n = system.n;
  const duration = options.duration ?? 40;
  const interval = options.interval ?? 1;
  if (!(duration > 0) || !(interval > 0)) {
    throw new RangeError(`duration and interval must be positive, got ${duration} and ${interval}`);
  }
  if (x0.length !== n) throw new RangeError(`x0 must have length ${n}, got ${x0.length}`);
  const pair = pairSystem(system);
  const z = new Float64Array(2 * n);
  z.set(x0);
  let xx = 0;
  for (let i = 0; i < n; i++) xx += x0[i] * x0[i];
  const d0 = (options.separation ?? 1e-7) * Math.max(1, Math.sqrt(xx));
  for (let i = 0; i < n; i++) z[n + i] = x0[i] + (d0 * Math.cos(1 + 2.399963 * i)) / Math.sqrt(n / 2);
  renormalise(z, n, d0);
  const intervals = Math.max(1, Math.round(duration / interval));
  const skip = Math.floor(intervals * (options.transient ?? 0.2));
  const settings = { rtol: options.rtol ?? 1e-8, atol: options.atol ?? 1e-10, tMax: interval, maxSteps: 1e6 };
  const batch = new Dopri5Batch(pair, 1, settings);
  batch.add(0, z);
  let growth = 0;
  const failed = () => ({ exponent: null, growth, time: 0, elapsed: 0, x: z.slice(0, n), counters: countersOf(batch), finite: false });
  for (let k = 0; k < intervals; k++) {
    if (k > 0) {
      settings.tMax = (k + 1) * interval;
      batch.restartRow(0, z);
    }
    while (batch.status[0] === ROW.running) batch.attempt();
    if (batch.status[0] !== ROW.tMax) return failed();
    z.set(batch.row("x", 0));
    options.onInterval?.(settings.tMax, z.subarray(0, n), batch.row("f", 0).subarray(0, n));
    const d = renormalise(z, n, d0);
    if (!(d > 0) || !Number.isFinite(d)) return failed();
    if (k >= skip) growth += Math.log(d / d0);
  }
  const time = (intervals - skip) * interval;
  return { exponent: growth / time, growth, time, elapsed: intervals * interval, x: z.slice(0, n), counters: countersOf(batch), finite: true };
}

function countersOf(batch: Dopri5Batch): IntegrationCounters {
  return { steps: batch.steps[0], accepted: batch.accepted[0], rejected: batch.rejected[0], evaluations: batch.evaluations[0] };
}

/** Rescales y − x to length d0; returns the length before rescaling. */
function renormalise(z: Float64Array, n: number, d0: number): number {
  let dd = 0;
  for (let i = 0; i < n; i++) dd += (z[n + i] - z[i]) ** 2;
  const d = Math.sqrt(dd);
  if (!(d > 0) || !Number.isFinite(d)) return d;
  const s = d0 / d;
  for (let i = 0; i < n; i++) z[n + i] = z[i] + s * (z[n + i] - z[i]);
  return d;
}
