import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { probeSearchSchema } from "../../../shared/schemas/probes";
import { rateCouplings, rateEnsemble } from "../../../server/engine/ensembles/rate/rate.ensemble";
import { rateNetworkFromMatrix } from "../../../server/engine/ensembles/rate/rate-network";
import { runStarts } from "../../../server/engine/equilibria/run-starts";
import { matrixStats } from "../../../server/modules/probes/analysis/matrix-stats";
import { drawProbeStart } from "../../../server/modules/probes/analysis/search-chunk";
import { createProbePool, sharedMatrix, type ProbePool } from "../../../server/modules/probes/probe.pool";
import { chunkBounds, runProbeSearch } from "../../../server/modules/probes/probe-search";

// The probe search on the pool's threads: chunks of starts merged into distinct equilibria, and
// the comparison networks aggregated as a map cell would be.

let pool: ProbePool;
beforeAll(() => {
  pool = createProbePool({ threads: 2 });
});
afterAll(async () => {
  await pool?.close();
});

function facts(j: Float64Array, n: number, mu: number) {
  return { couplings: sharedMatrix(j), n, mu, nonlinearity: "tanh", input: null, stats: matrixStats(j, n) };
}

describe("chunkBounds", () => {
  it("covers every start once in chunks of at least 8, at most 16 chunks", () => {
    for (const S of [1, 7, 8, 64, 100, 512]) {
      const b = chunkBounds(S);
      expect(b.reduce((a, c) => a + c.count, 0)).toBe(S);
      expect(b.length).toBeLessThanOrEqual(16);
      b.forEach((c, k) => expect(c.first).toBe(k === 0 ? 0 : b[k - 1].first + b[k - 1].count));
    }
  });
});

describe("runProbeSearch", () => {
  it("finds the two stable equilibria ±(a, a), a = 2 tanh a, of dx/dt = −x + [[0, 2], [2, 0]] tanh x", async () => {
    const J = Float64Array.from([0, 2, 2, 0]);
    const settings = probeSearchSchema.parse({ starts: 40, compareNetworks: 0 });
    const out = await runProbeSearch(pool, facts(J, 2, 1), settings);
    const { result, states } = out.merged;
    expect(out.comparison).toBeNull();
    expect(out.skippedComparison).toMatch(/No comparison networks/);
    const stable = result.equilibria.filter((e) => e.stable);
    expect(stable).toHaveLength(2);
    for (const e of stable) {
      const [x1, x2] = states[e.e];
      // Defining identity of the equilibrium: x1 = x2 = a with a = 2 tanh(a) (μ = 1).
      expect(x1).toBeCloseTo(x2, 10);
      expect(Math.abs(Math.abs(x1) - 2 * Math.tanh(Math.abs(x1)))).toBeLessThan(1e-10);
      expect(e.index).toBe(0);
    }
    expect(result.equilibria.reduce((a, e) => a + e.hits, 0)).toBe(result.runs.settled);
    expect(result.traces.map((t) => t.start)).toEqual([0, 1, 2]);
    expect(result.convergedShare.n).toBe(40);
  });

  it("finds the same distinct equilibria as one runStarts over all starts (N = 8 rate matrix)", async () => {
    const params = rateEnsemble.validate({ N: 8, g: 2.2 });
    const J = rateCouplings(params, rateEnsemble.draw(params, 3, 0), 0.6);
    const settings = probeSearchSchema.parse({ starts: 48, compareNetworks: 3, tMax: 150 });
    const out = await runProbeSearch(pool, facts(J, 8, 1), settings, () => {});
    const network = rateNetworkFromMatrix(J, 1);
    const starts = Array.from({ length: 48 }, (_, s) => drawProbeStart(settings.seed, s, 8, network.stateScale));
    const direct = runStarts(network, starts, { tMax: 150 });
    const directStable = direct.equilibria.items.filter((e) => e.stable);
    const found = out.merged.result.equilibria.filter((e) => e.stable);
    expect(directStable.length).toBeGreaterThan(1);
    expect(found.length).toBe(directStable.length);
    for (const e of directStable) {
      const match = found.some((f) => out.merged.states[f.e].every((v, i) => Math.abs(v - e.x[i]) < 1e-6 * Math.max(1, e.normInf)));
      expect(match).toBe(true);
    }
    expect(out.comparison).not.toBeNull();
    expect(out.comparison!.networks).toBe(3);
    expect(out.comparison!.perNetwork).toHaveLength(3);
    expect(out.comparison!.tau).toBeCloseTo(matrixStats(J, 8).tau!.estimate, 12);
    expect(out.comparison!.aggregate.meanStable.n).toBe(3);
  });

  it("reports progress up to every start and network", async () => {
    const params = rateEnsemble.validate({ N: 5, g: 1.5 });
    const J = rateCouplings(params, rateEnsemble.draw(params, 1, 0), 0.3);
    const seen: { startsDone: number; networksDone: number }[] = [];
    await runProbeSearch(pool, facts(J, 5, 1), probeSearchSchema.parse({ starts: 20, compareNetworks: 2 }), (p) => seen.push(p));
    expect(seen.at(-1)).toEqual({ startsDone: 20, networksDone: 2 });
    expect(seen.length).toBe(chunkBounds(20).length + 2);
  });
});
