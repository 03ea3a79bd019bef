import type { Rng } from "../random/rng";

/**
 * Checks an asymmetry parameter τ ∈ [0, 1].
 * @throws RangeError naming tau and its value
 */
export function assertTau(tau: number): void {
  if (typeof tau !== "number" || !(tau >= 0 && tau <= 1)) {
    throw new RangeError(`tau must be a number in [0, 1], got ${tau}`);
  }
}

/**
 * Writes scale·(c_s S + c_a A) with S = (G + Gᵀ)/√2, A = (H − Hᵀ)/√2, c_s = √((1+τ)/2),
 * c_a = √((1−τ)/2) — the real elliptic construction (Sommers, Crisanti, Sompolinsky & Stein,
 * PRL 60 (1988) 1895; science.md §1–2). For iid standard normal G, H the result has
 * off-diagonal variance scale², corr(X_ij, X_ji) = τ and diagonal variance scale²(1+τ).
 * @param g row-major n×n array of standard normals (not modified)
 * @param h row-major n×n array of standard normals (not modified)
 * @param n the order
 * @param tau the correlation τ ∈ [0, 1]
 * @param scale overall factor (1 for X itself, g/√N for couplings)
 * @param out receives the matrix, length n*n (may not alias g or h)
 * @throws RangeError on bad sizes, τ or scale
 */
export function combineElliptic(
  g: Float64Array,
  h: Float64Array,
  n: number,
  tau: number,
  scale: number,
  out: Float64Array,
): Float64Array {
  assertTau(tau);
  if (!Number.isSafeInteger(n) || n < 1) throw new RangeError(`n must be a positive integer, got ${n}`);
  if (!Number.isFinite(scale)) throw new RangeError(`scale must be finite, got ${scale}`);
  for (const [name, arr] of [["g", g], ["h", h], ["out", out]] as const) {
    if (arr.length !== n * n) throw new RangeError(`${name} must have length ${n * n}, got ${arr.length}`);
  }
  const cs = scale * Math.sqrt((1 + tau) / 2) * Math.SQRT1_2;
  const ca = scale * Math.sqrt((1 - tau) / 2) * Math.SQRT1_2;
  for (let i = 0; i < n; i++) {
    out[i * n + i] = 2 * cs * g[i * n + i];
    for (let j = i + 1; j < n; j++) {
      const sym = cs * (g[i * n + j] + g[j * n + i]);
      const anti = ca * (h[i * n + j] - h[j * n + i]);
      out[i * n + j] = sym + anti;
      out[j * n + i] = sym - anti;
    }
  }
  return out;
}

/**
 * Samples a real elliptic n×n matrix X = c_s S + c_a A (see combineElliptic): off-diagonal
 * variance 1, corr(X_ij, X_ji) = τ, diagonal variance 1 + τ; density
 * ∝ exp(−Tr(XXᵀ − τX²)/(2(1−τ²))). τ = 0 is real Ginibre, τ = 1 is GOE (variance 2 on the
 * diagonal). Draws G then H (2n² normals) from rng, whatever τ is.
 * @param rng the random stream
 * @param n the order, a positive integer
 * @param tau the correlation τ ∈ [0, 1]
 * @param out optional output of length n*n (allocated when omitted)
 * @returns the row-major matrix (out when given)
 * @throws RangeError on a bad n, τ or out length
 */
export function sampleElliptic(rng: Rng, n: number, tau: number, out?: Float64Array): Float64Array {
  assertTau(tau);
  if (!Number.isSafeInteger(n) || n < 1) throw new RangeError(`n must be a positive integer, got ${n}`);
  const target = out ?? new Float64Array(n * n);
  if (target.length !== n * n) {
    throw new RangeError(`out must have length ${n * n}, got ${target.length}`);
  }
  const g = new Float64Array(n * n);
  const h = new Float64Array(n * n);
  rng.fillNormal(g);
  rng.fillNormal(h);
  return combineElliptic(g, h, n, tau, 1, target);
}
