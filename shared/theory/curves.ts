import { assertTau } from "./checks";
import { sigmaStable } from "./complexity-stable";
import { sigmaTotal } from "./complexity-total";
import { originStabilityMu } from "./rate-lines";
import { mStable } from "./stable-boundary";

function assertArray(name: string, values: readonly number[]): void {
  if (!Array.isArray(values)) throw new TypeError(`${name} must be an array of numbers`);
}

/**
 * The boundary m_st(τ) sampled at the given τ values, for plotting over a (μ, τ) map
 * (Ben Arous, Fyodorov & Khoruzhenko, PNAS 118 (2021) e2023719118; see stable-boundary.ts).
 * @param taus asymmetries τ ∈ [0, 1], any order
 * @returns one point per τ, in the order given
 * @throws RangeError/TypeError on a bad τ or a non-array
 */
export function boundaryCurve(taus: readonly number[]): { tau: number; mStable: number }[] {
  assertArray("taus", taus);
  return taus.map((tau) => ({ tau, mStable: mStable(tau) }));
}

/**
 * Σ_tot(m) sampled at the given m (Fyodorov & Khoruzhenko, PNAS 113 (2016) 6827).
 * @param ms relative rates m > 0
 * @returns one point per m
 * @throws RangeError/TypeError on a bad m or a non-array
 */
export function sigmaTotalCurve(ms: readonly number[]): { m: number; sigma: number }[] {
  assertArray("ms", ms);
  return ms.map((m) => ({ m, sigma: sigmaTotal(m) }));
}

/**
 * Σ_st(m, τ) sampled at the given m for one τ (Ben Arous, Fyodorov & Khoruzhenko, PNAS 118
 * (2021) e2023719118). −Infinity entries (τ = 0, m < 1) are kept: callers drawing a line drop them.
 * @param ms relative rates m > 0
 * @param tau asymmetry τ ∈ [0, 1]
 * @returns one point per m
 * @throws RangeError/TypeError on a bad m, τ or a non-array
 */
export function sigmaStableCurve(ms: readonly number[], tau: number): { m: number; sigma: number }[] {
  assertArray("ms", ms);
  assertTau(tau);
  return ms.map((m) => ({ m, sigma: sigmaStable(m, tau) }));
}

/**
 * The rate network's origin-stability line μ = g(1+τ) sampled at the given τ (Sommers,
 * Crisanti, Sompolinsky & Stein, PRL 60 (1988) 1895).
 * @param g coupling gain g > 0
 * @param taus asymmetries τ ∈ [0, 1]
 * @returns one point per τ
 * @throws RangeError/TypeError on a bad g, τ or a non-array
 */
export function originStabilityCurve(g: number, taus: readonly number[]): { tau: number; mu: number }[] {
  assertArray("taus", taus);
  return taus.map((tau) => ({ tau, mu: originStabilityMu(g, tau) }));
}
