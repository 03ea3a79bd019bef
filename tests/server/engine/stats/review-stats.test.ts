import { describe, expect, it } from "vitest";
import ref from "../../../reference/review-stats.json";
import { bootstrapPercentile, quantileSorted } from "../../../../server/engine/stats/bootstrap";
import { fitLogistic, isSeparated, logisticCrossing } from "../../../../server/engine/stats/logistic-fit";
import { binomialCoefficient, permutationTest } from "../../../../server/engine/stats/permutation";
import { tTwoSidedP, welchTTest } from "../../../../server/engine/stats/welch";

// Every value in `ref` was computed with scipy 1.17.1 / numpy 2.4.6 by
// scripts/reference/review_stats.py (see its "source" field and each block's comment there).

describe("Welch's t test against scipy.stats.ttest_ind(equal_var=False)", () => {
  it("matches t, the Welch–Satterthwaite df and the two-sided p-value", () => {
    for (const r of ref.welch) {
      const w = welchTTest(r.a, r.b);
      expect(w.t).toBeCloseTo(r.t, 10);
      expect(w.df).toBeCloseTo(r.df, 9);
      expect(w.pValue / r.pValue).toBeCloseTo(1, 9);
    }
  });
  it("is antisymmetric in its samples", () => {
    const [r] = ref.welch;
    const ab = welchTTest(r.a, r.b);
    const ba = welchTTest(r.b, r.a);
    expect(ba.t).toBeCloseTo(-ab.t, 12);
    expect(ba.pValue).toBeCloseTo(ab.pValue, 12);
  });
  it("constant samples: p = 1 when equal, 0 when different (documented convention)", () => {
    expect(welchTTest([1, 1, 1], [1, 1])).toMatchObject({ t: 0, pValue: 1, df: 3 });
    expect(welchTTest([2, 2, 2], [1, 1])).toMatchObject({ t: Infinity, pValue: 0 });
  });
  it("t with one degree of freedom is Cauchy: P(|T| ≥ 1) = 1/2 (closed form)", () => {
    expect(tTwoSidedP(1, 1)).toBeCloseTo(0.5, 13);
  });
  it("refuses samples of one value and non-finite values", () => {
    expect(() => welchTTest([1], [1, 2])).toThrow(RangeError);
    expect(() => welchTTest([1, NaN], [1, 2])).toThrow(/a\[1\]/);
  });
});

describe("logistic fit by IRLS against numpy IRLS and scipy.optimize.minimize", () => {
  it("maximum likelihood: coefficients, covariance, log-likelihood, crossing", () => {
    for (const r of ref.logisticMl) {
      const fit = fitLogistic(r.x, r.successes, r.trials);
      expect(fit.intercept).toBeCloseTo(r.intercept, 9);
      expect(fit.slope).toBeCloseTo(r.slope, 9);
      // BFGS on the log-likelihood is an independent route to the same optimum (to its tolerance).
      expect(fit.intercept).toBeCloseTo(r.interceptMinimize, 6);
      expect(fit.slope).toBeCloseTo(r.slopeMinimize, 6);
      expect(fit.covariance[0][0]).toBeCloseTo(r.covariance[0][0], 8);
      expect(fit.covariance[0][1]).toBeCloseTo(r.covariance[0][1], 8);
      expect(fit.covariance[1][1]).toBeCloseTo(r.covariance[1][1], 8);
      expect(fit.logLikelihood).toBeCloseTo(r.logLikelihood, 9);
      expect(logisticCrossing(fit)).toBeCloseTo(r.crossing, 9);
    }
  });
  it("Firth's penalised fit, finite on separated data", () => {
    for (const r of ref.logisticFirth) {
      const fit = fitLogistic(r.x, r.successes, r.trials, { method: "firth" });
      expect(fit.intercept).toBeCloseTo(r.intercept, 5);
      expect(fit.slope).toBeCloseTo(r.slope, 4);
      expect(logisticCrossing(fit)).toBeCloseTo(r.crossing, 6);
    }
  });
  it("grouped and one-row-per-trial data give the same fit (same likelihood)", () => {
    const r = ref.logisticMl[0];
    const x: number[] = [], y: number[] = [], n: number[] = [];
    r.x.forEach((xi, i) => {
      for (let k = 0; k < r.trials[i]; k++) { x.push(xi); y.push(k < r.successes[i] ? 1 : 0); n.push(1); }
    });
    expect(fitLogistic(x, y, n).slope).toBeCloseTo(fitLogistic(r.x, r.successes, r.trials).slope, 9);
    expect(fitLogistic(x, y, n, { method: "firth" }).slope).toBeCloseTo(fitLogistic(r.x, r.successes, r.trials, { method: "firth" }).slope, 8);
  });
  it("reaches the same optimum from another start (a bootstrap refit starts from the full fit)", () => {
    const r = ref.logisticFirth[1];
    const fit = fitLogistic(r.x, r.successes, r.trials, { method: "firth", start: [3, -2] });
    expect(fit.intercept).toBeCloseTo(r.intercept, 5);
    expect(fit.slope).toBeCloseTo(r.slope, 4);
    expect(() => fitLogistic(r.x, r.successes, r.trials, { start: [NaN, 0] })).toThrow(/start/);
  });
  it("detects separation and refuses the ML fit there", () => {
    const s = ref.logisticFirth.find((c) => c.name === "separated")!;
    expect(isSeparated(s.x, s.successes, s.trials)).toBe(true);
    expect(isSeparated(ref.logisticMl[0].x, ref.logisticMl[0].successes, ref.logisticMl[0].trials)).toBe(false);
    expect(() => fitLogistic(s.x, s.successes, s.trials)).toThrow(/separated/);
  });
  it("refuses malformed data", () => {
    expect(() => fitLogistic([1, 2], [1], [1, 1])).toThrow(RangeError);
    expect(() => fitLogistic([1, 2], [2, 0], [1, 1])).toThrow(/successes\[0\]/);
    expect(() => fitLogistic([1, 1], [1, 0], [2, 2])).toThrow(/two distinct/);
    expect(() => fitLogistic([1, 2], [0, 0], [0, 0])).toThrow(/zero/);
    expect(() => logisticCrossing({ intercept: 0, slope: 1 }, 1)).toThrow(RangeError);
  });
});

describe("percentile bootstrap", () => {
  it("quantiles match numpy.percentile (linear interpolation)", () => {
    const sorted = [...ref.quantiles.values].sort((a, b) => a - b);
    ref.quantiles.q.forEach((q, k) => expect(quantileSorted(sorted, q)).toBeCloseTo(ref.quantiles.expected[k], 12));
  });
  it("band of a mean agrees with scipy.stats.bootstrap within Monte Carlo error (fixed seed)", () => {
    const r = ref.bootstrapMean;
    const B = 4000;
    const mean = (idx: Int32Array) => idx.reduce((s, k) => s + r.sample[k], 0) / idx.length;
    const band = bootstrapPercentile(r.sample.length, mean, { resamples: B, seed: 11 });
    expect(band.defined).toBe(B);
    // The 2.5 % quantile of B replicates has sd ≈ √(p(1−p)/B)/f(q) (asymptotic order-statistic
    // variance, common practice); with f the normal density of the bootstrap distribution
    // (sd = scipy's standard error) at its 2.5 % point this is ≈ 0.021 here. Allow 4 sd.
    const density = Math.exp(-0.5 * 1.96 ** 2) / (Math.sqrt(2 * Math.PI) * r.standardError);
    const sd = Math.sqrt((0.025 * 0.975) / B) / density;
    expect(Math.abs(band.lower! - r.lower)).toBeLessThan(4 * sd);
    expect(Math.abs(band.upper! - r.upper)).toBeLessThan(4 * sd);
  });
  it("is reproducible for a seed and leaves undefined replicates out", () => {
    const stat = (idx: Int32Array) => (idx[0] === 0 ? null : idx.reduce((s, k) => s + k, 0));
    const a = bootstrapPercentile(5, stat, { seed: 3, resamples: 200 });
    const b = bootstrapPercentile(5, stat, { seed: 3, resamples: 200 });
    expect(a).toEqual(b);
    // P(first index is 0) = 1/5: about 40 of 200 undefined; 4 binomial sd ≈ 23.
    expect(Math.abs(200 - a.defined - 40)).toBeLessThan(23);
    expect(() => bootstrapPercentile(3, () => NaN)).toThrow(RangeError);
    expect(() => bootstrapPercentile(0, () => 1)).toThrow(/n must/);
  });
});

describe("permutation test against scipy.stats.permutation_test (exact)", () => {
  it("matches the exact two-sided p-values", () => {
    for (const r of ref.permutation) {
      const p = permutationTest(r.a, r.b);
      expect(p.exact).toBe(true);
      expect(p.difference).toBeCloseTo(r.difference, 12);
      expect(p.pValue).toBeCloseTo(r.pValue, 12);
    }
  });
  it("random splits approach the exact p-value (within 4 binomial sd)", () => {
    const r = ref.permutation[0];
    const mc = permutationTest(r.a, r.b, { exactLimit: 1, resamples: 20000, seed: 5 });
    expect(mc.exact).toBe(false);
    const sd = 2 * Math.sqrt((r.pValue / 2) * (1 - r.pValue / 2) / 20000);
    expect(Math.abs(mc.pValue - r.pValue)).toBeLessThan(4 * sd);
  });
  it("binomial coefficients (Pascal's triangle, exact)", () => {
    expect(binomialCoefficient(11, 5)).toBe(462);
    expect(binomialCoefficient(20, 10)).toBe(184756);
    expect(() => binomialCoefficient(3, 4)).toThrow(RangeError);
  });
});
