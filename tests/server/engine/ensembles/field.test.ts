import { describe, expect, it } from "vitest";
import { createRng } from "../../../../server/engine/random/rng";
import { fieldEnsemble } from "../../../../server/engine/ensembles/field/field.ensemble";
import { zScore } from "../random/sample-moments";
import { jacobianMismatch } from "./finite-differences";

/** Samples of J_00², J_01², J_01·J_10, J_00·J_11, J_01, (Tr J)² of f's Jacobian over networks. */
function jacobianSamples(n: number, tau: number, sigma: number, networks: number) {
  const params = { N: n, sigma, features: 40 * n };
  const x = new Float64Array(n);
  createRng(99, n).fillNormal(x); // one random point, the same for every network
  const j = new Float64Array(n * n);
  const s = { d2: [] as number[], o2: [] as number[], pair: [] as number[], dd: [] as number[], o: [] as number[], tr2: [] as number[] };
  for (let k = 0; k < networks; k++) {
    const net = fieldEnsemble.build(params, fieldEnsemble.draw(params, 5, k), 1, tau);
    net.jacobian(x, j);
    for (let i = 0; i < n; i++) j[i * n + i] += 1; // remove −μI, μ = 1
    let tr = 0;
    for (let i = 0; i < n; i++) tr += j[i * n + i];
    s.d2.push(j[0] ** 2);
    s.o2.push(j[1] ** 2);
    s.pair.push(j[1] * j[n]);
    s.dd.push(j[0] * j[n + 1]);
    s.o.push(j[1]);
    s.tr2.push(tr * tr);
  }
  return s;
}

describe("field ensemble: Jacobian covariance (science.md §1)", () => {
  // E[J_im J_nk] = σ²[(1+ε)δ_in δ_mk + (τ−ε)(δ_ik δ_mn + δ_im δ_nk)], ε = (1−τ)/N:
  // Var J_ii = σ²(1 + 2τ − ε), Var J_ij = σ²(1+ε), E J_ij J_ji = E J_ii J_jj = σ²(τ−ε);
  // Var Tr J = σ² τ N (N+2).
  const n = 4;
  const sigma = 1.3;
  for (const tau of [0.1, 0.6]) {
    it(`matches all terms within 4 SE at N = 4, τ = ${tau} (τ < 1/(N+1) makes τ−ε negative)`, () => {
      const s = jacobianSamples(n, tau, sigma, 2500);
      const s2 = sigma * sigma;
      const eps = (1 - tau) / n;
      expect(zScore(s.o, 0)).toBeLessThan(4);
      expect(zScore(s.d2, s2 * (1 + 2 * tau - eps))).toBeLessThan(4);
      expect(zScore(s.o2, s2 * (1 + eps))).toBeLessThan(4);
      expect(zScore(s.pair, s2 * (tau - eps))).toBeLessThan(4);
      expect(zScore(s.dd, s2 * (tau - eps))).toBeLessThan(4);
      expect(zScore(s.tr2, s2 * tau * n * (n + 2))).toBeLessThan(4);
    });
  }
});

describe("field network", () => {
  const n = 5;
  const params = { N: n, sigma: 0.8, features: 60, lengthScale: 1.7 };
  const draws = fieldEnsemble.draw(params, 12, 3);
  const x = new Float64Array(n);
  createRng(4).fillNormal(x);

  it("jacobian agrees with central finite differences", () => {
    for (const tau of [0, 0.45, 1]) {
      expect(jacobianMismatch(fieldEnsemble.build(params, draws, 0.9, tau), x)).toBeLessThan(1e-8);
    }
  });

  it("at τ = 1 the drift is −∇V with V = v√(2/M) Σ cos(w_k·x + φ_k), v = σℓ²", () => {
    const net = fieldEnsemble.build(params, draws, 0.9, 1);
    const v = params.sigma * params.lengthScale ** 2 * Math.sqrt(2 / params.features);
    const potential = (y: Float64Array) => {
      let s = 0;
      for (let k = 0; k < draws.m; k++) {
        let t = draws.phase[k];
        for (let i = 0; i < n; i++) t += draws.w[k * n + i] * y[i];
        s += v * Math.cos(t);
      }
      return s;
    };
    const out = new Float64Array(n);
    net.rhs(x, out);
    const h = 1e-5;
    for (let i = 0; i < n; i++) {
      const [p, m] = [Float64Array.from(x), Float64Array.from(x)];
      p[i] += h;
      m[i] -= h;
      const grad = (potential(p) - potential(m)) / (2 * h);
      expect(out[i] + 0.9 * x[i]).toBeCloseTo(-grad, 8);
    }
  });

  it("is a gradient field at τ = 1 (symmetric J) and divergence-free at τ = 0 (Tr(J + μI) = 0)", () => {
    const j = new Float64Array(n * n);
    fieldEnsemble.build(params, draws, 0.9, 1).jacobian(x, j);
    for (let i = 0; i < n; i++) for (let k = 0; k < i; k++) expect(j[i * n + k]).toBeCloseTo(j[k * n + i], 12);
    fieldEnsemble.build(params, draws, 0.9, 0).jacobian(x, j);
    let tr = 0;
    for (let i = 0; i < n; i++) tr += j[i * n + i] + 0.9;
    expect(Math.abs(tr)).toBeLessThan(1e-12);
  });

  it("uses common random numbers: draws ignore σ, nested in M, and differ across k", () => {
    const again = fieldEnsemble.draw({ ...params, sigma: 3 }, 12, 3);
    expect(Array.from(again.u)).toEqual(Array.from(draws.u));
    const small = fieldEnsemble.draw({ ...params, features: 20 }, 12, 3);
    expect(Array.from(small.w)).toEqual(Array.from(draws.w.subarray(0, 20 * n)));
    expect(Array.from(small.phaseA)).toEqual(Array.from(draws.phaseA.subarray(0, 20)));
    expect(fieldEnsemble.draw(params, 12, 4).w[0]).not.toBe(draws.w[0]);
  });

  it("supports N = 1, where the antisymmetric part vanishes exactly", () => {
    const one = { N: 1 };
    const d = fieldEnsemble.draw(one, 1, 0);
    expect(d.m).toBe(40);
    expect(Array.from(d.u)).toEqual(new Array(40).fill(0));
    const net = fieldEnsemble.build(one, d, 2, 0);
    const out = new Float64Array(1);
    net.rhs(Float64Array.of(0.7), out);
    expect(out[0]).toBe(-1.4);
  });

  it("documents μ_c = σ√N, stateScale = σℓ/μ and rhsFlops", () => {
    expect(fieldEnsemble.muCritical(params)).toBeCloseTo(0.8 * Math.sqrt(5), 15);
    const net = fieldEnsemble.build(params, draws, 0.5, 0.5);
    expect(net.stateScale).toBeCloseTo((0.8 * 1.7) / 0.5, 15);
    expect(net.rhsFlops).toBe(2 * (4 * 60 * n + 60) + 2 * n);
  });

  it("rejects bad input naming the parameter and value", () => {
    expect(() => fieldEnsemble.validate({ N: 0 })).toThrow(/N must be a positive integer, got 0/);
    expect(() => fieldEnsemble.validate({ N: 3, features: 0 })).toThrow(/features .*0/);
    expect(() => fieldEnsemble.validate({ N: 3, sigma: -2 })).toThrow(/sigma .*-2/);
    expect(() => fieldEnsemble.validate({ N: 3, lengthScale: Number.NaN })).toThrow(/lengthScale .*NaN/);
    expect(() => fieldEnsemble.validate({ N: 1000, features: 20_000 })).toThrow(/features × N/);
    expect(() => fieldEnsemble.build(params, draws, 0.5, -0.1)).toThrow(/tau .*-0\.1/);
    expect(() => fieldEnsemble.build(params, draws, Infinity, 0.5)).toThrow(/mu .*Infinity/);
    expect(() => fieldEnsemble.build({ ...params, N: 4 }, draws, 1, 0.5)).toThrow(/N = 5, M = 60.*N = 4/);
  });
});
