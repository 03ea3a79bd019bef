import { describe, expect, it } from "vitest";
import ref from "../../reference/theory-closed-forms.json";
import { boundaryCurve, logMStable, mStable, regimeOf, sigmaStable, tauStable } from "../../../shared/theory";

const residual = (m: number, tau: number) => (1 - m) ** 2 - 2 * tau * (m - 1 - Math.log(m));

describe("m_st(τ)", () => {
  it("matches science.md §1: τ = 0.2 → 0.037736, 0.5 → 0.316197, 0.8 → 0.708448, 0.99 → 0.985019", () => {
    // six decimals as printed in science.md §1 (BFK 2021 boundary)
    expect(mStable(0.2)).toBeCloseTo(0.037736, 6);
    expect(mStable(0.5)).toBeCloseTo(0.316197, 6);
    expect(mStable(0.8)).toBeCloseTo(0.708448, 6);
    expect(mStable(0.99)).toBeCloseTo(0.985019, 6);
  });

  it("agrees with scipy.optimize.brentq (tests/reference/theory-closed-forms.json)", () => {
    for (const { tau, value } of ref.mStable) expect(mStable(tau) / value).toBeCloseTo(1, 12);
  });

  it("solves (1 − m)² = 2τ(m − 1 − ln m) to 1e-10 and zeroes Σ_st on generic τ", () => {
    for (const tau of [0.013, 0.071, 0.23, 0.47, 0.66, 0.91, 0.9993]) {
      const m = mStable(tau);
      expect(m).toBeGreaterThan(0);
      expect(m).toBeLessThan(1);
      expect(Math.abs(residual(m, tau))).toBeLessThan(1e-10);
      expect(Math.abs(sigmaStable(m, tau))).toBeLessThan(1e-10);
      expect(tauStable(m)).toBeCloseTo(tau, 12);
    }
  });

  it("is strictly increasing in τ", () => {
    const taus = Array.from({ length: 200 }, (_, i) => (i + 1) / 201);
    const ms = boundaryCurve(taus).map((p) => p.mStable);
    for (let i = 1; i < ms.length; i++) expect(ms[i]).toBeGreaterThan(ms[i - 1]);
  });

  it("handles the limits: τ = 0 → 0, τ = 1 → 1, small τ ≈ e^{−1−1/(2τ)} (science.md §1)", () => {
    expect(mStable(0)).toBe(0);
    expect(mStable(1)).toBe(1);
    for (const tau of [0.01, 1e-3, 1e-4]) {
      // asymptotic form; the e^{u} corrections are below e^{−50} here
      expect(logMStable(tau)).toBeCloseTo(-1 - 1 / (2 * tau), 9);
    }
    expect(mStable(1e-4)).toBe(0); // e^{−5001} underflows; the log form stays finite
    expect(Number.isFinite(logMStable(1e-12))).toBe(true);
    expect(1 - mStable(1 - 1e-9)).toBeCloseTo(1.5e-9, 11); // δ ≈ 3(1−τ)/(2τ) from the Taylor expansion
  });

  it("rejects τ outside [0, 1]", () => {
    expect(() => mStable(1.01)).toThrow(RangeError);
    expect(() => mStable(Number.NaN)).toThrow(/tau/);
  });
});

describe("regimeOf", () => {
  it("labels the three phases of BFK 2021", () => {
    expect(regimeOf(1.2, 0.5)).toBe("one-stable");
    expect(regimeOf(1, 0.5)).toBe("one-stable");
    expect(regimeOf(0.5, 0.5)).toBe("stable-rare"); // m_st(0.5) = 0.316 < 0.5
    expect(regimeOf(0.2, 0.5)).toBe("stable-abundant");
    expect(regimeOf(0.99, 1)).toBe("stable-abundant");
    expect(regimeOf(1e-6, 0)).toBe("stable-rare");
  });

  it("agrees with the sign of Σ_st on a grid", () => {
    for (const tau of [0.1, 0.4, 0.7, 0.95]) {
      for (const m of [0.02, 0.1, 0.3, 0.5, 0.7, 0.9]) {
        const abundant = sigmaStable(m, tau) > 0;
        expect(regimeOf(m, tau)).toBe(abundant ? "stable-abundant" : "stable-rare");
      }
    }
  });
});
