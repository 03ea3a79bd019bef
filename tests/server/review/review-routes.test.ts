import { readFileSync } from "node:fs";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { aboutSchema, mapBoundarySchema, mapComparisonSchema, mapReportSchema } from "../../../shared/schemas/review";
import { signedInPerson, startTestApp, type TestApp } from "../../helpers/test-app";
import { fillCache, groupWithMembers, missingId, rateBody } from "../maps/maps-fixtures";

// The review routes against the real app and PostgreSQL: replicate, import, compare, boundary,
// report, about, and the account preference; success paths and 401 / 403 / 404 / 422. Maps whose
// cells are all cached are done at creation, so no worker is needed here.

let app: TestApp;
beforeAll(async () => {
  app = await startTestApp({ queue: true });
});
afterAll(async () => {
  await app?.stop();
});

const budget = { networks: 4, starts: 6, tMax: 100 };
const body = rateBody({ title: "Review sweep", budget });
const specOf = (b: ReturnType<typeof rateBody>) => ({ ensemble: "rate", settings: b.settings, mu: b.mu, tau: b.tau, budget: b.budget, seed: b.seed }) as never;

describe("GET /api/about", () => {
  it("names the software version from package.json, the git commit and the engine", async () => {
    const pkg = JSON.parse(readFileSync("package.json", "utf8")) as { version: string };
    const res = await app.client().get("/api/about");
    expect(res.status).toBe(200);
    const about = aboutSchema.parse(res.body);
    expect(about.version).toBe(pkg.version);
    expect(about.commit).toMatch(/^([0-9a-f]{40}|unknown)$/);
    expect(about.ensembles.map((e) => e.id)).toEqual(expect.arrayContaining(["rate", "field"]));
  });
});

describe("account preferences", () => {
  it("reads and changes the map-finished e-mail preference; 401 signed out; 422 on bad bodies", async () => {
    expect((await app.client().get("/api/account/preferences")).status).toBe(401);
    const me = await signedInPerson(app, "prefs");
    expect((await me.client.get("/api/account/preferences")).body).toEqual({ notifyMapFinished: false });
    const on = await me.client.patch("/api/account/preferences", { notifyMapFinished: true });
    expect(on.status).toBe(200);
    expect(on.body).toEqual({ notifyMapFinished: true });
    expect((await me.client.get("/api/account/preferences")).body).toEqual({ notifyMapFinished: true });
    expect((await me.client.patch("/api/account/preferences", {})).status).toBe(422);
    const bad = await me.client.patch("/api/account/preferences", { notifyMapFinished: "yes" });
    expect(bad.status).toBe(422);
    expect(bad.body.error.issues[0].path).toBe("notifyMapFinished");
  });
});

describe("POST /api/maps/:id/replicate", () => {
  it("re-runs the manifest with a new seed as a linked map of the actor", async () => {
    const owner = await signedInPerson(app, "replicator");
    const original = await owner.client.post("/api/maps", body);
    const id = original.body.id as string;
    const chosen = await owner.client.post(`/api/maps/${id}/replicate`, { seed: 99 });
    expect(chosen.status).toBe(201);
    expect(chosen.body).toMatchObject({ replicateOf: id, seed: 99, ensemble: "rate", settings: original.body.settings, mu: original.body.mu, tau: original.body.tau, budget: original.body.budget, cells: 9, access: "owner" });
    expect(chosen.body.title).toMatch(/replicate, seed 99/);
    const random = await owner.client.post(`/api/maps/${id}/replicate`);
    expect(random.status).toBe(201);
    expect(random.body.seed).not.toBe(original.body.seed);
    expect(random.body.replicateOf).toBe(id);
  });

  it("401 signed out, 404 for strangers, 403 for viewers, 201 for editors; 422 on bad input", async () => {
    const { owner, groupId, editor, viewer } = await groupWithMembers(app);
    const created = await owner.client.post("/api/maps", rateBody({ title: "Group sweep", budget, visibility: "group", groupId }));
    const id = created.body.id as string;
    expect((await app.client().post(`/api/maps/${id}/replicate`)).status).toBe(401);
    const stranger = await signedInPerson(app, "stranger");
    expect((await stranger.client.post(`/api/maps/${id}/replicate`)).status).toBe(404);
    expect((await viewer.client.post(`/api/maps/${id}/replicate`)).status).toBe(403);
    const byEditor = await editor.client.post(`/api/maps/${id}/replicate`, { seed: 5 });
    expect(byEditor.status).toBe(201);
    expect(byEditor.body).toMatchObject({ ownerId: editor.id, groupId, visibility: "group", replicateOf: id });
    expect((await owner.client.post(`/api/maps/${id}/replicate`, { seed: -1 })).status).toBe(422);
    expect((await owner.client.post(`/api/maps/${id}/replicate`, { seed: 1.5 })).status).toBe(422);
    expect((await owner.client.post(`/api/maps/not-an-id/replicate`)).status).toBe(422);
    expect((await owner.client.post(`/api/maps/${missingId}/replicate`)).status).toBe(404);
    const share = await owner.client.post(`/api/maps/${id}/share`);
    expect((await app.client().post(`/api/maps/${id}/replicate?share=${share.body.token}`)).status).toBe(401);
    expect((await stranger.client.post(`/api/maps/${id}/replicate?share=${share.body.token}`)).status).toBe(403);
  });
});

describe("POST /api/maps/import", () => {
  it("recreates a map from an export's manifest; every cell comes from the cache", async () => {
    const author = await signedInPerson(app, "author");
    const importBody = rateBody({ title: "Published sweep", budget, seed: 12 });
    await fillCache(app.database.db, specOf(importBody));
    const published = await author.client.post("/api/maps", importBody);
    const exported = await author.client.get(`/api/maps/${published.body.id}/export.json`);
    const reviewer = await signedInPerson(app, "reviewer");
    const imported = await reviewer.client.post("/api/maps/import", { manifest: exported.body.manifest });
    expect(imported.status).toBe(201);
    expect(imported.body).toMatchObject({ title: "Published sweep", ownerId: reviewer.id, visibility: "private", seed: 12, cells: 9, cachedCells: 9, status: "done", cellsComputed: 0, cellsFromCache: 9 });
    const again = await reviewer.client.get(`/api/maps/${imported.body.id}/export.json`);
    const keys = (e: { cells: { i: number; j: number; cellKey: string }[] }) => e.cells.map((c) => `${c.i},${c.j}:${c.cellKey}`);
    expect(keys(again.body)).toEqual(keys(exported.body));
    expect(again.body.cells.every((c: { fromCache: boolean }) => c.fromCache)).toBe(true);
  });

  it("422 naming the manifest's field or limit; 401 signed out", async () => {
    const me = await signedInPerson(app, "importer");
    const manifest = { ...body, settings: { ...body.settings, N: 1000 } };
    const tooBig = await me.client.post("/api/maps/import", { manifest });
    expect(tooBig.status).toBe(422);
    expect(tooBig.body.error.issues.map((i: { path: string }) => i.path)).toContain("manifest.settings.N");
    const limit = await me.client.post("/api/maps/import", { manifest: { ...body, budget: { networks: 64, starts: 256 } } });
    expect(limit.status).toBe(422);
    expect(limit.body.error.message).toMatch(/runs per cell/);
    expect((await me.client.post("/api/maps/import", { manifest: "nope" })).status).toBe(422);
    expect((await me.client.post("/api/maps/import", {})).status).toBe(422);
    expect((await app.client().post("/api/maps/import", { manifest: body })).status).toBe(401);
  });
});

describe("compare, boundary and report", () => {
  it("compares two done maps on one grid cell by cell; 422 for different grids", async () => {
    const me = await signedInPerson(app, "comparer");
    const a = rateBody({ title: "A", budget, seed: 21 });
    const b = rateBody({ title: "B", budget, seed: 22 });
    await fillCache(app.database.db, specOf(a));
    await fillCache(app.database.db, specOf(b));
    const ma = (await me.client.post("/api/maps", a)).body;
    const mb = (await me.client.post("/api/maps", b)).body;
    const res = await me.client.get(`/api/maps/${ma.id}/compare/${mb.id}`);
    expect(res.status).toBe(200);
    const cmp = mapComparisonSchema.parse(res.body);
    expect(cmp.cells).toHaveLength(9);
    expect(cmp.summary).toMatchObject({ cells: 9, tested: 9, differingSettings: ["seed"] });
    expect(cmp.summary.agreeShare).toBeCloseTo(cmp.summary.agreeing / 9, 12);
    for (const c of cmp.cells) {
      expect(c.a.networks).toBe(4);
      expect(c.difference.stableFound).toBeCloseTo(c.a.stableFound! - c.b.stableFound!, 12);
      expect(c.agree).toBe(c.welch!.pValue >= 0.05);
    }
    const self = (await me.client.get(`/api/maps/${ma.id}/compare/${ma.id}`)).body;
    expect(self.summary.agreeing).toBe(9); // identical samples: p = 1 everywhere

    const other = await me.client.post("/api/maps", rateBody({ title: "C", budget, mu: { min: 0.5, max: 3, steps: 3 } }));
    const mismatch = await me.client.get(`/api/maps/${ma.id}/compare/${other.body.id}`);
    expect(mismatch.status).toBe(422);
    expect(mismatch.body.error.message).toMatch(/μ axes differ/);
  });

  it("answers the boundary per τ row and the report's facts; 401 / 404 / 422", async () => {
    const me = await signedInPerson(app, "bounder");
    const b = rateBody({ title: "Boundary sweep", budget, seed: 21 });
    await fillCache(app.database.db, specOf(b));
    const map = (await me.client.post("/api/maps", b)).body;
    const res = await me.client.get(`/api/maps/${map.id}/boundary`);
    expect(res.status).toBe(200);
    const boundary = mapBoundarySchema.parse(res.body);
    expect(boundary.rows.map((r) => r.tau)).toEqual([0, 0.5, 1]);
    for (const r of boundary.rows) {
      expect(r.predictedMu).toBeCloseTo(1 * (1 + r.tau), 12); // rate origin line μ = g(1 + τ), g = 1 (Sommers et al. 1988)
      expect(r.predictedMuStable).toBeNull();
      expect(r.networks).toBe(4);
      expect(r.cellsUsed).toBe(3);
    }
    const replicate = await me.client.post(`/api/maps/${map.id}/replicate`, { seed: 3 });
    const report = await me.client.get(`/api/maps/${map.id}/report`);
    expect(report.status).toBe(200);
    const facts = mapReportSchema.parse(report.body);
    expect(facts.computeSeconds).toBeGreaterThan(0);
    expect(facts.cellsStored).toBe(9);
    expect(facts.related).toEqual([expect.objectContaining({ id: replicate.body.id, relation: "replicate", seed: 3 })]);
    const back = mapReportSchema.parse((await me.client.get(`/api/maps/${replicate.body.id}/report`)).body);
    expect(back.related).toEqual([expect.objectContaining({ id: map.id, relation: "original" })]);

    const stranger = await signedInPerson(app, "nosy");
    for (const path of [`/api/maps/${map.id}/boundary`, `/api/maps/${map.id}/report`, `/api/maps/${map.id}/compare/${replicate.body.id}`]) {
      expect((await app.client().get(path)).status).toBe(401);
      expect((await stranger.client.get(path)).status).toBe(404);
    }
    expect((await me.client.get(`/api/maps/${map.id}/compare/${missingId}`)).status).toBe(404);
    expect((await me.client.get(`/api/maps/${map.id}/compare/xyz`)).status).toBe(422);
    expect((await me.client.get(`/api/maps/xyz/boundary`)).status).toBe(422);
    const link = await me.client.post(`/api/maps/${map.id}/share`);
    expect((await app.client().get(`/api/maps/${map.id}/boundary?share=${link.body.token}`)).status).toBe(200);
  });
});
