import { describe, expect, it } from "vitest";
import ref from "../../reference/theory-closed-forms.json";
import {
  logTotalCountLargeN,
  sigmaStable,
  sigmaStableCurve,
  sigmaTotal,
  sigmaTotalCurve,
  typicalIndexShare,
} from "../../../shared/theory";

describe("Σ_tot(m)", () => {
  it("matches the closed form of Fyodorov & Khoruzhenko, PNAS 113 (2016) 6827", () => {
    // values: tests/reference/theory-closed-forms.json (closed form evaluated with numpy 2.4.6)
    for (const { m, value } of ref.sigmaTotal) expect(sigmaTotal(m)).toBeCloseTo(value, 13);
  });

  it("vanishes like (1 − m)² + (1 − m)³/3 at m → 1 (Taylor expansion of the closed form)", () => {
    // −ln(1−δ) + ((1−δ)² − 1)/2 = δ² + δ³/3 + δ⁴/4 + …, so the remainder is below δ⁴
    for (const d of [1e-2, 3e-3, 1e-3]) {
      expect(Math.abs(sigmaTotal(1 - d) - (d * d + d ** 3 / 3))).toBeLessThan(d ** 4);
    }
  });

  it("is zero for m ≥ 1 and rejects m ≤ 0", () => {
    expect(sigmaTotal(1)).toBe(0);
    expect(sigmaTotal(4)).toBe(0);
    expect(() => sigmaTotal(0)).toThrow(RangeError);
    expect(() => sigmaTotal(Number.NaN)).toThrow(/m/);
  });
});

describe("Σ_st(m, τ)", () => {
  it("matches Ben Arous, Fyodorov & Khoruzhenko, PNAS 118 (2021) e2023719118", () => {
    // values: tests/reference/theory-closed-forms.json (closed form evaluated with numpy 2.4.6)
    for (const { m, tau, value } of ref.sigmaStable) expect(sigmaStable(m, tau)).toBeCloseTo(value, 13);
  });

  it("satisfies Σ_st(m, 1) = Σ_tot(m) − (1 − m)² (BFK 2021 at τ = 1) on generic m", () => {
    for (const m of [0.013, 0.17, 0.42, 0.77, 0.93]) {
      expect(sigmaStable(m, 1)).toBeCloseTo(sigmaTotal(m) - (1 - m) ** 2, 14);
    }
  });

  it("vanishes like (1 − m)³/3 at τ = 1, m → 1 (science.md §1)", () => {
    const d = 1e-3;
    expect(sigmaStable(1 - d, 1) / (d ** 3 / 3)).toBeCloseTo(1, 2);
  });

  it("never exceeds Σ_tot and increases with τ", () => {
    for (const m of [0.1, 0.4, 0.8]) {
      let previous = -Infinity;
      for (const tau of [0.1, 0.3, 0.6, 0.9, 1]) {
        const s = sigmaStable(m, tau);
        expect(s).toBeLessThanOrEqual(sigmaTotal(m));
        expect(s).toBeGreaterThan(previous);
        previous = s;
      }
    }
  });

  it("is −∞ at τ = 0 below m = 1, 0 above, and rejects τ outside [0, 1]", () => {
    expect(sigmaStable(0.5, 0)).toBe(-Infinity);
    expect(sigmaStable(1.5, 0)).toBe(0);
    expect(() => sigmaStable(0.5, 1.2)).toThrow(/tau/);
    expect(() => sigmaStable(0.5, -0.1)).toThrow(RangeError);
  });
});

describe("curves and side formulas", () => {
  it("samples Σ_tot and Σ_st in the order given", () => {
    const ms = [0.9, 0.2, 0.5];
    expect(sigmaTotalCurve(ms).map((p) => p.m)).toEqual(ms);
    expect(sigmaStableCurve(ms, 0.4)[1].sigma).toBe(sigmaStable(0.2, 0.4));
  });

  it("typical index share α*(m): 1/2 at m → 0, 0 at m ≥ 1, decreasing (derived formula)", () => {
    expect(typicalIndexShare(1e-9)).toBeCloseTo(0.5, 8);
    expect(typicalIndexShare(1)).toBe(0);
    // m = 1/2: (1/π)(π/3 − (1/2)(√3/2)) by hand from the formula of science.md §1
    expect(typicalIndexShare(0.5)).toBeCloseTo((Math.PI / 3 - Math.sqrt(3) / 4) / Math.PI, 14);
    expect(typicalIndexShare(0.3)).toBeGreaterThan(typicalIndexShare(0.6));
  });

  it("large-N ln E N_tot has rate Σ_tot: (1/N) ln E N_tot → Σ_tot (prefactor derived, science.md §1)", () => {
    const m = 0.4;
    const tau = 0.5;
    const gaps = [10, 100, 1000].map((n) => logTotalCountLargeN(n, m, tau) / n - sigmaTotal(m));
    expect(gaps[0]).toBeGreaterThan(gaps[1]);
    expect(gaps[1]).toBeGreaterThan(gaps[2]);
    expect(gaps[2]).toBeLessThan(2e-3);
    expect(logTotalCountLargeN(50, 1.2, 0.3)).toBe(0);
  });
});
