import { describe, expect, it } from "vitest";
import { placeOnMap } from "../../src/features/probe/lib/placement";

// Where a probe lands on a rate map: the rate network depends on μ and g only through μ/g
// (time rescaled by g; science.md §2), so μ_map = (μ/ĝ)·g_map; the nearest cell is the closest
// axis point (in log space on a log axis).

const linear = { mu: { min: 0.4, max: 1.6, steps: 4, scale: "linear" as const }, tau: { min: 0, max: 1, steps: 3, scale: "linear" as const }, g: 1 };

describe("placeOnMap", () => {
  it("keeps μ/g and finds the nearest cell", () => {
    const p = placeOnMap({ mu: 1, g: 1.5, tau: 0.384 }, linear)!;
    expect(p.mu).toBeCloseTo(1 / 1.5, 14);
    expect(p).toMatchObject({ i: 1, j: 1, insideMu: true, insideTau: true });
    expect(placeOnMap({ mu: 3, g: 1.5, tau: 0.9 }, { ...linear, g: 0.5 })!.mu).toBeCloseTo(1, 14);
  });

  it("uses log distances on a log axis and flags points outside the ranges", () => {
    const log = { ...linear, mu: { min: 0.1, max: 10, steps: 3, scale: "log" as const } };
    // Axis points 0.1, 1, 10: μ = 0.35 is nearer 1 than 0.1 in log space (|ln 0.35| < |ln 3.5|).
    expect(placeOnMap({ mu: 0.35, g: 1, tau: 0.5 }, log)!.i).toBe(1);
    const out = placeOnMap({ mu: 5, g: 1, tau: -0.2 }, linear)!;
    expect(out).toMatchObject({ i: 3, j: 0, insideMu: false, insideTau: false });
  });

  it("gives no place without ĝ or τ̂", () => {
    expect(placeOnMap({ mu: 1, g: null, tau: 0.1 }, linear)).toBeNull();
    expect(placeOnMap({ mu: 1, g: 1, tau: null }, linear)).toBeNull();
  });
});
