// `npm run bench:maps` (benchmark, not a test): fills a 16 × 16 rate-network map at N = 50
// through the whole pipeline — maps service, pg-boss, the worker's job handlers, the piscina
// pool, the cell store — once with 1 worker thread and once with 2, and prints cells per minute.
// Each run uses its own seed, so no cell comes from the cache.
//
// It needs a PostgreSQL server it may create a database on: DATABASE_URL (default: the dev
// cluster of `npm start`, postgres://postgres@127.0.0.1:54310/equilibrist). A throwaway
// database `equilibrist_bench_<pid>` is created there, migrated, and dropped at the end.
// Options (environment): BENCH_THREADS (default "1,2"), BENCH_GRID (16), BENCH_N (50),
// BENCH_NETWORKS (4), BENCH_STARTS (8), BENCH_TMAX (100). Takes about 2 minutes on 2 cores.
import { hostname } from "node:os";
import { eq, sql } from "drizzle-orm";
import pg from "pg";
import { createMapSchema } from "../shared/schemas/maps";
import { openDatabase, type Database } from "../server/db/client";
import { migrateDatabase } from "../server/db/migrate";
import { cells, maps, users } from "../server/db/schema/index";
import { createComputePool } from "../server/jobs/compute-pool";
import { startJobWorkers } from "../server/jobs/job-workers";
import { logger } from "../server/lib/logger";
import { createGroupsService } from "../server/modules/groups/groups.service";
import { bossMapJobs } from "../server/modules/maps/maps.jobs";
import { createMapsService } from "../server/modules/maps/maps.service";
import { createBoss } from "../server/queue/boss";

process.env.LOG_LEVEL ??= "warn"; // the figures only, not the worker's log lines
const num = (name: string, fallback: number) => Number(process.env[name] ?? fallback);
const settings = {
  threads: (process.env.BENCH_THREADS ?? "1,2").split(",").map(Number),
  grid: num("BENCH_GRID", 16),
  N: num("BENCH_N", 50),
  networks: num("BENCH_NETWORKS", 4),
  starts: num("BENCH_STARTS", 8),
  tMax: num("BENCH_TMAX", 100),
};
const serverUrl = process.env.DATABASE_URL ?? "postgres://postgres@127.0.0.1:54310/equilibrist";

function withDatabase(url: string, name: string): string {
  const u = new URL(url);
  u.pathname = `/${name}`;
  return u.toString();
}

async function admin(sqlText: string): Promise<void> {
  const client = new pg.Client({ connectionString: withDatabase(serverUrl, "postgres") });
  client.on("error", () => undefined);
  await client.connect();
  try {
    await client.query(sqlText);
  } finally {
    await client.end();
  }
}

function mapBody(seed: number) {
  return createMapSchema.parse({
    title: `bench ${settings.grid}×${settings.grid} N=${settings.N} seed ${seed}`,
    ensemble: "rate",
    settings: { N: settings.N, g: 1 },
    mu: { min: 0.25, max: 2.5, steps: settings.grid },
    tau: { min: 0, max: 1, steps: settings.grid },
    budget: { networks: settings.networks, starts: settings.starts, tMax: settings.tMax },
    seed,
  });
}

interface RunFigures {
  threads: number;
  cells: number;
  wallSeconds: number;
  cellsPerMinute: number;
  meanCellSeconds: number;
}

async function runOnce(database: Database, url: string, threads: number, seed: number): Promise<RunFigures> {
  const boss = await createBoss(url, { max: 2 });
  const compute = createComputePool({ threads });
  const [owner] = await database.db
    .insert(users)
    .values({ email: `bench-${seed}@bench.example`, name: "Bench", passwordHash: "none", siteRole: "admin" })
    .returning({ id: users.id, email: users.email, name: users.name, siteRole: users.siteRole });
  const service = createMapsService({ db: database.db, groups: createGroupsService({ db: database.db }), appUrl: "http://127.0.0.1", jobs: bossMapJobs(boss) });
  const t0 = performance.now();
  const created = await service.create(owner, mapBody(seed));
  if (!("id" in created)) throw new Error("map not created");
  const workers = await startJobWorkers({ db: database.db, boss, compute, workerName: `${hostname()}:${process.pid}`, logger, pollingIntervalSeconds: 0.5 });
  for (;;) {
    const [row] = await database.db.select({ status: maps.status, failure: maps.failure }).from(maps).where(eq(maps.id, created.id));
    if (row.status === "done") break;
    if (row.status === "failed") throw new Error(`map failed: ${row.failure}`);
    await new Promise((r) => setTimeout(r, 200));
  }
  const wallSeconds = (performance.now() - t0) / 1000;
  await workers.stop();
  await boss.stop({ graceful: true, timeout: 5000 });
  await workers.close();
  await compute.close();
  const [stats] = await database.db
    .select({ n: sql<number>`count(*)::int`, mean: sql<number>`avg(${cells.computeSeconds})` })
    .from(cells)
    .where(sql`${cells.input}->>'seed' = ${String(seed)}`);
  return { threads, cells: stats.n, wallSeconds, cellsPerMinute: (stats.n / wallSeconds) * 60, meanCellSeconds: Number(stats.mean) };
}

async function main(): Promise<void> {
  const name = `equilibrist_bench_${process.pid}`;
  await admin(`create database "${name}"`);
  const url = withDatabase(serverUrl, name);
  const database = openDatabase(url, { max: 6 });
  try {
    await migrateDatabase(url);
    console.log(`bench:maps — ${settings.grid} × ${settings.grid} rate map, N = ${settings.N}, g = 1, ${settings.networks} networks × ${settings.starts} starts, tMax ${settings.tMax}`);
    const figures: RunFigures[] = [];
    for (const [k, threads] of settings.threads.entries()) {
      const f = await runOnce(database, url, threads, 9000 + k);
      figures.push(f);
      console.log(`  ${threads} thread${threads === 1 ? " " : "s"}: ${f.cells} cells in ${f.wallSeconds.toFixed(1)} s → ${f.cellsPerMinute.toFixed(1)} cells/min (mean ${f.meanCellSeconds.toFixed(3)} s of wall time per cell in its thread)`);
    }
    if (figures.length > 1) console.log(`  speed-up ${figures.at(-1)!.threads} vs ${figures[0].threads} threads: ×${(figures.at(-1)!.cellsPerMinute / figures[0].cellsPerMinute).toFixed(2)}`);
  } finally {
    await database.close();
    await admin(`drop database if exists "${name}" with (force)`);
  }
}

await main();
