import { assertPositive, assertTau } from "./checks";

/** φ(u) = e^u − 1 − u = m − 1 − ln m at m = e^u, accurate near u = 0 (series for |u| < 0.1). */
function excessOverTangent(u: number): number {
  if (Math.abs(u) >= 0.1) return Math.expm1(u) - u;
  let term = (u * u) / 2;
  let sum = term;
  for (let k = 3; k < 20; k++) {
    term *= u / k;
    sum += term;
  }
  return sum;
}

/** τ_st as a function of u = ln m < 0: (1 − e^u)² / (2(e^u − 1 − u)). */
function tauStableAtLog(u: number): number {
  if (u > -1e-8) return 1 + (2 * u) / 3;
  const a = Math.expm1(u);
  return (a * a) / (2 * excessOverTangent(u));
}

/**
 * Asymmetry above which stable equilibria are exponentially many at relative rate m:
 * τ_st(m) = (1 − m)² / (2(m − 1 − ln m)), the zero of Σ_st(m, τ) (Ben Arous, Fyodorov &
 * Khoruzhenko, PNAS 118 (2021) e2023719118). Increases from 0 (m → 0) to 1 (m → 1).
 * @param m relative relaxation rate μ/μ_c > 0
 * @returns τ_st(m) ∈ [0, 1]; 1 for m ≥ 1
 * @throws RangeError when m is not positive and finite
 */
export function tauStable(m: number): number {
  assertPositive("m", m);
  if (m >= 1) return 1;
  return tauStableAtLog(Math.log(m));
}

/**
 * ln m_st(τ): the logarithm of the boundary between "stable ones exponentially rare" and
 * "stable ones exponentially many", the root in m ∈ (0, 1) of (1 − m)² = 2τ(m − 1 − ln m)
 * (Ben Arous, Fyodorov & Khoruzhenko, PNAS 118 (2021) e2023719118). Solved by bracketing and
 * bisection in u = ln m on τ_st(e^u) = τ, which is strictly increasing in u; the bracket starts
 * from the small-τ form m_st ≈ e^{−1−1/(2τ)}. Working in ln m keeps τ → 0 finite where m_st
 * itself underflows (below τ ≈ 7·10⁻⁴).
 * @param tau asymmetry τ ∈ [0, 1]
 * @returns ln m_st(τ): −Infinity at τ = 0, 0 at τ = 1
 * @throws RangeError when τ is outside [0, 1]
 */
export function logMStable(tau: number): number {
  assertTau(tau);
  if (tau === 0) return -Infinity;
  if (tau === 1) return 0;
  // Below 1e-300 the e^u terms are far below rounding: τ = 1/(2(−1 − u)) exactly in doubles.
  if (tau < 1e-300) return -1 - 1 / (2 * tau);
  let lo = -2 - 1 / (2 * tau);
  while (tauStableAtLog(lo) >= tau) lo *= 2;
  let hi = lo;
  while (tauStableAtLog(hi) < tau) {
    lo = hi;
    hi /= 2;
  }
  for (let i = 0; i < 400; i++) {
    const mid = 0.5 * (lo + hi);
    if (mid === lo || mid === hi) break;
    if (tauStableAtLog(mid) < tau) lo = mid;
    else hi = mid;
  }
  return 0.5 * (lo + hi);
}

/**
 * The boundary m_st(τ) = exp(logMStable(τ)) (Ben Arous, Fyodorov & Khoruzhenko, PNAS 118
 * (2021) e2023719118): below it stable equilibria are exponentially many. m_st → 1 as τ → 1,
 * m_st ≈ e^{−1−1/(2τ)} as τ → 0 (underflows to 0 below τ ≈ 7·10⁻⁴; use logMStable there).
 * @param tau asymmetry τ ∈ [0, 1]
 * @returns m_st(τ) ∈ [0, 1]
 * @throws RangeError when τ is outside [0, 1]
 */
export function mStable(tau: number): number {
  return Math.exp(logMStable(tau));
}
