import { sql } from "drizzle-orm";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { apiPaths } from "../../../shared/schemas/api-paths";
import { maps } from "../../../server/db/schema/index";
import { DEMO_PASSWORD, demoPeople, seedDemoLab } from "../../../server/db/seed/demo-lab";
import { demoMapBodies, seedDemoMaps } from "../../../server/db/seed/demo-maps";
import { FILL_CELL_QUEUE, THEORY_ROW_QUEUE } from "../../../server/queue/queues";
import { startTestApp, type TestApp } from "../../helpers/test-app";
import { mapsServiceOn } from "./map-fixture";

let app: TestApp;
beforeAll(async () => {
  app = await startTestApp({ queue: true });
  await seedDemoLab(app.database.db);
});
afterAll(async () => {
  await app?.stop();
});

async function queued(queue: string, mapId: string): Promise<number> {
  const r = await app.database.db.execute<{ n: number }>(sql`select count(*)::int as n from pgboss.job where name = ${queue} and data->>'mapId' = ${mapId} and state = 'created'`);
  return r.rows[0].n;
}

describe("seedDemoMaps", () => {
  it("creates one map per ensemble with its jobs queued, once", async () => {
    const service = mapsServiceOn(app.database.db, app.boss!);
    const first = await seedDemoMaps(app.database.db, service);
    const second = await seedDemoMaps(app.database.db, service);
    expect(first.map((m) => m.created)).toEqual([true, true]);
    expect(second.map((m) => m.created)).toEqual([false, false]);
    expect(second.map((m) => m.id)).toEqual(first.map((m) => m.id));
    const rows = await app.database.db.select().from(maps);
    expect(rows.map((r) => r.ensemble).sort((a, b) => a.localeCompare(b))).toEqual(["field", "rate"]);
    expect(rows.every((r) => r.visibility === "link" && r.groupId !== null && r.status === "queued")).toBe(true);
    for (const [k, m] of first.entries()) {
      const body = demoMapBodies[k];
      const cells = body.mu.steps * body.tau.steps;
      expect(await queued(FILL_CELL_QUEUE, m.id)).toBe(cells);
      expect(m.shareToken).toMatch(/^[A-Za-z0-9_-]{20,}$/);
    }
    const theory = await app.database.db.execute<{ n: number }>(sql`select count(*)::int as n from pgboss.job where name = ${THEORY_ROW_QUEUE}`);
    expect(theory.rows[0].n).toBe(demoMapBodies.reduce((s, b) => s + b.tau.steps, 0));
  });

  it("lets the lab's viewer read the demo maps, and a signed-out visitor read them by link", async () => {
    const seeded = await seedDemoMaps(app.database.db, mapsServiceOn(app.database.db, app.boss!));
    const viewer = app.client();
    expect((await viewer.post("/api/auth/login", { email: demoPeople[2].email, password: DEMO_PASSWORD })).status).toBe(200);
    for (const m of seeded) {
      const mine = await viewer.get(apiPaths.maps.detail(m.id));
      expect(mine.status).toBe(200);
      expect(mine.body).toMatchObject({ access: "viewer", status: "queued" });
      const anon = await app.client().get(`${apiPaths.maps.detail(m.id)}?share=${encodeURIComponent(m.shareToken!)}`);
      expect(anon.status).toBe(200);
      expect(anon.body.access).toBe("link");
    }
  });
});
