import { readFileSync } from "node:fs";
import path from "node:path";
import { count, sql } from "drizzle-orm";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { probes } from "../../../server/db/schema/index";
import { signedInPerson, startTestApp, type TestApp } from "../../helpers/test-app";
import { groupWithMembers } from "../maps/maps-fixtures";
import { FIXTURES, fixture, uploadProbe } from "./probe-upload";

// The probes API against the real app and PostgreSQL (pg-boss started, no worker): uploads in
// every format, refusals with their messages (nothing stored), access rules, starting a search.

const REF = JSON.parse(readFileSync(path.resolve(import.meta.dirname, "../../reference/probe-stats.json"), "utf8"));

let app: TestApp;
beforeAll(async () => {
  app = await startTestApp({ queue: true });
});
afterAll(async () => {
  await app?.stop();
});

async function stored(): Promise<number> {
  const [row] = await app.database.db.select({ n: count() }).from(probes);
  return row.n;
}

describe("POST /api/probes", () => {
  it("stores a .npy upload and answers its estimates and spectrum", async () => {
    const me = await signedInPerson(app, "uploader");
    const res = await uploadProbe(app.baseUrl, me.client, [fixture("probe-40.npy")], { mu: "1.2", title: "Trained network 7" });
    expect(res.status).toBe(201);
    expect(res.body).toMatchObject({ n: 40, mu: 1.2, nonlinearity: "tanh", format: "npy", title: "Trained network 7", fileName: "probe-40.npy", status: "ready", access: "owner", input: null });
    // numpy 2.4.6 values of the same file (tests/reference/probe-stats.json).
    expect(res.body.gEstimate).toBeCloseTo(REF.gEstimate, 12);
    expect(res.body.tauEstimate).toBeCloseTo(REF.tauEstimate, 12);
    expect(res.body.stats.g.se).toBeGreaterThan(0);
    const ours = (res.body.spectrum.re as number[]).map((re, k) => [re, res.body.spectrum.im[k] as number]).sort((a, b) => a[0] - b[0] || a[1] - b[1]);
    // numpy.linalg.eigvals of probe-40.npy, sorted by (Re, Im).
    (REF.eigenvalues as number[][]).forEach(([re, im], k) => {
      expect(ours[k][0]).toBeCloseTo(re, 9);
      expect(ours[k][1]).toBeCloseTo(im, 9);
    });
    const got = await me.client.get(`/api/probes/${res.body.id}`);
    expect(got.status).toBe(200);
    expect(got.body.stats).toEqual(res.body.stats);
  });

  it("takes CSV with an input vector, and Matrix Market files", async () => {
    const me = await signedInPerson(app, "csv");
    const csv = await uploadProbe(app.baseUrl, me.client, [fixture("good-4.csv"), fixture("input-4.csv", "input")], { mu: "0.8", nonlinearity: "tanh" });
    expect(csv.status).toBe(201);
    const values = JSON.parse(readFileSync(path.join(FIXTURES, "input-4.json"), "utf8")).values as number[];
    expect(csv.body.input.mean).toBeCloseTo(values.reduce((a, b) => a + b, 0) / 4, 14);
    expect(csv.body.input.max).toBe(Math.max(...values));
    const mtx = await uploadProbe(app.baseUrl, me.client, [fixture("coordinate-4.mtx")]);
    expect(mtx.status).toBe(201);
    expect(mtx.body).toMatchObject({ n: 4, format: "mtx", title: "coordinate-4" });
    expect((await me.client.get("/api/probes")).body.items.map((p: { id: string }) => p.id)).toEqual([mtx.body.id, csv.body.id]);
  });

  it("refuses signed-out uploads (401) and bad files with their problem (422), storing nothing", async () => {
    const before = await stored();
    expect((await uploadProbe(app.baseUrl, null, [fixture("good-4.csv")])).status).toBe(401);
    const me = await signedInPerson(app, "careless");
    const cases: [ReturnType<typeof fixture>[], Record<string, string>, RegExp][] = [
      [[fixture("ragged.csv")], { mu: "1" }, /row 3 has 2 values/],
      [[fixture("header.csv")], { mu: "1" }, /row 1 looks like a header/],
      [[fixture("complex.npy")], { mu: "1" }, /complex dtype/],
      [[fixture("big-endian.npy")], { mu: "1" }, /big-endian/],
      [[fixture("wrong-count.mtx")], { mu: "1" }, /wrong count/],
      [[{ field: "matrix", name: "couplings.txt", bytes: Buffer.from("1,2\n3,4\n") }], { mu: "1" }, /extension "\.txt"/],
      [[fixture("good-4.csv"), fixture("input-5.npy", "input")], { mu: "1" }, /Input vector: expected 4 values/],
      [[], { mu: "1" }, /Attach the coupling matrix/],
      [[{ field: "weights", name: "w.csv", bytes: Buffer.from("1") }], { mu: "1" }, /Unexpected file field "weights"/],
    ];
    for (const [parts, fields, message] of cases) {
      const res = await uploadProbe(app.baseUrl, me.client, parts, fields);
      expect(res.status, String(message)).toBe(422);
      expect(res.body.error.message).toMatch(message);
    }
    const noMu = await uploadProbe(app.baseUrl, me.client, [fixture("good-4.csv")], {});
    expect(noMu.status).toBe(422);
    expect(noMu.body.error.issues).toEqual([{ path: "mu", message: expect.stringMatching(/μ/) }]);
    expect((await uploadProbe(app.baseUrl, me.client, [fixture("good-4.csv")], { mu: "-1" })).body.error.issues[0].path).toBe("mu");
    expect(await stored()).toBe(before);
  });

  it("answers 413 with the limit for a file over 40 MB, storing nothing", async () => {
    const before = await stored();
    const me = await signedInPerson(app, "bulky");
    const big = { field: "matrix", name: "huge.csv", bytes: new Uint8Array(40 * 1024 * 1024 + 1).fill(0x31) };
    const res = await uploadProbe(app.baseUrl, me.client, [big]);
    expect(res.status).toBe(413);
    expect(res.body.error).toMatchObject({ code: "PAYLOAD_TOO_LARGE", message: "The matrix file is larger than the upload limit of 40 MB" });
    expect(await stored()).toBe(before);
  });
});

describe("access and searches", () => {
  it("group viewers read, editors search, outsiders get 404, only the owner deletes", async () => {
    const { owner, groupId, editor, viewer } = await groupWithMembers(app);
    const up = await uploadProbe(app.baseUrl, owner.client, [fixture("f64-5.npy")], { mu: "1", groupId });
    expect(up.status).toBe(201);
    const id = up.body.id as string;
    expect(up.body).toMatchObject({ groupId, groupName: "Attractor Reading Circle" });

    expect((await viewer.client.get(`/api/probes/${id}`)).body.access).toBe("viewer");
    expect((await viewer.client.get("/api/probes")).body.items.map((p: { id: string }) => p.id)).toContain(id);
    const denied = await viewer.client.post(`/api/probes/${id}/search`, {});
    expect(denied.status).toBe(403);
    expect((await viewer.client.delete(`/api/probes/${id}`)).status).toBe(403);

    const outsider = await signedInPerson(app, "outsider");
    expect((await outsider.client.get(`/api/probes/${id}`)).status).toBe(404);
    expect((await outsider.client.post(`/api/probes/${id}/search`, {})).status).toBe(404);
    expect((await outsider.client.get("/api/probes")).body.items).toEqual([]);
    expect((await app.client().get(`/api/probes/${id}`)).status).toBe(401);

    const started = await editor.client.post(`/api/probes/${id}/search`, { starts: 16, compareNetworks: 2 });
    expect(started.status).toBe(202);
    expect(started.body.status).toBe("searching");
    expect(started.body.search).toMatchObject({ settings: { starts: 16, compareNetworks: 2, tMax: 200, rtol: 1e-6, atol: 1e-9, seed: 1 }, startsDone: 0, startedAt: null });
    const jobs = await app.database.db.execute(sql`select data from pgboss.job where name = 'probe-search'`);
    expect(jobs.rows).toContainEqual({ data: { probeId: id, searchId: started.body.search.id } });
    const again = await owner.client.post(`/api/probes/${id}/search`, {});
    expect(again.status).toBe(409);

    expect((await editor.client.delete(`/api/probes/${id}`)).status).toBe(403);
    expect((await owner.client.delete(`/api/probes/${id}`)).status).toBe(204);
    expect((await owner.client.get(`/api/probes/${id}`)).status).toBe(404);
  });

  it("validates search settings and the work limit (422 naming them)", async () => {
    const me = await signedInPerson(app, "ambitious");
    const n = 900;
    const diag = Array.from({ length: n }, (_, i) => `${i + 1} ${i + 1} ${(-1) ** i * 0.5}`).join("\n");
    const body = Buffer.from(`%%MatrixMarket matrix coordinate real general\n${n} ${n} ${n}\n${diag}\n`);
    const up = await uploadProbe(app.baseUrl, me.client, [{ field: "matrix", name: "diag.mtx", bytes: body }]);
    expect(up.status).toBe(201);
    const over = await me.client.post(`/api/probes/${up.body.id}/search`, { starts: 512, compareNetworks: 16 });
    expect(over.status).toBe(422);
    expect(over.body.error.message).toMatch(/Limit "search work \(N² × starts × \(1 \+ comparison networks\)\)": at most 6\.0e\+8 for members, got 7\.05e\+9/);
    const bad = await me.client.post(`/api/probes/${up.body.id}/search`, { starts: 0, compareNetworks: 17, rtol: 1 });
    expect(bad.status).toBe(422);
    expect(bad.body.error.issues.map((i: { path: string }) => i.path).sort()).toEqual(["compareNetworks", "rtol", "starts"]);
    expect((await me.client.get(`/api/probes/${up.body.id}/equilibria/0`)).status).toBe(404);
  });
});
