import type { Network } from "../ensembles/ensemble";
import { createLu, factorLu, solveLu } from "../linalg/lu";
import { normInf } from "../linalg/vector";

export interface RefineOptions {
  /** Newton iterations at most. Default 50. */
  maxIterations?: number;
  /** A point is an equilibrium when ‖F(x)‖∞ is below this. Default 1e-10 (science.md §4). */
  residualTol?: number;
  /** Iterations stop early once ‖F‖∞ is below this (polishing). Default 1e-13. */
  polishTol?: number;
  /** Backtracking halvings of the damped fallback at most. Default 30. */
  maxHalvings?: number;
}

export interface RefineResult {
  /** Last iterate (a fresh array). */
  x: Float64Array;
  /** ‖F(x)‖∞ at x. */
  residual: number;
  /** True when residual < residualTol: x is a verified equilibrium. */
  converged: boolean;
  iterations: number;
  /** Iterations that needed a shortened (damped) step. */
  dampedSteps: number;
  /** ‖F‖∞ before each iteration and after the last: shows the rate of convergence. */
  residuals: number[];
}

/** Reusable buffers of one refinement. */
interface Work {
  f: Float64Array;
  fTrial: Float64Array;
  xTrial: Float64Array;
  step: Float64Array;
  jac: Float64Array;
}

function workFor(n: number): Work {
  const v = () => new Float64Array(n);
  return { f: v(), fTrial: v(), xTrial: v(), step: v(), jac: new Float64Array(n * n) };
}

function sumSquares(v: Float64Array): number {
  let s = 0;
  for (let i = 0; i < v.length; i++) s += v[i] * v[i];
  return s;
}

/**
 * Refines an approximate equilibrium of dx/dt = F(x) by Newton's method: solve J(x)·δ = −F(x)
 * by LU with partial pivoting (Golub & Van Loan, Matrix Computations, 4th ed., §3.4) and take
 * x + αδ, with α = 1 when it lowers ½‖F‖₂² enough and otherwise halved (backtracking line
 * search with the Armijo condition ‖F(x+αδ)‖₂² ≤ (1 − 2·10⁻⁴α)‖F(x)‖₂²; Dennis & Schnabel,
 * Numerical Methods for Unconstrained Optimization and Nonlinear Equations (1983), §6.3). The
 * result is verified: converged iff ‖F(x)‖∞ < residualTol (1e-10 by default).
 * @param network the system (rhs and jacobian)
 * @param x0 starting point, length n
 * @param options maxIterations (50), residualTol (1e-10), polishTol (1e-13), maxHalvings (30)
 * @returns the last iterate with its residual history; never throws on non-convergence
 * @throws RangeError when x0 has the wrong length or options are out of range
 */
export function refineEquilibrium(network: Network, x0: Float64Array, options: RefineOptions = {}): RefineResult {
  const n = network.n;
  if (x0.length !== n) throw new RangeError(`x0 must have length ${n}, got ${x0.length}`);
  const maxIterations = options.maxIterations ?? 50;
  const residualTol = options.residualTol ?? 1e-10;
  const polishTol = options.polishTol ?? 1e-13;
  const maxHalvings = options.maxHalvings ?? 30;
  if (!Number.isSafeInteger(maxIterations) || maxIterations < 0) {
    throw new RangeError(`maxIterations must be a non-negative integer, got ${maxIterations}`);
  }
  if (!(residualTol > 0)) throw new RangeError(`residualTol must be positive, got ${residualTol}`);
  const w = workFor(n);
  const lu = createLu(n);
  const x = Float64Array.from(x0);
  network.rhs(x, w.f);
  let residual = normInf(w.f);
  const residuals = [residual];
  let iterations = 0;
  let dampedSteps = 0;
  while (iterations < maxIterations && residual >= polishTol && Number.isFinite(residual)) {
    network.jacobian(x, w.jac);
    factorLu(w.jac, lu);
    if (lu.singular) break;
    for (let i = 0; i < n; i++) w.fTrial[i] = -w.f[i];
    solveLu(lu, w.fTrial, w.step);
    const alpha = lineSearch(network, x, w, maxHalvings);
    iterations++;
    if (alpha === 0) break;
    if (alpha < 1) dampedSteps++;
    x.set(w.xTrial);
    w.f.set(w.fTrial);
    residual = normInf(w.f);
    residuals.push(residual);
  }
  return { x, residual, converged: residual < residualTol, iterations, dampedSteps, residuals };
}

/** Backtracking on α ∈ {1, ½, ¼, …}; leaves x + αδ in xTrial and F there in fTrial; 0 = failed. */
function lineSearch(network: Network, x: Float64Array, w: Work, maxHalvings: number): number {
  const f0 = sumSquares(w.f);
  let alpha = 1;
  for (let k = 0; k <= maxHalvings; k++) {
    for (let i = 0; i < x.length; i++) w.xTrial[i] = x[i] + alpha * w.step[i];
    network.rhs(w.xTrial, w.fTrial);
    const f1 = sumSquares(w.fTrial);
    if (Number.isFinite(f1) && f1 <= (1 - 2e-4 * alpha) * f0) return alpha;
    alpha /= 2;
  }
  return 0;
}
