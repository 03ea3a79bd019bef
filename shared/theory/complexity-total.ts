import { assertPositive } from "./checks";

/**
 * Annealed total complexity of the Gaussian field network, Σ_tot(m) = lim (1/N) ln E N_tot:
 * Σ_tot(m) = (m² − 1)/2 − ln m for m < 1 and 0 for m ≥ 1, the same for every asymmetry τ
 * (Fyodorov & Khoruzhenko, PNAS 113 (2016) 6827, the complexity of equilibria of
 * dx/dt = −μx + f(x) with m = μ/(σ√N)). Near m = 1 it vanishes like (1 − m)² + (1 − m)³/3.
 * Asymptotic (N → ∞): finite-N counts lie above it.
 * @param m relative relaxation rate μ/μ_c > 0
 * @returns Σ_tot(m) ≥ 0
 * @throws RangeError when m is not positive and finite
 */
export function sigmaTotal(m: number): number {
  assertPositive("m", m);
  if (m >= 1) return 0;
  return (m * m - 1) / 2 - Math.log(m);
}
