import { describe, expect, it } from "vitest";
import ref from "../../../reference/stats.json";
import { normalCdf, studentTCdf, logGamma } from "../../../../server/engine/stats/special";
import { meanInterval, normalQuantile, studentTQuantile, wilsonInterval } from "../../../../server/engine/stats/intervals";
import { chao1 } from "../../../../server/engine/stats/chao1";

// Every value in ref comes from scipy 1.17.1 scipy.stats (scripts/reference/stats_reference.py).
describe("special functions against scipy.stats", () => {
  it("Student t CDF and quantiles", () => {
    for (const r of ref.tCdf) expect(studentTCdf(r.t, r.df)).toBeCloseTo(r.value, 12);
    for (const r of ref.tQuantile) expect(studentTQuantile(r.p, r.df)).toBeCloseTo(r.value, 9);
  });
  it("normal CDF and quantiles", () => {
    for (const r of ref.normalCdf) expect(normalCdf(r.z)).toBeCloseTo(r.value, 14);
    for (const r of ref.normalQuantile) expect(normalQuantile(r.p)).toBeCloseTo(r.value, 10);
  });
  it("log-gamma at exact values", () => {
    expect(logGamma(0.5)).toBeCloseTo(0.5 * Math.log(Math.PI), 13); // Γ(1/2) = √π (DLMF 5.4.6)
    expect(logGamma(10)).toBeCloseTo(Math.log(362880), 12); // Γ(10) = 9!
  });
  it("rejects bad arguments", () => {
    expect(() => studentTCdf(1, 0)).toThrow(RangeError);
    expect(() => normalQuantile(1)).toThrow(RangeError);
    expect(() => logGamma(-1)).toThrow(RangeError);
  });
});

describe("confidence intervals", () => {
  it("Student-t interval of a mean matches scipy.stats.t.interval", () => {
    const r = ref.meanInterval;
    const ci = meanInterval(r.values, r.level);
    expect(ci.estimate).toBeCloseTo(r.mean, 14);
    expect(ci.lower).toBeCloseTo(r.lower, 9);
    expect(ci.upper).toBeCloseTo(r.upper, 9);
    expect(ci.n).toBe(r.values.length);
  });
  it("a single value has an unbounded interval, constant values a point", () => {
    expect(meanInterval([3]).upper).toBe(Infinity);
    const c = meanInterval([2, 2, 2]);
    expect([c.lower, c.upper]).toEqual([2, 2]);
    expect(() => meanInterval([])).toThrow(RangeError);
    expect(() => meanInterval([1, NaN])).toThrow(RangeError);
  });
  it("Wilson interval matches scipy.stats.binomtest(...).proportion_ci(method='wilson')", () => {
    for (const r of ref.wilson) {
      const ci = wilsonInterval(r.k, r.n);
      expect(ci.lower).toBeCloseTo(r.lower, 10);
      expect(ci.upper).toBeCloseTo(r.upper, 10);
    }
    expect(() => wilsonInterval(4, 3)).toThrow(RangeError);
    expect(() => wilsonInterval(1.5, 3)).toThrow(RangeError);
  });
});

describe("Chao1 richness", () => {
  it("classic form S_obs + f1²/(2 f2) (Chao 1984)", () => {
    // counts: f1 = 3 (three singletons), f2 = 2, S_obs = 7 → 7 + 9/4 = 9.25 (hand-computed from the formula)
    const r = chao1([1, 1, 1, 2, 2, 5, 9, 0]);
    expect(r).toMatchObject({ observed: 7, f1: 3, f2: 2, form: "classic" });
    expect(r.estimate).toBeCloseTo(9.25, 14);
  });
  it("bias-corrected form S_obs + f1(f1−1)/(2(f2+1)) when f2 = 0 (Chao 1987)", () => {
    // f1 = 3, f2 = 0, S_obs = 4 → 4 + 3·2/2 = 7 (hand-computed from the formula)
    expect(chao1([1, 1, 1, 6]).estimate).toBeCloseTo(7, 14);
    expect(chao1([4, 6]).estimate).toBe(2); // no singletons: nothing unseen
    expect(() => chao1([1, -1])).toThrow(RangeError);
  });
});
