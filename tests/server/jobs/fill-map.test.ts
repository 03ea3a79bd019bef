import { and, eq, sql } from "drizzle-orm";
import type PgBoss from "pg-boss";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { openDatabase, type Database } from "../../../server/db/client";
import { cells, mapCells, maps, theoryRows } from "../../../server/db/schema/index";
import { runCell } from "../../../server/engine/cell/run-cell";
import { createComputePool, type ComputePool } from "../../../server/jobs/compute-pool";
import { startJobWorkers, type JobWorkers } from "../../../server/jobs/job-workers";
import { logger } from "../../../server/lib/logger";
import { cellInputFor, type MapSpec } from "../../../server/modules/maps/cell-key";
import { readMapProgress } from "../../../server/modules/cells/map-progress.repo";
import { createBoss } from "../../../server/queue/boss";
import { FILL_CELL_QUEUE, MAP_FINISHED_QUEUE } from "../../../server/queue/queues";
import { createTestDatabase, type TestDatabase } from "../../helpers/db-template";
import { SMALL_RATE_MAP, createMap, insertLegacyMap, insertUser, mapsServiceOn, waitFor } from "./map-fixture";

// A map fills through the real pg-boss queue and an in-process worker (thread pool of 2) against
// a fresh PostgreSQL database; results are compared with the engine run directly.

let testDb: TestDatabase;
let database: Database;
let boss: PgBoss;
let compute: ComputePool;
let workers: JobWorkers;
const WORKER = "test-host:4242";

beforeAll(async () => {
  testDb = await createTestDatabase();
  database = openDatabase(testDb.url, { max: 6 });
  boss = await createBoss(testDb.url, { maintenanceIntervalSeconds: 1 });
  compute = createComputePool({ threads: 2 });
  workers = await startJobWorkers({ db: database.db, boss, compute, workerName: WORKER, logger, pollingIntervalSeconds: 0.5 });
});

afterAll(async () => {
  await workers?.stop();
  await boss?.stop({ graceful: true, timeout: 5000 });
  await workers?.close();
  await compute?.close();
  await database?.close();
  await testDb?.drop();
});

/** A CellResult without its wall-clock part (the only part that is not deterministic). */
function withoutTiming(result: unknown): unknown {
  const { timing: _timing, ...rest } = result as { timing: unknown };
  return rest;
}

async function waitDone(mapId: string) {
  return waitFor(async () => {
    const p = await readMapProgress(database.db, mapId);
    if (p?.status === "failed") throw new Error(`map failed: ${p.failure}`);
    return p?.status === "done" ? p : undefined;
  }, 60_000, `map ${mapId} done`);
}

describe("fill-cell through the queue", () => {
  it("fills a 3 × 3 rate map at N = 6 with cells equal to runCell's output", async () => {
    const owner = await insertUser(database.db);
    const map = await createMap(database.db, boss, owner, SMALL_RATE_MAP);
    const progress = await waitDone(map.id);
    expect(progress).toMatchObject({ cellsTotal: 9, cellsDone: 9, cellsComputed: 9, cellsFromCache: 0 });
    expect(progress.throughput).toBeGreaterThan(0);
    expect(progress.etaSeconds).toBe(0);
    expect(progress.startedAt).not.toBeNull();
    expect(progress.finishedAt).not.toBeNull();

    for (let i = 0; i < 3; i++) {
      for (let j = 0; j < 3; j++) {
        const [row] = await database.db.select().from(cells).where(eq(cells.key, map.cellKeys[i][j]));
        const direct = runCell(cellInputFor(SMALL_RATE_MAP, i, j));
        expect(withoutTiming(row.result)).toEqual(withoutTiming(direct));
        expect(row.input).toEqual(cellInputFor(SMALL_RATE_MAP, i, j));
        expect(row.worker).toBe(WORKER);
        expect(row.computeSeconds).toBeGreaterThan(0);
        expect((row.result as { counters: { steps: number } }).counters.steps).toBeGreaterThan(0);
      }
    }
    const positions = await database.db.select().from(mapCells).where(eq(mapCells.mapId, map.id));
    expect(positions.every((p) => p.state === "done" && !p.fromCache && p.doneAt !== null)).toBe(true);
  });

  it("stores the τ rows' theory columns and runs map-finished once", async () => {
    const owner = await insertUser(database.db);
    const spec: MapSpec = { ...SMALL_RATE_MAP, seed: 8 };
    const map = await createMap(database.db, boss, owner, spec);
    await waitDone(map.id);
    const keys = (await database.db.selectDistinct({ k: mapCells.theoryKey }).from(mapCells).where(eq(mapCells.mapId, map.id))).map((r) => r.k);
    expect(keys).toHaveLength(3);
    const rows = await waitFor(async () => {
      const found = await database.db.select().from(theoryRows).where(sql`${theoryRows.key} in ${keys}`);
      return found.length === 3 ? found : undefined;
    }, 20_000, "theory rows");
    for (const row of rows) {
      const columns = row.columns as { m: number; rateLines: { originStabilityMu: number } }[];
      expect(columns).toHaveLength(3);
      // Rate network: μ_c = g, so m = μ/g (shared/theory; the map's μ values are 0.5, 1.25, 2 with g = 1.5).
      expect(columns.map((c) => c.m)).toEqual([0.5 / 1.5, 1.25 / 1.5, 2 / 1.5]);
      // Origin stable iff μ > g(1 + τ) (Sommers et al., PRL 60 (1988) 1895).
      expect(columns[0].rateLines.originStabilityMu).toBeCloseTo(1.5 * (1 + row.tau), 12);
    }
    const finished = await waitFor(async () => {
      const [r] = await database.db.execute<{ n: number }>(
        sql`select count(*)::int as n from pgboss.job where name = ${MAP_FINISHED_QUEUE} and data->>'mapId' = ${map.id} and state = 'completed'`,
      ).then((x) => x.rows);
      return r.n === 1 ? r.n : undefined;
    }, 20_000, "map-finished job");
    expect(finished).toBe(1);
  });

  it("serves cells another map stored meanwhile from the cache without computing them", async () => {
    const [a, b] = [await insertUser(database.db, "a"), await insertUser(database.db, "b")];
    const spec: MapSpec = { ...SMALL_RATE_MAP, seed: 9 };
    // Both maps are created before any cell exists, so both get nine jobs; whichever job comes
    // second for a key finds it stored (or loses the insert race) and stores nothing.
    const first = await createMap(database.db, boss, a, spec);
    const second = await createMap(database.db, boss, b, spec);
    const [pa, pb] = [await waitDone(first.id), await waitDone(second.id)];
    const keys = first.cellKeys.flat();
    expect(second.cellKeys.flat()).toEqual(keys);
    const stored = await database.db.select({ n: sql<number>`count(*)::int` }).from(cells).where(sql`${cells.key} in ${keys}`);
    expect(stored[0].n).toBe(9);
    expect(pa.cellsComputed + pb.cellsComputed).toBe(9);
    expect(pa.cellsFromCache + pb.cellsFromCache).toBe(9);

    // A third map created after the cells exist is done at creation: no job, nothing computed.
    const third = await createMap(database.db, boss, b, spec);
    expect(third.fillJobs).toHaveLength(0);
    expect(third.answer).toMatchObject({ cells: 9, cachedCells: 9, status: "done", cellsComputed: 0, cellsFromCache: 9 });
    const [row] = await database.db.select().from(maps).where(eq(maps.id, third.id));
    expect(row).toMatchObject({ status: "done", cellsComputed: 0, cellsFromCache: 9, cellsDone: 9 });
  });

  it("cancel stops the queued cells and keeps the finished ones", async () => {
    const owner = await insertUser(database.db);
    // Cells of about 0.3 s each (N = 30, 8 networks × 16 starts) on two threads: the cancel
    // lands while most of the map is still queued.
    const spec: MapSpec = { ...SMALL_RATE_MAP, settings: { ...SMALL_RATE_MAP.settings, N: 30 }, budget: { ...SMALL_RATE_MAP.budget, networks: 8, starts: 16 }, seed: 10 };
    const map = await createMap(database.db, boss, owner, spec);
    await waitFor(async () => ((await readMapProgress(database.db, map.id))!.cellsDone >= 1 ? true : undefined), 30_000, "a finished cell");
    const view = await mapsServiceOn(database.db, boss).cancel(owner, map.id);
    expect(view.status).toBe("cancelled");
    const doneAtCancel = view.cellsDone;
    expect(doneAtCancel).toBeGreaterThanOrEqual(1);
    expect(doneAtCancel).toBeLessThan(9);
    await waitFor(async () => ((await boss.getQueueSize(FILL_CELL_QUEUE, { before: "active" })) === 0 ? true : undefined), 30_000, "no fill-cell job left");
    await new Promise((r) => setTimeout(r, 1500)); // cells that were computing at the cancel finish
    const positions = await database.db.select().from(mapCells).where(eq(mapCells.mapId, map.id));
    expect(positions.filter((p) => p.state === "done")).toHaveLength(doneAtCancel);
    expect(positions.filter((p) => p.state === "cancelled")).toHaveLength(9 - doneAtCancel);
    const [row] = await database.db.select().from(maps).where(eq(maps.id, map.id));
    expect(row).toMatchObject({ status: "cancelled", cellsDone: doneAtCancel });
  });

  it("fails the map with the engine's message when the engine refuses a cell, and cancels the rest", async () => {
    const owner = await insertUser(database.db);
    // The engine's exhaustive search is limited to N ≤ 10 (validateCellInput throws a RangeError
    // inside the worker thread); today's manifest rules refuse such a map, so it is inserted as a
    // map stored under earlier rules.
    const spec: MapSpec = { ...SMALL_RATE_MAP, settings: { ...SMALL_RATE_MAP.settings, N: 12 }, budget: { ...SMALL_RATE_MAP.budget, exhaustive: true } };
    const map = await insertLegacyMap(database.db, boss, owner, spec);
    const failed = await waitFor(async () => {
      const p = await readMapProgress(database.db, map.id);
      return p?.status === "failed" ? p : undefined;
    }, 30_000, "map failed");
    expect(failed.failure).toMatch(/^Cell \(\d, \d\) failed: RangeError: budget\.exhaustive needs N ≤ 10, got N = 12$/);
    expect(failed.finishedAt).not.toBeNull();
    await waitFor(async () => ((await boss.getQueueSize("fill-cell")) === 0 ? true : undefined), 30_000, "fill-cell queue drained");
    const positions = await database.db.select().from(mapCells).where(eq(mapCells.mapId, map.id));
    expect(positions.filter((p) => p.state === "failed")).toHaveLength(1);
    expect(positions.filter((p) => p.state === "cancelled")).toHaveLength(8);
    expect(positions.find((p) => p.state === "failed")?.failure).toMatch(/budget\.exhaustive needs N ≤ 10/);
  });

  it("marks the cell and the map failed when a job used up its retries (dead letter)", async () => {
    const owner = await insertUser(database.db);
    await workers.stop();
    await workers.close();
    const map = await createMap(database.db, boss, owner, { ...SMALL_RATE_MAP, seed: 11 });
    // A job of that map with no retries fails once (as a lost database connection would make
    // it): pg-boss moves its payload and last error to fill-cell-exhausted.
    const payload = { mapId: map.id, i: 1, j: 2, cellKey: map.cellKeys[1][2] };
    await boss.deleteJob(FILL_CELL_QUEUE, map.fillJobs);
    const id = await boss.send(FILL_CELL_QUEUE, payload, { retryLimit: 0 });
    const [taken] = await boss.fetch(FILL_CELL_QUEUE);
    expect(taken.id).toBe(id);
    await boss.fail(FILL_CELL_QUEUE, taken.id, { message: "connection terminated" });
    workers = await startJobWorkers({ db: database.db, boss, compute, workerName: WORKER, logger, pollingIntervalSeconds: 0.5 });
    const failed = await waitFor(async () => {
      const p = await readMapProgress(database.db, map.id);
      return p?.status === "failed" ? p : undefined;
    }, 30_000, "map failed");
    expect(failed.failure).toBe("Cell (1, 2) failed: gave up after 1 attempt; last error: connection terminated");
    const [position] = await database.db.select().from(mapCells).where(and(eq(mapCells.mapId, map.id), eq(mapCells.i, 1), eq(mapCells.j, 2)));
    expect(position.state).toBe("failed");
  });
});
