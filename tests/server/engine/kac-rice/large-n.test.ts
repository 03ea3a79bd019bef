import { describe, expect, it } from "vitest";
import { kacRicePoint, kacRiceRow } from "../../../../server/engine/kac-rice/monte-carlo";
import { logTotalCountLargeN, sigmaStable, sigmaTotal } from "../../../../shared/theory";

const sizes = [20, 60, 120];
/** Matrices per N: more at small N, where they are cheap and the per-unit error is largest. */
const samples = [200, 60, 40];

describe("(1/N) ln E N_tot approaches Σ_tot (FK 2016) as N grows", () => {
  const tau = 0.5;
  const rows = sizes.map((N, i) =>
    kacRiceRow({ N, sigma: 1, tau, mus: [0.3, 0.6].map((m) => m * Math.sqrt(N)), samples: samples[i], seed: 21 }),
  );

  for (const [j, m] of [0.3, 0.6].entries()) {
    it(`m = ${m}: the excess over Σ_tot shrinks monotonically at N = 20, 60, 120`, () => {
      const excess = rows.map((row, i) => (row[j].total.logMean as number) / sizes[i] - sigmaTotal(m));
      expect(excess[0]).toBeGreaterThan(excess[1]);
      expect(excess[1]).toBeGreaterThan(excess[2]);
      expect(excess[2]).toBeGreaterThan(0);
      expect(excess[2]).toBeLessThan(0.03);
    });

    it(`m = ${m}: ln E N_tot within 4 SE of the large-N form with its (derived) prefactor`, () => {
      rows.forEach((row, i) => {
        const est = row[j].total;
        // logSe = se/mean is the standard error of ln(mean) by the delta method
        expect(Math.abs((est.logMean as number) - logTotalCountLargeN(sizes[i], m, tau))).toBeLessThan(
          4 * (est.logSe as number) + 0.05,
        );
      });
    });
  }
});

describe("stable equilibria at τ = 0.6, m = 0.3 (science.md §1: 0.38, 0.28, 0.21 → 0.096)", () => {
  it("(1/N) ln E N_st decreases towards the BFK 2021 limit and stays near science.md's own figures", () => {
    // science.md's figures are Kac–Rice Monte Carlo of our own (no error bars given); the stable
    // estimator is heavy-tailed at N ≥ 60, so the comparison is loose (±0.05 per unit).
    const reference = [0.38, 0.28, 0.21];
    const results = sizes.map((N, i) =>
      kacRicePoint({ N, sigma: 1, tau: 0.6, mu: 0.3 * Math.sqrt(N), samples: samples[i], seed: 22 }),
    );
    const perUnit = results.map((r, i) => (r.stable.logMean as number) / sizes[i]);
    perUnit.forEach((v, i) => {
      const se = (results[i].stable.logSe as number) / sizes[i];
      expect(Math.abs(v - reference[i])).toBeLessThan(Math.max(0.05, 4 * se));
    });
    expect(perUnit[0]).toBeGreaterThan(perUnit[1]);
    expect(perUnit[1]).toBeGreaterThan(perUnit[2]);
    expect(perUnit[2]).toBeGreaterThan(sigmaStable(0.3, 0.6));
  });
});

describe("stable bound, determinism and errors", () => {
  it("τ = 0 with no stable sample reports 0 with a finite positive 95 % upper bound", () => {
    const r = kacRicePoint({ N: 12, sigma: 1, tau: 0, mu: 0.3 * Math.sqrt(12), samples: 40, seed: 2 });
    expect(r.stable.mean).toBe(0);
    expect(r.stable.logMean).toBeNull();
    expect(r.stable.upper95).toBeGreaterThan(0);
    expect(Number.isFinite(r.stable.logUpper95)).toBe(true);
    expect(r.total.logMean).toBeGreaterThan(0);
  });

  it("an exponentially small stable estimate stays positive in log space, with its bound above it", () => {
    // Σ_st(0.5, 0.05) = −2.31 (BFK 2021), so E N_st is of order e^{−40·2.3}
    const r = kacRicePoint({ N: 40, sigma: 1, tau: 0.05, mu: 0.5 * Math.sqrt(40), samples: 8, seed: 2 });
    expect(r.stable.logMean as number).toBeLessThan(-20);
    expect(r.stable.mean as number).toBeGreaterThan(0);
    expect(r.stable.logUpper95).toBeGreaterThan(r.stable.logMean as number);
  });

  it("is deterministic for a seed and shares matrices across μ (row = points)", () => {
    const opts = { N: 8, sigma: 1.5, tau: 0.4, samples: 6, seed: 77 };
    const row = kacRiceRow({ ...opts, mus: [1, 3] });
    expect(kacRicePoint({ ...opts, mu: 3 })).toEqual(row[1]);
    expect(kacRicePoint({ ...opts, seed: 78, mu: 3 }).total.mean).not.toBe(row[1].total.mean);
  });

  it("rejects bad options, naming them", () => {
    const base = { N: 4, sigma: 1, tau: 0.5, mus: [1], samples: 4, seed: 1 };
    expect(() => kacRiceRow({ ...base, samples: 1 })).toThrow(/samples/);
    expect(() => kacRiceRow({ ...base, mus: [0] })).toThrow(/mu/);
    expect(() => kacRiceRow({ ...base, tau: -0.1 })).toThrow(/tau/);
    expect(() => kacRiceRow({ ...base, sigma: Number.NaN })).toThrow(/sigma/);
    expect(() => kacRiceRow({ ...base, N: 2.5 })).toThrow(/N/);
  });
});
