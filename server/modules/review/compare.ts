import type { CompareCell, MapComparison } from "../../../shared/schemas/review";
import { wilsonInterval } from "../../engine/stats/intervals";
import { binomialCoefficient, permutationTest } from "../../engine/stats/permutation";
import { welchTTest } from "../../engine/stats/welch";
import type { PositionCounts } from "./review.repo";

/** Level of the per-cell tests: a cell "agrees" when p ≥ AGREE_LEVEL. */
export const AGREE_LEVEL = 0.05;

/** Exact permutation p-values are added where the number of splits is at most this. */
export const PERMUTATION_EXACT_LIMIT = 5000;

function side(counts: number[] | null): CompareCell["a"] {
  if (!counts || counts.length === 0) return { stableFound: null, oneStable: null, networks: 0 };
  const mean = counts.reduce((s, c) => s + c, 0) / counts.length;
  return { stableFound: mean, oneStable: counts.filter((c) => c === 1).length / counts.length, networks: counts.length };
}

function diff(a: number | null, b: number | null): number | null {
  return a === null || b === null ? null : a - b;
}

/**
 * One cell of a comparison: both sides' stable-found mean and one-stable share, their
 * difference, Welch's t test on the per-network counts (needs ≥ 2 networks on each side) and,
 * when cheap, the exact permutation test of the same difference as a cross-check.
 */
export function compareCell(a: PositionCounts, b: PositionCounts): CompareCell {
  const A = side(a.stableCounts);
  const B = side(b.stableCounts);
  const testable = !!a.stableCounts && !!b.stableCounts && a.stableCounts.length >= 2 && b.stableCounts.length >= 2;
  const w = testable ? welchTTest(a.stableCounts!, b.stableCounts!) : null;
  let permutationP: number | null = null;
  if (testable && binomialCoefficient(A.networks + B.networks, A.networks) <= PERMUTATION_EXACT_LIMIT) {
    permutationP = permutationTest(a.stableCounts!, b.stableCounts!, { exactLimit: PERMUTATION_EXACT_LIMIT }).pValue;
  }
  return {
    i: a.i,
    j: a.j,
    mu: a.mu,
    tau: a.tau,
    a: A,
    b: B,
    difference: { stableFound: diff(A.stableFound, B.stableFound), oneStable: diff(A.oneStable, B.oneStable) },
    welch: w ? { t: Number.isFinite(w.t) ? w.t : null, df: w.df, pValue: w.pValue } : null,
    permutationP,
    agree: w ? w.pValue >= AGREE_LEVEL : null,
  };
}

/**
 * Cell-by-cell comparison of two maps on the same grid (positions matched by (i, j)), with the
 * share of tested cells that agree at the 5 % level and its Wilson 95 % interval. Under the
 * hypothesis that both maps sample the same distribution about 95 % of cells agree by design:
 * a share well below that signals a real difference.
 * @param a positions of the first map (listPositionCounts)
 * @param b positions of the second map, same grid
 * @throws RangeError when a position of `a` is missing from `b`
 */
export function compareGrids(a: PositionCounts[], b: PositionCounts[]): Pick<MapComparison, "cells" | "level"> & { summary: Omit<MapComparison["summary"], "differingSettings"> } {
  const byPos = new Map(b.map((p) => [`${p.i},${p.j}`, p]));
  const cells = a.map((p) => {
    const other = byPos.get(`${p.i},${p.j}`);
    if (!other) throw new RangeError(`position (${p.i}, ${p.j}) is missing from the second map`);
    return compareCell(p, other);
  });
  const tested = cells.filter((c) => c.agree !== null);
  const agreeing = tested.filter((c) => c.agree).length;
  const ci = tested.length > 0 ? wilsonInterval(agreeing, tested.length) : null;
  return {
    level: AGREE_LEVEL,
    cells,
    summary: {
      cells: cells.length,
      tested: tested.length,
      agreeing,
      agreeShare: ci ? ci.estimate : null,
      agreeLower: ci ? ci.lower : null,
      agreeUpper: ci ? ci.upper : null,
    },
  };
}

/** Dotted names of the settings that differ between two manifests (seed, settings.g, budget.starts…). */
export function differingSettings(a: Record<string, unknown>, b: Record<string, unknown>): string[] {
  const out: string[] = [];
  const walk = (x: unknown, y: unknown, path: string) => {
    const isObj = (v: unknown) => v !== null && typeof v === "object" && !Array.isArray(v);
    if (isObj(x) && isObj(y)) {
      const keys = [...new Set([...Object.keys(x as object), ...Object.keys(y as object)])].sort();
      for (const k of keys) walk((x as Record<string, unknown>)[k], (y as Record<string, unknown>)[k], path ? `${path}.${k}` : k);
    } else if (JSON.stringify(x) !== JSON.stringify(y)) out.push(path);
  };
  const pick = (m: Record<string, unknown>) => ({ ensemble: m.ensemble, settings: m.settings, budget: m.budget, seed: m.seed, mu: m.mu, tau: m.tau });
  walk(pick(a), pick(b), "");
  return out;
}
