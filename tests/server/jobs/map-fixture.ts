import { randomBytes } from "node:crypto";
import { asc, eq } from "drizzle-orm";
import type PgBoss from "pg-boss";
import { createMapSchema } from "../../../shared/schemas/maps";
import type { Db } from "../../../server/db/client";
import { mapCells, maps, users } from "../../../server/db/schema/index";
import { getEnsemble } from "../../../server/engine/ensembles/registry";
import type { Actor } from "../../../server/lib/actor";
import { createGroupsService } from "../../../server/modules/groups/groups.service";
import { cellInputFor, cellKey, theoryPayloadFor, type MapSpec } from "../../../server/modules/maps/cell-key";
import { bossMapJobs } from "../../../server/modules/maps/maps.jobs";
import { createMapsService, type MapsService } from "../../../server/modules/maps/maps.service";
import { FILL_CELL_QUEUE } from "../../../server/queue/queues";
import { sendMany } from "../../../server/queue/send";

// Maps for the job tests: created through the maps service (the path of POST /api/maps), or —
// for the one test that needs a map today's rules refuse — inserted directly.

/** The 3 × 3 rate-network map at N = 6 of the job tests (issue 5). */
export const SMALL_RATE_MAP: MapSpec = {
  ensemble: "rate",
  settings: { N: 6, g: 1.5, nonlinearity: "tanh", input: 0 },
  mu: { min: 0.5, max: 2, steps: 3, scale: "linear" },
  tau: { min: 0, max: 1, steps: 3, scale: "linear" },
  budget: { networks: 2, starts: 4, tMax: 100, rtol: 1e-6, atol: 1e-9 },
  seed: 7,
};

export async function insertUser(db: Db, label = "owner"): Promise<Actor> {
  const tag = `${label}-${randomBytes(4).toString("hex")}`;
  const [row] = await db
    .insert(users)
    .values({ email: `${tag}@lab.example`, name: tag, passwordHash: "not-a-real-hash" })
    .returning({ id: users.id, email: users.email, name: users.name, siteRole: users.siteRole });
  return row;
}

export interface CreatedMap {
  id: string;
  /** cellKeys[i][j] of every position. */
  cellKeys: string[][];
  /** Fill-cell job ids of the positions that were not cached at creation. */
  fillJobs: string[];
  answer: Awaited<ReturnType<MapsService["create"]>>;
}

async function describeMap(db: Db, spec: MapSpec, id: string): Promise<Omit<CreatedMap, "answer">> {
  const rows = await db.select().from(mapCells).where(eq(mapCells.mapId, id)).orderBy(asc(mapCells.j), asc(mapCells.i));
  const cellKeys = Array.from({ length: spec.mu.steps }, (_, i) => Array.from({ length: spec.tau.steps }, (_, j) => rows[j * spec.mu.steps + i].cellKey));
  return { id, cellKeys, fillJobs: rows.flatMap((r) => (r.jobId ? [r.jobId] : [])) };
}

/** The real maps service on this database and queue. */
export function mapsServiceOn(db: Db, boss: PgBoss): MapsService {
  return createMapsService({ db, groups: createGroupsService({ db }), appUrl: "http://127.0.0.1:1", jobs: bossMapJobs(boss) });
}

/**
 * Creates a map through the maps service, as POST /api/maps does: positions, cached cells and
 * the fill-cell and theory-row jobs in one transaction.
 */
export async function createMap(db: Db, boss: PgBoss, owner: Actor, spec: MapSpec): Promise<CreatedMap> {
  const maps = mapsServiceOn(db, boss);
  const body = createMapSchema.parse({ title: "job test map", ...spec, visibility: "private" });
  const answer = await maps.create(owner, body);
  if (!("id" in answer)) throw new Error("expected a created map");
  return { ...(await describeMap(db, spec, answer.id)), answer };
}

/**
 * Inserts a map row, its grid and its jobs directly, bypassing the manifest rules — a map stored
 * under earlier rules that the engine now refuses (the service would reject it at creation).
 */
export async function insertLegacyMap(db: Db, boss: PgBoss, owner: Actor, spec: MapSpec): Promise<Omit<CreatedMap, "answer">> {
  const positions: { i: number; j: number; mu: number; tau: number; cellKey: string; theoryKey: string }[] = [];
  for (let j = 0; j < spec.tau.steps; j++) {
    for (let i = 0; i < spec.mu.steps; i++) {
      const input = cellInputFor(spec, i, j);
      positions.push({ i, j, mu: input.mu, tau: input.tau, cellKey: cellKey(input), theoryKey: theoryPayloadFor(spec, j).theoryKey });
    }
  }
  const id = await db.transaction(async (tx) => {
    const [map] = await tx
      .insert(maps)
      .values({
        ownerId: owner.id, title: "legacy map", ensemble: spec.ensemble, ensembleVersion: getEnsemble(spec.ensemble).version,
        settings: getEnsemble(spec.ensemble).validate(spec.settings), muAxis: spec.mu, tauAxis: spec.tau,
        budget: cellInputFor(spec, 0, 0).budget, seed: spec.seed, cellsTotal: positions.length,
      })
      .returning({ id: maps.id });
    const jobs = await sendMany(boss, tx, FILL_CELL_QUEUE, positions.map((p) => ({ mapId: map.id, i: p.i, j: p.j, cellKey: p.cellKey })));
    await tx.insert(mapCells).values(positions.map((p, k) => ({ ...p, mapId: map.id, jobId: jobs[k] })));
    return map.id;
  });
  return describeMap(db, spec, id);
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
