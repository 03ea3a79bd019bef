import { assertPositive, assertPositiveInteger } from "./checks";

/**
 * Critical relaxation rate of the Gaussian field network, μ_c = σ√N: the scale on which the
 * number of equilibria changes from one (μ > μ_c) to exponentially many (μ < μ_c) for every τ
 * (Fyodorov & Khoruzhenko, PNAS 113 (2016) 6827, the "nonlinear May–Wigner" transition at m = 1).
 * @param n number of units N, a positive integer
 * @param sigma Jacobian scale σ > 0 (σ² = (v² + a²)/ℓ⁴ for the Gaussian covariance)
 * @returns μ_c = σ√N
 * @throws RangeError when n or sigma is out of range
 */
export function fieldMuCritical(n: number, sigma: number): number {
  assertPositiveInteger("N", n);
  assertPositive("sigma", sigma);
  return sigma * Math.sqrt(n);
}

/**
 * Reference relaxation rate of the rate network, μ_c = g: at τ = 0 the mean-field transition to
 * chaos sits at g/μ = 1 (Sompolinsky, Crisanti & Sommers, PRL 61 (1988) 259). For τ > 0 the
 * origin's own stability line is μ = g(1+τ) (see rate-lines.ts), so m = μ/g is a plain gain
 * ratio, not a τ-dependent boundary.
 * @param g coupling gain g > 0 (off-diagonal variance g²/N)
 * @returns μ_c = g
 * @throws RangeError when g is not positive and finite
 */
export function rateMuCritical(g: number): number {
  return assertPositive("g", g);
}

/**
 * Relative relaxation rate m = μ/μ_c, the coordinate of every asymptotic formula.
 * @param mu relaxation rate μ > 0
 * @param muCritical critical rate μ_c > 0 (fieldMuCritical or rateMuCritical)
 * @returns m = μ/μ_c
 * @throws RangeError when either argument is not positive and finite
 */
export function relativeRate(mu: number, muCritical: number): number {
  assertPositive("mu", mu);
  assertPositive("muCritical", muCritical);
  return mu / muCritical;
}
