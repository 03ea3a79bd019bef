import { eq } from "drizzle-orm";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { groupInvites } from "../../../server/db/schema/index";
import { createGroupsService } from "../../../server/modules/groups/groups.service";
import { signedInPerson, startTestApp, tokenFromMail, type TestApp } from "../../helpers/test-app";

let app: TestApp;
beforeAll(async () => {
  app = await startTestApp();
});
afterAll(async () => {
  await app?.stop();
});

const missing = "00000000-0000-4000-8000-000000000000";

async function groupWithOwner(name = "Lab") {
  const owner = await signedInPerson(app, "owner");
  const res = await owner.client.post("/api/groups", { name });
  expect(res.status).toBe(201);
  return { owner, group: res.body as { id: string; name: string } };
}

/** Adds a freshly registered person to the group with `role` through the invite flow. */
async function addMember(groupId: string, inviter: Awaited<ReturnType<typeof signedInPerson>>, role: string) {
  const person = await signedInPerson(app, role);
  const invite = await inviter.client.post(`/api/groups/${groupId}/invites`, { email: person.email, role });
  expect(invite.status).toBe(201);
  const token = tokenFromMail((await app.lastMailTo(person.email)).text, "invite");
  expect((await person.client.post(`/api/invites/${token}/accept`)).status).toBe(200);
  return person;
}

describe("create, list and read groups", () => {
  it("creates a group owned by its creator and lists it", async () => {
    const { owner, group } = await groupWithOwner("Hopf Bifurcation Club");
    expect(group).toMatchObject({ name: "Hopf Bifurcation Club", myRole: "owner", memberCount: 1 });
    const list = await owner.client.get("/api/groups");
    expect(list.status).toBe(200);
    expect(list.body.items).toEqual([expect.objectContaining({ id: group.id, myRole: "owner" })]);
    const detail = await owner.client.get(`/api/groups/${group.id}`);
    expect(detail.status).toBe(200);
    expect(detail.body.members).toEqual([expect.objectContaining({ userId: owner.id, role: "owner" })]);
  });

  it("answers 401 signed out, 422 for a bad body or id, 404 for another group", async () => {
    const c = app.client();
    expect((await c.get("/api/groups")).status).toBe(401);
    expect((await c.post("/api/groups", { name: "x" })).status).toBe(401);
    expect((await c.get(`/api/groups/${missing}`)).status).toBe(401);
    const { group } = await groupWithOwner();
    const stranger = await signedInPerson(app, "stranger");
    const bad = await stranger.client.post("/api/groups", { name: "   " });
    expect(bad.status).toBe(422);
    expect(bad.body.error.issues[0].path).toBe("name");
    expect((await stranger.client.get("/api/groups/not-a-uuid")).status).toBe(422);
    const other = await stranger.client.get(`/api/groups/${group.id}`);
    expect(other.status).toBe(404);
    expect(other.body.error.code).toBe("NOT_FOUND");
    expect((await stranger.client.get(`/api/groups/${missing}`)).status).toBe(404);
  });
});

describe("invitations", () => {
  it("invites by e-mail; the link shows group and role; the invited account accepts once", async () => {
    const { owner, group } = await groupWithOwner("Saddle Point Society");
    const guest = await signedInPerson(app, "guest");
    const invite = await owner.client.post(`/api/groups/${group.id}/invites`, { email: guest.email, role: "viewer" });
    expect(invite.status).toBe(201);
    expect(invite.body).toMatchObject({ email: guest.email, role: "viewer" });
    const mail = await app.lastMailTo(guest.email);
    expect(mail.subject).toContain("Saddle Point Society");
    const token = tokenFromMail(mail.text, "invite");
    expect(mail.text).toContain(`${app.baseUrl}/invites/${token}`);

    const preview = await app.client().get(`/api/invites/${token}`);
    expect(preview.status).toBe(200);
    expect(preview.body).toMatchObject({ groupName: "Saddle Point Society", role: "viewer", email: guest.email, status: "pending" });
    expect((await owner.client.get(`/api/groups/${group.id}`)).body.invites).toHaveLength(1);

    expect((await app.client().post(`/api/invites/${token}/accept`)).status).toBe(401);
    const accepted = await guest.client.post(`/api/invites/${token}/accept`);
    expect(accepted.status).toBe(200);
    expect(accepted.body).toMatchObject({ id: group.id, myRole: "viewer", memberCount: 2 });
    expect((await guest.client.get("/api/groups")).body.items[0]).toMatchObject({ id: group.id, myRole: "viewer" });
    expect((await guest.client.post(`/api/invites/${token}/accept`)).status).toBe(409);
    expect((await app.client().get(`/api/invites/${token}`)).body.status).toBe("accepted");
  });

  it("refuses an invitation accepted by another address (403), unknown tokens (404), bad tokens (422)", async () => {
    const { owner, group } = await groupWithOwner();
    const invitedEmail = "invited-only@lab.example";
    await owner.client.post(`/api/groups/${group.id}/invites`, { email: invitedEmail, role: "editor" });
    const token = tokenFromMail((await app.lastMailTo(invitedEmail)).text, "invite");
    const intruder = await signedInPerson(app, "intruder");
    const res = await intruder.client.post(`/api/invites/${token}/accept`);
    expect(res.status).toBe(403);
    expect((await intruder.client.get(`/api/groups/${group.id}`)).status).toBe(404);
    expect((await app.client().get(`/api/invites/${"Z".repeat(43)}`)).status).toBe(404);
    expect((await intruder.client.post(`/api/invites/${"Z".repeat(43)}/accept`)).status).toBe(404);
    expect((await app.client().get("/api/invites/short")).status).toBe(422);
    expect((await intruder.client.post("/api/invites/short/accept")).status).toBe(422);
  });

  it("lets editors invite, forbids viewers (403), owners-only for the owner role, 409 for members", async () => {
    const { owner, group } = await groupWithOwner();
    const editor = await addMember(group.id, owner, "editor");
    const viewer = await addMember(group.id, owner, "viewer");
    const url = `/api/groups/${group.id}/invites`;
    expect((await editor.client.post(url, { email: "new1@lab.example", role: "viewer" })).status).toBe(201);
    expect((await editor.client.post(url, { email: "new2@lab.example", role: "owner" })).status).toBe(403);
    const byViewer = await viewer.client.post(url, { email: "new3@lab.example", role: "viewer" });
    expect(byViewer.status).toBe(403);
    expect(byViewer.body.error.code).toBe("FORBIDDEN");
    expect((await owner.client.post(url, { email: viewer.email, role: "editor" })).status).toBe(409);
    expect((await owner.client.post(url, { email: "nope", role: "boss" })).status).toBe(422);
    expect((await app.client().post(url, { email: "x@lab.example", role: "viewer" })).status).toBe(401);
    const stranger = await signedInPerson(app, "stranger");
    expect((await stranger.client.post(url, { email: "x@lab.example", role: "viewer" })).status).toBe(404);
    // Viewers do not see pending invitations; editors do.
    expect((await viewer.client.get(`/api/groups/${group.id}`)).body.invites).toEqual([]);
    expect((await editor.client.get(`/api/groups/${group.id}`)).body.invites.length).toBeGreaterThan(0);
  });

  it("rejects an expired invitation (409) and shows it as expired", async () => {
    const { owner, group } = await groupWithOwner();
    const late = await signedInPerson(app, "late");
    await owner.client.post(`/api/groups/${group.id}/invites`, { email: late.email, role: "viewer" });
    const token = tokenFromMail((await app.lastMailTo(late.email)).text, "invite");
    await app.database.db.update(groupInvites).set({ expiresAt: new Date(Date.now() - 1000) }).where(eq(groupInvites.email, late.email));
    expect((await app.client().get(`/api/invites/${token}`)).body.status).toBe("expired");
    expect((await late.client.post(`/api/invites/${token}/accept`)).status).toBe(409);
  });

  it("revokes a pending invitation (editor), 403 for viewers, 404 when gone", async () => {
    const { owner, group } = await groupWithOwner();
    const viewer = await addMember(group.id, owner, "viewer");
    const invite = await owner.client.post(`/api/groups/${group.id}/invites`, { email: "revoked@lab.example", role: "viewer" });
    const url = `/api/groups/${group.id}/invites/${invite.body.id}`;
    expect((await viewer.client.delete(url)).status).toBe(403);
    expect((await app.client().delete(url)).status).toBe(401);
    expect((await owner.client.delete(`/api/groups/${group.id}/invites/bad`)).status).toBe(422);
    expect((await owner.client.delete(url)).status).toBe(204);
    expect((await owner.client.delete(url)).status).toBe(404);
  });
});

describe("roles and membership", () => {
  it("owners change roles; editors and viewers cannot (403); the last owner cannot be demoted (409)", async () => {
    const { owner, group } = await groupWithOwner();
    const editor = await addMember(group.id, owner, "editor");
    const viewer = await addMember(group.id, owner, "viewer");
    const memberUrl = (id: string) => `/api/groups/${group.id}/members/${id}`;
    expect((await editor.client.patch(memberUrl(viewer.id), { role: "editor" })).status).toBe(403);
    expect((await viewer.client.patch(memberUrl(viewer.id), { role: "owner" })).status).toBe(403);
    const promoted = await owner.client.patch(memberUrl(viewer.id), { role: "editor" });
    expect(promoted.status).toBe(200);
    expect(promoted.body).toMatchObject({ userId: viewer.id, role: "editor" });
    const lastOwner = await owner.client.patch(memberUrl(owner.id), { role: "viewer" });
    expect(lastOwner.status).toBe(409);
    expect((await owner.client.patch(memberUrl(viewer.id), { role: "king" })).status).toBe(422);
    expect((await owner.client.patch(memberUrl(missing), { role: "viewer" })).status).toBe(404);
    expect((await app.client().patch(memberUrl(viewer.id), { role: "viewer" })).status).toBe(401);
    // With a second owner, the first may step down.
    expect((await owner.client.patch(memberUrl(editor.id), { role: "owner" })).status).toBe(200);
    expect((await owner.client.patch(memberUrl(owner.id), { role: "viewer" })).status).toBe(200);
  });

  it("two owners demoting each other at once leave exactly one owner (group row lock)", async () => {
    const { owner, group } = await groupWithOwner();
    const second = await addMember(group.id, owner, "owner");
    const memberUrl = (id: string) => `/api/groups/${group.id}/members/${id}`;
    const [a, b] = await Promise.all([
      owner.client.patch(memberUrl(second.id), { role: "viewer" }),
      second.client.patch(memberUrl(owner.id), { role: "viewer" }),
    ]);
    // The later transaction waits for the lock, then finds its actor already demoted.
    expect([a.status, b.status].sort((x, y) => x - y)).toEqual([200, 403]);
    const detail = await (a.status === 200 ? owner : second).client.get(`/api/groups/${group.id}`);
    expect(detail.body.members.filter((m: { role: string }) => m.role === "owner")).toHaveLength(1);
  });

  it("owners remove members; others cannot; the last owner cannot be removed", async () => {
    const { owner, group } = await groupWithOwner();
    const editor = await addMember(group.id, owner, "editor");
    const viewer = await addMember(group.id, owner, "viewer");
    const memberUrl = (id: string) => `/api/groups/${group.id}/members/${id}`;
    expect((await editor.client.delete(memberUrl(viewer.id))).status).toBe(403);
    expect((await app.client().delete(memberUrl(viewer.id))).status).toBe(401);
    expect((await owner.client.delete(memberUrl("bad"))).status).toBe(422);
    expect((await owner.client.delete(memberUrl(owner.id))).status).toBe(409);
    expect((await owner.client.delete(memberUrl(viewer.id))).status).toBe(204);
    expect((await owner.client.delete(memberUrl(viewer.id))).status).toBe(404);
    expect((await viewer.client.get(`/api/groups/${group.id}`)).status).toBe(404);
  });

  it("any member leaves; the last owner cannot", async () => {
    const { owner, group } = await groupWithOwner();
    const viewer = await addMember(group.id, owner, "viewer");
    const leaveUrl = `/api/groups/${group.id}/leave`;
    expect((await app.client().post(leaveUrl)).status).toBe(401);
    expect((await owner.client.post(leaveUrl)).status).toBe(409);
    expect((await viewer.client.post(leaveUrl)).status).toBe(204);
    expect((await viewer.client.post(leaveUrl)).status).toBe(404);
    expect((await owner.client.post("/api/groups/bad/leave")).status).toBe(422);
    expect((await owner.client.get(`/api/groups/${group.id}`)).body.memberCount).toBe(1);
  });
});

describe("requireGroupRole", () => {
  it("is exported by the groups service for later modules", async () => {
    const { owner, group } = await groupWithOwner();
    const viewer = await addMember(group.id, owner, "viewer");
    const service = createGroupsService({ db: app.database.db });
    const actor = (p: { id: string; email: string; name: string }) => ({ ...p, siteRole: "member" as const });
    await expect(service.requireGroupRole(actor(viewer), group.id, "viewer")).resolves.toMatchObject({ role: "viewer" });
    await expect(service.requireGroupRole(actor(viewer), group.id, "editor")).rejects.toMatchObject({ code: "FORBIDDEN" });
    await expect(service.requireGroupRole(actor(viewer), missing, "viewer")).rejects.toMatchObject({ code: "NOT_FOUND" });
    await expect(service.requireGroupRole(null, group.id, "viewer")).rejects.toMatchObject({ code: "UNAUTHENTICATED" });
  });
});
