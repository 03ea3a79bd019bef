import { describe, expect, it } from "vitest";
import { integrateMany } from "../../../../server/engine/integrate/integrate-many";
import { estimateLyapunov } from "../../../../server/engine/equilibria/lyapunov";
import { runStarts } from "../../../../server/engine/equilibria/run-starts";
import type { IntegrationResult } from "../../../../server/engine/integrate/types";
import { decay } from "./systems";
import { hopf } from "../equilibria/toy-networks";

/** Runs dx/dt = −x from x0 to tMax, jumping once (at the first step past tJump) to x0·e^{−(t+dt)}. */
function decayWithJump(x0: number, tJump: number, dt: number, tMax: number): { result: IntegrationResult; jumpedAt: number } {
  let result: IntegrationResult | null = null;
  let jumpedAt = -1;
  integrateMany(
    decay(1),
    1,
    {
      start: () => Float64Array.of(x0),
      onStep: (_id, t) => {
        if (jumpedAt >= 0 || t < tJump) return false;
        jumpedAt = t;
        return { x: Float64Array.of(x0 * Math.exp(-(t + dt))), dt };
      },
      onEnd: (_id, r) => { result = r; },
    },
    { rtol: 1e-8, atol: 1e-12, tMax, maxSteps: 1e5, capacity: 1 },
  );
  return { result: result!, jumpedAt };
}

describe("a run moved forward by its observer (RunJump)", () => {
  it("continues from the new state at t + dt and still follows x0·e^{−t} (closed form)", () => {
    const { result, jumpedAt } = decayWithJump(2, 1, 3, 8);
    expect(jumpedAt).toBeGreaterThanOrEqual(1);
    expect(result.status).toBe("reached-tmax");
    expect(result.t).toBe(8);
    expect(Math.abs(result.x[0] - 2 * Math.exp(-8))).toBeLessThan(1e-9);
  });

  it("ends at tMax when the jump reaches it", () => {
    const { result, jumpedAt } = decayWithJump(2, 1, 50, 8);
    const longer = decayWithJump(2, 1, 3, 8).result;
    expect(result.status).toBe("reached-tmax");
    expect(result.t).toBe(8);
    expect(result.x[0]).toBe(2 * Math.exp(-(jumpedAt + 50))); // the jump's state, not integrated further
    expect(result.counters.evaluations).toBeLessThan(longer.counters.evaluations);
  });
});

describe("the Lyapunov probe as part of the run", () => {
  it("reports its whole window and calls onInterval at each interval end", () => {
    const times: number[] = [];
    const est = estimateLyapunov(hopf, Float64Array.of(0.5, 0), { duration: 10, interval: 2, onInterval: (t) => times.push(t) });
    expect(est.elapsed).toBe(10);
    expect(times).toEqual([2, 4, 6, 8, 10]);
  });

  it("a limit cycle probed and jumped over is still periodic, ending at tMax", () => {
    const r = runStarts(hopf, [Float64Array.of(0.5, 0)], { tMax: 100, lyapunovAt: 0.25 });
    expect(r.outcomes[0].class).toBe("periodic");
    expect(r.outcomes[0].time).toBe(100);
    expect(r.counters.probeEvaluations).toBeGreaterThan(0);
  });
});
