import { describe, expect, it } from "vitest";
import { runStarts } from "../../../../server/engine/equilibria/run-starts";
import { estimateLyapunov } from "../../../../server/engine/equilibria/lyapunov";
import { findAllEquilibria } from "../../../../server/engine/equilibria/exhaustive";
import { integrate } from "../../../../server/engine/integrate/integrate";
import { getEnsemble } from "../../../../server/engine/ensembles/registry";
import { createRng } from "../../../../server/engine/random/rng";
import { normInf } from "../../../../server/engine/linalg/vector";
import { blowUp, creeping, hopf, lorenz, poisoned, quartic2, torus } from "./toy-networks";

const starts = (n: number, count: number, scale: number, seed = 1) => {
  const rng = createRng(seed);
  return Array.from({ length: count }, () => Float64Array.from({ length: n }, () => scale * rng.normal()));
};

describe("runStarts on a rate network", () => {
  const ens = getEnsemble("rate");
  const params = { N: 12, g: 2.5 };
  const network = ens.build(params, ens.draw(params, 4, 0), 1, 0.6);
  const run = runStarts(network, starts(12, 24, network.stateScale), { traceStarts: 2 });

  it("reports only verified equilibria (‖F‖∞ < 1e-10) with the stability their dynamics show", () => {
    expect(run.equilibria.size).toBeGreaterThan(0);
    const f = new Float64Array(12);
    const rng = createRng(77);
    for (const e of run.equilibria.items) {
      network.rhs(e.x, f);
      expect(normInf(f)).toBeLessThan(1e-10);
      expect(e.stable).toBe(e.maxRealPart < 0);
      expect(e.index).toBe(Array.from(e.re).filter((v) => v > 0).length);
      // A small kick decays back to a stable equilibrium and grows away from an unstable one.
      const kicked = Float64Array.from(e.x, (v) => v + 1e-4 * rng.normal());
      const r = integrate(network, kicked, { tMax: 60 / Math.max(0.05, Math.abs(e.maxRealPart)) });
      const back = Math.max(...Array.from(r.x, (v, i) => Math.abs(v - e.x[i])));
      if (e.stable) expect(back).toBeLessThan(1e-5);
      else expect(back).toBeGreaterThan(1e-3);
    }
  });

  it("accounts for every start and every hit", () => {
    expect(run.outcomes).toHaveLength(24);
    const settled = run.outcomes.filter((o) => o.class === "settled");
    expect(run.equilibria.hits.reduce((a, b) => a + b, 0)).toBe(settled.length);
    for (const o of settled) expect(o.equilibrium).toBeGreaterThanOrEqual(0);
    expect(run.traces.map((t) => t.start)).toEqual([0, 1]);
    for (const t of run.traces) expect(t.t.length).toBeLessThanOrEqual(100);
  });

  it("is the same with the odex integrator up to merging tolerance", () => {
    const other = runStarts(network, starts(12, 24, network.stateScale), { method: "odex" });
    const key = (items: typeof run.equilibria.items) => items.filter((e) => e.stable).map((e) => e.normRms.toFixed(6)).sort();
    expect(key(other.equilibria.items)).toEqual(key(run.equilibria.items));
  });
});

describe("runStarts classifies runs that never settle", () => {
  it("a stable limit cycle is periodic", () => {
    const r = runStarts(hopf, [Float64Array.of(0.5, 0)], { tMax: 100, lyapunovAt: 0.25 });
    expect(r.outcomes[0].class).toBe("periodic");
  });

  it("a quasi-periodic torus is periodic-looking, with a neutral Lyapunov exponent", () => {
    const r = runStarts(torus, [Float64Array.of(0.5, 0, 0, 0.7)], { tMax: 200 });
    expect(r.outcomes[0].class).toBe("periodic");
    expect(Math.abs(r.outcomes[0].lyapunov!)).toBeLessThan(0.02);
  });

  it("the Lorenz attractor is irregular, stopped early by a positive Lyapunov exponent", () => {
    const r = runStarts(lorenz, [Float64Array.of(1, 1, 20)], { tMax: 200 });
    expect(r.outcomes[0].class).toBe("irregular");
    expect(r.outcomes[0].time).toBeLessThan(200);
    expect(r.outcomes[0].lyapunov!).toBeGreaterThan(0.3);
  });

  it("a run creeping towards infinity is slow; blow-up and NaN are escaping, not crashes", () => {
    expect(runStarts(creeping, [Float64Array.of(0)], { tMax: 200 }).outcomes[0].class).toBe("slow");
    expect(runStarts(blowUp, [Float64Array.of(1)], { tMax: 5 }).outcomes[0].class).toBe("escaping");
    expect(runStarts(poisoned, [Float64Array.of(0)], { tMax: 5 }).outcomes[0].class).toBe("escaping");
  });

  it("rejects starts of the wrong length and bad options", () => {
    expect(() => runStarts(hopf, [Float64Array.of(1)])).toThrow(RangeError);
    expect(() => runStarts(hopf, [Float64Array.of(1, 0)], { stillTol: 0 })).toThrow(/stillTol/);
  });
});

describe("Lyapunov and exhaustive search", () => {
  it("estimates the Lorenz exponent near 0.906", () => {
    // 0.9056 for σ = 10, r = 28, b = 8/3 (J. C. Sprott, Chaos and Time-Series Analysis, 2003;
    // value recalled from memory); a finite-time estimate over 100 time units lies within ±0.25.
    const warm = integrate(lorenz, Float64Array.of(1, 1, 20), { tMax: 20 }).x;
    const est = estimateLyapunov(lorenz, warm, { duration: 100, interval: 0.5 });
    expect(est.exponent!).toBeGreaterThan(0.65);
    expect(est.exponent!).toBeLessThan(1.15);
  });

  it("finds all nine equilibria of x_i − x_i³ with their indices", () => {
    const r = findAllEquilibria(quartic2, { box: 1.5, starts: 60 });
    expect(r.equilibria.size).toBe(9);
    const byIndex = [0, 0, 0];
    for (const e of r.equilibria.items) byIndex[e.index]++;
    expect(byIndex).toEqual([4, 4, 1]); // closed form: 4 minima-like, 4 saddles, 1 source
    expect(() => findAllEquilibria({ ...quartic2, n: 11 })).toThrow(/N ≤ 10/);
  });
});
