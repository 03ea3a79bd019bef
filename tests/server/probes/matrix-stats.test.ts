import { readFileSync } from "node:fs";
import path from "node:path";
import { describe, expect, it } from "vitest";
import { parseNpy } from "../../../server/engine/io/npy";
import { rateCouplings, rateEnsemble } from "../../../server/engine/ensembles/rate/rate.ensemble";
import { matrixStats } from "../../../server/modules/probes/analysis/matrix-stats";

// ĝ and τ̂ of sampled rate-ensemble couplings (science.md §2: off-diagonal variance g²/N,
// corr(J_ij, J_ji) = τ) land within a few standard errors of the truth, the standard errors
// match the spread over many samples, and every statistic equals numpy's on a fixed matrix.

const REF = JSON.parse(readFileSync(path.resolve(import.meta.dirname, "../../reference/probe-stats.json"), "utf8"));
const FIX = path.resolve(import.meta.dirname, "../../fixtures/probes");

function sample(N: number, g: number, tau: number, seed: number, k = 0): Float64Array {
  const params = rateEnsemble.validate({ N, g });
  return rateCouplings(params, rateEnsemble.draw(params, seed, k), tau);
}

describe("matrixStats on rate-ensemble samples", () => {
  it.each([
    [60, 1.3, 0.5],
    [80, 0.8, 0],
    [50, 2.0, 0.9],
  ])("N = %i, g = %f, τ = %f: estimates within 3.5 standard errors (seed 11)", (N, g, tau) => {
    const s = matrixStats(sample(N, g, tau, 11), N);
    expect(s.g).not.toBeNull();
    expect(s.tau).not.toBeNull();
    expect(Math.abs(s.g!.estimate - g)).toBeLessThan(3.5 * s.g!.se);
    expect(Math.abs(s.tau!.estimate - tau)).toBeLessThan(Math.max(3.5 * s.tau!.se, 1e-12));
    expect(s.g!.lower).toBeLessThan(s.g!.estimate);
    expect(s.g!.upper).toBeGreaterThan(s.g!.estimate);
    // Off-diagonal mean is 0 in the ensemble.
    expect(Math.abs(s.offDiagonal.mean)).toBeLessThan(3.5 * s.offDiagonal.meanSe);
  });

  it("standard errors match the spread of the estimates over 200 samples (N = 30, g = 1.2, τ = 0.6)", () => {
    const N = 30;
    const gs: number[] = [];
    const taus: number[] = [];
    const gse: number[] = [];
    const tse: number[] = [];
    for (let k = 0; k < 200; k++) {
      const s = matrixStats(sample(N, 1.2, 0.6, 5, k), N);
      gs.push(s.g!.estimate);
      taus.push(s.tau!.estimate);
      gse.push(s.g!.se);
      tse.push(s.tau!.se);
    }
    const sd = (v: number[]) => {
      const m = v.reduce((a, b) => a + b, 0) / v.length;
      return Math.sqrt(v.reduce((a, b) => a + (b - m) ** 2, 0) / (v.length - 1));
    };
    const mean = (v: number[]) => v.reduce((a, b) => a + b, 0) / v.length;
    // The sample sd of 200 draws has relative standard error ≈ 1/√(2·199) ≈ 5 %: allow 20 %.
    expect(mean(gse) / sd(gs)).toBeGreaterThan(0.8);
    expect(mean(gse) / sd(gs)).toBeLessThan(1.2);
    expect(mean(tse) / sd(taus)).toBeGreaterThan(0.8);
    expect(mean(tse) / sd(taus)).toBeLessThan(1.2);
    // And the mean estimate is within 4 standard errors of its mean of g and τ.
    expect(Math.abs(mean(gs) - 1.2)).toBeLessThan(4 * sd(gs) / Math.sqrt(200) + 0.01);
    expect(Math.abs(mean(taus) - 0.6)).toBeLessThan(4 * sd(taus) / Math.sqrt(200) + 0.01);
  });

  it("the diagonal sd matches the ensemble's g√((1 + τ)/N) within sampling error", () => {
    const N = 400;
    const s = matrixStats(sample(N, 1.5, 0.5, 3), N);
    // sd of N normal values has relative standard error 1/√(2(N−1)) ≈ 3.5 %: allow 4 of them.
    expect(Math.abs(s.diagonal.sd / s.ensembleDiagonalSd! - 1)).toBeLessThan(4 / Math.sqrt(2 * (N - 1)));
  });
});

describe("matrixStats against numpy 2.4.6 on tests/fixtures/probes/probe-40.npy", () => {
  const { shape, data } = parseNpy(readFileSync(path.join(FIX, "probe-40.npy")));
  const s = matrixStats(data, shape[0]);
  it.each([
    ["gEstimate", () => s.g!.estimate],
    ["tauEstimate", () => s.tau!.estimate],
    ["offDiagonalMean", () => s.offDiagonal.mean],
    ["offDiagonalSd", () => s.offDiagonal.sd],
    ["diagonalMean", () => s.diagonal.mean],
    ["diagonalSd", () => s.diagonal.sd],
    ["rowSumMean", () => s.rowSumMean],
    ["frobenius", () => s.frobenius],
  ])("%s equals numpy's value (tests/reference/probe-stats.json)", (key, get) => {
    expect(get()).toBeCloseTo(REF[key], 12);
  });
});

describe("matrixStats edge cases", () => {
  it("leaves g and τ undefined for matrices too small to estimate them", () => {
    expect(matrixStats(new Float64Array([2]), 1)).toMatchObject({ g: null, tau: null, pairs: 0 });
    expect(matrixStats(Float64Array.from([1, 2, 3, 4, 5, 6, 7, 8, 9]), 3).tau).toBeNull();
  });

  it("gives τ̂ = 1 with a vanishing standard error for a symmetric matrix", () => {
    const t = matrixStats(sample(20, 1, 1, 2), 20).tau!;
    expect(t.estimate).toBeCloseTo(1, 14);
    expect(t.se).toBeLessThan(1e-14);
    expect(t.upper - t.lower).toBeLessThan(1e-12);
  });

  it("refuses bad input", () => {
    expect(() => matrixStats(new Float64Array(5), 2)).toThrow(RangeError);
    expect(() => matrixStats(Float64Array.from([1, Number.NaN, 0, 1]), 2)).toThrow(/j\[1\] must be finite/);
  });
});
