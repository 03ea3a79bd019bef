import type { Rng } from "../random/rng";
import { sampleElliptic } from "../spectra/elliptic";

/**
 * How the field network's Jacobian J (σ = 1) is split into a sampled matrix J' and an
 * independent scalar shift ξ ~ N(0, η), J = J' + ξ I.
 * - "elliptic" (τ ≥ 1/(N+1)): J' = √α X, X real elliptic of correlation t = γ/α, η = γ, the exact
 *   finite-N decomposition of science.md §1 with α = 1 + ε_N, γ = τ − ε_N, ε_N = (1 − τ)/N.
 * - "trace-shift" (τ < 1/(N+1), where γ < 0 and no elliptic split exists): J' has the same
 *   off-diagonal pairs (variance α, covariance γ) and a diagonal √(1+τ)(z − z̄1) with zero trace;
 *   the whole trace goes to the shift, η = τ(N + 2)/N = Var(Tr J)/N². Both reproduce
 *   E[J_im J_nk] = (1+ε_N)δ_in δ_mk + (τ−ε_N)(δ_ik δ_mn + δ_im δ_nk) exactly.
 */
export interface ShiftDecomposition {
  readonly n: number;
  readonly tau: number;
  readonly mode: "elliptic" | "trace-shift";
  /** α = 1 + ε_N. */
  readonly alpha: number;
  /** γ = τ − ε_N (negative below τ = 1/(N+1)). */
  readonly gamma: number;
  /** Correlation of the off-diagonal pairs of J'/√α, t = γ/α ∈ (−1, 1]. */
  readonly t: number;
  /** Variance η ≥ 0 of the scalar shift (0 only at τ = 0, where Tr J = 0 exactly). */
  readonly shiftVariance: number;
}

/**
 * The finite-N split J = J' + ξ I of the Gaussian field network's Jacobian (science.md §1,
 * "Jacobian statistics"; covariance of Fyodorov & Khoruzhenko, PNAS 113 (2016) 6827).
 * @param n number of units N, a positive integer
 * @param tau asymmetry τ ∈ [0, 1]
 * @returns the decomposition constants
 * @throws RangeError on a bad n or τ
 */
export function shiftDecomposition(n: number, tau: number): ShiftDecomposition {
  if (!Number.isSafeInteger(n) || n < 1) throw new RangeError(`N must be a positive integer, got ${n}`);
  if (typeof tau !== "number" || !(tau >= 0 && tau <= 1)) throw new RangeError(`tau must be in [0, 1], got ${tau}`);
  const eps = (1 - tau) / n;
  const alpha = 1 + eps;
  const gamma = tau - eps;
  const t = gamma / alpha;
  if (gamma >= 0) return { n, tau, mode: "elliptic", alpha, gamma, t, shiftVariance: gamma };
  return { n, tau, mode: "trace-shift", alpha, gamma, t, shiftVariance: (tau * (n + 2)) / n };
}

/** Off-diagonal pairs √α(c_s (g_ij + g_ji) + c_a (h_ij − h_ji))/√2 for any t ∈ (−1, 1). */
function fillTraceShift(d: ShiftDecomposition, g: Float64Array, h: Float64Array, out: Float64Array): void {
  const n = d.n;
  const cs = Math.sqrt(d.alpha * (1 + d.t)) * 0.5;
  const ca = Math.sqrt(d.alpha * (1 - d.t)) * 0.5;
  let mean = 0;
  for (let i = 0; i < n; i++) mean += g[i * n + i] / n;
  const a = Math.sqrt(1 + d.tau);
  for (let i = 0; i < n; i++) {
    out[i * n + i] = a * (g[i * n + i] - mean);
    for (let j = i + 1; j < n; j++) {
      const sym = cs * (g[i * n + j] + g[j * n + i]);
      const anti = ca * (h[i * n + j] - h[j * n + i]);
      out[i * n + j] = sym + anti;
      out[j * n + i] = sym - anti;
    }
  }
}

/**
 * Samples J' of a ShiftDecomposition (σ = 1), row-major n×n. Both modes draw G then H
 * (2n² standard normals) from rng, so sample k uses the same draws at every τ (common random
 * numbers). Elliptic mode uses spectra/elliptic.ts sampleElliptic(rng, n, t) scaled by √α.
 * @param rng the random stream of this sample
 * @param d the decomposition (from shiftDecomposition)
 * @param out output array of length n²
 * @returns out
 * @throws RangeError when out has the wrong length
 */
export function sampleShiftedJacobian(rng: Rng, d: ShiftDecomposition, out: Float64Array): Float64Array {
  const n = d.n;
  if (out.length !== n * n) throw new RangeError(`out must have length ${n * n}, got ${out.length}`);
  if (d.mode === "elliptic") {
    sampleElliptic(rng, n, d.t, out);
    const scale = Math.sqrt(d.alpha);
    for (let i = 0; i < out.length; i++) out[i] *= scale;
    return out;
  }
  const g = new Float64Array(n * n);
  const h = new Float64Array(n * n);
  rng.fillNormal(g);
  rng.fillNormal(h);
  fillTraceShift(d, g, h, out);
  return out;
}
