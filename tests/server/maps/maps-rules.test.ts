import { describe, expect, it } from "vitest";
import { inFlightIssue, limitIssues, mapLimits } from "../../../shared/maps/limits";
import { accessOf, canWrite } from "../../../server/modules/maps/maps.access";
import { COST_MODEL, cellSeconds, estimateSeconds } from "../../../server/modules/maps/maps.estimate";
import { csvColumns, exportFileName, mapCsv } from "../../../server/modules/maps/maps.export";
import { etaOf, throughputOf } from "../../../server/modules/maps/maps.view";
import type { MapRow } from "../../../server/modules/maps/maps.repo";

// Pure rules of the maps module: limits, access, cost model, throughput and ETA, CSV layout.

const manifest = { ensemble: "rate", settings: { N: 50 }, mu: { steps: 16 }, tau: { steps: 16 }, budget: { networks: 8, starts: 32 } };

describe("limits", () => {
  it("passes a body inside every limit and names each broken one with its field", () => {
    expect(limitIssues(manifest, "member")).toEqual([]);
    const over = limitIssues({ ...manifest, budget: { networks: 32, starts: 128 } }, "member");
    expect(over).toEqual([{ limit: "maxRunsPerCell", path: "budget.starts", message: 'Limit "runs per cell (networks × starts)": at most 2048 for members, got 4096' }]);
    expect(limitIssues({ ...manifest, budget: { networks: 32, starts: 128 } }, "admin")).toEqual([]);
    expect(limitIssues({ ...manifest, ensemble: "field", settings: { N: 201 } }, "admin").map((i) => i.path)).toEqual(["settings.N"]);
    expect(limitIssues({ ...manifest, mu: { steps: 65 }, tau: { steps: 65 } }, "admin").map((i) => i.path)).toEqual(["mu.steps", "tau.steps"]);
  });

  it("counts maps in flight per role", () => {
    expect(inFlightIssue(mapLimits.member.maxInFlight - 1, "member")).toBeNull();
    expect(inFlightIssue(3, "member")?.message).toMatch(/maps in flight.*at most 3/);
    expect(inFlightIssue(3, "admin")).toBeNull();
    expect(inFlightIssue(10, "admin")?.limit).toBe("maxInFlight");
  });
});

describe("access", () => {
  const map = { ownerId: "o", visibility: "group" as const, shareToken: "tok-123", readerRole: null };
  it("gives the owner everything, group roles their level, a token read-only, others nothing", () => {
    expect(accessOf(map, "o")).toBe("owner");
    expect(accessOf({ ...map, readerRole: "editor" }, "e")).toBe("editor");
    expect(accessOf({ ...map, readerRole: "owner" }, "g")).toBe("editor");
    expect(accessOf({ ...map, readerRole: "viewer" }, "v")).toBe("viewer");
    expect(accessOf(map, null, "tok-123")).toBe("link");
    expect(accessOf(map, "x", "tok-12")).toBeNull();
    expect(accessOf(map, "x")).toBeNull();
    expect(accessOf({ ...map, visibility: "private", readerRole: "editor" }, "e", "tok-123")).toBeNull();
    expect(accessOf({ ...map, shareToken: null }, null, "tok-123")).toBeNull();
    expect([canWrite("owner"), canWrite("editor"), canWrite("viewer"), canWrite("link")]).toEqual([true, true, false, false]);
  });
});

describe("cost model", () => {
  const cell = { ensemble: "rate", N: 50, scale: 1, features: 2000, tau: 0, networks: 4, starts: 8, tMax: 200, exhaustive: false };
  it("charges runs that do not settle more than runs that settle, and scales with the budget", () => {
    const quiet = cellSeconds({ ...cell, mu: 2 }); // μ > g(1+τ): origin stable, one state
    const busy = cellSeconds({ ...cell, mu: 0.5 });
    expect(quiet).toBeCloseTo(32 * (COST_MODEL.rate.quiet.a + COST_MODEL.rate.quiet.b * 2500), 12);
    expect(busy).toBeGreaterThan(quiet);
    expect(cellSeconds({ ...cell, mu: 0.5, starts: 16 })).toBeCloseTo(2 * busy, 12);
    expect(cellSeconds({ ...cell, mu: 0.5, tMax: 100 })).toBeCloseTo(busy / 2, 12);
    expect(cellSeconds({ ...cell, mu: 2, N: 6, exhaustive: true })).toBeGreaterThan(cellSeconds({ ...cell, mu: 2, N: 6 }));
  });

  it("sums the missing cells of a map (none missing: 0)", () => {
    const spec = { ensemble: "rate", settings: { N: 50, g: 1 }, mu: { min: 0.5, max: 2, steps: 2 }, tau: { min: 0, max: 0, steps: 1 }, budget: { networks: 4, starts: 8 }, seed: 1 };
    const both = estimateSeconds(spec, [{ i: 0, j: 0 }, { i: 1, j: 0 }]);
    expect(both).toBeCloseTo(Math.ceil((cellSeconds({ ...cell, mu: 0.5 }) + cellSeconds({ ...cell, mu: 2 })) * 10) / 10, 10);
    expect(estimateSeconds(spec, [])).toBe(0);
  });
});

describe("throughput and ETA", () => {
  const start = new Date("2026-01-01T10:00:00Z");
  const row = { status: "running", startedAt: start, finishedAt: null, cellsComputed: 20, cellsDone: 30, cellsTotal: 100 } as unknown as MapRow;
  const tenMinutesIn = start.getTime() + 10 * 60_000;
  it("uses the last five minutes while running, the whole run otherwise", () => {
    expect(throughputOf(row, 15, tenMinutesIn)).toBe(3); // 15 cells over the last 5 min
    expect(throughputOf(row, 0, tenMinutesIn)).toBe(2); // 20 cells over 10 min
    expect(throughputOf({ ...row, cellsComputed: 0 } as MapRow, 0, tenMinutesIn)).toBeNull();
    expect(etaOf(row, 2)).toBe(35 * 60); // 70 cells left at 2 per minute
    expect(etaOf(row, null)).toBeNull();
    expect(etaOf({ ...row, status: "done" } as MapRow, 2)).toBe(0);
    expect(etaOf({ ...row, status: "cancelled" } as MapRow, 2)).toBeNull();
  });
});

describe("CSV layout", () => {
  it("quotes fields that need it and has one column per name", () => {
    const names = csvColumns.map(([n]) => n);
    expect(new Set(names).size).toBe(names.length);
    const meta = {
      manifest: { title: "A, \"quoted\"\ntitle", ensemble: "rate", settings: { N: 6, g: 1 }, mu: { min: 1, max: 1, steps: 1 }, tau: { min: 0, max: 0, steps: 1 }, budget: { networks: 1, starts: 1 }, seed: 1 } as never,
      engineVersion: "dynamics-1",
      ensembleVersion: "1",
      exportedAt: "2026-01-01T00:00:00.000Z",
    };
    const text = mapCsv(meta, []);
    expect(text.split("\n")[0]).toBe('# Equilibrist map export: A, "quoted" title');
    expect(text.trimEnd().split("\n").at(-1)).toBe(names.join(","));
    expect(exportFileName("Leak sweep (g = 1)", "csv")).toBe("leak-sweep-g-1.csv");
    expect(exportFileName("∂∂∂", "json")).toBe("map.json");
  });
});
