import { createRng } from "../random/rng";

/**
 * Two-sample permutation test of the difference of means (R. A. Fisher, The Design of
 * Experiments, 1935, §21; P. Good, Permutation Tests, Springer 2000, ch. 3): under the null
 * the pooled values are exchangeable, so every split into groups of the original sizes is
 * equally likely.
 */

export interface PermutationOptions {
  /** Enumerate every split when there are at most this many. Default 20 000. */
  exactLimit?: number;
  /** Random splits when enumeration is too costly. Default 9 999. */
  resamples?: number;
  /** Seed of the random splits. Default 1. */
  seed?: number;
}

export interface PermutationTest {
  /** mean(a) − mean(b). */
  difference: number;
  /** Two-sided p-value: min(1, 2·min(P(D ≤ d), P(D ≥ d))). */
  pValue: number;
  exact: boolean;
  /** Splits evaluated (every split when exact). */
  permutations: number;
}

/** C(n, k) as a float (exact for the sizes where it matters here). */
export function binomialCoefficient(n: number, k: number): number {
  if (!Number.isSafeInteger(n) || !Number.isSafeInteger(k) || k < 0 || n < k) throw new RangeError(`need integers 0 ≤ k ≤ n, got n = ${n}, k = ${k}`);
  let c = 1;
  for (let i = 1; i <= Math.min(k, n - k); i++) c = (c * (n - k + i)) / i;
  return Math.round(c);
}

/** Calls visit(sum of a-group values) for every k-subset of `pooled` (recursive enumeration). */
function forEachSubsetSum(pooled: readonly number[], k: number, visit: (sum: number) => void): void {
  const n = pooled.length;
  const walk = (start: number, left: number, sum: number): void => {
    if (left === 0) return visit(sum);
    for (let i = start; i <= n - left; i++) walk(i + 1, left - 1, sum + pooled[i]);
  };
  walk(0, k, 0);
}

function check(name: string, v: readonly number[]): void {
  if (v.length < 1) throw new RangeError(`${name} must be non-empty`);
  v.forEach((x, i) => {
    if (!Number.isFinite(x)) throw new RangeError(`${name}[${i}] must be finite, got ${x}`);
  });
}

/**
 * Two-sided permutation test of mean(a) − mean(b), exact (every split) when there are at most
 * `exactLimit` splits, else over `resamples` random splits with p = (count + 1)/(B + 1)
 * (Phipson & Smyth, Stat. Appl. Genet. Mol. Biol. 9 (2010) 39). Same definition as
 * scipy.stats.permutation_test(permutation_type="independent", alternative="two-sided"),
 * including its relative tolerance for ties.
 * @param a first sample (≥ 1 finite value)
 * @param b second sample (≥ 1 finite value)
 * @param options exactLimit (20 000), resamples (9 999), seed (1)
 * @returns difference, p-value, whether exact, splits evaluated
 * @throws RangeError on an empty sample, a non-finite value or a bad option
 */
export function permutationTest(a: readonly number[], b: readonly number[], options: PermutationOptions = {}): PermutationTest {
  check("a", a);
  check("b", b);
  const exactLimit = options.exactLimit ?? 20_000;
  const resamples = options.resamples ?? 9_999;
  if (!Number.isSafeInteger(resamples) || resamples < 1) throw new RangeError(`resamples must be a positive integer, got ${resamples}`);
  const pooled = [...a, ...b];
  const total = pooled.reduce((s, x) => s + x, 0);
  const stat = (sumA: number) => sumA / a.length - (total - sumA) / b.length;
  const observed = stat(a.reduce((s, x) => s + x, 0));
  const gamma = Math.abs(observed) * 2.220446049250313e-14; // scipy: 100 · machine epsilon, relative
  let less = 0;
  let greater = 0;
  const count = (d: number) => {
    if (d <= observed + gamma) less += 1;
    if (d >= observed - gamma) greater += 1;
  };
  const splits = binomialCoefficient(pooled.length, a.length);
  const exact = splits <= exactLimit;
  if (exact) forEachSubsetSum(pooled, a.length, (s) => count(stat(s)));
  else randomSplits(pooled, a.length, resamples, options.seed ?? 1, (s) => count(stat(s)));
  const adj = exact ? 0 : 1;
  const m = exact ? splits : resamples;
  const p = 2 * Math.min((less + adj) / (m + adj), (greater + adj) / (m + adj));
  return { difference: observed, pValue: Math.min(1, p), exact, permutations: m };
}

/** Sums of the first k entries after partial Fisher–Yates shuffles (Knuth TAOCP 2, Alg. 3.4.2P). */
function randomSplits(pooled: readonly number[], k: number, resamples: number, seed: number, visit: (sum: number) => void): void {
  const rng = createRng(seed);
  const work = [...pooled];
  for (let r = 0; r < resamples; r++) {
    let sum = 0;
    for (let i = 0; i < k; i++) {
      const j = i + rng.uniformInt(work.length - i);
      [work[i], work[j]] = [work[j], work[i]];
      sum += work[i];
    }
    visit(sum);
  }
}
