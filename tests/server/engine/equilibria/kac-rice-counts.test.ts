import { describe, expect, it } from "vitest";
import { getEnsemble } from "../../../../server/engine/ensembles/registry";
import { findAllEquilibria } from "../../../../server/engine/equilibria/exhaustive";

const field = getEnsemble("field");

/** Mean and standard error of the number of equilibria found over K networks. */
function exhaustiveCounts(N: number, tau: number, mu: number, K: number, starts: number, seed: number) {
  const params = { N, sigma: 1, features: 500, lengthScale: 1 };
  const counts: number[] = [];
  let stableMinusUnstable = true;
  for (let k = 0; k < K; k++) {
    const net = field.build(params, field.draw(params, seed, k), mu, tau);
    const found = findAllEquilibria(net, { seed, stream: k, starts });
    counts.push(found.equilibria.size);
    if (N === 1) {
      const st = found.equilibria.items.filter((e) => e.stable).length;
      stableMinusUnstable &&= st - (found.equilibria.size - st) === 1;
    }
  }
  const mean = counts.reduce((a, b) => a + b, 0) / K;
  const sd = Math.sqrt(counts.reduce((a, b) => a + (b - mean) ** 2, 0) / (K - 1));
  return { mean, se: sd / Math.sqrt(K), stableMinusUnstable };
}

describe("exhaustive counts against Kac–Rice (Monte Carlo, fixed seeds, within 3 SE)", () => {
  it("1-D: E N = erf(m/√2) + √(2/π) e^{−m²/2}/m = 1.791186 at m = 0.5 (science.md §3, Rice's formula)", () => {
    // Field ensemble at N = 1, τ = 1: f = −V′, Var f′ = Var V″ = 3σ² (Γ = e^{−r²/2ℓ²}, ℓ = 1), so m = μ/(√3 σ).
    const r = exhaustiveCounts(1, 1, 0.5 * Math.sqrt(3), 160, 12, 21);
    expect(Math.abs(r.mean - 1.791186)).toBeLessThan(3 * r.se);
    // In 1-D, stable minus unstable equilibria is exactly 1 in every realisation (science.md §3).
    expect(r.stableMinusUnstable).toBe(true);
  });

  it.each([
    [0, 2.40072],
    [0.5, 3.63752],
    [1, 5.2495],
  ])("N = 2, τ = %s: E N_tot = %s at m = 0.5 (exact Kac–Rice table, science.md §1)", (tau, expected) => {
    // 100 networks: SE ≈ 0.15–0.26, so a search missing one equilibrium in ten fails at τ ≥ 0.5.
    const r = exhaustiveCounts(2, tau, 0.5 * Math.SQRT2, 100, 60, 5);
    expect(Math.abs(r.mean - expected)).toBeLessThan(3 * r.se);
  });
});
