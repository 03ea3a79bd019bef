import { randomUUID } from "node:crypto";
import { readFileSync } from "node:fs";
import path from "node:path";
import { eq } from "drizzle-orm";
import type PgBoss from "pg-boss";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { probeSearchSchema, type ProbeView } from "../../../shared/schemas/probes";
import { openDatabase, type Database } from "../../../server/db/client";
import { probes } from "../../../server/db/schema/index";
import { runCell } from "../../../server/engine/cell/run-cell";
import { createComputePool, type ComputePool } from "../../../server/jobs/compute-pool";
import { startJobWorkers, type JobWorkers } from "../../../server/jobs/job-workers";
import { probeSearch } from "../../../server/jobs/probe-search.job";
import { logger } from "../../../server/lib/logger";
import { createGroupsService } from "../../../server/modules/groups/groups.service";
import { planComparison } from "../../../server/modules/probes/analysis/comparison";
import { matrixStats } from "../../../server/modules/probes/analysis/matrix-stats";
import { fromBytes, toBytes } from "../../../server/modules/probes/probe-bytes";
import { createProbePool, sharedMatrix, type ProbePool } from "../../../server/modules/probes/probe.pool";
import { runProbeSearch } from "../../../server/modules/probes/probe-search";
import { createProbesService, type ProbesService } from "../../../server/modules/probes/probes.service";
import { createBoss } from "../../../server/queue/boss";
import { createTestDatabase, type TestDatabase } from "../../helpers/db-template";
import { insertUser, waitFor } from "../jobs/map-fixture";
import { FIXTURES } from "./probe-upload";

// The equilibrium search through the real pg-boss queue and an in-process worker (probe pool of
// 2 threads) against a fresh database; the stored result equals the search run directly, and
// the comparison equals the engine's cell runner on the same input.

let testDb: TestDatabase;
let database: Database;
let boss: PgBoss;
let compute: ComputePool;
let probePool: ProbePool;
let workers: JobWorkers;
let service: ProbesService;

beforeAll(async () => {
  testDb = await createTestDatabase();
  database = openDatabase(testDb.url, { max: 6 });
  boss = await createBoss(testDb.url, { maintenanceIntervalSeconds: 1 });
  compute = createComputePool({ threads: 1 });
  probePool = createProbePool({ threads: 2 });
  workers = await startJobWorkers({ db: database.db, boss, compute, probePool, workerName: "probe-test:1", logger, pollingIntervalSeconds: 0.5 });
  service = createProbesService({ db: database.db, groups: createGroupsService({ db: database.db }), pool: probePool, boss });
});

afterAll(async () => {
  await workers?.stop();
  await boss?.stop({ graceful: true, timeout: 5000 });
  await compute?.close();
  await probePool?.close();
  await database?.close();
  await testDb?.drop();
});

function withoutTimes<T extends { wallSeconds: number }>(v: T): Omit<T, "wallSeconds"> {
  const { wallSeconds: _w, ...rest } = v;
  return rest;
}

async function waitSettled(id: string, owner: Awaited<ReturnType<typeof insertUser>>): Promise<ProbeView> {
  return waitFor(async () => {
    const v = await service.get(owner, id);
    return v.status === "done" || v.status === "failed" ? v : undefined;
  }, 60_000, `probe ${id} searched`);
}

describe("probe-search through the queue", () => {
  it("searches the uploaded matrix and its comparison networks; results equal the direct runs", async () => {
    const owner = await insertUser(database.db, "prober");
    const file = { originalname: "probe-40.npy", buffer: readFileSync(path.join(FIXTURES, "probe-40.npy")) };
    const up = await service.upload(owner, { matrix: file, input: null }, { mu: 1, nonlinearity: "tanh" });
    const settings = probeSearchSchema.parse({ starts: 24, compareNetworks: 3, tMax: 120 });
    const started = await service.search(owner, up.id, settings);
    expect(started.status).toBe("searching");
    const done = await waitSettled(up.id, owner);
    expect(done.failure).toBeNull();
    expect(done.status).toBe("done");
    expect(done.search).toMatchObject({ startsDone: 24, networksDone: 3, skippedComparison: null });
    expect(done.search!.startedAt).not.toBeNull();
    expect(done.search!.finishedAt).not.toBeNull();

    const [row] = await database.db.select().from(probes).where(eq(probes.id, up.id));
    const J = fromBytes(row.matrix);
    const stats = matrixStats(J, 40);
    const direct = await runProbeSearch(probePool, { couplings: sharedMatrix(J), n: 40, mu: 1, nonlinearity: "tanh", input: null, stats }, settings);
    expect(withoutTimes(done.result!)).toEqual(withoutTimes(direct.merged.result));
    expect((row.result as { states: number[][] }).states).toEqual(direct.merged.states);
    expect(done.result!.equilibria.reduce((a, e) => a + e.hits, 0)).toBe(done.result!.runs.settled);

    const plan = planComparison({ n: 40, mu: 1, nonlinearity: "tanh", input: null, stats }, settings);
    if (!("input" in plan)) throw new Error("expected a comparison plan");
    const cell = runCell(plan.input);
    expect(done.comparison!.aggregate).toEqual(cell.aggregate);
    expect(done.comparison!.perNetwork.map((p) => p.stableFound)).toEqual(cell.networks.map((s) => s.stable.length));
    expect(done.comparison!.tau).toBeCloseTo(stats.tau!.estimate, 12);

    const json = await service.equilibrium(owner, up.id, 0, "json");
    expect((json.body as { x: number[] }).x).toEqual(direct.merged.states[0]);
    const csv = await service.equilibrium(owner, up.id, 0, "csv");
    const lines = (csv.body as string).trim().split("\n").filter((l) => !l.startsWith("#"));
    expect(lines[0]).toBe("unit,x");
    expect(lines.slice(1).map((l) => Number(l.split(",")[1]))).toEqual(direct.merged.states[0]);
    expect(csv.fileName).toBe("probe-40-equilibrium-0.csv");
  });

  it("records an engine refusal as the probe's failure", async () => {
    const owner = await insertUser(database.db, "odd");
    const J = Float64Array.from([0, 1, 1, 0]);
    const searchId = randomUUID();
    const settings = probeSearchSchema.parse({ starts: 4, compareNetworks: 0 });
    const [row] = await database.db.insert(probes).values({
      ownerId: owner.id, title: "stored under an old nonlinearity", fileName: "m.csv", format: "csv", n: 2, matrix: toBytes(J), mu: 1,
      nonlinearity: "softsign", stats: matrixStats(J, 2), spectrum: { re: [1, -1], im: [0, 0] }, status: "searching",
      search: { id: searchId, settings, requestedAt: new Date().toISOString(), startedAt: null, finishedAt: null, startsDone: 0, networksDone: 0, skippedComparison: null },
    }).returning({ id: probes.id });
    const outcome = await probeSearch({ db: database.db, pool: probePool, logger }, { data: { probeId: row.id, searchId }, retryCount: 0, retryLimit: 2 } as unknown as PgBoss.JobWithMetadata<unknown>);
    expect(outcome).toBe("failed");
    const v = await service.get(owner, row.id);
    expect(v.status).toBe("failed");
    expect(v.failure).toMatch(/RangeError: nonlinearity must be one of tanh, got "softsign"/);
  });

  it("skips a job whose search was superseded, or whose probe is gone", async () => {
    const deps = { db: database.db, pool: probePool, logger };
    const job = (probeId: string) => ({ data: { probeId, searchId: randomUUID() }, retryCount: 0, retryLimit: 2 }) as unknown as PgBoss.JobWithMetadata<unknown>;
    expect(await probeSearch(deps, job(randomUUID()))).toBe("skipped");
    const owner = await insertUser(database.db, "late");
    const file = { originalname: "f64-5.npy", buffer: readFileSync(path.join(FIXTURES, "f64-5.npy")) };
    const up = await service.upload(owner, { matrix: file, input: null }, { mu: 1, nonlinearity: "tanh" });
    expect(await probeSearch(deps, job(up.id))).toBe("skipped");
    expect((await service.get(owner, up.id)).status).toBe("ready");
    expect(await probeSearch(deps, { data: { nonsense: true } } as unknown as PgBoss.JobWithMetadata<unknown>)).toBe("skipped");
  });
});
