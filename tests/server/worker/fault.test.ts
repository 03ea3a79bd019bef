import { eq, sql } from "drizzle-orm";
import type PgBoss from "pg-boss";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { openDatabase, type Database } from "../../../server/db/client";
import { cells, mapCells } from "../../../server/db/schema/index";
import { readMapProgress } from "../../../server/modules/cells/map-progress.repo";
import type { MapSpec } from "../../../server/modules/maps/cell-key";
import { createBoss } from "../../../server/queue/boss";
import { FILL_CELL_QUEUE } from "../../../server/queue/queues";
import { createTestDatabase, type TestDatabase } from "../../helpers/db-template";
import { SMALL_RATE_MAP, createMap, insertUser, waitFor } from "../jobs/map-fixture";
import { spawnWorker, type WorkerProcess } from "./worker-process";

// Worker processes (`node --import tsx server/worker.ts`, one thread each) are killed in the
// middle of a map; a new one finishes it. Cells of N = 30 with 8 networks × 48 starts take
// about a second each on one thread, so a kill lands inside a cell, not between two.

const SLOW_MAP: MapSpec = { ...SMALL_RATE_MAP, settings: { ...SMALL_RATE_MAP.settings, N: 30 }, budget: { ...SMALL_RATE_MAP.budget, networks: 8, starts: 48 } };
// Long enough that a cell never outlives it on a loaded machine (cells ~1 s unloaded), short enough
// that the dead worker's job comes back quickly.
const EXPIRE_SECONDS = 10;

let testDb: TestDatabase;
let database: Database;
let boss: PgBoss;
const spawned: WorkerProcess[] = [];

beforeAll(async () => {
  testDb = await createTestDatabase();
  database = openDatabase(testDb.url, { max: 4 });
  // This process only sends jobs and runs maintenance every second (expiring the dead worker's
  // job); the short expiry is written on the queue here, before any worker starts.
  boss = await createBoss(testDb.url, { maintenanceIntervalSeconds: 1, queues: { [FILL_CELL_QUEUE]: { expireInSeconds: EXPIRE_SECONDS, retryDelay: 1 } } });
});

afterAll(async () => {
  for (const w of spawned) if (w.child.exitCode === null) w.child.kill("SIGKILL");
  await Promise.all(spawned.map((w) => w.exited));
  await boss?.stop({ graceful: false });
  await database?.close();
  await testDb?.drop();
});

async function start(): Promise<WorkerProcess> {
  const w = await spawnWorker(testDb.url, { QUEUE_MAINTENANCE_SECONDS: "1", WORKER_STOP_SECONDS: "1" });
  spawned.push(w);
  return w;
}

/** Fill-cell jobs of a map by state, from pg-boss's table. */
async function jobStates(mapId: string): Promise<{ state: string; retry_count: number }[]> {
  const r = await database.db.execute<{ state: string; retry_count: number }>(
    sql`select state, retry_count from pgboss.job where name = ${FILL_CELL_QUEUE} and data->>'mapId' = ${mapId}`,
  );
  return r.rows;
}

/** Waits until ≥ 1 cell of the map is done and one of its jobs is being computed. */
async function midMap(mapId: string): Promise<void> {
  await waitFor(async () => {
    const p = await readMapProgress(database.db, mapId);
    const active = (await jobStates(mapId)).some((j) => j.state === "active");
    return p && p.cellsDone >= 1 && p.cellsDone < p.cellsTotal && active ? true : undefined;
  }, 60_000, "a finished cell and an active job").catch((err: Error) => {
    throw new Error(`${err.message}\n${outputs()}`);
  });
}

/** The worker processes' output, for a failure message. */
const outputs = () => spawned.map((w, k) => `--- worker ${k} ---\n${w.output()}`).join("\n");

async function expectCompleteOnce(mapId: string, keys: string[]): Promise<void> {
  const p = await waitFor(async () => {
    const q = await readMapProgress(database.db, mapId);
    return q?.status === "done" ? q : undefined;
  }, 90_000, "map done").catch((err: Error) => {
    throw new Error(`${err.message}\n${outputs()}`);
  });
  expect(p).toMatchObject({ cellsTotal: 9, cellsDone: 9, cellsFromCache: 0 });
  const rows = await database.db.select({ key: cells.key }).from(cells).where(sql`${cells.key} in ${keys}`);
  expect(rows.map((r) => r.key).sort()).toEqual([...new Set(keys)].sort());
  const positions = await database.db.select().from(mapCells).where(eq(mapCells.mapId, mapId));
  expect(positions.filter((x) => x.state === "done")).toHaveLength(9);
}

describe("worker process faults", () => {
  it("a worker killed with SIGKILL mid-cell loses nothing: the job expires, is retried, each cell is stored once", async () => {
    const owner = await insertUser(database.db);
    const map = await createMap(database.db, boss, owner, { ...SLOW_MAP, seed: 21 });
    const first = await start();
    await midMap(map.id);
    first.child.kill("SIGKILL");
    expect(await first.exited).toBe("SIGKILL");
    const second = await start();
    await expectCompleteOnce(map.id, map.cellKeys.flat());
    second.child.kill("SIGTERM");
    expect(await second.exited).toBe(0);
    // The job that was active when the process died ran again (pg-boss counts the retry).
    expect((await jobStates(map.id)).some((j) => j.retry_count >= 1)).toBe(true);
  }, 240_000);

  it("SIGTERM hands the running job back and exits cleanly; the next worker finishes the map", async () => {
    const owner = await insertUser(database.db);
    const map = await createMap(database.db, boss, owner, { ...SLOW_MAP, seed: 22 });
    const first = await start();
    await midMap(map.id);
    first.child.kill("SIGTERM");
    expect(await first.exited).toBe(0);
    await start();
    await expectCompleteOnce(map.id, map.cellKeys.flat());
  }, 240_000);
});
