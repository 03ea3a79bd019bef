import { describe, expect, it } from "vitest";
import { createRng, networkStream } from "../../../../server/engine/random/rng";
import { hashSeedTuple } from "../../../../server/engine/random/seed-hash";
import { zScore } from "./sample-moments";

function take(rng: { uniform(): number }, count: number): number[] {
  return Array.from({ length: count }, () => rng.uniform());
}

describe("createRng", () => {
  it("reproduces the same stream for the same seed and stream indices", () => {
    expect(take(createRng(42, 3, 7), 50)).toEqual(take(createRng(42, 3, 7), 50));
    const a = new Float64Array(33);
    const b = new Float64Array(33);
    createRng(5).fillNormal(a);
    createRng(5).fillNormal(b);
    expect(Array.from(a)).toEqual(Array.from(b));
  });

  it("gives different streams for different seeds, indices, positions and lengths", () => {
    const heads = [
      createRng(1), createRng(2), createRng(1, 0), createRng(1, 1), createRng(0, 1), createRng(1, 0, 0),
    ].map((r) => r.uniform());
    expect(new Set(heads).size).toBe(heads.length);
    expect(hashSeedTuple([7])).not.toEqual(hashSeedTuple([7, 0]));
  });

  it("fillNormal gives the same values as repeated normal()", () => {
    const a = createRng(9, 1);
    const b = createRng(9, 1);
    const out = new Float64Array(11);
    a.normal();
    a.fillNormal(out);
    b.normal();
    expect(Array.from(out)).toEqual(Array.from({ length: 11 }, () => b.normal()));
  });

  it("uniforms lie in [0, 1) with mean 1/2 and variance 1/12 within 4 SE", () => {
    const u = new Float64Array(40_000);
    createRng(123).fillUniform(u);
    expect(Math.min(...u)).toBeGreaterThanOrEqual(0);
    expect(Math.max(...u)).toBeLessThan(1);
    expect(zScore(u, 0.5)).toBeLessThan(4); // E U = 1/2 (definition)
    expect(zScore(u.map((v) => (v - 0.5) ** 2), 1 / 12)).toBeLessThan(4); // Var U = 1/12 (definition)
  });

  it("uniforms pass a Kolmogorov–Smirnov test at the 1% level", () => {
    const n = 20_000;
    const u = Array.from(take(createRng(77), n)).sort((x, y) => x - y);
    let d = 0;
    u.forEach((v, i) => {
      d = Math.max(d, Math.abs((i + 1) / n - v), Math.abs(v - i / n));
    });
    // √n·D_n < 1.628 at α = 0.01 (asymptotic Kolmogorov distribution, standard tables).
    expect(Math.sqrt(n) * d).toBeLessThan(1.628);
  });

  it("normals have mean 0, variance 1, fourth moment 3 and normal quantiles within 4 SE", () => {
    const n = 60_000;
    const x = new Float64Array(n);
    createRng(2024).fillNormal(x);
    expect(zScore(x, 0)).toBeLessThan(4);
    expect(zScore(x.map((v) => v * v), 1)).toBeLessThan(4);
    expect(zScore(x.map((v) => v ** 4), 3)).toBeLessThan(4); // E X⁴ = 3 (normal moments)
    // Φ(−1) = 0.158655, Φ(0) = 0.5, Φ(1.5) = 0.933193 (Abramowitz & Stegun table 26.1).
    for (const [q, p] of [[-1, 0.158655], [0, 0.5], [1.5, 0.933193]] as const) {
      expect(zScore(x.map((v) => (v < q ? 1 : 0)), p)).toBeLessThan(4);
    }
  });

  it("streams of different indices are uncorrelated within 4 SE", () => {
    const a = new Float64Array(30_000);
    const b = new Float64Array(30_000);
    createRng(1, 0).fillNormal(a);
    createRng(1, 1).fillNormal(b);
    expect(zScore(a.map((v, i) => v * b[i]), 0)).toBeLessThan(4);
  });

  it("uniformInt covers {0..bound−1} evenly within 4 SE", () => {
    const rng = createRng(8);
    const draws = Array.from({ length: 12_000 }, () => rng.uniformInt(6));
    expect(Math.min(...draws)).toBe(0);
    expect(Math.max(...draws)).toBe(5);
    for (let face = 0; face < 6; face++) {
      expect(zScore(draws.map((d) => (d === face ? 1 : 0)), 1 / 6)).toBeLessThan(4);
    }
  });

  it("rejects bad seeds and bounds naming the value", () => {
    expect(() => createRng(1.5)).toThrow(TypeError);
    expect(() => createRng(Number.NaN)).toThrow(/seed.*NaN/);
    expect(() => createRng(1, Infinity)).toThrow(TypeError);
    expect(() => createRng(1).uniformInt(0)).toThrow(RangeError);
  });
});

describe("networkStream", () => {
  it("depends only on (ensemble id, seed, k, N) and the optional substream", () => {
    const head = (r: { uniform(): number }) => take(r, 3);
    expect(head(networkStream("rate", 4, 2, 10))).toEqual(head(networkStream("rate", 4, 2, 10)));
    const variants = [
      networkStream("rate", 4, 2, 10), networkStream("field", 4, 2, 10), networkStream("rate", 5, 2, 10),
      networkStream("rate", 4, 3, 10), networkStream("rate", 4, 2, 11), networkStream("rate", 4, 2, 10, 1),
    ].map((r) => r.uniform());
    expect(new Set(variants).size).toBe(variants.length);
  });

  it("rejects bad arguments naming them", () => {
    expect(() => networkStream("", 1, 0, 3)).toThrow(TypeError);
    expect(() => networkStream("rate", 1, -1, 3)).toThrow(/k .*-1/);
    expect(() => networkStream("rate", 1, 0, 0)).toThrow(/N .*0/);
    expect(() => networkStream("rate", 0.5, 0, 3)).toThrow(/seed/);
  });
});
