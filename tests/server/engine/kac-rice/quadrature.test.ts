import { describe, expect, it } from "vitest";
import { gaussLegendre } from "../../../../server/engine/kac-rice/gauss-legendre";
import { logIntegrate } from "../../../../server/engine/kac-rice/log-integrate";
import { LogSum, logSumExp } from "../../../../server/engine/kac-rice/log-space";
import { integrateShift } from "../../../../server/engine/kac-rice/shift-integral";
import { logAbsCharPoly, prepareSpectrum } from "../../../../server/engine/kac-rice/spectrum";
import { erf, normalCdf, normalPdf } from "./special";

describe("Gauss–Legendre and log-space sums", () => {
  it("integrates x^{2k} on [−1, 1] exactly up to degree 2q − 1 (= 2/(2k+1), calculus)", () => {
    const rule = gaussLegendre(7);
    for (let k = 0; k <= 6; k++) {
      let sum = 0;
      for (let i = 0; i < 7; i++) sum += rule.weights[i] * rule.nodes[i] ** (2 * k);
      expect(sum).toBeCloseTo(2 / (2 * k + 1), 13);
    }
    expect(() => gaussLegendre(0)).toThrow(RangeError);
  });

  it("log-sum-exp does not overflow and ignores −∞", () => {
    expect(logSumExp([1000, 1000])).toBeCloseTo(1000 + Math.LN2, 12);
    expect(logSumExp([-Infinity, Math.log(3)])).toBeCloseTo(Math.log(3), 14);
    const acc = new LogSum();
    expect(acc.value()).toBe(-Infinity);
    expect(() => acc.add(Number.NaN)).toThrow(RangeError);
  });

  it("logIntegrate: ∫ e^{−w²/2} = √(2π) and ∫ |w| e^{−w²/2} = 2 with a kink (closed forms)", () => {
    expect(logIntegrate((w) => -0.5 * w * w, -12, 12)).toBeCloseTo(0.5 * Math.log(2 * Math.PI), 12);
    const kinked = (w: number) => Math.log(Math.abs(w - 0.3)) - 0.5 * (w - 0.3) ** 2;
    expect(logIntegrate(kinked, -12, 12, [0.3])).toBeCloseTo(Math.LN2, 12);
    expect(() => logIntegrate((w) => w, 1, 0)).toThrow(/limits/);
  });
});

describe("spectra and the shift integral", () => {
  it("ln|det(y − J')| from the spectrum equals the direct product", () => {
    const re = Float64Array.from([0.5, 1.5, 1.5, -2]);
    const im = Float64Array.from([0, 0.7, -0.7, 0]);
    const spec = prepareSpectrum(re, im);
    const y = 0.9;
    const direct = Math.abs((y - 0.5) * ((y - 1.5) ** 2 + 0.49) * (y + 2));
    expect(logAbsCharPoly(spec, y)).toBeCloseTo(Math.log(direct), 14);
    expect(logAbsCharPoly(spec, 0.5)).toBe(-Infinity);
    expect(spec.maxRe).toBe(1.5);
    expect(() => prepareSpectrum(re, Float64Array.from([0, 0.7, 0.7, 0]))).toThrow(/conjugate/);
  });

  it("in 1-D with J' = 0 the quadrature alone gives E N and E N_st exactly (science.md §3)", () => {
    const spec = prepareSpectrum(new Float64Array(1), new Float64Array(1));
    for (const m of [0.5, 1, 2]) {
      const r = integrateShift(spec, m, 1);
      // E N = erf(m/√2) + √(2/π) e^{−m²/2}/m, E N_st = Φ(m) + φ(m)/m (Kac–Rice; Rice's formula)
      const total = erf(m / Math.SQRT2) + Math.sqrt(2 / Math.PI) * Math.exp((-m * m) / 2) / m;
      expect(Math.exp(r.logTotal)).toBeCloseTo(total, 10);
      expect(Math.exp(r.logStable)).toBeCloseTo(normalCdf(m) + normalPdf(m) / m, 10);
    }
    // science.md §3 check values, m = 0.5 → 1.791186, 1.395593; m = 1 → 1.166631, 1.083315
    expect(Math.exp(integrateShift(spec, 0.5, 1).logTotal)).toBeCloseTo(1.791186, 6);
    expect(Math.exp(integrateShift(spec, 1, 1).logStable)).toBeCloseTo(1.083315, 6);
  });

  it("captures a dominant shift far from the bulk of N(0, 1): 40 real eigenvalues at −8", () => {
    // E|μ − ξ + 8|^40 under ξ ~ N(0, 1) is dominated near ξ ≈ −√40, in closed form:
    // E(a + Z)^40 = Σ_k C(40, 2k) a^{40−2k} (2k−1)!! (Gaussian moments, common practice); a = μ + 8.
    const n = 40;
    const spec = prepareSpectrum(new Float64Array(n).fill(-8), new Float64Array(n));
    const mu = 2;
    const a = mu + 8;
    let exact = 0;
    let binom = 1;
    let dfact = 1;
    for (let k = 0; 2 * k <= n; k++) {
      if (k > 0) {
        binom *= ((n - 2 * k + 2) * (n - 2 * k + 1)) / ((2 * k - 1) * (2 * k));
        dfact *= 2 * k - 1;
      }
      exact += binom * a ** (n - 2 * k) * dfact;
    }
    // |a − ξ|^40 = (a − ξ)^40 exactly (even power), so the log-space quadrature must match
    const r = integrateShift(spec, mu, 1);
    expect(r.logTotal).toBeCloseTo(Math.log(exact) - n * Math.log(mu), 9);
  });
});
