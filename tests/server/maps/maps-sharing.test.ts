import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { signedInPerson, startTestApp, type TestApp } from "../../helpers/test-app";
import { groupWithMembers, rateBody } from "./maps-fixtures";

// Group access (owner, editor, viewer), read-only share links and their revocation.

let app: TestApp;
beforeAll(async () => {
  app = await startTestApp({ queue: true });
});
afterAll(async () => {
  await app?.stop();
});

describe("group maps", () => {
  it("members read; editors update and cancel; viewers only read; outsiders get 404", async () => {
    const { owner, groupId, editor, viewer } = await groupWithMembers(app);
    const created = await owner.client.post("/api/maps", rateBody({ visibility: "group", groupId, title: "Shared leak sweep" }));
    expect(created.status).toBe(201);
    expect(created.body).toMatchObject({ groupId, groupName: "Attractor Reading Circle", visibility: "group" });
    const id = created.body.id as string;

    const seen = await viewer.client.get(`/api/maps/${id}`);
    expect(seen.status).toBe(200);
    expect(seen.body.access).toBe("viewer");
    expect((await viewer.client.get(`/api/maps/${id}/grid`)).status).toBe(200);
    expect((await viewer.client.patch(`/api/maps/${id}`, { title: "renamed" })).status).toBe(403);
    expect((await viewer.client.post(`/api/maps/${id}/cancel`)).status).toBe(403);
    expect((await viewer.client.post(`/api/maps/${id}/share`)).status).toBe(403);
    expect((await viewer.client.delete(`/api/maps/${id}/share`)).status).toBe(403);
    expect((await viewer.client.delete(`/api/maps/${id}`)).status).toBe(403);

    const edited = await editor.client.patch(`/api/maps/${id}`, { description: "edited by the editor" });
    expect(edited.status).toBe(200);
    expect(edited.body).toMatchObject({ access: "editor", description: "edited by the editor" });
    expect((await editor.client.delete(`/api/maps/${id}`)).status).toBe(403);
    expect((await editor.client.patch(`/api/maps/${id}`, { groupId: null, visibility: "private" })).status).toBe(403);

    const outsider = await signedInPerson(app, "outsider");
    expect((await outsider.client.get(`/api/maps/${id}`)).status).toBe(404);

    const shared = await viewer.client.get("/api/maps?scope=shared");
    expect(shared.body.items.map((m: { id: string }) => m.id)).toEqual([id]);
    expect((await viewer.client.get("/api/maps?scope=group")).body.items.map((m: { id: string }) => m.id)).toEqual([id]);
    expect((await viewer.client.get("/api/maps?scope=mine")).body.items).toEqual([]);
    expect((await owner.client.get("/api/maps?scope=shared")).body.items).toEqual([]);
    expect((await owner.client.get("/api/maps?scope=group")).body.items.map((m: { id: string }) => m.id)).toEqual([id]);

    expect((await editor.client.post(`/api/maps/${id}/cancel`)).body.status).toBe("cancelled");
  });

  it("only editors and owners of a group launch maps in it", async () => {
    const { groupId, editor, viewer } = await groupWithMembers(app);
    const denied = await viewer.client.post("/api/maps", rateBody({ visibility: "group", groupId }));
    expect(denied.status).toBe(403);
    const ok = await editor.client.post("/api/maps", rateBody({ visibility: "group", groupId }));
    expect(ok.status).toBe(201);
    const outsider = await signedInPerson(app, "gatecrasher");
    expect((await outsider.client.post("/api/maps", rateBody({ visibility: "group", groupId }))).status).toBe(404);
  });

  it("making a group map private hides it from the group", async () => {
    const { owner, groupId, viewer } = await groupWithMembers(app);
    const id = (await owner.client.post("/api/maps", rateBody({ visibility: "group", groupId }))).body.id;
    expect((await owner.client.patch(`/api/maps/${id}`, { visibility: "private" })).status).toBe(200);
    expect((await viewer.client.get(`/api/maps/${id}`)).status).toBe(404);
  });
});

describe("share links", () => {
  it("a token reads every read route, never writes, and stops working when revoked", async () => {
    const owner = await signedInPerson(app, "sharer");
    const id = (await owner.client.post("/api/maps", rateBody({ title: "Linked sweep" }))).body.id as string;
    expect((await app.client().post(`/api/maps/${id}/share`)).status).toBe(401);
    const share = await owner.client.post(`/api/maps/${id}/share`);
    expect(share.status).toBe(200);
    const token = share.body.token as string;
    expect(token).toMatch(/^[A-Za-z0-9_-]{32}$/); // 24 random bytes in base64url
    expect(share.body.url).toBe(`${app.baseUrl}/s/${token}`);
    expect((await owner.client.post(`/api/maps/${id}/share`)).body.token).toBe(token);
    const mine = await owner.client.get(`/api/maps/${id}`);
    expect(mine.body).toMatchObject({ visibility: "link", shareToken: token });

    const anon = app.client();
    const q = `?share=${encodeURIComponent(token)}`;
    expect((await anon.get(`/api/maps/${id}`)).status).toBe(401);
    const read = await anon.get(`/api/maps/${id}${q}`);
    expect(read.status).toBe(200);
    expect(read.body).toMatchObject({ access: "link", shareToken: null, title: "Linked sweep" });
    expect((await anon.get(`/api/shared/${token}`)).body).toMatchObject({ id, access: "link" });
    for (const path of ["grid?layer=converged&", "cells/0/0?", "export.csv?", "export.json?"]) {
      expect((await anon.get(`/api/maps/${id}/${path}share=${encodeURIComponent(token)}`)).status).toBe(200);
    }
    expect((await anon.get(`/api/maps/${id}?share=wrong-token`)).status).toBe(404);

    expect((await anon.patch(`/api/maps/${id}${q}`, { title: "defaced" })).status).toBe(401);
    expect((await anon.post(`/api/maps/${id}/cancel${q}`)).status).toBe(401);
    expect((await anon.delete(`/api/maps/${id}${q}`)).status).toBe(401);
    const stranger = await signedInPerson(app, "linkholder");
    expect((await stranger.client.get(`/api/maps/${id}${q}`)).body.access).toBe("link");
    expect((await stranger.client.patch(`/api/maps/${id}${q}`, { title: "defaced" })).status).toBe(403);
    expect((await stranger.client.post(`/api/maps/${id}/cancel${q}`)).status).toBe(403);
    expect((await stranger.client.post(`/api/maps/${id}/share${q}`)).status).toBe(403);
    expect((await stranger.client.get(`/api/maps/${id}`)).status).toBe(404);
    expect((await owner.client.get(`/api/maps/${id}`)).body.title).toBe("Linked sweep");

    const revoked = await owner.client.delete(`/api/maps/${id}/share`);
    expect(revoked.status).toBe(200);
    expect(revoked.body).toMatchObject({ shareToken: null, visibility: "private" });
    expect((await anon.get(`/api/maps/${id}${q}`)).status).toBe(404);
    expect((await anon.get(`/api/shared/${token}`)).status).toBe(404);
    expect((await anon.get(`/api/maps/${id}/grid${q}`)).status).toBe(404);
  });

  it("a new link after revocation is a new token; making the map private disables it", async () => {
    const owner = await signedInPerson(app, "resharer");
    const id = (await owner.client.post("/api/maps", rateBody())).body.id as string;
    const first = (await owner.client.post(`/api/maps/${id}/share`)).body.token;
    await owner.client.delete(`/api/maps/${id}/share`);
    const second = (await owner.client.post(`/api/maps/${id}/share`)).body.token;
    expect(second).not.toBe(first);
    expect((await app.client().get(`/api/shared/${second}`)).status).toBe(200);
    expect((await owner.client.patch(`/api/maps/${id}`, { visibility: "private" })).body.shareToken).toBeNull();
    expect((await app.client().get(`/api/shared/${second}`)).status).toBe(404);
    expect((await app.client().get(`/api/shared/${"x".repeat(101)}`)).status).toBe(422);
  });
});
