import { describe, expect, it } from "vitest";
import { estimateBoundaryRow, stableLost } from "../../../server/modules/review/boundary";
import { compareCell, compareGrids, differingSettings } from "../../../server/modules/review/compare";
import type { PositionCounts } from "../../../server/modules/review/review.repo";
import { normalQuantile } from "../../../server/engine/stats/intervals";

// Pure parts of the review module on constructed rows whose answer is known by symmetry.

const none = { predictedMu: null, predictedMuStable: null };

/**
 * A row of 12 cells, log-symmetric around μ* = 1.2, with 40 networks: network k has one stable
 * state exactly when μ > θ_k, θ_k = μ* exp(0.2 z_k) at the normal quantiles z_k (a symmetric
 * set). Flipping ln μ around ln μ* and swapping outcomes maps the data onto itself, so the
 * Firth fit's crossing is ln μ* exactly (Firth's estimate is equivariant; common practice).
 */
function symmetricRow(K = 40, centre = 1.2): PositionCounts[] {
  const theta = Array.from({ length: K }, (_, k) => centre * Math.exp(0.2 * normalQuantile((k + 0.5) / K)));
  return Array.from({ length: 12 }, (_, i) => {
    const mu = centre * Math.exp(0.15 * (i - 5.5));
    return { i, j: 0, mu, tau: 0.5, state: "done" as const, stableCounts: theta.map((t) => (mu > t ? 1 : 3)) };
  });
}

describe("boundary of one τ row", () => {
  it("finds the crossing of a symmetric row at its centre, inside a bootstrap band", () => {
    const row = estimateBoundaryRow(0, 0.5, symmetricRow(), { predictedMu: 1.5, predictedMuStable: null });
    expect(row.status).toBe("crossed");
    expect(row.muHalf).toBeCloseTo(1.2, 8);
    expect(row.low!).toBeLessThan(1.2);
    expect(row.high!).toBeGreaterThan(1.2);
    expect(row.high! / row.low!).toBeLessThan(1.3); // 40 networks: a narrow band
    expect(row.difference).toBeCloseTo(1.2 - 1.5, 8);
    expect(row).toMatchObject({ networks: 40, cellsUsed: 12, resamples: 400 });
    expect(row.definedResamples).toBeGreaterThan(390);
    expect(row.muLost).toBeNull(); // stable states found everywhere
  });
  it("is reproducible (fixed bootstrap seed) and ignores pending cells", () => {
    const cells = symmetricRow();
    const withPending = [...cells, { i: 12, j: 0, mu: 9, tau: 0.5, state: "pending" as const, stableCounts: null }];
    expect(estimateBoundaryRow(0, 0.5, withPending, none)).toEqual(estimateBoundaryRow(0, 0.5, cells, none));
  });
  it("labels rows without a crossing", () => {
    const all = symmetricRow().map((c) => ({ ...c, stableCounts: c.stableCounts!.map(() => 1) }));
    expect(estimateBoundaryRow(0, 0.5, all, none)).toMatchObject({ status: "below-range", muHalf: null, low: null });
    const no = symmetricRow().map((c) => ({ ...c, stableCounts: c.stableCounts!.map(() => 2) }));
    expect(estimateBoundaryRow(0, 0.5, no, none).status).toBe("above-range");
    const falling = symmetricRow().map((c, i, arr) => ({ ...c, stableCounts: arr[arr.length - 1 - i].stableCounts }));
    expect(estimateBoundaryRow(0, 0.5, falling, none).status).toBe("no-trend");
    expect(estimateBoundaryRow(0, 0.5, symmetricRow().slice(0, 1), none).status).toBe("too-few");
  });
  it("muLost: the top run of cells that found stable states, and the μ below it", () => {
    const cells = [0.5, 1, 1.5, 2, 2.5].map((mu, k) => ({ mu, found: k !== 1 }));
    expect(stableLost(cells)).toEqual({ muLost: 1.5, muLostBelow: 1 });
    expect(stableLost(cells.map((c) => ({ ...c, found: true })))).toEqual({ muLost: null, muLostBelow: null });
    expect(stableLost(cells.map((c) => ({ ...c, found: c.mu < 2.5 })))).toEqual({ muLost: null, muLostBelow: null });
    expect(stableLost([])).toEqual({ muLost: null, muLostBelow: null });
  });
});

const pos = (counts: number[] | null, i = 0, j = 0): PositionCounts => ({ i, j, mu: 1, tau: 0, state: counts ? "done" : "pending", stableCounts: counts });

describe("comparison of cells", () => {
  it("reports both sides, the difference and Welch's test", () => {
    const c = compareCell(pos([1, 2, 2, 3, 1, 2, 4, 2]), pos([3, 3, 4, 2, 5, 3, 4, 4]));
    expect(c.a).toEqual({ stableFound: 17 / 8, oneStable: 2 / 8, networks: 8 });
    expect(c.difference.stableFound).toBeCloseTo(17 / 8 - 28 / 8, 12);
    // scipy 1.17.1 ttest_ind(equal_var=False) on these samples: p = 0.012457643440731173
    // (tests/reference/review-stats.json, first Welch case).
    expect(c.welch!.pValue).toBeCloseTo(0.012457643440731173, 10);
    expect(c.agree).toBe(false);
    expect(c.permutationP).toBeNull(); // C(16, 8) = 12 870 splits: above the exact limit of 5 000
    // scipy 1.17.1 permutation_test (exact) on [1,2,2,3,1] vs [3,3,4,2,5,3]: p = 0.05627705627705628
    // (tests/reference/review-stats.json).
    expect(compareCell(pos([1, 2, 2, 3, 1]), pos([3, 3, 4, 2, 5, 3])).permutationP).toBeCloseTo(0.05627705627705628, 12);
  });
  it("untestable cells (pending, one network) have no verdict; constant equal samples agree", () => {
    expect(compareCell(pos(null), pos([1, 1])).agree).toBeNull();
    expect(compareCell(pos([1]), pos([1, 1])).agree).toBeNull();
    const same = compareCell(pos([1, 1, 1]), pos([1, 1, 1]));
    expect(same).toMatchObject({ agree: true, welch: { t: 0, pValue: 1 } });
    expect(compareCell(pos([1, 1, 1]), pos([2, 2, 2])).welch).toMatchObject({ t: null, pValue: 0 });
  });
  it("summarises the share of agreeing cells with a Wilson interval", () => {
    const a = [pos([1, 1, 1], 0), pos([1, 2, 1, 2], 1), pos([1, 1], 2)];
    const b = [pos([1, 1, 1], 0), pos([5, 6, 5, 6], 1), pos(null, 2)];
    const g = compareGrids(a, b);
    expect(g.summary).toMatchObject({ cells: 3, tested: 2, agreeing: 1, agreeShare: 0.5 });
    expect(g.summary.agreeLower!).toBeLessThan(0.5);
    expect(() => compareGrids(a, b.slice(0, 2))).toThrow(/missing/);
  });
  it("names the settings that differ", () => {
    const m = { ensemble: "rate", settings: { N: 6, g: 1 }, budget: { networks: 4 }, seed: 1, mu: {}, tau: {}, title: "x" };
    expect(differingSettings(m, { ...m, title: "y", seed: 2, settings: { N: 6, g: 2 } })).toEqual(["seed", "settings.g"]);
    expect(differingSettings(m, m)).toEqual([]);
  });
});
