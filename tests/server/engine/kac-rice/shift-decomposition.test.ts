import { describe, expect, it } from "vitest";
import { createRng } from "../../../../server/engine/random/rng";
import { sampleShiftedJacobian, shiftDecomposition } from "../../../../server/engine/kac-rice/shift-decomposition";

/** Sample mean and SE of a product of two entries of J' over K draws. */
function moment(n: number, tau: number, pick: (j: Float64Array) => number, k = 20000) {
  const d = shiftDecomposition(n, tau);
  const j = new Float64Array(n * n);
  let s = 0;
  let s2 = 0;
  for (let i = 0; i < k; i++) {
    const v = pick(sampleShiftedJacobian(createRng(99, n, i), d, j));
    s += v;
    s2 += v * v;
  }
  const mean = s / k;
  return { mean, se: Math.sqrt((s2 / k - mean * mean) / (k - 1)), eta: d.shiftVariance };
}

describe("J = J' + ξI reproduces the field network's Jacobian covariance (science.md §1)", () => {
  // E[J_im J_nk] = (1+ε)δ_in δ_mk + (τ−ε)(δ_ik δ_mn + δ_im δ_nk), ε = (1−τ)/N, σ = 1
  for (const tau of [0.5, 0.1]) {
    it(`τ = ${tau} at N = 3 (${tau >= 0.25 ? "elliptic" : "trace-shift"} mode), within 4 SE`, () => {
      const n = 3;
      const eps = (1 - tau) / n;
      const off = moment(n, tau, (j) => j[1] * j[1]);
      expect(Math.abs(off.mean - (1 + eps))).toBeLessThan(4 * off.se);
      const pair = moment(n, tau, (j) => j[1] * j[n]);
      expect(Math.abs(pair.mean - (tau - eps))).toBeLessThan(4 * pair.se);
      const diag = moment(n, tau, (j) => j[0] * j[0]);
      expect(Math.abs(diag.mean + diag.eta - (1 + 2 * tau - eps))).toBeLessThan(4 * diag.se);
      const cross = moment(n, tau, (j) => j[0] * j[n + 1]);
      expect(Math.abs(cross.mean + cross.eta - (tau - eps))).toBeLessThan(4 * cross.se);
      const unrelated = moment(n, tau, (j) => j[1] * j[2]);
      expect(Math.abs(unrelated.mean)).toBeLessThan(4 * unrelated.se);
    });
  }

  it("Var(Tr J) = τN(N+2) exactly from the constants (science.md §1 identity)", () => {
    for (const [n, tau] of [[5, 0.7], [5, 0.1], [40, 0.02]] as const) {
      const d = shiftDecomposition(n, tau);
      const traceVarOfJPrime = d.mode === "elliptic" ? n * d.alpha * (1 + d.t) : 0;
      expect(traceVarOfJPrime + n * n * d.shiftVariance).toBeCloseTo(tau * n * (n + 2), 12);
    }
  });

  it("chooses the mode at τ = 1/(N+1) and rejects bad input", () => {
    expect(shiftDecomposition(4, 0.2).mode).toBe("elliptic");
    expect(shiftDecomposition(4, 0.19).mode).toBe("trace-shift");
    expect(shiftDecomposition(4, 0).shiftVariance).toBe(0);
    expect(() => shiftDecomposition(0, 0.5)).toThrow(/N/);
    expect(() => shiftDecomposition(3, 1.5)).toThrow(/tau/);
  });
});
