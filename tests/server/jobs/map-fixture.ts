import { randomBytes } from "node:crypto";
import type PgBoss from "pg-boss";
import type { Db } from "../../../server/db/client";
import { mapCells, maps, users } from "../../../server/db/schema/index";
import { getEnsemble } from "../../../server/engine/ensembles/registry";
import { storedCellKeys } from "../../../server/modules/cells/cells.repo";
import { cellInputFor, cellKey, theoryPayloadFor, type MapSpec } from "../../../server/modules/maps/cell-key";
import { FILL_CELL_QUEUE, THEORY_ROW_QUEUE } from "../../../server/queue/queues";
import { sendMany } from "../../../server/queue/send";

// Job tests need maps with their grid and jobs without going through HTTP. This inserts them
// the way a map is created (one transaction: map row, grid positions — cached ones done at
// once — and one fill-cell job per missing cell plus one theory-row job per τ row).

/** The 3 × 3 rate-network map at N = 6 of the job tests (issue 5). */
export const SMALL_RATE_MAP: MapSpec = {
  ensemble: "rate",
  settings: { N: 6, g: 1.5, nonlinearity: "tanh", input: 0 },
  mu: { min: 0.5, max: 2, steps: 3, scale: "linear" },
  tau: { min: 0, max: 1, steps: 3, scale: "linear" },
  budget: { networks: 2, starts: 4, tMax: 100, rtol: 1e-6, atol: 1e-9 },
  seed: 7,
};

export async function insertUser(db: Db, label = "owner"): Promise<string> {
  const tag = `${label}-${randomBytes(4).toString("hex")}`;
  const [row] = await db.insert(users).values({ email: `${tag}@lab.example`, name: tag, passwordHash: "not-a-real-hash" }).returning({ id: users.id });
  return row.id;
}

export interface InsertedMap {
  id: string;
  cellKeys: string[][];
  fillJobs: string[];
}

/** Inserts a map with its grid and enqueues its jobs in one transaction. */
export async function insertMapWithJobs(db: Db, boss: PgBoss, ownerId: string, spec: MapSpec): Promise<InsertedMap> {
  const settings = getEnsemble(spec.ensemble).validate(spec.settings) as Record<string, unknown>;
  const positions: { i: number; j: number; mu: number; tau: number; cellKey: string; theoryKey: string }[] = [];
  for (let j = 0; j < spec.tau.steps; j++) {
    const theoryKey = theoryPayloadFor(spec, j).theoryKey;
    for (let i = 0; i < spec.mu.steps; i++) {
      const input = cellInputFor(spec, i, j);
      positions.push({ i, j, mu: input.mu, tau: input.tau, cellKey: cellKey(input), theoryKey });
    }
  }
  return db.transaction(async (tx) => {
    const cached = await storedCellKeys(tx, positions.map((p) => p.cellKey));
    const [map] = await tx
      .insert(maps)
      .values({
        ownerId, title: "fixture map", ensemble: spec.ensemble, ensembleVersion: getEnsemble(spec.ensemble).version,
        settings, muAxis: spec.mu, tauAxis: spec.tau, budget: cellInputFor(spec, 0, 0).budget, seed: spec.seed,
        cellsTotal: positions.length, cellsDone: cached.size, cellsFromCache: cached.size,
        status: cached.size === positions.length ? "done" : "queued",
      })
      .returning({ id: maps.id });
    const missing = positions.filter((p) => !cached.has(p.cellKey));
    const fillJobs = await sendMany(boss, tx, FILL_CELL_QUEUE, missing.map((p) => ({ mapId: map.id, i: p.i, j: p.j, cellKey: p.cellKey })));
    const jobOf = new Map(missing.map((p, k) => [`${p.i},${p.j}`, fillJobs[k]]));
    await tx.insert(mapCells).values(
      positions.map((p) => {
        const hit = cached.has(p.cellKey);
        return { ...p, mapId: map.id, state: hit ? ("done" as const) : ("pending" as const), fromCache: hit, jobId: jobOf.get(`${p.i},${p.j}`) ?? null };
      }),
    );
    const rows = Array.from({ length: spec.tau.steps }, (_, j) => theoryPayloadFor(spec, j));
    await sendMany(boss, tx, THEORY_ROW_QUEUE, rows, { priority: 1 });
    const cellKeys = Array.from({ length: spec.mu.steps }, (_, i) => Array.from({ length: spec.tau.steps }, (_, j) => positions[j * spec.mu.steps + i].cellKey));
    return { id: map.id, cellKeys, fillJobs };
  });
}

/** Polls until `check` returns a value (not undefined), or fails after `timeoutMs`. */
export async function waitFor<T>(check: () => Promise<T | undefined>, timeoutMs = 60_000, label = "condition"): Promise<T> {
  const until = Date.now() + timeoutMs;
  for (;;) {
    const v = await check();
    if (v !== undefined) return v;
    if (Date.now() > until) throw new Error(`timed out waiting for ${label}`);
    await new Promise((r) => setTimeout(r, 100));
  }
}
