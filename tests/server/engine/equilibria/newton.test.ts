import { describe, expect, it } from "vitest";
import { createLu, factorLu, solveLu } from "../../../../server/engine/linalg/lu";
import { refineEquilibrium } from "../../../../server/engine/equilibria/newton";
import { createRng } from "../../../../server/engine/random/rng";
import type { Network } from "../../../../server/engine/ensembles/ensemble";

/** F(x) = (x0² + x1² − 4, x0 − x1): roots ±(√2, √2) (closed form), regular Jacobian there. */
const circleLine: Network = {
  n: 2,
  mu: 1,
  rhsFlops: 6,
  stateScale: 1,
  rhs(x, out) {
    out[0] = x[0] * x[0] + x[1] * x[1] - 4;
    out[1] = x[0] - x[1];
  },
  jacobian(x, out) {
    out.set([2 * x[0], 2 * x[1], 1, -1]);
  },
};

describe("LU with partial pivoting (Golub & Van Loan Alg. 3.4.1)", () => {
  it("satisfies P·A = L·U on a random matrix and solves A·x = b", () => {
    const n = 7;
    const rng = createRng(9);
    const a = new Float64Array(n * n);
    rng.fillNormal(a);
    const f = factorLu(a, createLu(n));
    expect(f.singular).toBe(false);
    for (let i = 0; i < n; i++) {
      for (let j = 0; j < n; j++) {
        let s = 0;
        for (let k = 0; k <= Math.min(i, j); k++) s += (k === i ? 1 : f.lu[i * n + k]) * (k <= j ? f.lu[k * n + j] : 0);
        expect(s).toBeCloseTo(a[f.perm[i] * n + j], 12);
      }
    }
    const b = new Float64Array(n);
    rng.fillNormal(b);
    const x = solveLu(f, b, new Float64Array(n));
    for (let i = 0; i < n; i++) {
      let s = 0;
      for (let j = 0; j < n; j++) s += a[i * n + j] * x[j];
      expect(s).toBeCloseTo(b[i], 12);
    }
  });

  it("flags a singular matrix and refuses to solve with it", () => {
    const f = factorLu(Float64Array.from([1, 2, 2, 4]), createLu(2));
    expect(f.singular).toBe(true);
    expect(() => solveLu(f, new Float64Array(2), new Float64Array(2))).toThrow(RangeError);
  });
});

describe("refineEquilibrium", () => {
  it("converges quadratically to (√2, √2)", () => {
    const r = refineEquilibrium(circleLine, Float64Array.from([1.2, 1.7]));
    expect(r.converged).toBe(true);
    expect(r.residual).toBeLessThan(1e-13);
    expect(r.x[0]).toBeCloseTo(Math.SQRT2, 14);
    expect(r.x[1]).toBeCloseTo(Math.SQRT2, 14);
    // quadratic convergence: r_{k+1} ≤ C r_k² once close (C ~ ‖J⁻¹‖·‖F''‖/2 ≈ 1 here)
    const res = r.residuals;
    for (let k = 1; k + 1 < res.length; k++) {
      if (res[k] < 1e-2 && res[k + 1] > 1e-15) expect(res[k + 1]).toBeLessThan(2 * res[k] * res[k]);
    }
  });

  it("uses damped steps from far away and still verifies the root", () => {
    const r = refineEquilibrium(circleLine, Float64Array.from([40, -3]));
    expect(r.converged).toBe(true);
    expect(Math.abs(Math.abs(r.x[0]) - Math.SQRT2)).toBeLessThan(1e-12);
  });

  it("reports failure (not NaN) where no root exists", () => {
    const none: Network = { ...circleLine, rhs: (x, out) => { out[0] = x[0] * x[0] + 1; out[1] = x[1]; }, jacobian: (x, out) => out.set([2 * x[0], 0, 0, 1]) };
    const r = refineEquilibrium(none, Float64Array.from([0.5, 0.5]));
    expect(r.converged).toBe(false);
    expect(Number.isFinite(r.residual)).toBe(true);
    expect(() => refineEquilibrium(none, Float64Array.of(1))).toThrow(RangeError);
  });
});
