import { describe, expect, it } from "vitest";
import ref from "../../reference/theory-closed-forms.json";
import {
  ellipseAxes,
  ellipsePoints,
  expectedRealEigenvaluesGinibre,
  expectedRealEigenvaluesLargeN,
  fieldMuCritical,
  insideEllipse,
  originStabilityCurve,
  originStabilityMu,
  rateMuCritical,
  rateReferenceLines,
  relativeRate,
} from "../../../shared/theory";

describe("critical rates", () => {
  it("field: μ_c = σ√N (FK 2016); rate: μ_c = g (SCS 1988); m = μ/μ_c", () => {
    expect(fieldMuCritical(16, 0.5)).toBe(2);
    expect(rateMuCritical(1.5)).toBe(1.5);
    expect(relativeRate(3, 2)).toBe(1.5);
    expect(() => fieldMuCritical(2.5, 1)).toThrow(/N/);
    expect(() => relativeRate(-1, 2)).toThrow(/mu/);
  });
});

describe("elliptic law and rate lines", () => {
  it("ellipse semi-axes g(1±τ) (Sommers et al., PRL 60 (1988) 1895) and closed boundary", () => {
    expect(ellipseAxes(2, 0.25)).toEqual({ real: 2.5, imag: 1.5 });
    const { re, im } = ellipsePoints(2, 0.25, 64);
    expect(re).toHaveLength(65);
    expect(re[0]).toBe(re[64]);
    for (let k = 0; k < re.length; k++) expect((re[k] / 2.5) ** 2 + (im[k] / 1.5) ** 2).toBeCloseTo(1, 12);
    expect(insideEllipse(2.4, 0, 2, 0.25)).toBe(true);
    expect(insideEllipse(0, 1.6, 2, 0.25)).toBe(false);
    expect(() => ellipsePoints(1, 0.5, 2)).toThrow(/count/);
  });

  it("origin-stability line μ = g(1+τ) and the chaos-onset labels with their status", () => {
    expect(originStabilityMu(1.2, 0.5)).toBeCloseTo(1.8, 14);
    expect(originStabilityCurve(1, [0, 1]).map((p) => p.mu)).toEqual([1, 2]);
    const [origin, chaos0] = rateReferenceLines(1, 0);
    expect(origin.status).toBe("published");
    expect(chaos0.label).toContain("PRL 61 (1988) 259");
    const chaos = rateReferenceLines(1, 0.4)[1];
    expect(chaos.status).toBe("recalled-unconfirmed");
    expect(chaos.label).toContain("not yet confirmed from the text");
    expect(rateReferenceLines(1, 1)[1].mu).toBeNull();
  });
});

describe("expected number of real eigenvalues", () => {
  it("EKS exact values, N = 1..10 (Edelman, Kostlan & Shub 1994; science.md §3)", () => {
    const s = Math.SQRT2;
    const exact = [1, s, 1 + s / 2, (11 * s) / 8, 1 + (13 * s) / 16, (211 * s) / 128, 1 + (271 * s) / 256,
      (1919 * s) / 1024, 1 + (2597 * s) / 2048, (67843 * s) / 32768];
    exact.forEach((value, i) => expect(expectedRealEigenvaluesGinibre(i + 1)).toBeCloseTo(value, 13));
  });

  it("agrees with scipy.special.hyp2f1/gammaln at larger N (tests/reference/theory-closed-forms.json)", () => {
    for (const { n, value } of ref.ginibreRealEigenvalues) {
      expect(expectedRealEigenvaluesGinibre(n) / value).toBeCloseTo(1, 11);
    }
  });

  it("the large-N form √(2N/π·(1+τ)/(1−τ)) (Forrester & Nagao 2008) approaches EKS − 1/2 at τ = 0", () => {
    const gaps = [5, 20, 80, 320, 1280].map(
      (n) => expectedRealEigenvaluesGinibre(n) - 0.5 - expectedRealEigenvaluesLargeN(n, 0),
    );
    for (let i = 1; i < gaps.length; i++) expect(Math.abs(gaps[i])).toBeLessThan(Math.abs(gaps[i - 1]));
    // the remainder decays like N^{−1/2} (scipy 1.17.1 gives −0.0167 at N = 320, −0.0084 at 1280)
    expect(Math.abs(gaps[gaps.length - 1])).toBeLessThan(0.01);
    expect(expectedRealEigenvaluesGinibre(1280) / expectedRealEigenvaluesLargeN(1280, 0)).toBeCloseTo(1, 1);
  });

  it("grows with τ and is N at τ = 1 (GOE: all real)", () => {
    expect(expectedRealEigenvaluesLargeN(100, 0.5)).toBeCloseTo(Math.sqrt((200 / Math.PI) * 3), 12);
    expect(expectedRealEigenvaluesLargeN(100, 1)).toBe(100);
  });
});
