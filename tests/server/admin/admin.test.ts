import { sql } from "drizzle-orm";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { signedInPerson, startTestApp, type TestApp } from "../../helpers/test-app";

let app: TestApp;
let admin: Awaited<ReturnType<typeof signedInPerson>>;
let member: Awaited<ReturnType<typeof signedInPerson>>;

beforeAll(async () => {
  app = await startTestApp();
  admin = await signedInPerson(app, "admin");
  await app.makeAdmin(admin.email);
  member = await signedInPerson(app, "member");
});
afterAll(async () => {
  await app?.stop();
});

const missing = "00000000-0000-4000-8000-000000000000";
const listRoutes = ["/api/admin/users", "/api/admin/groups", "/api/admin/outbox"];

describe("admin access", () => {
  it("answers 401 signed out and 403 for members on every admin route", async () => {
    for (const path of listRoutes) {
      expect((await app.client().get(path)).status).toBe(401);
      const res = await member.client.get(path);
      expect(res.status).toBe(403);
      expect(res.body.error.code).toBe("FORBIDDEN");
    }
    expect((await app.client().patch(`/api/admin/users/${member.id}`, { siteRole: "admin" })).status).toBe(401);
    expect((await member.client.patch(`/api/admin/users/${member.id}`, { siteRole: "admin" })).status).toBe(403);
  });

  it("answers 422 for bad paging on every list route", async () => {
    for (const path of listRoutes) {
      const res = await admin.client.get(`${path}?limit=0&offset=-1`);
      expect(res.status).toBe(422);
      expect(res.body.error.issues.map((i: { path: string }) => i.path).sort((a: string, b: string) => a.localeCompare(b))).toEqual([
        "limit",
        "offset",
      ]);
    }
  });
});

describe("GET /api/admin/users and PATCH /api/admin/users/:userId", () => {
  it("lists users with paging and search", async () => {
    const all = await admin.client.get("/api/admin/users");
    expect(all.status).toBe(200);
    expect(all.body.total).toBeGreaterThanOrEqual(2);
    expect(all.body.items.map((u: { email: string }) => u.email)).toEqual(expect.arrayContaining([admin.email, member.email]));
    const found = await admin.client.get(`/api/admin/users?q=${encodeURIComponent(member.email)}&limit=5`);
    expect(found.body).toMatchObject({ total: 1, items: [{ id: member.id, siteRole: "member", groupCount: 0 }] });
    const page = await admin.client.get("/api/admin/users?limit=1&offset=1");
    expect(page.body.items).toHaveLength(1);
    // % is literal in searches, not a wildcard.
    expect((await admin.client.get("/api/admin/users?q=%25")).body.total).toBe(0);
  });

  it("changes a site role; 404 for an unknown user; 422 for bad input; the last admin stays", async () => {
    const promoted = await admin.client.patch(`/api/admin/users/${member.id}`, { siteRole: "admin" });
    expect(promoted.status).toBe(200);
    expect(promoted.body).toMatchObject({ id: member.id, siteRole: "admin" });
    expect((await member.client.get("/api/admin/users")).status).toBe(200);
    expect((await admin.client.patch(`/api/admin/users/${member.id}`, { siteRole: "member" })).status).toBe(200);
    expect((await member.client.get("/api/admin/users")).status).toBe(403);
    expect((await admin.client.patch(`/api/admin/users/${missing}`, { siteRole: "member" })).status).toBe(404);
    expect((await admin.client.patch(`/api/admin/users/${member.id}`, { siteRole: "root" })).status).toBe(422);
    expect((await admin.client.patch("/api/admin/users/xyz", { siteRole: "member" })).status).toBe(422);
    const last = await admin.client.patch(`/api/admin/users/${admin.id}`, { siteRole: "member" });
    expect(last.status).toBe(409);
  });
});

describe("GET /api/admin/groups", () => {
  it("lists every group with member counts and owners", async () => {
    await member.client.post("/api/groups", { name: "Lyapunov Reading Circle" });
    const res = await admin.client.get("/api/admin/groups?q=lyapunov");
    expect(res.status).toBe(200);
    expect(res.body).toMatchObject({ total: 1, items: [{ name: "Lyapunov Reading Circle", memberCount: 1, ownerNames: [member.name] }] });
    const users = await admin.client.get(`/api/admin/users?q=${encodeURIComponent(member.email)}`);
    expect(users.body.items[0].groupCount).toBe(1);
  });
});

describe("GET /api/admin/outbox", () => {
  it("lists caught e-mail newest first", async () => {
    await app.client().post("/api/auth/forgot", { email: member.email });
    await member.client.post("/api/groups", { name: "Outbox Check" });
    const groups = (await member.client.get("/api/groups")).body.items as { id: string; name: string }[];
    const group = groups.find((g) => g.name === "Outbox Check")!;
    await member.client.post(`/api/groups/${group.id}/invites`, { email: "later@lab.example", role: "viewer" });
    const res = await admin.client.get("/api/admin/outbox");
    expect(res.status).toBe(200);
    expect(res.body.total).toBe(2);
    expect(res.body.items.map((m: { to: string }) => m.to)).toEqual(["later@lab.example", member.email]);
    expect(res.body.items[0]).toMatchObject({ subject: expect.stringContaining("Outbox Check"), html: expect.stringContaining("<a href=") });
    const filtered = await admin.client.get("/api/admin/outbox?q=reset");
    expect(filtered.body.items.map((m: { to: string }) => m.to)).toEqual([member.email]);
  });
});

describe("GET /api/admin/queue without pg-boss", () => {
  it("answers empty lists when no process has started pg-boss on the database", async () => {
    const schema = await app.database.db.execute<{ present: boolean }>(sql`select to_regnamespace('pgboss') is not null as present`);
    expect(schema.rows[0].present).toBe(false);
    const res = await admin.client.get("/api/admin/queue");
    expect(res.status).toBe(200);
    expect(res.body).toEqual({ queues: [], activeJobs: [], workers: [], inFlightMaps: [] });
  });
});
