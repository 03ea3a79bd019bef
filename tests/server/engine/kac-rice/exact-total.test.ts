import { describe, expect, it } from "vitest";
import direct from "../../../reference/kac-rice-direct-mc.json";
import quad from "../../../reference/kac-rice-n2-quad.json";
import { exactTotalKacRice } from "../../../../server/engine/kac-rice/exact-total";
import { logTotalCountLargeN } from "../../../../shared/theory";

const exact = (N: number, m: number, tau: number) => exactTotalKacRice({ N, mu: m * Math.sqrt(N), tau });

describe("exactTotalKacRice (real-eigenvalue density, EKS trick as in FK 2016)", () => {
  it("reproduces the table of science.md §1 (σ = 1, m = μ/√N), to its 6 digits", () => {
    const table: [number, number, number[]][] = [
      [2, 0, [2.40072, 1.07814, 1.00285]],
      [2, 0.5, [3.63752, 1.42955, 1.09346]],
      [2, 1, [5.2495, 1.82738, 1.24242]],
      [3, 0.5, [5.58034, 1.49625, 1.08173]],
    ];
    for (const [N, tau, values] of table) {
      [0.5, 1, 1.5].forEach((m, i) => expect(Math.abs(exact(N, m, tau) - values[i])).toBeLessThan(6e-6));
    }
    expect(exact(2, 0.5, 0.3)).toBeCloseTo(3.13, 3); // science.md §1: N = 2, m = 0.5, τ = 0.3 → 3.130
    expect(exact(2, 1, 0.6)).toBeCloseTo(1.501, 3); // science.md §1: N = 2, m = 1, τ = 0.6 → 1.501
  });

  it("agrees with scipy nested quadrature over the entries of J at N = 2 (tests/reference/kac-rice-n2-quad.json)", () => {
    for (const row of quad.rows) expect(exact(row.N, row.m, row.tau) / row.total).toBeCloseTo(1, 8);
  });

  it("agrees with numpy direct Monte Carlo at N = 2..6 within 4 SE (tests/reference/kac-rice-direct-mc.json)", () => {
    // includes τ < 1/(N+1) (negative shift variance: the analytically continued formula)
    for (const row of direct.rows) {
      expect(Math.abs(exact(row.N, row.m, row.tau) - row.total.mean)).toBeLessThan(4 * row.total.se);
    }
  });

  it("scales with σ only through μ/σ, and tends to 1 for m ≫ 1", () => {
    const a = exactTotalKacRice({ N: 4, mu: 1.3, tau: 0.4, sigma: 0.5 });
    expect(a).toBeCloseTo(exactTotalKacRice({ N: 4, mu: 2.6, tau: 0.4 }), 12);
    expect(exact(5, 6, 0.5)).toBeCloseTo(1, 2);
  });

  it("at N = 30 lies near the large-N form with prefactor (derived, science.md §1)", () => {
    for (const m of [0.3, 0.6]) {
      const ratio = Math.log(exact(30, m, 0.5)) / logTotalCountLargeN(30, m, 0.5);
      expect(ratio).toBeGreaterThan(0.97);
      expect(ratio).toBeLessThan(1.03);
    }
  });

  it("rejects N beyond 40 and non-positive μ or σ", () => {
    expect(() => exactTotalKacRice({ N: 41, mu: 1, tau: 0.5 })).toThrow(/N/);
    expect(() => exactTotalKacRice({ N: 3, mu: 0, tau: 0.5 })).toThrow(/mu/);
    expect(() => exactTotalKacRice({ N: 3, mu: 1, tau: 0.5, sigma: -1 })).toThrow(/sigma/);
    expect(() => exactTotalKacRice({ N: 3, mu: 1, tau: 2 })).toThrow(/tau/);
  });
});
