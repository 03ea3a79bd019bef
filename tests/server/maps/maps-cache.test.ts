import { count, eq } from "drizzle-orm";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { cells, mapCells, maps, users } from "../../../server/db/schema/index";
import { createGroupsService } from "../../../server/modules/groups/groups.service";
import { bossMapJobs, noMapJobs, type MapJobs } from "../../../server/modules/maps/maps.jobs";
import { createMapsService } from "../../../server/modules/maps/maps.service";
import { layerIds } from "../../../shared/maps/layers";
import { cellResultSchema } from "../../../shared/schemas/cell-result";
import { createMapSchema, mapExportSchema } from "../../../shared/schemas/maps";
import { signedInPerson, startTestApp, type TestApp } from "../../helpers/test-app";
import { fillCache, jobsOf, rateBody } from "./maps-fixtures";

// Cells already in the cache: a second account's identical map is done at creation with zero
// jobs; grids, cells and exports read the stored results. And nothing is half-written when
// enqueueing fails inside the creating transaction.

let app: TestApp;
beforeAll(async () => {
  app = await startTestApp({ queue: true });
});
afterAll(async () => {
  await app?.stop();
});

const body = rateBody({ title: "Cached, sweep", description: "line one\nline two", budget: { networks: 3, starts: 4, tMax: 100 } });
const spec = { ensemble: "rate", settings: body.settings, mu: body.mu, tau: body.tau, budget: body.budget, seed: body.seed } as never;

describe("cache sharing between accounts", () => {
  it("a second account's identical map takes every cell from the cache and queues nothing", async () => {
    const first = await signedInPerson(app, "first");
    const a = await first.client.post("/api/maps", body);
    expect(a.body).toMatchObject({ cells: 9, cachedCells: 0, status: "queued" });
    await fillCache(app.database.db, spec);
    const [{ n: stored }] = await app.database.db.select({ n: count() }).from(cells);

    const second = await signedInPerson(app, "second");
    const estimate = await second.client.post("/api/maps", { ...body, estimateOnly: true });
    expect(estimate.body).toEqual({ cells: 9, cachedCells: 9, estimatedSeconds: 0 });
    const b = await second.client.post("/api/maps", body);
    expect(b.status).toBe(201);
    expect(b.body).toMatchObject({
      cells: 9, cachedCells: 9, estimatedSeconds: 0, status: "done", cellsTotal: 9, cellsDone: 9,
      cellsComputed: 0, cellsFromCache: 9, etaSeconds: 0,
    });
    expect(b.body.startedAt).not.toBeNull();
    expect(b.body.finishedAt).not.toBeNull();
    expect(await jobsOf(app.database.db, "fill-cell", b.body.id)).toEqual({});
    expect(await jobsOf(app.database.db, "map-finished", b.body.id)).toEqual({ created: 1 });
    const [{ n: after }] = await app.database.db.select({ n: count() }).from(cells);
    expect(after).toBe(stored);
    const positions = await app.database.db.select().from(mapCells).where(eq(mapCells.mapId, b.body.id));
    expect(positions.every((p) => p.state === "done" && p.fromCache && p.jobId === null)).toBe(true);

    // A finished map does not count against the in-flight limit, and deleting keeps the cache.
    expect((await second.client.delete(`/api/maps/${b.body.id}`)).status).toBe(204);
    const [{ n: kept }] = await app.database.db.select({ n: count() }).from(cells);
    expect(kept).toBe(stored);
  });
});

describe("reads of a finished map", () => {
  it("grid, cell detail and exports show the stored results", async () => {
    await fillCache(app.database.db, spec);
    const me = await signedInPerson(app, "reader");
    const id = (await me.client.post("/api/maps", body)).body.id as string;

    const grid = await me.client.get(`/api/maps/${id}/grid?layer=stable-found`);
    expect(grid.status).toBe(200);
    expect(grid.body.values).toHaveLength(3);
    expect(grid.body.values.flat().every((v: unknown) => typeof v === "number" && v >= 0)).toBe(true);
    const c = grid.body.cells.find((s: { i: number; j: number }) => s.i === 1 && s.j === 2);
    expect(grid.body.values[2][1]).toBe(c.stable.estimate);
    expect(c).toMatchObject({ state: "done", fromCache: true, networks: 3, starts: 4, mu: 1.25, tau: 1 });
    expect(c.stable.n).toBe(3);
    // The rate network's theory row: m = μ/g, origin stable iff μ > g(1+τ) (Sommers et al. 1988).
    expect(c.theory).toMatchObject({ m: 1.25, originStable: false, sigmaStable: null, krStable: null });
    const gridDefault = await me.client.get(`/api/maps/${id}/grid`);
    expect(gridDefault.body.layer).toBe("stable-found");

    const cell = await me.client.get(`/api/maps/${id}/cells/1/2`);
    expect(cell.status).toBe(200);
    expect(cellResultSchema.safeParse(cell.body.result).success).toBe(true);
    expect(cell.body.result).toMatchObject({ ensemble: "rate", mu: 1.25, tau: 1, seed: 1 });
    expect(cell.body.result.networks).toHaveLength(3);
    expect(cell.body.theory.rateLines).toMatchObject({ originStabilityMu: 2, originStable: false });
    expect(cell.body).toMatchObject({ fromCache: true, summary: { i: 1, j: 2, state: "done" } });

    const csv = await me.client.get(`/api/maps/${id}/export.csv`);
    expect(csv.status).toBe(200);
    expect(csv.headers.get("content-type")).toMatch(/^text\/csv/);
    expect(csv.headers.get("content-disposition")).toMatch(/^attachment; filename="?cached-sweep\.csv"?$/);
    const lines = (csv.body as string).trimEnd().split("\n");
    const comments = lines.filter((l) => l.startsWith("#"));
    const table = lines.filter((l) => !l.startsWith("#"));
    expect(comments[0]).toBe("# Equilibrist map export: Cached, sweep");
    const settingsLine = comments.find((l) => l.startsWith("# settings "));
    expect(JSON.parse(settingsLine!.slice("# settings ".length))).toEqual({ N: 6, g: 1, nonlinearity: "tanh", input: 0 });
    expect(comments.join("\n")).toContain("lower bounds");
    expect(table).toHaveLength(1 + 9);
    const header = table[0].split(",");
    expect(header.slice(0, 5)).toEqual(["i", "j", "mu", "tau", "m"]);
    expect(header).toEqual(expect.arrayContaining(["stable_found", "stable_found_lower95", "stable_found_upper95", "stable_found_n", "converged_share", "kr_stable_log", "found_ratio", "regime_asymptotic"]));
    const row = Object.fromEntries(header.map((h, k) => [h, table[1 + 2 * 3 + 1].split(",")[k]]));
    expect(row).toMatchObject({ i: "1", j: "2", mu: "1.25", tau: "1", state: "done", from_cache: "true", networks: "3", starts: "4" });
    expect(Number(row.stable_found)).toBe(c.stable.estimate);

    const json = await me.client.get(`/api/maps/${id}/export.json`);
    expect(json.status).toBe(200);
    expect(json.headers.get("content-disposition")).toMatch(/^attachment; filename="?cached-sweep\.json"?$/);
    expect(mapExportSchema.safeParse(json.body).success).toBe(true);
    const again = createMapSchema.safeParse(json.body.manifest);
    expect(again.success).toBe(true);
    expect(json.body).toMatchObject({ engineVersion: "dynamics-3", ensembleVersion: "1" });
    expect(json.body.cells).toHaveLength(9);
    // Recreating from the manifest hits the cache for every cell.
    const replay = await me.client.post("/api/maps", { ...json.body.manifest, estimateOnly: true });
    expect(replay.body).toMatchObject({ cells: 9, cachedCells: 9 });
    for (const layer of layerIds) expect((await me.client.get(`/api/maps/${id}/grid?layer=${layer}`)).status).toBe(200);
  });
});

describe("nothing is half-written", () => {
  async function ownerRow() {
    const me = await signedInPerson(app, "atomic");
    const [actor] = await app.database.db.select().from(users).where(eq(users.id, me.id));
    return { id: actor.id, email: actor.email, name: actor.name, siteRole: actor.siteRole };
  }

  it("an enqueue that fails after sending jobs leaves no map, no positions and no jobs", async () => {
    const actor = await ownerRow();
    const real = bossMapJobs(app.boss!);
    let sent: string[] = [];
    const failing: MapJobs = {
      enqueue: async (tx, jobs) => {
        sent = (await real.enqueue(tx, jobs)).fillCellIds;
        throw new Error("queue went away mid-create");
      },
      cancelFillCells: real.cancelFillCells,
    };
    const service = createMapsService({ db: app.database.db, groups: createGroupsService({ db: app.database.db }), appUrl: app.baseUrl, jobs: failing });
    const parsed = createMapSchema.parse(rateBody({ seed: 4242 }));
    await expect(service.create(actor, parsed)).rejects.toThrow("queue went away mid-create");
    expect(sent).toHaveLength(9);
    expect(await app.database.db.select().from(maps).where(eq(maps.ownerId, actor.id))).toHaveLength(0);
    const { rows } = await app.database.pool.query("select count(*)::int as n from pgboss.job where id = any($1::uuid[])", [sent]);
    expect(rows[0].n).toBe(0);
    const [{ n: orphans }] = await app.database.db.select({ n: count() }).from(mapCells).where(eq(mapCells.jobId, sent[0]));
    expect(orphans).toBe(0);
  });

  it("without a queue the create is refused with 503-style UNAVAILABLE and stores nothing", async () => {
    const actor = await ownerRow();
    const service = createMapsService({ db: app.database.db, groups: createGroupsService({ db: app.database.db }), appUrl: app.baseUrl, jobs: noMapJobs });
    await expect(service.create(actor, createMapSchema.parse(rateBody({ seed: 4343 })))).rejects.toMatchObject({ code: "UNAVAILABLE" });
    expect(await app.database.db.select().from(maps).where(eq(maps.ownerId, actor.id))).toHaveLength(0);
  });
});

describe("a field-network map", () => {
  it("carries asymptotic and finite-N Kac–Rice theory per cell once its rows are stored", async () => {
    const fieldBody = {
      ...rateBody({ title: "Landscape", budget: { networks: 2, starts: 4, tMax: 100 } }),
      ensemble: "field",
      settings: { N: 4, sigma: 1 },
      mu: { min: 1, max: 3, steps: 2 },
      tau: { min: 0.5, max: 0.5, steps: 1 },
    };
    const fieldSpec = { ensemble: "field", settings: fieldBody.settings, mu: fieldBody.mu, tau: fieldBody.tau, budget: fieldBody.budget, seed: 1 } as never;
    await fillCache(app.database.db, fieldSpec);
    const me = await signedInPerson(app, "field");
    const created = await me.client.post("/api/maps", fieldBody);
    expect(created.body).toMatchObject({ status: "done", cachedCells: 2, muCritical: 2 }); // μ_c = σ√N = 2
    const id = created.body.id as string;
    const regime = await me.client.get(`/api/maps/${id}/grid?layer=regime`);
    // m = μ/μ_c = 0.5 and 1.5 at τ = 0.5: m_st(0.5) = 0.316197 (science.md) < 0.5 < 1, so
    // "stable-rare" (code 1), then m > 1 "one-stable" (code 0) (Ben Arous, Fyodorov & Khoruzhenko 2021).
    expect(regime.body.values).toEqual([[1, 0]]);
    const total = await me.client.get(`/api/maps/${id}/grid?layer=sigma-total`);
    // Σ_tot(m) = (m² − 1)/2 − ln m for m < 1, 0 beyond (Fyodorov & Khoruzhenko 2016); at m = 0.5
    // 0.3181471805599453, computed with Python 3 math: (0.25 - 1)/2 - math.log(0.5).
    expect(total.body.values[0][0]).toBeCloseTo(0.318147, 5);
    expect(total.body.values[0][1]).toBe(0);
    const kr = await me.client.get(`/api/maps/${id}/grid?layer=kr-total`);
    expect(kr.body.cells[0].theory.krSamples).toBe(32);
    expect(kr.body.values[0].every((v: unknown) => typeof v === "number")).toBe(true);
    const cell = await me.client.get(`/api/maps/${id}/cells/0/0`);
    expect(cell.body.theory.finiteN).toMatchObject({ samples: 32, seed: 1 });
  });
});
