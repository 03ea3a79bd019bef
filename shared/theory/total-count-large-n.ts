import { assertPositive, assertPositiveInteger, assertTau } from "./checks";
import { sigmaTotal } from "./complexity-total";

/**
 * Natural logarithm of the large-N form of E N_tot for the Gaussian field network, with the
 * prefactor: for m < 1 and τ < 1, E N_tot ≈ √(2(1+τ)/(1−τ)) e^{(1−τ)(1−m²)/2} e^{N Σ_tot(m)};
 * for τ = 1, E N_tot ≈ 4√(N(1−m²)/π) e^{N Σ_tot(m)}; for m > 1, E N_tot → 1. The exponential
 * rate is Fyodorov & Khoruzhenko, PNAS 113 (2016) 6827; the prefactors are derived here and
 * checked numerically up to N = 160, not yet compared with FK 2016: label them so. Neither form
 * holds in the crossover |m − 1| ≲ N^{−1/2}; m ≥ 1 returns ln 1 = 0.
 * @param n number of units N, a positive integer
 * @param m relative relaxation rate μ/μ_c > 0
 * @param tau asymmetry τ ∈ [0, 1]
 * @returns ln E N_tot in the large-N approximation (log form: the value overflows at large N)
 * @throws RangeError when an argument is out of range
 */
export function logTotalCountLargeN(n: number, m: number, tau: number): number {
  assertPositiveInteger("N", n);
  assertPositive("m", m);
  assertTau(tau);
  if (m >= 1) return 0;
  const rate = n * sigmaTotal(m);
  if (tau === 1) return Math.log(4 * Math.sqrt((n * (1 - m * m)) / Math.PI)) + rate;
  const logPrefactor = 0.5 * Math.log((2 * (1 + tau)) / (1 - tau)) + ((1 - tau) * (1 - m * m)) / 2;
  return logPrefactor + rate;
}

/** Label to show beside logTotalCountLargeN wherever it is displayed. */
export const TOTAL_PREFACTOR_LABEL =
  "large-N E N_tot with prefactor: rate from Fyodorov & Khoruzhenko 2016, prefactor derived here (to be compared with FK 2016)";
