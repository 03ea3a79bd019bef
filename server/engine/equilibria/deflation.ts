import type { Network } from "../ensembles/ensemble";
import { createLu, factorLu, solveLu } from "../linalg/lu";
import { normInf } from "../linalg/vector";

export interface DeflationOptions {
  /** Power p of the deflation operator. Default 2. */
  power?: number;
  /** Shift s of the deflation operator. Default 1. */
  shift?: number;
  /** Iterations at most. Default 100. */
  maxIterations?: number;
  /** Stop when ‖F(x)‖∞ falls below this. Default 1e-11. */
  tol?: number;
  /** Give up when ‖x‖∞ exceeds this (the iterate left the region of interest). Default Infinity. */
  bound?: number;
  /** Step halvings of the line search before giving up this attempt. Default 6. */
  maxHalvings?: number;
}

export interface DeflatedResult {
  x: Float64Array;
  residual: number;
  converged: boolean;
  iterations: number;
}

/**
 * Deflated Newton iteration (P. E. Farrell, Á. Birkisson & S. W. Funke, "Deflation techniques
 * for finding distinct solutions of nonlinear partial differential equations", SIAM J. Sci.
 * Comput. 37 (2015) A2026): Newton on G(x) = M(x) F(x), M(x) = Π_i (‖x − x_i‖₂^{−p} + s), which
 * has no root at the known roots x_i. By the Sherman–Morrison formula the Newton step of G is
 * the Newton step δ of F scaled by 1 / (1 − ∇(ln M)·δ) (their §3, eq. (3.4)), so each iteration
 * costs one LU of the Jacobian of F. The step is damped by backtracking on ‖G‖₂ (Armijo
 * condition; the line-searched variant the authors use), which keeps iterates from flying off.
 * @param network the system F
 * @param x0 starting point
 * @param known roots already found (deflated)
 * @param options power (2), shift (1), maxIterations (100), tol (1e-11), bound (∞), maxHalvings (6)
 * @returns the last iterate and whether ‖F‖∞ < tol there
 * @throws RangeError when x0 has the wrong length
 */
export function deflatedNewton(
  network: Network,
  x0: Float64Array,
  known: readonly Float64Array[],
  options: DeflationOptions = {},
): DeflatedResult {
  const n = network.n;
  if (x0.length !== n) throw new RangeError(`x0 must have length ${n}, got ${x0.length}`);
  const p = options.power ?? 2;
  const s = options.shift ?? 1;
  const maxIterations = options.maxIterations ?? 100;
  const tol = options.tol ?? 1e-11;
  const bound = options.bound ?? Infinity;
  const maxHalvings = options.maxHalvings ?? 6;
  const x = Float64Array.from(x0);
  const f = new Float64Array(n);
  const minusF = new Float64Array(n);
  const step = new Float64Array(n);
  const jac = new Float64Array(n * n);
  const lu = createLu(n);
  const xTrial = new Float64Array(n);
  const fTrial = new Float64Array(n);
  network.rhs(x, f);
  let residual = normInf(f);
  let merit = logMerit(x, f, known, p, s);
  let it = 0;
  for (; it < maxIterations && !(residual < tol); it++) {
    if (!Number.isFinite(residual) || normInf(x) > bound) break;
    network.jacobian(x, jac);
    factorLu(jac, lu);
    if (lu.singular) break;
    for (let i = 0; i < n; i++) minusF[i] = -f[i];
    solveLu(lu, minusF, step);
    const scale = 1 / (1 - gradLogM(x, known, p, s, step));
    if (!Number.isFinite(scale)) break;
    let alpha = 1;
    let accepted = false;
    for (let h = 0; h < maxHalvings && !accepted; h++, alpha /= 2) {
      for (let i = 0; i < n; i++) xTrial[i] = x[i] + alpha * scale * step[i];
      network.rhs(xTrial, fTrial);
      const m = logMerit(xTrial, fTrial, known, p, s);
      accepted = m <= merit + Math.log(1 - 1e-4 * alpha);
      if (accepted) merit = m;
    }
    if (!accepted) break;
    x.set(xTrial);
    f.set(fTrial);
    residual = normInf(f);
  }
  return { x, residual, converged: residual < tol, iterations: it };
}

/** ln ‖G(x)‖₂ = ln M(x) + ln ‖F(x)‖₂, the merit function of the damped deflated step. */
function logMerit(x: Float64Array, f: Float64Array, known: readonly Float64Array[], p: number, s: number): number {
  let ff = 0;
  for (let i = 0; i < f.length; i++) ff += f[i] * f[i];
  let logM = 0;
  for (const root of known) {
    let rr = 0;
    for (let i = 0; i < x.length; i++) rr += (x[i] - root[i]) ** 2;
    logM += Math.log(Math.pow(rr, -p / 2) + s);
  }
  const v = logM + 0.5 * Math.log(ff);
  return Number.isNaN(v) ? Infinity : v;
}

/** ∇(ln M)(x)·δ with ln M = Σ_i ln(r_i^{−p} + s), r_i = ‖x − x_i‖₂. */
function gradLogM(x: Float64Array, known: readonly Float64Array[], p: number, s: number, delta: Float64Array): number {
  let total = 0;
  for (const root of known) {
    let rr = 0;
    let dot = 0;
    for (let i = 0; i < x.length; i++) {
      const d = x[i] - root[i];
      rr += d * d;
      dot += d * delta[i];
    }
    const rp = Math.pow(rr, -p / 2);
    // d/dx ln(r^{-p} + s) = −p r^{−p−2} (x − x_i) / (r^{−p} + s)
    total += (-p * rp * dot) / rr / (rp + s);
  }
  return total;
}
