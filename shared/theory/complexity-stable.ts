import { assertPositive, assertTau } from "./checks";

/**
 * Annealed complexity of stable equilibria of the Gaussian field network,
 * Σ_st(m, τ) = lim (1/N) ln E N_st = −ln m − (1 − m) − (1 − m)²/(2τ) for m < 1 and 0 for
 * m ≥ 1 (Ben Arous, Fyodorov & Khoruzhenko, PNAS 118 (2021) e2023719118, the stable-equilibria
 * complexity; it is also the annealed value with the spectral edge of the elliptic part held
 * below the scalar shift). At τ = 1 it equals Σ_tot(m) − (1 − m)². Negative values mean stable
 * equilibria are exponentially rare. Asymptotic (N → ∞).
 * @param m relative relaxation rate μ/μ_c > 0
 * @param tau asymmetry τ ∈ [0, 1] (gradient share)
 * @returns Σ_st(m, τ); −Infinity at τ = 0 with m < 1 (stable equilibria are then rarer than
 *   any exponential in N)
 * @throws RangeError when m or τ is out of range
 */
export function sigmaStable(m: number, tau: number): number {
  assertPositive("m", m);
  assertTau(tau);
  if (m >= 1) return 0;
  const d = 1 - m;
  if (tau === 0) return -Infinity;
  return -Math.log(m) - d - (d * d) / (2 * tau);
}
