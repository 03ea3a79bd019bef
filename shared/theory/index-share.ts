import { assertPositive } from "./checks";

/**
 * Typical share of unstable directions (index / N) among equilibria of the Gaussian field
 * network, α*(m) = (1/π)[arccos m − m√(1 − m²)] for m < 1 and 0 for m ≥ 1, independent of τ:
 * the fraction of the semicircle of radius 1 (in units of μ_c) lying above m. Derived, not
 * confirmed in the paper (compare with Ben Arous, Fyodorov & Khoruzhenko, PNAS 118 (2021)
 * e2023719118 before quoting). Asymptotic (N → ∞).
 * @param m relative relaxation rate μ/μ_c > 0
 * @returns α*(m) ∈ [0, 1/2]
 * @throws RangeError when m is not positive and finite
 */
export function typicalIndexShare(m: number): number {
  assertPositive("m", m);
  if (m >= 1) return 0;
  return (Math.acos(m) - m * Math.sqrt(1 - m * m)) / Math.PI;
}

/** Label text to show beside typicalIndexShare wherever it is displayed. */
export const TYPICAL_INDEX_SHARE_LABEL =
  "typical index share α*(m): derived, not confirmed in the paper (asymptotic, N → ∞)";
