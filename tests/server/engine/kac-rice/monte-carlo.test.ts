import { describe, expect, it } from "vitest";
import { exactTotalKacRice } from "../../../../server/engine/kac-rice/exact-total";
import { kacRicePoint, kacRiceRow } from "../../../../server/engine/kac-rice/monte-carlo";
import { logTotalCountLargeN, sigmaStable, sigmaTotal } from "../../../../shared/theory";
import { erf, normalCdf, normalPdf } from "./special";

const within = (value: number, target: number, se: number, k = 4) => expect(Math.abs(value - target)).toBeLessThan(k * se);
const ms = [0.5, 1, 1.5];

describe("finite-N Kac–Rice Monte Carlo, N = 2 against science.md §1", () => {
  const table: [number, number[], number][] = [
    [0, [2.40072, 1.07814, 1.00285], 20000], // τ = 0: no shift to integrate (Tr J = 0), plain MC
    [0.5, [3.63752, 1.42955, 1.09346], 4000],
    [1, [5.2495, 1.82738, 1.24242], 4000],
  ];
  for (const [tau, values, samples] of table) {
    it(`τ = ${tau}: E N_tot within 4 SE of the table`, () => {
      const row = kacRiceRow({ N: 2, sigma: 1, tau, mus: ms.map((m) => m * Math.SQRT2), samples, seed: 3 });
      row.forEach((r, i) => within(r.total.mean as number, values[i], r.total.se as number));
    });
  }

  it("τ = 0.3, m = 0.5 → 3.130 and τ = 0.6, m = 1 → 1.501 (science.md §1) within 4 SE", () => {
    const a = kacRicePoint({ N: 2, sigma: 1, tau: 0.3, mu: 0.5 * Math.SQRT2, samples: 4000, seed: 4 });
    within(a.total.mean as number, 3.13, a.total.se as number);
    const b = kacRicePoint({ N: 2, sigma: 2, tau: 0.6, mu: 2 * Math.SQRT2, samples: 4000, seed: 4 });
    within(b.total.mean as number, 1.501, b.total.se as number);
  });
});

describe("agreement with the exact density formula at N = 2..6", () => {
  it("τ = 0.5 and τ = 0.15 (trace-shift below 1/(N+1) for N ≤ 5), three m each, within 4 SE", () => {
    for (const N of [2, 3, 4, 5, 6]) {
      for (const tau of [0.5, 0.15]) {
        const row = kacRiceRow({ N, sigma: 1, tau, mus: ms.map((m) => m * Math.sqrt(N)), samples: 1500, seed: 10 + N });
        row.forEach((r) => within(r.total.mean as number, exactTotalKacRice({ N, mu: r.mu, tau }), r.total.se as number));
      }
    }
  });
});

describe("one dimension (science.md §3)", () => {
  it("N = 1, τ = 1: E N = erf(m/√2) + √(2/π)e^{−m²/2}/m, E N_st = Φ(m) + φ(m)/m with m = μ/(σ√3)", () => {
    // for N = 1 only the potential acts: Var J = 3τσ² with the Gaussian covariance (science.md §1)
    const s = Math.sqrt(3);
    const row = kacRiceRow({ N: 1, sigma: 1, tau: 1, mus: [0.5 * s, 1 * s], samples: 3000, seed: 5 });
    const expected = [[1.791186, 1.395593], [1.166631, 1.083315]]; // science.md §3 check values
    row.forEach((r, i) => {
      within(r.total.mean as number, expected[i][0], r.total.se as number);
      within(r.stable.mean as number, expected[i][1], r.stable.se as number);
    });
  });

  it("N = 1, τ = 0.3 (trace-shift: J' = 0) is exact quadrature, zero standard error", () => {
    const m = 0.8;
    const r = kacRicePoint({ N: 1, sigma: 1, tau: 0.3, mu: m * Math.sqrt(0.9), samples: 2, seed: 1 });
    expect(r.total.mean).toBeCloseTo(erf(m / Math.SQRT2) + Math.sqrt(2 / Math.PI) * Math.exp((-m * m) / 2) / m, 10);
    expect(r.stable.mean).toBeCloseTo(normalCdf(m) + normalPdf(m) / m, 10);
    expect(r.total.se).toBeLessThan(1e-12);
  });
});
