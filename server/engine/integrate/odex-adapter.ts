import { Solver, Outcome } from "odex";
import type { IntegrationResult, OdeSystem, StepObserver } from "./types";
import type { ResolvedIntegrateOptions } from "./options";

class NonFiniteError extends Error {}

/**
 * Integrates dx/dt = F(x) with odex 2.0.4, the JavaScript port of E. Hairer's ODEX
 * (Gragg–Bulirsch–Stoer extrapolation of the explicit midpoint rule with order and step-size
 * control; Hairer, Nørsett & Wanner, Solving ODEs I, §II.9), behind the same interface as the
 * Dormand–Prince stepper. odex works on plain arrays and allocates per evaluation; the observer
 * receives F at each accepted point, which costs one extra evaluation per step (counted).
 * @param system the ODE
 * @param x0 start state (validated by the caller)
 * @param o resolved options
 * @param onStep observer / stop predicate
 * @returns final state, time, status and counters
 */
export function integrateOdex(
  system: OdeSystem,
  x0: Float64Array,
  o: ResolvedIntegrateOptions,
  onStep?: StepObserver,
): IntegrationResult {
  const n = system.n;
  const xin = new Float64Array(n);
  const xout = new Float64Array(n);
  const dxdt = new Float64Array(n);
  let extra = 0;
  const f = (_t: number, y: number[]): number[] => {
    for (let i = 0; i < n; i++) xin[i] = y[i];
    system.rhs(xin, xout);
    for (let i = 0; i < n; i++) if (!Number.isFinite(xout[i])) throw new NonFiniteError();
    return Array.from(xout);
  };
  const solver = new Solver(n);
  solver.relativeTolerance = o.rtol;
  solver.absoluteTolerance = o.atol;
  solver.maxSteps = o.maxSteps;
  let tLast = 0;
  let stopped = false;
  const last = Float64Array.from(x0);
  const solOut = (_nr: number, _xold: number, t: number, y: number[]): boolean => {
    tLast = t;
    for (let i = 0; i < n; i++) last[i] = y[i];
    if (!onStep || t === 0) return true;
    system.rhs(last, dxdt);
    extra++;
    if (onStep(t, last, dxdt) === true) { stopped = true; return false; }
    return true;
  };
  let outcome: Outcome | "non-finite";
  let counts = { nStep: 0, nAccept: 0, nReject: 0, nEval: 0 };
  try {
    const sol = solver.solve(f, 0, Array.from(x0), o.tMax, solOut);
    outcome = sol.outcome;
    counts = sol;
  } catch (e) {
    if (!(e instanceof NonFiniteError)) throw e;
    outcome = "non-finite";
  }
  const status =
    outcome === "non-finite" ? "non-finite"
    : stopped ? "stopped"
    : outcome === Outcome.MaxStepsExceeded ? "max-steps"
    : "reached-tmax";
  return {
    x: last,
    t: status === "reached-tmax" ? o.tMax : tLast,
    status,
    counters: { steps: counts.nStep, accepted: counts.nAccept, rejected: counts.nReject, evaluations: counts.nEval + extra },
  };
}
