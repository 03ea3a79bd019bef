import { describe, expect, it } from "vitest";
import { theoryColumnsSchema } from "../../../../shared/schemas/theory";
import { theoryColumns, theoryColumnsRow } from "../../../../server/engine/kac-rice/columns";
import { exactTotalKacRice } from "../../../../server/engine/kac-rice/exact-total";
import { mStable, sigmaStable, sigmaTotal } from "../../../../shared/theory";

describe("theoryColumnsRow", () => {
  it("field network: asymptotic columns, finite-N Monte Carlo and the exact total, valid contract", () => {
    const N = 6;
    const sigma = 0.8;
    const muC = sigma * Math.sqrt(N);
    const mus = [0.3, 0.7, 1.4].map((m) => m * muC);
    const row = theoryColumnsRow({ ensemble: "field", params: { N, sigma }, mus, tau: 0.5, kacRice: { samples: 400, seed: 9 } });
    expect(row).toHaveLength(3);
    row.forEach((c, i) => {
      theoryColumnsSchema.parse(c);
      const m = mus[i] / muC;
      expect(c.muCritical).toBeCloseTo(muC, 14);
      expect(c.m).toBeCloseTo(m, 14);
      expect(c.asymptotic?.sigmaTotal).toBe(sigmaTotal(m));
      expect(c.asymptotic?.sigmaStable).toBe(sigmaStable(m, 0.5));
      expect(c.asymptotic?.mStable).toBe(mStable(0.5));
      expect(c.finiteN?.exactTotal).toBeCloseTo(exactTotalKacRice({ N, mu: mus[i], tau: 0.5, sigma }), 12);
      const total = c.finiteN?.total;
      expect(Math.abs((total?.mean as number) - (c.finiteN?.exactTotal as number))).toBeLessThan(4 * (total?.se as number));
      expect(c.rateLines).toBeNull();
    });
    expect(row.map((c) => c.asymptotic?.regime)).toEqual(["stable-abundant", "stable-rare", "one-stable"]);
  });

  it("field network at τ = 0 reports Σ_st as null (−∞) and no finite-N part without Monte Carlo settings", () => {
    const c = theoryColumns({ ensemble: "field", params: { N: 50, sigma: 1 }, mu: 2, tau: 0 });
    theoryColumnsSchema.parse(c);
    expect(c.asymptotic?.sigmaStable).toBeNull();
    expect(c.finiteN).toBeNull();
  });

  it("rate network: μ_c = g, m = μ/g, the origin line g(1+τ) and the labelled chaos line", () => {
    const row = theoryColumnsRow({ ensemble: "rate", params: { N: 100, g: 1.5 }, mus: [1, 3], tau: 0.4 });
    row.forEach((c) => theoryColumnsSchema.parse(c));
    expect(row[0].m).toBeCloseTo(1 / 1.5, 14);
    expect(row[0].rateLines?.originStabilityMu).toBeCloseTo(2.1, 14);
    expect(row.map((c) => c.rateLines?.originStable)).toEqual([false, true]);
    expect(row[1].rateLines?.gain).toBeCloseTo(0.5, 14);
    expect(row[0].rateLines?.chaosOnsetLabel).toContain("not yet confirmed");
    expect(row[0].asymptotic).toBeNull();
    expect(row[0].finiteN).toBeNull();
  });

  it("other ensembles get all-null columns; bad input throws naming the parameter", () => {
    expect(theoryColumns({ ensemble: "oscillator", params: { N: 3 }, mu: 1, tau: 0.2 })).toEqual({
      muCritical: null, m: null, asymptotic: null, finiteN: null, rateLines: null,
    });
    expect(() => theoryColumns({ ensemble: "field", params: { N: 4 }, mu: 1, tau: 0.2 })).toThrow(/sigma/);
    expect(() => theoryColumns({ ensemble: "rate", params: { N: 4, g: 1 }, mu: -1, tau: 0.2 })).toThrow(/mu/);
    expect(() => theoryColumns({ ensemble: "rate", params: { N: 4, g: 1 }, mu: 1, tau: 3 })).toThrow(/tau/);
  });
});
