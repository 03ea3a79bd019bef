import { describe, expect, it } from "vitest";
import { createRng } from "../../../../server/engine/random/rng";
import { rateEnsemble, rateCouplings } from "../../../../server/engine/ensembles/rate/rate.ensemble";
import { rateNetworkFromMatrix } from "../../../../server/engine/ensembles/rate/rate-network";
import { eigenvalues } from "../../../../server/engine/spectra/eigenvalues";
import { zScore } from "../random/sample-moments";
import { jacobianMismatch } from "./finite-differences";

const N = 200;
const g = 1.5;

describe("rate ensemble couplings", () => {
  const params = rateEnsemble.validate({ N, g });
  const draws = rateEnsemble.draw(params, 7, 0);

  for (const tau of [0, 0.5]) {
    it(`J has off-diagonal variance g²/N, corr τ, diagonal variance g²(1+τ)/N at τ = ${tau}`, () => {
      const j = rateCouplings(params, draws, tau);
      const off: number[] = [];
      const pair: number[] = [];
      const diag: number[] = [];
      for (let i = 0; i < N; i++) {
        diag.push(j[i * N + i] ** 2);
        for (let k = i + 1; k < N; k++) {
          off.push(j[i * N + k] ** 2);
          pair.push(j[i * N + k] * j[k * N + i]);
        }
      }
      // science.md §2: Var J_ij = g²/N, E J_ij J_ji = τ g²/N, Var J_ii = g²(1+τ)/N.
      expect(zScore(off, (g * g) / N)).toBeLessThan(4);
      expect(zScore(pair, (tau * g * g) / N)).toBeLessThan(4);
      expect(zScore(diag, (g * g * (1 + tau)) / N)).toBeLessThan(4);
    });

    it(`eigenvalues of J fill the elliptic-law ellipse g(1±τ) at N = 200, τ = ${tau}`, () => {
      const { re, im } = eigenvalues(rateCouplings(params, draws, tau), N);
      const [ax, ay] = [g * (1 + tau), g * (1 - tau)]; // Sommers et al., PRL 60 (1988) 1895
      let outside = 0;
      let inner = 0;
      for (let i = 0; i < N; i++) {
        const r = Math.hypot(re[i] / ax, im[i] / ay);
        if (r > 1.1) outside += 1; // finite-N edge margin of 10 % (common practice)
        if (r < Math.SQRT1_2) inner += 1;
      }
      expect(outside).toBe(0);
      // Uniform density: half of the eigenvalues lie within the ellipse scaled by 1/√2;
      // binomial SE √(N/4) ≈ 7.1, but eigenvalues repel, so this is conservative.
      expect(Math.abs(inner - N / 2)).toBeLessThan(4 * Math.sqrt(N / 4));
      expect(Math.max(...re)).toBeGreaterThan(0.85 * ax);
    });
  }

  it("uses common random numbers: same draws for every (μ, τ, g), reweighted only", () => {
    const again = rateEnsemble.draw({ N, g: 0.3, input: 2 }, 7, 0);
    expect(Array.from(again.G)).toEqual(Array.from(draws.G));
    expect(Array.from(again.H)).toEqual(Array.from(draws.H));
    expect(rateEnsemble.draw(params, 7, 1).G[0]).not.toBe(draws.G[0]);
    expect(rateEnsemble.draw(params, 8, 0).G[0]).not.toBe(draws.G[0]);
    // J(τ) + J(τ)ᵀ = (g/√N) c_s(τ) √2 (G + Gᵀ): the symmetric parts at two τ are proportional.
    const [a, b] = [rateCouplings(params, draws, 0.2), rateCouplings(params, draws, 0.8)];
    const ratio = Math.sqrt((1 + 0.8) / (1 + 0.2));
    expect((b[1] + b[N]) / (a[1] + a[N])).toBeCloseTo(ratio, 12);
    expect(rateEnsemble.build(params, draws, 1.3, 0.8).mu).toBe(1.3);
  });
});

describe("rate network", () => {
  const n = 7;
  const params = { N: n, g: 1.2, input: 0.3 };
  const draws = rateEnsemble.draw(params, 3, 2);
  const x = new Float64Array(n);
  createRng(44).fillNormal(x);

  it("rhs is −μx + J tanh(x) + I", () => {
    const net = rateEnsemble.build(params, draws, 0.7, 0.4);
    const j = rateEnsemble.couplings!(params, draws, 0.7, 0.4)!;
    const out = new Float64Array(n);
    net.rhs(x, out);
    for (let i = 0; i < n; i++) {
      let s = 0;
      for (let k = 0; k < n; k++) s += j[i * n + k] * Math.tanh(x[k]);
      expect(out[i]).toBeCloseTo(-0.7 * x[i] + s + 0.3, 13);
    }
    expect(net.rhsFlops).toBe(2 * n * n + 4 * n);
  });

  it("jacobian agrees with central finite differences", () => {
    for (const tau of [0, 0.6, 1]) {
      expect(jacobianMismatch(rateEnsemble.build(params, draws, 0.7, tau), x)).toBeLessThan(1e-8);
    }
  });

  it("rateNetworkFromMatrix takes a vector input and documents its state scale", () => {
    const j = Float64Array.of(0, 2, -1, 0);
    const net = rateNetworkFromMatrix(j, 2, Float64Array.of(1, -1));
    const out = new Float64Array(2);
    net.rhs(Float64Array.of(0, 0), out);
    expect(Array.from(out)).toEqual([1, -1]);
    // (‖J‖_F/√N + ‖I‖/√N)/μ = (√(5/2) + 1)/2
    expect(net.stateScale).toBeCloseTo((Math.sqrt(2.5) + 1) / 2, 14);
    expect(jacobianMismatch(net, Float64Array.of(0.3, -0.8))).toBeLessThan(1e-8);
  });

  it("reports μ_c = g", () => {
    expect(rateEnsemble.muCritical(params)).toBe(1.2);
  });

  it("rejects bad input naming the parameter and value", () => {
    expect(() => rateEnsemble.validate({ N: 0, g: 1 })).toThrow(/N must be a positive integer, got 0/);
    expect(() => rateEnsemble.validate({ N: 2.5, g: 1 })).toThrow(RangeError);
    expect(() => rateEnsemble.validate({ N: 3, g: -1 })).toThrow(/g .*-1/);
    expect(() => rateEnsemble.validate({ N: 3, g: 1, input: Number.NaN })).toThrow(/input .*NaN/);
    expect(() => rateEnsemble.validate({ N: 3, g: 1, nonlinearity: "relu" as "tanh" })).toThrow(/nonlinearity/);
    expect(() => rateEnsemble.validate({ N: "3" as unknown as number, g: 1 })).toThrow(TypeError);
    expect(() => rateEnsemble.build(params, draws, 0, 0.5)).toThrow(/mu .*0/);
    expect(() => rateEnsemble.build(params, draws, 1, 1.5)).toThrow(/tau .*1\.5/);
    expect(() => rateEnsemble.build({ N: 6, g: 1 }, draws, 1, 0.5)).toThrow(/N = 7.*N = 6/);
    expect(() => rateNetworkFromMatrix(new Float64Array(5), 1)).toThrow(/square/);
    expect(() => rateNetworkFromMatrix(Float64Array.of(1, Infinity, 0, 1), 1)).toThrow(/J\[1\]/);
    expect(() => rateNetworkFromMatrix(new Float64Array(4), 1, new Float64Array(3))).toThrow(/input .*length 2/);
    expect(() => rateNetworkFromMatrix(new Float64Array(4), -1)).toThrow(/mu/);
  });
});
