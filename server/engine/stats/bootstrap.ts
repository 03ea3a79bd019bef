import { createRng } from "../random/rng";

/**
 * Nonparametric bootstrap with percentile bands (B. Efron & R. J. Tibshirani, An Introduction
 * to the Bootstrap, Chapman & Hall 1993, ch. 6 and §13.3): resample the n units with
 * replacement, recompute the statistic, read the band off the empirical quantiles.
 */

export interface BootstrapOptions {
  /** Resamples B. Default 400. */
  resamples?: number;
  /** Two-sided level of the band. Default 0.95. */
  level?: number;
  /** Seed of the resampling stream (a fixed seed makes the band reproducible). Default 1. */
  seed?: number;
  /** Further stream indices (e.g. a row index), for independent streams under one seed. */
  stream?: readonly number[];
}

export interface BootstrapBand {
  /** (1 − level)/2 and (1 + level)/2 quantiles of the defined replicates (null when none). */
  lower: number | null;
  upper: number | null;
  level: number;
  resamples: number;
  /** Replicates on which the statistic was defined (not null). */
  defined: number;
  /** The defined replicates, ascending. */
  replicates: number[];
}

/**
 * Quantile q of ascending values by linear interpolation between order statistics, position
 * (n − 1)·q (Hyndman & Fan, Am. Stat. 50 (1996) 361, definition 7; numpy.percentile's default).
 * @param sorted values in ascending order, at least one, all finite
 * @param q probability in [0, 1]
 * @throws RangeError on an empty array, q ∉ [0, 1] or a non-finite value
 */
export function quantileSorted(sorted: readonly number[], q: number): number {
  if (sorted.length === 0) throw new RangeError("sorted must be non-empty");
  if (!(q >= 0 && q <= 1)) throw new RangeError(`q must be in [0, 1], got ${q}`);
  const h = (sorted.length - 1) * q;
  const lo = Math.floor(h);
  const hi = Math.min(lo + 1, sorted.length - 1);
  const v = sorted[lo] + (h - lo) * (sorted[hi] - sorted[lo]);
  if (!Number.isFinite(v)) throw new RangeError(`quantile ${q} is not finite (values must be finite)`);
  return v;
}

function checkOptions(o: BootstrapOptions): { resamples: number; level: number; seed: number; stream: readonly number[] } {
  const resamples = o.resamples ?? 400;
  if (!Number.isSafeInteger(resamples) || resamples < 1) throw new RangeError(`resamples must be a positive integer, got ${resamples}`);
  const level = o.level ?? 0.95;
  if (!(level > 0 && level < 1)) throw new RangeError(`level must be in (0, 1), got ${level}`);
  return { resamples, level, seed: o.seed ?? 1, stream: o.stream ?? [] };
}

/**
 * Percentile bootstrap band of a statistic of n units (Efron & Tibshirani 1993, §13.3). Each
 * replicate draws n unit indices uniformly with replacement from a seeded xoroshiro128+ stream
 * (engine/random/rng.ts) and evaluates `statistic` on them; replicates where it returns null
 * (undefined, e.g. a fit with no crossing) are counted but left out of the quantiles — the
 * caller decides what too many of them mean.
 * @param n number of units (e.g. networks), ≥ 1
 * @param statistic value of the statistic on a resample given as unit indices (may repeat)
 * @param options resamples (400), level (0.95), seed (1), stream ([])
 * @returns the band, the count of defined replicates and the sorted replicates
 * @throws RangeError on a bad n or option, or when the statistic returns a non-finite number
 */
export function bootstrapPercentile(n: number, statistic: (indices: Int32Array) => number | null, options: BootstrapOptions = {}): BootstrapBand {
  if (!Number.isSafeInteger(n) || n < 1) throw new RangeError(`n must be a positive integer, got ${n}`);
  const o = checkOptions(options);
  const rng = createRng(o.seed, ...o.stream);
  const indices = new Int32Array(n);
  const replicates: number[] = [];
  for (let b = 0; b < o.resamples; b++) {
    for (let k = 0; k < n; k++) indices[k] = rng.uniformInt(n);
    const v = statistic(indices);
    if (v === null) continue;
    if (!Number.isFinite(v)) throw new RangeError(`statistic must return a finite number or null, got ${v} on replicate ${b}`);
    replicates.push(v);
  }
  replicates.sort((a, b) => a - b);
  const alpha = (1 - o.level) / 2;
  const empty = replicates.length === 0;
  return {
    lower: empty ? null : quantileSorted(replicates, alpha),
    upper: empty ? null : quantileSorted(replicates, 1 - alpha),
    level: o.level,
    resamples: o.resamples,
    defined: replicates.length,
    replicates,
  };
}
