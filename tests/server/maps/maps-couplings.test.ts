import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { parseNpy } from "../../../server/engine/io/npy";
import { rateCouplings, rateEnsemble } from "../../../server/engine/ensembles/rate/rate.ensemble";
import { signedInPerson, startTestApp, type TestApp } from "../../helpers/test-app";
import { rateBody } from "./maps-fixtures";

// GET /api/maps/:id/cells/:i/:j/networks/:k/couplings.(npy|csv): the coupling matrix a cell's
// network k was built from, regenerated from its seed (common random numbers).

let app: TestApp;
beforeAll(async () => {
  app = await startTestApp({ queue: true });
});
afterAll(async () => {
  await app?.stop();
});

async function linkedMap() {
  const me = await signedInPerson(app, "coupler");
  const map = await me.client.post("/api/maps", rateBody({ seed: 77 }));
  expect(map.status).toBe(201);
  const share = await me.client.post(`/api/maps/${map.body.id}/share`);
  return { me, id: map.body.id as string, token: share.body.token as string };
}

describe("network couplings download", () => {
  it("serves J of network k at the cell's τ as .npy and CSV, equal to the engine's draw", async () => {
    const { id, token } = await linkedMap();
    // Position (i = 1, j = 2): μ = 1.25, τ = 1 on rateBody's axes; network k = 3 of seed 77.
    const params = rateEnsemble.validate({ N: 6, g: 1, nonlinearity: "tanh", input: 0 });
    const expected = rateCouplings(params, rateEnsemble.draw(params, 77, 3), 1);
    const npy = await fetch(`${app.baseUrl}/api/maps/${id}/cells/1/2/networks/3/couplings.npy?share=${token}`);
    expect(npy.status).toBe(200);
    expect(npy.headers.get("content-disposition")).toMatch(/attachment; filename="?[a-z0-9-]*couplings\.npy/);
    const parsed = parseNpy(new Uint8Array(await npy.arrayBuffer()));
    expect(parsed.shape).toEqual([6, 6]);
    expect(Array.from(parsed.data)).toEqual(Array.from(expected));
    // τ = 1 is the symmetric end: J equals its transpose (science.md §2, corr(J_ij, J_ji) = τ).
    for (let a = 0; a < 6; a++) for (let b = 0; b < 6; b++) expect(parsed.data[a * 6 + b]).toBe(parsed.data[b * 6 + a]);
    const csv = await (await fetch(`${app.baseUrl}/api/maps/${id}/cells/1/2/networks/3/couplings.csv?share=${token}`)).text();
    const rows = csv.trim().split("\n").map((r) => r.split(",").map(Number));
    expect(rows).toHaveLength(6);
    expect(rows.flat()).toEqual(Array.from(expected));
  });

  it("answers 404 off the grid or past the networks, 404 for another account, 401 signed out, 422 for a bad format", async () => {
    const { me, id } = await linkedMap();
    expect((await me.client.get(`/api/maps/${id}/cells/0/0/networks/4/couplings.csv`)).status).toBe(404);
    expect((await me.client.get(`/api/maps/${id}/cells/3/0/networks/0/couplings.csv`)).status).toBe(404);
    expect((await me.client.get(`/api/maps/${id}/cells/0/0/networks/0/couplings.csv`)).status).toBe(200);
    const other = await signedInPerson(app, "snoop");
    const priv = await me.client.post("/api/maps", rateBody({ seed: 78 }));
    expect((await other.client.get(`/api/maps/${priv.body.id}/cells/0/0/networks/0/couplings.csv`)).status).toBe(404);
    expect((await app.client().get(`/api/maps/${priv.body.id}/cells/0/0/networks/0/couplings.csv`)).status).toBe(401);
    const bad = await me.client.get(`/api/maps/${id}/cells/0/0/networks/0/couplings.mat`);
    expect(bad.status).toBe(422);
    expect(bad.body.error.issues[0].path).toBe("format");
  });

  it("answers 422 for the field network, which has no coupling matrix", async () => {
    const me = await signedInPerson(app, "fielder");
    const map = await me.client.post("/api/maps", rateBody({ ensemble: "field", settings: { N: 3, sigma: 1 } }));
    expect(map.status).toBe(201);
    const res = await me.client.get(`/api/maps/${map.body.id}/cells/0/0/networks/0/couplings.npy`);
    expect(res.status).toBe(422);
    expect(res.body.error.message).toMatch(/no coupling matrix/);
  });
});
