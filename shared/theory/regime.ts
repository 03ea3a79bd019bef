import type { Regime } from "../schemas/theory";
import { assertPositive, assertTau } from "./checks";
import { logMStable } from "./stable-boundary";

/**
 * Large-N regime of the Gaussian field network at (m, τ) (phases of Ben Arous, Fyodorov &
 * Khoruzhenko, PNAS 118 (2021) e2023719118): "one-stable" for m ≥ 1 (a single stable
 * equilibrium, the trivial phase), "stable-rare" for m_st(τ) ≤ m < 1 (exponentially many
 * equilibria, stable ones exponentially rare: absolute instability), "stable-abundant" for
 * m < m_st(τ) (stable ones exponentially many too: relative instability). Compared in ln m so
 * that tiny m_st at small τ is handled. Asymptotic: at finite N the lines are blurred.
 * @param m relative relaxation rate μ/μ_c > 0
 * @param tau asymmetry τ ∈ [0, 1]
 * @returns the regime label
 * @throws RangeError when m or τ is out of range
 */
export function regimeOf(m: number, tau: number): Regime {
  assertPositive("m", m);
  assertTau(tau);
  if (m >= 1) return "one-stable";
  return Math.log(m) < logMStable(tau) ? "stable-abundant" : "stable-rare";
}
