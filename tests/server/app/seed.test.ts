import { count, eq } from "drizzle-orm";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { groupMembers, groups, users } from "../../../server/db/schema/index";
import { DEMO_GROUP, DEMO_PASSWORD, demoPeople, seedDemoLab } from "../../../server/db/seed/demo-lab";
import { startTestApp, type TestApp } from "../../helpers/test-app";

let app: TestApp;
beforeAll(async () => {
  app = await startTestApp();
});
afterAll(async () => {
  await app?.stop();
});

describe("seedDemoLab", () => {
  it("creates the lab once and is idempotent", async () => {
    const first = await seedDemoLab(app.database.db);
    const second = await seedDemoLab(app.database.db);
    expect(first.every((p) => p.created)).toBe(true);
    expect(second.every((p) => !p.created)).toBe(true);
    const db = app.database.db;
    expect((await db.select({ n: count() }).from(users))[0].n).toBe(demoPeople.length);
    const lab = await db.select().from(groups).where(eq(groups.name, DEMO_GROUP));
    expect(lab).toHaveLength(1);
    const members = await db.select().from(groupMembers).where(eq(groupMembers.groupId, lab[0].id));
    expect(members.map((m) => m.role).sort((a, b) => a.localeCompare(b))).toEqual(["editor", "owner", "viewer"]);
    expect((await db.select().from(users).where(eq(users.siteRole, "admin"))).map((u) => u.email)).toEqual([demoPeople[0].email]);
  });

  it("prints sign-ins that work", async () => {
    const admin = app.client();
    const res = await admin.post("/api/auth/login", { email: demoPeople[0].email, password: DEMO_PASSWORD });
    expect(res.status).toBe(200);
    expect(res.body.siteRole).toBe("admin");
    const mine = await admin.get("/api/groups");
    expect(mine.body.items).toEqual([expect.objectContaining({ name: DEMO_GROUP, myRole: "owner", memberCount: 3 })]);
  });
});
