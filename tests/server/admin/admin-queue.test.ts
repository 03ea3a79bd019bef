import { eq } from "drizzle-orm";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { maps } from "../../../server/db/schema/index";
import { runCell } from "../../../server/engine/cell/run-cell";
import { createCellsService } from "../../../server/modules/cells/cells.service";
import { cellInputFor, cellKey, mapSpecFromRow } from "../../../server/modules/maps/cell-key";
import { FILL_CELL_QUEUE, type FillCellPayload } from "../../../server/queue/queues";
import { adminQueueSchema, type AdminQueue } from "../../../shared/schemas/admin";
import { signedInPerson, startTestApp, type TestApp } from "../../helpers/test-app";
import { rateBody } from "../maps/maps-fixtures";

// GET /api/admin/queue through the real app, PostgreSQL and pg-boss. No worker runs: the test
// takes jobs from pg-boss itself (fetch, complete, fail) and records one computed cell the way
// the fill-cell job does, so every count below follows from those steps.

let app: TestApp;
let admin: Awaited<ReturnType<typeof signedInPerson>>;
let member: Awaited<ReturnType<typeof signedInPerson>>;
const WORKER = "admin-view-worker";

beforeAll(async () => {
  app = await startTestApp({ queue: true });
  admin = await signedInPerson(app, "admin");
  await app.makeAdmin(admin.email);
  member = await signedInPerson(app, "member");
});
afterAll(async () => {
  await app?.stop();
});

async function overview(): Promise<AdminQueue> {
  const res = await admin.client.get("/api/admin/queue");
  expect(res.status).toBe(200);
  const parsed = adminQueueSchema.safeParse(res.body);
  expect(parsed.success).toBe(true);
  return res.body as AdminQueue;
}

const queueOf = (view: AdminQueue, name: string) => view.queues.find((q) => q.name === name);

/** Runs the engine on a fetched fill-cell job's position and records it as worker WORKER. */
async function computeJob(data: FillCellPayload): Promise<void> {
  const [row] = await app.database.db.select().from(maps).where(eq(maps.id, data.mapId));
  const input = cellInputFor(mapSpecFromRow(row), data.i, data.j);
  expect(cellKey(input)).toBe(data.cellKey);
  const cells = createCellsService({ db: app.database.db, boss: app.boss! });
  await cells.recordComputed({ mapId: data.mapId, i: data.i, j: data.j, key: data.cellKey, input, result: runCell(input), worker: WORKER });
}

describe("GET /api/admin/queue", () => {
  it("answers 401 signed out and 403 for members", async () => {
    expect((await app.client().get("/api/admin/queue")).status).toBe(401);
    const res = await member.client.get("/api/admin/queue");
    expect(res.status).toBe(403);
    expect(res.body.error.code).toBe("FORBIDDEN");
  });

  it("lists every queue with zero counts before any map exists", async () => {
    const view = await overview();
    expect(view.queues.map((q) => q.name)).toEqual(["fill-cell", "fill-cell-exhausted", "map-finished", "probe-search", "theory-row"]);
    expect(view.queues.every((q) => q.created + q.retry + q.active + q.completed + q.failed + q.cancelled === 0)).toBe(true);
    expect(view).toMatchObject({ activeJobs: [], workers: [], inFlightMaps: [] });
  });

  it("counts jobs by state, names the map of active cell jobs, the worker and the map in flight", async () => {
    const created = await member.client.post("/api/maps", rateBody());
    expect(created.status).toBe(201);
    const mapId = created.body.id as string;
    // 3 × 3 grid: 9 fill-cell jobs and 3 theory-row jobs (maps-routes.test.ts checks the same).
    const [first, second] = await app.boss!.fetch<FillCellPayload>(FILL_CELL_QUEUE, { batchSize: 2 });
    await computeJob(first.data);
    await app.boss!.complete(FILL_CELL_QUEUE, first.id);
    await app.boss!.fail(FILL_CELL_QUEUE, second.id, { message: "worker lost" }); // retryLimit 3 → state retry
    const [running] = await app.boss!.fetch<FillCellPayload>(FILL_CELL_QUEUE);

    const view = await overview();
    expect(queueOf(view, "fill-cell")).toEqual({ name: "fill-cell", created: 6, retry: 1, active: 1, completed: 1, failed: 0, cancelled: 0 });
    expect(queueOf(view, "theory-row")).toMatchObject({ created: 3, active: 0 });
    expect(view.activeJobs).toEqual([
      { id: running.id, queue: "fill-cell", mapId, mapTitle: "Leak sweep", i: running.data.i, j: running.data.j, startedOn: expect.any(String), retryCount: 0 },
    ]);
    expect(Math.abs(Date.parse(view.activeJobs[0].startedOn) - Date.now())).toBeLessThan(60_000);
    expect(view.workers).toEqual([{ name: WORKER, cellsLastHour: 1, lastCellAt: expect.any(String) }]);
    expect(view.inFlightMaps).toEqual([
      { id: mapId, title: "Leak sweep", ownerName: member.name, status: "running", cellsDone: 1, cellsTotal: 9 },
    ]);
  });

  it("counts cancelled jobs and drops the map from the in-flight list once cancelled", async () => {
    const mapId = (await overview()).inFlightMaps[0].id;
    expect((await member.client.post(`/api/maps/${mapId}/cancel`)).status).toBe(200);
    const view = await overview();
    const fill = queueOf(view, "fill-cell")!;
    expect(fill.created + fill.retry).toBe(0);
    expect(fill.cancelled).toBeGreaterThanOrEqual(6);
    expect(view.inFlightMaps).toEqual([]);
    expect(view.workers.map((w) => w.name)).toEqual([WORKER]);
  });
});
