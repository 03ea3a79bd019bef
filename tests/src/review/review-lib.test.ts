import { describe, expect, it } from "vitest";
import { manifestOf } from "../../../src/features/review/components/import-form";
import { divergingColor, shareColor } from "../../../src/features/review/lib/colors";
import { fmtP } from "../../../src/features/review/lib/format";
import { axisScale, band, pickEvenly } from "../../../src/lib/axis-scale";
import { formatNumber } from "../../../src/lib/format-number";
import { compareCandidates } from "../../../src/app/routes/review/review-actions";
import type { MapView } from "../../../shared/schemas/maps";

// Pure helpers of the review screens: manifest parsing, grid geometry, colours, numbers, and
// which maps the comparison picker offers.

describe("manifestOf", () => {
  const manifest = { title: "T", ensemble: "rate", settings: { N: 6 } };
  it("takes the manifest block of an export, or a bare manifest", () => {
    expect(manifestOf(JSON.stringify({ manifest, cells: [] }))).toEqual(manifest);
    expect(manifestOf(JSON.stringify(manifest))).toEqual(manifest);
  });
  it("refuses what is not a manifest", () => {
    expect(manifestOf("{not json")).toBeNull();
    expect(manifestOf("[1, 2]")).toBeNull();
    expect(manifestOf(JSON.stringify({ manifest: { title: "no ensemble" } }))).toBeNull();
  });
});

describe("grid geometry and colours", () => {
  it("puts axis points at band centres, linear and log", () => {
    const lin = axisScale({ min: 0, max: 1, steps: 3, scale: "linear" }, [0, 300]);
    expect([lin(0), lin(0.5), lin(1)]).toEqual([50, 150, 250]);
    expect(band(1, 3, [0, 300])).toEqual({ start: 100, size: 100 });
    expect(band(1, 3, [300, 0])).toEqual({ start: 100, size: 100 }); // a y axis runs backwards
    const log = axisScale({ min: 1, max: 100, steps: 3, scale: "log" }, [0, 300]);
    expect(log(10)).toBeCloseTo(150, 10);
    expect(pickEvenly([0, 1, 2, 3, 4, 5, 6, 7, 8], 5)).toEqual([0, 2, 4, 6, 8]);
  });
  it("colours: neutral at zero, the ends of the ramps at the extremes", () => {
    expect(divergingColor(0, 1)).toBe("#f4efe4");
    expect(divergingColor(5, 1)).toBe("#8f3a17");
    expect(divergingColor(-5, 1)).toBe("#1b4a72");
    expect(shareColor(0)).toBe("#f7f1e3");
    expect(shareColor(1)).toBe("#1f4e6b");
  });
  it("formats numbers and p-values", () => {
    expect(formatNumber(-0.38412)).toBe("−0.384");
    // Both minus signs become true minus signs (U+2212), the exponent's too (common practice in typesetting).
    expect(formatNumber(-1.234e-4)).toBe("−1.23e−4");
    expect(formatNumber(null)).toBe("—");
    expect(fmtP(0.0004)).toBe("p < 0.001");
    expect(fmtP(0.0346)).toBe("p = 0.035");
  });
});

describe("compareCandidates", () => {
  const axis = { min: 0.5, max: 2, steps: 3, scale: "linear" as const };
  const base = { mu: axis, tau: { ...axis, min: 0, max: 1 }, seed: 1, status: "done", replicateOf: null } as unknown as MapView;
  const map = (id: string, extra: Partial<MapView> = {}) => ({ ...base, id, title: id, ...extra }) as MapView;
  it("offers maps on the same grid only, related ones first", () => {
    const me = map("me");
    const list = [map("other"), map("copy", { replicateOf: "me" }), map("wider", { mu: { ...axis, steps: 4 } }), me];
    expect(compareCandidates(me, list).map((c) => [c.id, c.relation])).toEqual([["copy", "replicate"], ["other", undefined]]);
  });
});
