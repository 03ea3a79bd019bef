import { describe, expect, it } from "vitest";
import { createRng } from "../../../../server/engine/random/rng";
import { combineElliptic, sampleElliptic } from "../../../../server/engine/spectra/elliptic";
import { zScore } from "../random/sample-moments";

/** Collects X_01², X_01·X_10 and X_00² over many n×n samples. */
function moments(tau: number, n: number, count: number) {
  const rng = createRng(17, Math.round(100 * tau));
  const x = new Float64Array(n * n);
  const off: number[] = [];
  const pair: number[] = [];
  const diag: number[] = [];
  for (let c = 0; c < count; c++) {
    sampleElliptic(rng, n, tau, x);
    for (let i = 0; i < n; i++) {
      diag.push(x[i * n + i] ** 2);
      for (let j = i + 1; j < n; j++) {
        off.push(x[j * n + i] ** 2); // one of each pair: X_ij², X_ji² are correlated
        pair.push(x[i * n + j] * x[j * n + i]);
      }
    }
  }
  return { off, pair, diag };
}

describe("sampleElliptic", () => {
  // Real elliptic ensemble (science.md §1): Var X_ij = 1, E X_ij X_ji = τ, Var X_ii = 1 + τ.
  for (const tau of [0, 0.35, 0.9, 1]) {
    it(`has off-diagonal variance 1, correlation τ and diagonal variance 1+τ at τ = ${tau}`, () => {
      const { off, pair, diag } = moments(tau, 5, 3000);
      expect(zScore(off, 1)).toBeLessThan(4);
      expect(zScore(diag, 1 + tau)).toBeLessThan(4);
      if (tau < 1) expect(zScore(pair, tau)).toBeLessThan(4);
      else pair.forEach((p, i) => expect(p).toBeCloseTo(off[i], 12)); // τ = 1: symmetric
    });
  }

  it("is reproducible and writes into out", () => {
    const out = new Float64Array(9);
    const back = sampleElliptic(createRng(3), 3, 0.5, out);
    expect(back).toBe(out);
    expect(Array.from(sampleElliptic(createRng(3), 3, 0.5))).toEqual(Array.from(out));
  });

  it("rejects bad n, τ and sizes naming the value", () => {
    const rng = createRng(1);
    expect(() => sampleElliptic(rng, 0, 0.5)).toThrow(/n must be a positive integer, got 0/);
    expect(() => sampleElliptic(rng, 3, 1.2)).toThrow(/tau .*1\.2/);
    expect(() => sampleElliptic(rng, 3, Number.NaN)).toThrow(RangeError);
    expect(() => sampleElliptic(rng, 3, 0.5, new Float64Array(8))).toThrow(/out must have length 9, got 8/);
    expect(() => combineElliptic(new Float64Array(4), new Float64Array(3), 2, 0, 1, new Float64Array(4))).toThrow(
      /h must have length 4, got 3/,
    );
  });
});
