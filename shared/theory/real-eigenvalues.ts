import { assertPositiveInteger, assertTau } from "./checks";

/** Γ(N + 1/2)/Γ(N): exact product for N ≤ 2000, the asymptotic series beyond (error < 1e-16). */
function gammaRatioHalf(n: number): number {
  if (n <= 2000) {
    let r = Math.sqrt(Math.PI) / 2; // Γ(3/2)/Γ(1)
    for (let k = 1; k < n; k++) r *= (k + 0.5) / k;
    return r;
  }
  const x = 1 / n;
  return Math.sqrt(n) * (1 - x / 8 + (x * x) / 128 + (5 * x ** 3) / 1024 - (21 * x ** 4) / 32768);
}

/** ₂F₁(1, −1/2; N; 1/2) by its series (terms shrink at least by half from the second on). */
function hyp2f1Half(n: number): number {
  let term = 1;
  let sum = 1;
  for (let k = 0; k < 200; k++) {
    term *= ((k - 0.5) / (n + k)) * 0.5;
    sum += term;
    if (Math.abs(term) < 1e-18 * Math.abs(sum)) break;
  }
  return sum;
}

/**
 * Exact expected number of real eigenvalues of an N×N real Ginibre matrix (iid N(0, 1)
 * entries): E_N = 1/2 + √2 ₂F₁(1, −1/2; N; 1/2) Γ(N + 1/2)/(Γ(N)√π)
 * (Edelman, Kostlan & Shub, J. AMS 7 (1994) 247). E_1 = 1, E_2 = √2, and
 * E_N ≈ √(2N/π) + 1/2 for large N.
 * @param n matrix order N, a positive integer
 * @returns E_N
 * @throws RangeError when n is not a positive integer
 */
export function expectedRealEigenvaluesGinibre(n: number): number {
  assertPositiveInteger("N", n);
  return 0.5 + (Math.SQRT2 * hyp2f1Half(n) * gammaRatioHalf(n)) / Math.sqrt(Math.PI);
}

/**
 * Large-N expected number of real eigenvalues of an N×N real elliptic matrix with
 * corr(X_ij, X_ji) = τ: √(2N/π · (1+τ)/(1−τ)) (Forrester & Nagao, J. Phys. A 41 (2008) 375003).
 * Asymptotic, valid for N(1 − τ) ≫ 1 (at τ = 0 the exact value adds 1/2). At τ = 1 (GOE) all N
 * eigenvalues are real and N is returned.
 * @param n matrix order N, a positive integer
 * @param tau correlation τ ∈ [0, 1]
 * @returns the asymptotic expected count (N at τ = 1)
 * @throws RangeError when n or τ is out of range
 */
export function expectedRealEigenvaluesLargeN(n: number, tau: number): number {
  assertPositiveInteger("N", n);
  assertTau(tau);
  if (tau === 1) return n;
  return Math.sqrt(((2 * n) / Math.PI) * ((1 + tau) / (1 - tau)));
}
