import { describe, expect, it } from "vitest";
import scipyRef from "../../../reference/arenstorf-scipy.json";
import { integrate } from "../../../../server/engine/integrate/integrate";
import { integrateMany } from "../../../../server/engine/integrate/integrate-many";
import type { IntegrationResult, OdeSystem } from "../../../../server/engine/integrate/types";
import { arenstorf, arenstorfStart, ARENSTORF_PERIOD, decay } from "./systems";

const METHODS = ["dopri5", "odex"] as const;

describe.each(METHODS)("integrate with %s", (method) => {
  it("dx/dt = −x follows x0·e^{−t} (closed form)", () => {
    const x0 = Float64Array.from([1, -2, 0.5]);
    const r = integrate(decay(3), x0, { method, tMax: 5 });
    expect(r.status).toBe("reached-tmax");
    expect(r.t).toBe(5);
    for (let i = 0; i < 3; i++) expect(Math.abs(r.x[i] - x0[i] * Math.exp(-5))).toBeLessThan(1e-7);
  });

  it("returns the Arenstorf orbit to its start at T = 17.0652165601579625588917206249 (HNW I §II.0)", () => {
    const r = integrate(arenstorf, arenstorfStart(), { method, tMax: ARENSTORF_PERIOD, rtol: 1e-12, atol: 1e-12 });
    const s = arenstorfStart();
    const err = Math.max(...Array.from(r.x, (v, i) => Math.abs(v - s[i])));
    expect(err).toBeLessThan(1e-6);
    expect(r.counters.accepted + r.counters.rejected).toBe(r.counters.steps);
  });

  it("stops when the observer asks, and passes F(x) to it", () => {
    let seen = 0;
    const r = integrate(decay(1), Float64Array.of(1), {
      method,
      onStep: (t, x, f) => {
        seen++;
        expect(f[0]).toBeCloseTo(-x[0], 12);
        return x[0] < 0.5;
      },
    });
    expect(r.status).toBe("stopped");
    expect(r.x[0]).toBeLessThan(0.5);
    expect(r.t).toBeGreaterThan(Math.log(2) - 1e-9);
    expect(seen).toBeGreaterThan(0);
  });

  it("reports a blow-up as non-finite or an exhausted step instead of throwing", () => {
    // dx/dt = x² from x(0) = 1 blows up at t = 1 (closed form x = 1/(1 − t)).
    const blowUp: OdeSystem = { n: 1, rhs: (x, out) => { out[0] = x[0] * x[0]; } };
    const r = integrate(blowUp, Float64Array.of(1), { method, tMax: 2, maxSteps: 100_000 });
    expect(["non-finite", "step-too-small", "max-steps"]).toContain(r.status);
    expect(r.t).toBeLessThanOrEqual(1 + 1e-6);
  });
});

describe("integrate: validation and pinned statistics", () => {
  it("rejects bad systems, starts and options", () => {
    expect(() => integrate(decay(2), Float64Array.of(1))).toThrow(RangeError);
    expect(() => integrate(decay(1), Float64Array.of(NaN))).toThrow(RangeError);
    expect(() => integrate(decay(1), Float64Array.of(1), { rtol: -1 })).toThrow(/rtol/);
    expect(() => integrate(decay(1), Float64Array.of(1), { tMax: 0 })).toThrow(/tMax/);
    expect(() => integrate(decay(1), Float64Array.of(1), { method: "euler" as never })).toThrow(/method/);
    expect(() => integrate({} as OdeSystem, Float64Array.of(1))).toThrow(TypeError);
  });

  it("dopri5 step counts on Arenstorf at rtol = atol = 1e-8 are pinned and near scipy's RK45", () => {
    const r = integrate(arenstorf, arenstorfStart(), { tMax: ARENSTORF_PERIOD, rtol: 1e-8, atol: 1e-8 });
    // Pinned from our own run (regression guard, not an external reference).
    expect(r.counters).toEqual({ steps: 361, accepted: 338, rejected: 23, evaluations: 2168 });
    // scipy 1.17.1 RK45 (same Dormand–Prince pair, different controller), tests/reference/arenstorf-scipy.json.
    const rk45 = scipyRef.runs.find((x) => x.method === "RK45" && x.rtol === 1e-8)!;
    expect(Math.abs(r.counters.accepted - rk45.accepted) / rk45.accepted).toBeLessThan(0.25);
    expect(Math.abs(r.counters.evaluations - rk45.nfev) / rk45.nfev).toBeLessThan(0.25);
  });

  it("integrateMany gives every run exactly what it gets alone, whatever the batch size", () => {
    const starts = [arenstorfStart(), Float64Array.from([0.9, 0.1, 0, -2]), Float64Array.from([1.0, 0, 0.1, -1.9])];
    const alone = starts.map((s) => integrate(arenstorf, s, { tMax: 5 }));
    for (const capacity of [1, 2, 3]) {
      const got: IntegrationResult[] = [];
      integrateMany(arenstorf, starts.length, { start: (i) => starts[i], onEnd: (i, r) => { got[i] = r; } },
        { rtol: 1e-6, atol: 1e-9, tMax: 5, maxSteps: 1e6, capacity });
      got.forEach((r, i) => {
        expect(Array.from(r.x)).toEqual(Array.from(alone[i].x));
        expect(r.counters).toEqual(alone[i].counters);
      });
    }
  });
});
