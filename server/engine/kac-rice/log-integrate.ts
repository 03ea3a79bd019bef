import { gaussLegendre } from "./gauss-legendre";
import { LogSum } from "./log-space";

/** Options of logIntegrate. */
export interface LogIntegrateOptions {
  /** Longest piece of the composite rule (default 0.5, in the integration variable). */
  pieceLength?: number;
  /** Gauss–Legendre nodes per piece (default 10). */
  nodes?: number;
  /**
   * Pieces whose coarse values (ends and midpoint) all lie more than `margin` nats below the
   * largest coarse value are skipped, apart from the neighbours of kept pieces (default 40).
   */
  margin?: number;
}

function pieceEnds(lo: number, hi: number, breaks: readonly number[], h: number): number[] {
  const cuts = [lo, ...breaks.filter((b) => b > lo && b < hi), hi];
  const ends: number[] = [lo];
  for (let i = 1; i < cuts.length; i++) {
    const a = cuts[i - 1];
    const len = cuts[i] - a;
    if (len <= 0) continue;
    const k = Math.max(1, Math.ceil(len / h));
    for (let j = 1; j < k; j++) ends.push(a + (len * j) / k);
    ends.push(cuts[i]);
  }
  return ends;
}

/** Largest of L at the ends and midpoint of every piece, and the overall largest. */
function coarseScan(logf: (w: number) => number, ends: number[]): { coarse: Float64Array; top: number } {
  const coarse = new Float64Array(ends.length - 1);
  let top = -Infinity;
  let left = logf(ends[0]);
  for (let p = 0; p < coarse.length; p++) {
    const right = logf(ends[p + 1]);
    const mid = logf(0.5 * (ends[p] + ends[p + 1]));
    if (Number.isNaN(left) || Number.isNaN(mid) || Number.isNaN(right)) throw new RangeError("logf returned NaN");
    coarse[p] = Math.max(left, mid, right);
    if (coarse[p] > top) top = coarse[p];
    left = right;
  }
  return { coarse, top };
}

/**
 * ln ∫_lo^hi e^{L(w)} dw for a log-integrand that is smooth between given break points (kinks
 * such as |y − λ| at real eigenvalues): composite Gauss–Legendre on pieces no longer than
 * `pieceLength`, split at every break point, with pieces that are negligible on a coarse scan
 * (ends and midpoints) skipped, summed by log-sum-exp. Algorithm: composite Gauss quadrature
 * (Davis & Rabinowitz, Methods of Numerical Integration, 2nd ed. 1984, §2.7) with a
 * dominant-region screen.
 * @param logf L(w), may return −∞ (zero integrand), never NaN
 * @param lo lower limit (finite)
 * @param hi upper limit (finite, ≥ lo)
 * @param breaks sorted break points (those outside (lo, hi) are ignored)
 * @param options piece length, nodes and screening margin (see LogIntegrateOptions)
 * @returns the log of the integral, −∞ when it is 0
 * @throws RangeError on non-finite limits, hi < lo, bad options or a NaN from logf
 */
export function logIntegrate(
  logf: (w: number) => number,
  lo: number,
  hi: number,
  breaks: readonly number[] = [],
  options: LogIntegrateOptions = {},
): number {
  const h = options.pieceLength ?? 0.5;
  const margin = options.margin ?? 40;
  if (!Number.isFinite(lo) || !Number.isFinite(hi) || hi < lo) {
    throw new RangeError(`integration limits must be finite with lo ≤ hi, got [${lo}, ${hi}]`);
  }
  if (!(h > 0) || !(margin > 0)) throw new RangeError(`pieceLength and margin must be > 0, got ${h}, ${margin}`);
  const rule = gaussLegendre(options.nodes ?? 10);
  if (hi === lo) return -Infinity;
  const ends = pieceEnds(lo, hi, breaks, h);
  const { coarse, top } = coarseScan(logf, ends);
  const pieces = coarse.length;
  if (top === -Infinity) return -Infinity;
  const acc = new LogSum();
  for (let p = 0; p < pieces; p++) {
    const near = (q: number) => q >= 0 && q < pieces && coarse[q] >= top - margin;
    if (!near(p) && !near(p - 1) && !near(p + 1)) continue;
    const half = 0.5 * (ends[p + 1] - ends[p]);
    const centre = 0.5 * (ends[p + 1] + ends[p]);
    for (let i = 0; i < rule.nodes.length; i++) {
      const v = logf(centre + half * rule.nodes[i]);
      if (Number.isNaN(v)) throw new RangeError("logf returned NaN");
      acc.add(Math.log(half * rule.weights[i]) + v);
    }
  }
  return acc.value();
}
