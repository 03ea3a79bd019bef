import { networkStream } from "../../random/rng";

/**
 * Random Fourier features of one field network (science.md §1 "Sampling it"), independent of
 * μ, τ and σ. Row k of each M×N array is feature k.
 */
export interface FieldDraws {
  readonly n: number;
  /** Number of features M. */
  readonly m: number;
  /** Wave vectors w_k ~ N(0, ℓ⁻² I) of the potential V, M×N. */
  readonly w: Float64Array;
  /** Phases φ_k ~ U(0, 2π) of V. */
  readonly phase: Float64Array;
  /** Wave vectors w'_k ~ N(0, ℓ⁻² I) of the antisymmetric field A, M×N. */
  readonly wA: Float64Array;
  /** Phases φ'_k ~ U(0, 2π) of A. */
  readonly phaseA: Float64Array;
  /** u_k = C_k w'_k with C_k = (p_k q_kᵀ − q_k p_kᵀ)/√2, p_k, q_k standard normal, M×N. */
  readonly u: Float64Array;
}

/**
 * u = C w' with C_ij = (p_i q_j − q_i p_j)/√2, computed entry by entry so that C is exactly
 * antisymmetric (C_ii = 0 bit for bit; u = 0 exactly when N = 1). O(N²) per feature, once.
 */
function antisymmetricProduct(p: Float64Array, q: Float64Array, w: Float64Array, out: Float64Array, offset: number) {
  const n = p.length;
  for (let i = 0; i < n; i++) {
    let s = 0;
    for (let j = 0; j < n; j++) s += (p[i] * q[j] - q[i] * p[j]) * w[j];
    out[offset + i] = s * Math.SQRT1_2;
  }
}

/**
 * Draws the features of field network k from its common-random-numbers stream
 * networkStream("field", seed, k, N). Features are drawn one after another (w_k, φ_k, w'_k,
 * φ'_k, p_k, q_k), so with more features the first ones stay the same.
 * @param n dimension N
 * @param m number of features M
 * @param lengthScale correlation length ℓ > 0 of Γ(r²) = exp(−r²/(2ℓ²))
 * @param seed base seed
 * @param k network index
 * @returns the draws (about 3·M·N doubles)
 */
export function drawFieldFeatures(n: number, m: number, lengthScale: number, seed: number, k: number): FieldDraws {
  const rng = networkStream("field", seed, k, n);
  const w = new Float64Array(m * n);
  const wA = new Float64Array(m * n);
  const u = new Float64Array(m * n);
  const phase = new Float64Array(m);
  const phaseA = new Float64Array(m);
  const p = new Float64Array(n);
  const q = new Float64Array(n);
  const wk = new Float64Array(n);
  const inv = 1 / lengthScale;
  for (let f = 0; f < m; f++) {
    for (let i = 0; i < n; i++) w[f * n + i] = rng.normal() * inv;
    phase[f] = 2 * Math.PI * rng.uniform();
    for (let i = 0; i < n; i++) wk[i] = wA[f * n + i] = rng.normal() * inv;
    phaseA[f] = 2 * Math.PI * rng.uniform();
    rng.fillNormal(p);
    rng.fillNormal(q);
    antisymmetricProduct(p, q, wk, u, f * n);
  }
  return { n, m, w, phase, wA, phaseA, u };
}
