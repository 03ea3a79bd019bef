import { describe, expect, it } from "vitest";
import ref from "../../reference/oklab.json";
import type { CellSummary } from "../../../shared/maps/cell-summary";
import { axisPoints } from "../../../shared/schemas/maps";
import { mStable } from "../../../shared/theory";
import { applyCellEvent, applyProgressEvent } from "../../../src/features/maps/hooks/use-map-events";
import { layerScale } from "../../../src/features/maps/lib/color-scale";
import { matchesCriteria } from "../../../src/features/maps/lib/filters";
import { formatDuration, formatNumber } from "../../../src/lib/format-number";
import { buildGrid, layerValues, upsertCell } from "../../../src/features/maps/lib/grid-model";
import { hexToOklab, oklabToHex, rampColors } from "../../../src/features/maps/lib/oklab";
import { overlayCurves } from "../../../src/features/maps/lib/overlay-curves";
import { KILN, SADDLE, TIDE } from "../../../src/features/maps/lib/palettes";
import { axisScale, band } from "../../../src/lib/axis-scale";
import { bmpDataUrl } from "../../../src/features/maps/lib/thumbnail";
import { wrapParts } from "../../../src/features/maps/lib/wrap-text";

const iv = (estimate: number, n = 4) => ({ estimate, lower: estimate - 1, upper: estimate + 1, n, level: 0.95 });

function cell(i: number, j: number, over: Partial<CellSummary> = {}): CellSummary {
  return {
    i, j, mu: 1 + i, tau: j / 2, state: "done", fromCache: false, networks: 4, starts: 8,
    stable: iv(2 + i), richness: iv(3), converged: iv(0.5 + 0.1 * j), oneStable: iv(0.25), unstableReached: iv(0), total: null, theory: null,
    ...over,
  };
}

const AXES = { mu: { min: 1, max: 2, steps: 2, scale: "linear" as const }, tau: { min: 0, max: 0.5, steps: 2, scale: "linear" as const } };

describe("OKLab conversion", () => {
  it("matches numpy with Ottosson's matrices (tests/reference/oklab.json)", () => {
    for (const { hex, lab } of ref.colours) {
      const mine = hexToOklab(hex);
      for (let k = 0; k < 3; k++) expect(mine[k]).toBeCloseTo(lab[k], 9);
    }
  });

  it("round-trips every colour of the palettes back to the same hex", () => {
    for (const hex of [...TIDE, ...KILN, ...SADDLE]) expect(oklabToHex(hexToOklab(hex))).toBe(hex);
  });

  it("refuses a malformed colour", () => {
    expect(() => hexToOklab("teal")).toThrow(TypeError);
    expect(() => rampColors(["#000000"], 4)).toThrow(RangeError);
  });
});

describe("palettes", () => {
  const lightness = (stops: readonly string[], n = 64) => rampColors(stops, n).map((h) => hexToOklab(h)[0]);

  it("sequential ramps darken monotonically in OKLab lightness", () => {
    for (const stops of [TIDE, KILN]) {
      const L = lightness(stops);
      for (let k = 1; k < L.length; k++) expect(L[k]).toBeLessThan(L[k - 1]);
    }
  });

  it("the diverging ramp is lightest at its centre and darkens both ways", () => {
    const L = lightness(SADDLE, 65);
    for (let k = 1; k <= 32; k++) expect(L[k]).toBeGreaterThan(L[k - 1]);
    for (let k = 33; k < 65; k++) expect(L[k]).toBeLessThan(L[k - 1]);
  });
});

describe("layer colour scales", () => {
  const continuous = (s: ReturnType<typeof layerScale>) => {
    if (s.kind !== "continuous") throw new Error("continuous scale expected");
    return s;
  };

  it("puts shares on [0, 1] and complexities symmetric around 0", () => {
    expect(continuous(layerScale("converged", [0.2, 0.4])).domain).toEqual([0, 1]);
    const s = continuous(layerScale("sigma-stable", [-0.3, 0.1, Number.NaN]));
    expect(s.domain).toEqual([-0.3, 0.3]);
    expect(s.center).toBe(0);
  });

  it("colours ratios by log10 around 1 and maps the domain ends to the palette ends", () => {
    const s = continuous(layerScale("found-ratio", [0.1, 2]));
    expect(s.domain[0]).toBeCloseTo(0.1, 12);
    expect(s.domain[1]).toBeCloseTo(10, 12);
    expect(s.colorOf(0.1)).toBe(s.lut[0]);
    expect(s.colorOf(10)).toBe(s.lut[s.lut.length - 1]);
    expect(s.colorOf(1)).toBe(s.lut[Math.round((s.lut.length - 1) / 2)]);
  });

  it("gives the regime three distinct category colours", () => {
    const s = layerScale("regime", [0, 1, 2]);
    if (s.kind !== "category") throw new Error("category expected");
    expect(new Set(s.entries.map((e) => s.colorOf(e.code))).size).toBe(3);
  });
});

describe("grid model and live updates", () => {
  it("lays cells out at i + j·muSteps and gives pending cells no value", () => {
    const grid = buildGrid(AXES, [cell(1, 1), cell(0, 0), cell(1, 0, { state: "pending", stable: null })]);
    const v = layerValues(grid, "stable-found");
    expect(v[0]).toBe(2);
    expect(Number.isNaN(v[1])).toBe(true); // (1, 0) pending
    expect(Number.isNaN(v[2])).toBe(true); // (0, 1) not listed
    expect(v[3]).toBe(3);
  });

  it("writes a cell event into the cached grid, value included, without touching the rest", () => {
    const before = { layer: "stable-found" as const, mu: [1, 2], tau: [0, 0.5], values: [[2, null], [null, null]], cells: [cell(0, 0), cell(1, 0, { state: "pending", stable: null })] };
    const after = applyCellEvent(before, cell(1, 0, { stable: iv(7) }))!;
    expect(after.values).toEqual([[2, 7], [null, null]]);
    expect(after.cells[1].stable?.estimate).toBe(7);
    expect(before.cells[1].state).toBe("pending");
    expect(upsertCell([cell(0, 0)], cell(1, 1))).toHaveLength(2);
  });

  it("merges a progress event's counters into the map view", () => {
    const map = { id: "m", status: "queued", cellsDone: 0, title: "t" } as never;
    const next = applyProgressEvent(map, { mapId: "m", status: "running", failure: null, cellsTotal: 4, cellsDone: 1, cellsComputed: 1, cellsFromCache: 0, throughput: 12, etaSeconds: 15, startedAt: null, finishedAt: null });
    expect(next).toMatchObject({ id: "m", title: "t", status: "running", cellsDone: 1, throughput: 12 });
  });
});

describe("filters", () => {
  it("match finished cells meeting every condition only", () => {
    const c = cell(0, 1);
    expect(matchesCriteria(c, [{ layer: "converged", op: "atLeast", value: 0.6 }, { layer: "stable-found", op: "atLeast", value: 2 }])).toBe(true);
    expect(matchesCriteria(c, [{ layer: "stable-found", op: "atMost", value: 1 }])).toBe(false);
    expect(matchesCriteria(cell(0, 1, { state: "pending" }), [])).toBe(false);
    expect(matchesCriteria(c, [{ layer: "sigma-stable", op: "atLeast", value: -10 }])).toBe(false); // no theory: no match
  });
});

describe("plot geometry", () => {
  it("puts every cell centre of a linear or log axis at the middle of its band", () => {
    for (const axis of [{ min: 0.5, max: 3, steps: 6, scale: "linear" as const }, { min: 0.1, max: 10, steps: 5, scale: "log" as const }]) {
      const x = axisScale(axis, [0, 600]);
      axisPoints(axis).forEach((v, k) => {
        const b = band(k, axis.steps, [0, 600]);
        expect(x(v)).toBeCloseTo(b.start + b.size / 2, 9);
      });
    }
  });

  it("draws m_st(τ) at μ_c·m_st(τ) and the rate origin line at g(1+τ)", () => {
    const field = overlayCurves({ ensemble: "field", settings: { N: 16, sigma: 1 }, muCritical: 4 }, [0, 1]);
    const st = field.find((c) => c.id === "m-stable")!;
    const half = st.points.find((p) => Math.abs(p.tau - 0.5) < 1e-12)!;
    expect(half.mu).toBeCloseTo(4 * 0.316197, 5); // science.md §1: m_st(0.5) = 0.316197
    expect(half.mu).toBe(4 * mStable(0.5));
    const rate = overlayCurves({ ensemble: "rate", settings: { N: 50, g: 1.5 }, muCritical: 1.5 }, [0, 1]);
    expect(rate.map((c) => c.id)).toEqual(["origin"]);
    for (const p of rate[0].points) expect(p.mu).toBeCloseTo(1.5 * (1 + p.tau), 12); // Sommers et al. 1988 edge
  });
});

describe("thumbnail bitmap", () => {
  it("writes a 24-bit BMP: 'BM', size 54 + padded rows, pixels bottom-up in BGR", () => {
    // BMP layout (BITMAPINFOHEADER, common practice): 3 px × 3 bytes = 9, padded to 12 per row.
    const url = bmpDataUrl(3, 2, (x, y) => (x === 0 && y === 0 ? "#102030" : "#ffffff"));
    const bytes = Uint8Array.from(atob(url.split(",")[1]), (c) => c.charCodeAt(0));
    expect(String.fromCharCode(bytes[0], bytes[1])).toBe("BM");
    expect(bytes.length).toBe(54 + 12 * 2);
    expect(new DataView(bytes.buffer).getUint32(2, true)).toBe(78);
    expect([bytes[54], bytes[55], bytes[56]]).toEqual([0x30, 0x20, 0x10]);
  });
});

describe("text helpers", () => {
  it("formats numbers with a true minus, exponents for extremes, and durations", () => {
    expect(formatNumber(-1.5)).toBe("−1.5");
    expect(formatNumber(0.0001234)).toBe("1.23e−4");
    expect(formatNumber(2.5e7)).toBe("2.5e7");
    expect(formatNumber(null)).toBe("—");
    expect(formatDuration(200)).toBe("3 min 20 s");
    expect(formatDuration(7500)).toBe("2 h 05 min");
  });

  it("wraps settings between parts, never inside one", () => {
    expect(wrapParts(["N = 50", "g = 1", "tanh", "input 0"], 16)).toEqual(["N = 50 · g = 1", "tanh · input 0"]);
  });
});
