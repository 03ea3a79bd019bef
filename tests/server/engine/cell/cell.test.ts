import { afterAll, describe, expect, it } from "vitest";
import { runCell } from "../../../../server/engine/cell/run-cell";
import { drawStart, runNetwork } from "../../../../server/engine/cell/run-network";
import { mergeNetworks } from "../../../../server/engine/cell/merge";
import { validateCellInput } from "../../../../server/engine/cell/cell-input";
import { createEnginePool, runCellParallel, runRateStartsParallel } from "../../../../server/engine/pool/engine-pool";
import { runStarts } from "../../../../server/engine/equilibria/run-starts";
import { getEnsemble } from "../../../../server/engine/ensembles/registry";
import type { RateNetwork } from "../../../../server/engine/ensembles/rate/rate-network";
import { cellResultSchema, type CellInput, type CellResult } from "../../../../shared/schemas/cell-result";

const input: CellInput = {
  ensemble: "rate",
  params: { N: 16, g: 2.2 },
  mu: 1,
  tau: 0.5,
  budget: { networks: 4, starts: 10, tMax: 200, rtol: 1e-6, atol: 1e-9 },
  seed: 12345,
};
const withoutTiming = ({ timing: _t, ...rest }: CellResult) => JSON.stringify(rest);

describe("runCell", () => {
  const result = runCell(input);

  it("returns a CellResult that the shared zod schema accepts", () => {
    expect(() => cellResultSchema.parse(result)).not.toThrow();
    expect(result.theory).toBeNull();
    expect(result.networks.map((s) => s.k)).toEqual([0, 1, 2, 3]);
    expect(result.traces.length).toBe(3);
    for (const tr of result.traces) expect(tr.x.length).toBe(4);
  });

  it("is bit-identical for identical inputs (timing excluded)", () => {
    expect(withoutTiming(runCell(input))).toBe(withoutTiming(result));
  });

  it("keeps its counts consistent", () => {
    const total = Object.values(result.aggregate.runs).reduce((a, b) => a + b, 0);
    expect(total).toBe(4 * 10);
    expect(result.aggregate.settleHistogram.counts.reduce((a, b) => a + b, 0)).toBe(result.aggregate.runs.settled);
    for (const s of result.networks) {
      const hits = s.stable.concat(s.unstable).reduce((a, e) => a + e.hits, 0);
      expect(hits).toBe(s.runs.settled);
      expect(s.chao1.estimate).toBeGreaterThanOrEqual(s.stable.length);
      for (const e of s.stable) expect(e.maxRealPart).toBeLessThan(0);
      for (const e of s.stable.concat(s.unstable)) expect(e.residual).toBeLessThan(1e-10);
    }
    const mean = result.networks.reduce((a, s) => a + s.stable.length, 0) / 4;
    expect(result.aggregate.meanStable.estimate).toBeCloseTo(mean, 14);
  });

  it("merges networks to the same result in any order", () => {
    const valid = validateCellInput(input);
    const outs = [3, 1, 0, 2].map((k) => runNetwork(valid, k));
    const merged = mergeNetworks(valid, outs, result.timing);
    expect(withoutTiming(merged)).toBe(withoutTiming(result));
    expect(() => mergeNetworks(valid, outs.slice(1), result.timing)).toThrow(RangeError);
  });

  it("draws starts that do not depend on μ or τ (common random numbers)", () => {
    const a = drawStart(input, 16, 2, 5, 1);
    const b = drawStart({ ...input, mu: 3, tau: 0.1 }, 16, 2, 5, 1);
    expect(Array.from(a)).toEqual(Array.from(b));
    expect(Array.from(drawStart(input, 16, 2, 6, 1))).not.toEqual(Array.from(a));
  });

  it("rejects bad input naming the field", () => {
    expect(() => runCell({ ...input, mu: 0 })).toThrow(/mu/);
    expect(() => runCell({ ...input, tau: 1.5 })).toThrow(/tau/);
    expect(() => runCell({ ...input, ensemble: "nope" })).toThrow(RangeError);
    expect(() => runCell({ ...input, budget: { ...input.budget, starts: 0 } })).toThrow(/budget.starts/);
    expect(() => runCell({ ...input, budget: { ...input.budget, exhaustive: true } })).toThrow(/N ≤ 10/);
    expect(() => runCell({ ...input, params: { N: -1, g: 1 } })).toThrow(RangeError);
  });
});

describe("exhaustive cells and the pool", () => {
  const pool = createEnginePool({ threads: 2 });
  afterAll(() => pool.close());
  const small: CellInput = {
    ensemble: "field",
    params: { N: 2, features: 200 },
    mu: 0.7,
    tau: 0.5,
    budget: { networks: 3, starts: 6, tMax: 100, rtol: 1e-6, atol: 1e-9, exhaustive: true },
    seed: 7,
  };

  it("warms each of its threads once", async () => {
    const ids = await pool.warm();
    expect(new Set(ids).size).toBe(2);
  });

  it("runCellParallel over two threads equals runCell", async () => {
    const serial = runCell(input);
    const parallel = await runCellParallel(pool, input);
    expect(parallel.timing.threads).toBe(2);
    expect(withoutTiming(parallel)).toBe(withoutTiming(serial));
  });

  it("splits one rate network's starts over the threads and joins them in start order", async () => {
    const rate = getEnsemble("rate");
    const params = { N: 16, g: 2.2 };
    const net = rate.build(params, rate.draw(params, 3, 0), 1, 0.7) as RateNetwork;
    const starts = Array.from({ length: 8 }, (_, s) => drawStart(input, 16, 0, s, net.stateScale));
    const serial = runStarts(net, starts);
    const joined = await runRateStartsParallel(pool, net.couplings, 1, 0, starts);
    expect(joined.outcomes.map((o) => o.start)).toEqual([0, 1, 2, 3, 4, 5, 6, 7]);
    expect(joined.equilibria.hits.reduce((a, b) => a + b, 0)).toBe(joined.outcomes.filter((o) => o.class === "settled").length);
    // The basin shortcut differs between shares, not the equilibria reached:
    const key = (r: typeof serial) => r.equilibria.items.filter((e) => e.stable).map((e) => e.normRms.toFixed(8)).sort();
    expect(key(joined)).toEqual(key(serial));
  });

  it("adds exhaustive totals that contain every stable equilibrium the runs reached", () => {
    const r = runCell(small);
    expect(r.aggregate.meanTotal).not.toBeNull();
    for (const s of r.networks) {
      expect(s.exhaustive!.total).toBeGreaterThanOrEqual(s.stable.length + s.unstable.length);
      expect(s.exhaustive!.byIndex.reduce((a, b) => a + b, 0)).toBe(s.exhaustive!.total);
    }
  });
});
