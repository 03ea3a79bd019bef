/**
 * Contracts of the integrators. A system is autonomous, dx/dt = F(x), as every network of the
 * engine is; `Network` (ensembles/ensemble.ts) satisfies `OdeSystem` as it stands.
 */

/** An autonomous ODE dx/dt = F(x) of dimension n. */
export interface OdeSystem {
  readonly n: number;
  /** Writes F(x) into out (length n). Must not allocate in hot loops. */
  rhs(x: Float64Array, out: Float64Array): void;
}

/**
 * Optional batched right-hand side: rows r = 0 … count−1 of `xs` (row-major, count × n) are
 * independent states; writes F of each row into the same row of `out`. A network that offers it
 * lets the batched Dormand–Prince driver serve many runs with one matrix–matrix product. Each
 * row's result must equal, bit for bit, what `rhs` gives for that row alone.
 */
export interface BatchRhs {
  rhsBatch(xs: Float64Array, out: Float64Array, count: number): void;
}

export type IntegratorMethod = "dopri5" | "odex";

/** Work counters; `evaluations` counts calls of F on one state. */
export interface IntegrationCounters {
  steps: number;
  accepted: number;
  rejected: number;
  evaluations: number;
}

/**
 * Called after every accepted step with the time, the state and F at that state (both views
 * valid only during the call). Return true to stop the integration there.
 */
export type StepObserver = (t: number, x: Float64Array, dxdt: Float64Array) => boolean | void;

export interface IntegrateOptions {
  /** Relative tolerance of the local error test. Default 1e-6. */
  rtol?: number;
  /** Absolute tolerance of the local error test. Default 1e-9. */
  atol?: number;
  /** End time; the run starts at t = 0. Default 200. */
  tMax?: number;
  /** "dopri5" (default: measured faster on the rate network, see integrate.ts) or "odex". */
  method?: IntegratorMethod;
  /** Largest number of step attempts. Default 1e6. */
  maxSteps?: number;
  /** Observer / stop predicate called after each accepted step. */
  onStep?: StepObserver;
}

/** Why an integration ended. */
export type IntegrationStatus =
  | "reached-tmax"
  | "stopped"
  | "non-finite"
  | "step-too-small"
  | "max-steps";

export interface IntegrationResult {
  /** State at the end (a fresh array). */
  x: Float64Array;
  /** Time reached. */
  t: number;
  status: IntegrationStatus;
  counters: IntegrationCounters;
}

/** Fresh all-zero counters. */
export function emptyCounters(): IntegrationCounters {
  return { steps: 0, accepted: 0, rejected: 0, evaluations: 0 };
}

/** Adds b's counts into a. */
export function addCounters(a: IntegrationCounters, b: IntegrationCounters): IntegrationCounters {
  a.steps += b.steps;
  a.accepted += b.accepted;
  a.rejected += b.rejected;
  a.evaluations += b.evaluations;
  return a;
}
