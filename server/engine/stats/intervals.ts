import { invertCdf, normalCdf, studentTCdf } from "./special";

/** A point estimate with a two-sided confidence interval. */
export interface Interval {
  estimate: number;
  lower: number;
  upper: number;
  /** Sample size behind the estimate. */
  n: number;
  /** Confidence level, e.g. 0.95. */
  level: number;
}

function checkLevel(level: number): void {
  if (!(level > 0 && level < 1)) throw new RangeError(`level must be in (0, 1), got ${level}`);
}

/**
 * Quantile of Student's t distribution with ν degrees of freedom, by bisection on the CDF
 * (special.ts).
 * @throws RangeError when p ∉ (0, 1) or ν ≤ 0
 */
export function studentTQuantile(p: number, nu: number): number {
  if (!(nu > 0)) throw new RangeError(`degrees of freedom must be positive, got ${nu}`);
  return invertCdf((t) => studentTCdf(t, nu), p, -1, 1);
}

/**
 * Standard normal quantile Φ⁻¹(p), by bisection on Φ (special.ts).
 * @throws RangeError when p ∉ (0, 1)
 */
export function normalQuantile(p: number): number {
  return invertCdf(normalCdf, p, -1, 1);
}

/**
 * Mean with its Student-t confidence interval x̄ ± t_{1−α/2, n−1} s/√n (W. S. Gosset, "The
 * probable error of a mean", Biometrika 6 (1908) 1). With n = 1 the interval is unbounded
 * (±Infinity); with zero spread it collapses to the mean.
 * @param values finite sample values (n ≥ 1)
 * @param level confidence level (default 0.95)
 * @returns estimate, bounds, n, level
 * @throws RangeError on an empty sample, a non-finite value or a bad level
 */
export function meanInterval(values: readonly number[], level = 0.95): Interval {
  checkLevel(level);
  const n = values.length;
  if (n === 0) throw new RangeError("values must be non-empty");
  let sum = 0;
  values.forEach((v, i) => {
    if (!Number.isFinite(v)) throw new RangeError(`values[${i}] must be finite, got ${v}`);
    sum += v;
  });
  const mean = sum / n;
  if (n === 1) return { estimate: mean, lower: -Infinity, upper: Infinity, n, level };
  let ss = 0;
  for (const v of values) ss += (v - mean) ** 2;
  const se = Math.sqrt(ss / (n - 1) / n);
  const half = se === 0 ? 0 : studentTQuantile(0.5 + level / 2, n - 1) * se;
  return { estimate: mean, lower: mean - half, upper: mean + half, n, level };
}

/**
 * Proportion with the Wilson score interval (E. B. Wilson, "Probable inference, the law of
 * succession, and statistical inference", J. Am. Stat. Assoc. 22 (1927) 209):
 * (p̂ + z²/2n ± z √(p̂(1−p̂)/n + z²/4n²)) / (1 + z²/n), z = Φ⁻¹(1 − α/2).
 * @param successes count k, 0 ≤ k ≤ n
 * @param trials count n ≥ 1
 * @param level confidence level (default 0.95)
 * @throws RangeError on non-integer or inconsistent counts or a bad level
 */
export function wilsonInterval(successes: number, trials: number, level = 0.95): Interval {
  checkLevel(level);
  if (!Number.isSafeInteger(trials) || trials < 1) throw new RangeError(`trials must be a positive integer, got ${trials}`);
  if (!Number.isSafeInteger(successes) || successes < 0 || successes > trials) {
    throw new RangeError(`successes must be an integer in [0, ${trials}], got ${successes}`);
  }
  const z = normalQuantile(0.5 + level / 2);
  const p = successes / trials;
  const z2n = (z * z) / trials;
  const centre = (p + z2n / 2) / (1 + z2n);
  const half = (z * Math.sqrt(p * (1 - p) / trials + z2n / (4 * trials))) / (1 + z2n);
  return { estimate: p, lower: Math.max(0, centre - half), upper: Math.min(1, centre + half), n: trials, level };
}
