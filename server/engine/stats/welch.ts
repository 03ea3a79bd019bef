import { incompleteBeta } from "./special";

/** Result of a two-sample test of equal means. */
export interface WelchTest {
  meanA: number;
  meanB: number;
  /** meanA − meanB. */
  difference: number;
  /** √(s²_A/n_A + s²_B/n_B). */
  standardError: number;
  /** difference / standardError (±Infinity when the samples are constant and differ). */
  t: number;
  /** Welch–Satterthwaite degrees of freedom (n_A + n_B − 2 when both variances are 0). */
  df: number;
  /** Two-sided p-value P(|T_df| ≥ |t|). */
  pValue: number;
  nA: number;
  nB: number;
}

function moments(name: string, v: readonly number[]): { mean: number; variance: number } {
  if (v.length < 2) throw new RangeError(`${name} needs at least 2 values, got ${v.length}`);
  let sum = 0;
  v.forEach((x, i) => {
    if (!Number.isFinite(x)) throw new RangeError(`${name}[${i}] must be finite, got ${x}`);
    sum += x;
  });
  const mean = sum / v.length;
  let ss = 0;
  for (const x of v) ss += (x - mean) ** 2;
  return { mean, variance: ss / (v.length - 1) };
}

/**
 * Two-sided p-value of Student's t with ν degrees of freedom: P(|T| ≥ |t|) = I_{ν/(ν+t²)}(ν/2, ½)
 * (Abramowitz & Stegun 26.7.1), evaluated directly so that small p-values keep their digits.
 * @throws RangeError when ν ≤ 0 or t is NaN
 */
export function tTwoSidedP(t: number, nu: number): number {
  if (!(nu > 0)) throw new RangeError(`degrees of freedom must be positive, got ${nu}`);
  if (Number.isNaN(t)) throw new RangeError("t must not be NaN");
  if (!Number.isFinite(t)) return 0;
  return incompleteBeta(nu / (nu + t * t), nu / 2, 0.5);
}

/**
 * Welch's unequal-variances t test of equal means (B. L. Welch, "The generalization of
 * 'Student's' problem when several different population variances are involved", Biometrika
 * 34 (1947) 28): t = (x̄_A − x̄_B)/√(s²_A/n_A + s²_B/n_B) with the Welch–Satterthwaite degrees of
 * freedom ν = (s²_A/n_A + s²_B/n_B)² / ((s²_A/n_A)²/(n_A − 1) + (s²_B/n_B)²/(n_B − 1)); the same
 * numbers as scipy.stats.ttest_ind(a, b, equal_var=False). When both samples are constant the
 * statistic is 0/0; by convention here p = 1 when the two constants are equal (t = 0) and p = 0
 * when they differ (t = ±Infinity), with ν = n_A + n_B − 2 (scipy answers nan there).
 * @param a first sample (≥ 2 finite values)
 * @param b second sample (≥ 2 finite values)
 * @returns means, difference, standard error, t, ν, two-sided p
 * @throws RangeError when a sample has fewer than 2 values or a non-finite value
 */
export function welchTTest(a: readonly number[], b: readonly number[]): WelchTest {
  const A = moments("a", a);
  const B = moments("b", b);
  const va = A.variance / a.length;
  const vb = B.variance / b.length;
  const difference = A.mean - B.mean;
  const base = { meanA: A.mean, meanB: B.mean, difference, nA: a.length, nB: b.length };
  if (va + vb === 0) {
    const equal = difference === 0;
    return { ...base, standardError: 0, t: equal ? 0 : Math.sign(difference) * Infinity, df: a.length + b.length - 2, pValue: equal ? 1 : 0 };
  }
  const standardError = Math.sqrt(va + vb);
  const t = difference / standardError;
  const df = (va + vb) ** 2 / (va ** 2 / (a.length - 1) + vb ** 2 / (b.length - 1));
  return { ...base, standardError, t, df, pValue: tTwoSidedP(t, df) };
}
