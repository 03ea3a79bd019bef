import { eq } from "drizzle-orm";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { mapCells, maps } from "../../../server/db/schema/index";
import { mapSchema } from "../../../shared/schemas/maps";
import { signedInPerson, startTestApp, type TestApp } from "../../helpers/test-app";
import { jobsOf, missingId, rateBody } from "./maps-fixtures";

// Every maps route through the real app and PostgreSQL, with pg-boss receiving the jobs (no
// worker runs them here: maps stay queued unless their cells were cached).

let app: TestApp;
beforeAll(async () => {
  app = await startTestApp({ queue: true });
});
afterAll(async () => {
  await app?.stop();
});

describe("POST /api/maps", () => {
  it("creates a queued map with one fill-cell job per cell and one theory-row job per τ row", async () => {
    const me = await signedInPerson(app, "maker");
    const res = await me.client.post("/api/maps", rateBody());
    expect(res.status).toBe(201);
    expect(mapSchema.safeParse(res.body).success).toBe(true);
    expect(res.body).toMatchObject({
      title: "Leak sweep", ensemble: "rate", status: "queued", access: "owner", ownerId: me.id,
      cellsTotal: 9, cellsDone: 0, cellsComputed: 0, cellsFromCache: 0, cells: 9, cachedCells: 0,
      muCritical: 1, throughput: null, etaSeconds: null, shareToken: null,
    });
    expect(res.body.estimatedSeconds).toBeGreaterThan(0);
    expect(res.body.budget).toEqual({ networks: 4, starts: 8, tMax: 200, rtol: 1e-6, atol: 1e-9, exhaustive: false });
    expect(await jobsOf(app.database.db, "fill-cell", res.body.id)).toEqual({ created: 9 });
    const positions = await app.database.db.select().from(mapCells).where(eq(mapCells.mapId, res.body.id));
    expect(positions).toHaveLength(9);
    expect(positions.every((p) => p.state === "pending" && p.jobId !== null && !p.fromCache)).toBe(true);
    expect(new Set(positions.map((p) => p.cellKey)).size).toBe(9);
    expect(new Set(positions.map((p) => p.theoryKey)).size).toBe(3);
  });

  it("estimateOnly answers the estimate and stores nothing", async () => {
    const me = await signedInPerson(app, "estimator");
    const res = await me.client.post("/api/maps", rateBody({ estimateOnly: true }));
    expect(res.status).toBe(200);
    expect(Object.keys(res.body).sort((a, b) => a.localeCompare(b))).toEqual(["cachedCells", "cells", "estimatedSeconds"]);
    expect(res.body).toMatchObject({ cells: 9, cachedCells: 0 });
    expect(res.body.estimatedSeconds).toBeGreaterThan(0);
    expect(await app.database.db.select().from(maps).where(eq(maps.ownerId, me.id))).toHaveLength(0);
    expect((await me.client.get("/api/maps?scope=mine")).body.items).toEqual([]);
  });

  it("answers 401 signed out and 422 with field issues for a bad body", async () => {
    expect((await app.client().post("/api/maps", rateBody())).status).toBe(401);
    const me = await signedInPerson(app, "sloppy");
    const bad = await me.client.post("/api/maps", rateBody({ title: " ", mu: { min: 2, max: 1, steps: 3 }, tau: { min: 0, max: 1.5, steps: 3 } }));
    expect(bad.status).toBe(422);
    const paths = bad.body.error.issues.map((i: { path: string }) => i.path);
    expect(paths).toEqual(expect.arrayContaining(["title", "mu.max", "tau.max"]));
    const group = await me.client.post("/api/maps", rateBody({ visibility: "group" }));
    expect(group.status).toBe(422);
    expect(group.body.error.issues[0].path).toBe("groupId");
    const unknown = await me.client.post("/api/maps", rateBody({ ensemble: "spin-glass" }));
    expect(unknown.status).toBe(422);
  });

  it("enforces the limits with 422 naming the limit and the field", async () => {
    const me = await signedInPerson(app, "greedy");
    const grid = await me.client.post("/api/maps", rateBody({ mu: { min: 0.5, max: 2, steps: 65 } }));
    expect(grid.status).toBe(422);
    expect(grid.body.error.issues[0]).toMatchObject({ path: "mu.steps", message: expect.stringContaining("64") });
    const n = await me.client.post("/api/maps", rateBody({ settings: { N: 501, g: 1 } }));
    expect(n.status).toBe(422);
    expect(n.body.error.issues[0]).toMatchObject({ path: "settings.N" });
    const fieldN = await me.client.post("/api/maps", rateBody({ ensemble: "field", settings: { N: 201, sigma: 1 } }));
    expect(fieldN.status).toBe(422);
    expect(fieldN.body.error.issues[0].path).toBe("settings.N");
    const runs = await me.client.post("/api/maps", rateBody({ budget: { networks: 64, starts: 64 } }));
    expect(runs.status).toBe(422);
    expect(runs.body.error.issues).toEqual([{ path: "budget.starts", message: expect.stringMatching(/runs per cell.*2048.*4096/) }]);
    expect(await app.database.db.select().from(maps).where(eq(maps.ownerId, me.id))).toHaveLength(0);
  });

  it("lets admins spend more per cell", async () => {
    const admin = await signedInPerson(app, "admin");
    await app.makeAdmin(admin.email);
    const body = rateBody({ budget: { networks: 64, starts: 64 }, mu: { min: 1, max: 1, steps: 1 }, tau: { min: 0.5, max: 0.5, steps: 1 } });
    const res = await admin.client.post("/api/maps", { ...body, estimateOnly: true });
    expect(res.status).toBe(200);
    expect(res.body).toMatchObject({ cells: 1, cachedCells: 0 });
  });

  it("allows at most 3 maps in flight per member", async () => {
    const me = await signedInPerson(app, "busy");
    for (let k = 0; k < 3; k++) expect((await me.client.post("/api/maps", rateBody({ seed: 100 + k }))).status).toBe(201);
    const fourth = await me.client.post("/api/maps", rateBody({ seed: 200 }));
    expect(fourth.status).toBe(422);
    expect(fourth.body.error.message).toMatch(/maps in flight.*at most 3/);
    const estimate = await me.client.post("/api/maps", rateBody({ seed: 200, estimateOnly: true }));
    expect(estimate.status).toBe(200);
    const first = (await me.client.get("/api/maps?scope=mine")).body.items[0];
    expect((await me.client.post(`/api/maps/${first.id}/cancel`)).status).toBe(200);
    expect((await me.client.post("/api/maps", rateBody({ seed: 200 }))).status).toBe(201);
  });
});

describe("GET, PATCH, DELETE /api/maps/:id and cancel", () => {
  it("reads, renames and deletes my map; another account's private map is 404", async () => {
    const me = await signedInPerson(app, "owner");
    const created = (await me.client.post("/api/maps", rateBody())).body;
    const got = await me.client.get(`/api/maps/${created.id}`);
    expect(got.status).toBe(200);
    expect(got.body).toMatchObject({ id: created.id, status: "queued", cellsTotal: 9, cellsDone: 0, cellsComputed: 0, cellsFromCache: 0 });
    const renamed = await me.client.patch(`/api/maps/${created.id}`, { title: "Leak sweep, take 2", description: "g = 1" });
    expect(renamed.status).toBe(200);
    expect(renamed.body).toMatchObject({ title: "Leak sweep, take 2", description: "g = 1" });

    const stranger = await signedInPerson(app, "stranger");
    expect((await stranger.client.get(`/api/maps/${created.id}`)).status).toBe(404);
    expect((await stranger.client.patch(`/api/maps/${created.id}`, { title: "mine now" })).status).toBe(404);
    expect((await stranger.client.delete(`/api/maps/${created.id}`)).status).toBe(404);
    expect((await app.client().get(`/api/maps/${created.id}`)).status).toBe(401);
    expect((await me.client.get(`/api/maps/${missingId}`)).status).toBe(404);
    expect((await me.client.get("/api/maps/not-a-uuid")).status).toBe(422);
    expect((await me.client.patch(`/api/maps/${created.id}`, {})).status).toBe(422);
    expect((await me.client.patch(`/api/maps/${created.id}`, { visibility: "group" })).body.error.issues[0].path).toBe("groupId");

    expect((await me.client.delete(`/api/maps/${created.id}`)).status).toBe(204);
    expect((await me.client.get(`/api/maps/${created.id}`)).status).toBe(404);
    expect(await jobsOf(app.database.db, "fill-cell", created.id)).toEqual({ cancelled: 9 });
  });

  it("cancel stops the queued cells and cancels their jobs; a second cancel is 409", async () => {
    const me = await signedInPerson(app, "canceller");
    const created = (await me.client.post("/api/maps", rateBody())).body;
    expect((await app.client().post(`/api/maps/${created.id}/cancel`)).status).toBe(401);
    const res = await me.client.post(`/api/maps/${created.id}/cancel`);
    expect(res.status).toBe(200);
    expect(res.body).toMatchObject({ status: "cancelled", etaSeconds: null });
    expect(res.body.finishedAt).not.toBeNull();
    expect(await jobsOf(app.database.db, "fill-cell", created.id)).toEqual({ cancelled: 9 });
    const states = await app.database.db.select({ state: mapCells.state }).from(mapCells).where(eq(mapCells.mapId, created.id));
    expect(states.every((s) => s.state === "cancelled")).toBe(true);
    const again = await me.client.post(`/api/maps/${created.id}/cancel`);
    expect(again.status).toBe(409);
    expect((await me.client.post(`/api/maps/${missingId}/cancel`)).status).toBe(404);
  });
});

describe("GET /api/maps (list)", () => {
  it("lists my maps, searches and sorts; 401 signed out; 422 for a bad scope", async () => {
    const me = await signedInPerson(app, "lister");
    await me.client.post("/api/maps", rateBody({ title: "Beta sweep", seed: 3 }));
    await me.client.post("/api/maps", rateBody({ title: "Alpha sweep", seed: 4, description: "strong coupling" }));
    const byTitle = await me.client.get("/api/maps?scope=mine&sort=title");
    expect(byTitle.status).toBe(200);
    expect(byTitle.body.items.map((m: { title: string }) => m.title)).toEqual(["Alpha sweep", "Beta sweep"]);
    const newest = await me.client.get("/api/maps");
    expect(newest.body.items.map((m: { title: string }) => m.title)).toEqual(["Alpha sweep", "Beta sweep"]);
    const oldest = await me.client.get("/api/maps?sort=oldest");
    expect(oldest.body.items.map((m: { title: string }) => m.title)).toEqual(["Beta sweep", "Alpha sweep"]);
    const found = await me.client.get("/api/maps?q=STRONG");
    expect(found.body.items.map((m: { title: string }) => m.title)).toEqual(["Alpha sweep"]);
    expect((await me.client.get("/api/maps?scope=shared")).body.items).toEqual([]);
    expect((await app.client().get("/api/maps")).status).toBe(401);
    expect((await me.client.get("/api/maps?scope=everything")).status).toBe(422);
  });
});

describe("grid and cell routes of a map still filling", () => {
  it("shows every position pending with null values; a cell off the grid is 404", async () => {
    const me = await signedInPerson(app, "watcher");
    const created = (await me.client.post("/api/maps", rateBody())).body;
    const grid = await me.client.get(`/api/maps/${created.id}/grid?layer=converged`);
    expect(grid.status).toBe(200);
    expect(grid.body.layer).toBe("converged");
    expect(grid.body.mu).toEqual([0.5, 1.25, 2]);
    expect(grid.body.tau).toEqual([0, 0.5, 1]);
    expect(grid.body.values).toEqual([[null, null, null], [null, null, null], [null, null, null]]);
    expect(grid.body.cells).toHaveLength(9);
    expect(grid.body.cells[0]).toMatchObject({ i: 0, j: 0, state: "pending", networks: 4, starts: 8, stable: null, theory: null });
    expect((await me.client.get(`/api/maps/${created.id}/grid?layer=loudness`)).status).toBe(422);
    const cell = await me.client.get(`/api/maps/${created.id}/cells/2/1`);
    expect(cell.status).toBe(200);
    expect(cell.body).toMatchObject({ result: null, theory: null, fromCache: false, summary: { i: 2, j: 1, mu: 2, tau: 0.5 } });
    expect(cell.body.cellKey).toMatch(/^[0-9a-f]{64}$/);
    expect((await me.client.get(`/api/maps/${created.id}/cells/3/0`)).status).toBe(404);
    expect((await me.client.get(`/api/maps/${created.id}/cells/64/0`)).status).toBe(422);
    expect((await app.client().get(`/api/maps/${created.id}/grid`)).status).toBe(401);
    const stranger = await signedInPerson(app, "peeker");
    expect((await stranger.client.get(`/api/maps/${created.id}/grid`)).status).toBe(404);
    expect((await stranger.client.get(`/api/maps/${created.id}/cells/0/0`)).status).toBe(404);
    expect((await stranger.client.get(`/api/maps/${created.id}/export.csv`)).status).toBe(404);
    expect((await stranger.client.get(`/api/maps/${created.id}/export.json`)).status).toBe(404);
  });
});
