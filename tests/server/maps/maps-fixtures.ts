import { sql } from "drizzle-orm";
import { expect } from "vitest";
import type { Db } from "../../../server/db/client";
import { runCell } from "../../../server/engine/cell/run-cell";
import { theoryColumnsRow } from "../../../server/engine/kac-rice/columns";
import { storeCell, storeTheoryRow } from "../../../server/modules/cells/cells.repo";
import { cellInputFor, cellKey, theoryPayloadFor, type MapSpec } from "../../../server/modules/maps/cell-key";
import { signedInPerson, tokenFromMail, type TestApp } from "../../helpers/test-app";

// Shared pieces of the maps API tests: create bodies, group members, and a cache filled by
// running the engine directly (what a worker would have stored).

/** The example body: a 3 × 3 rate-network map at N = 6. */
export function rateBody(overrides: Record<string, unknown> = {}) {
  return {
    title: "Leak sweep",
    ensemble: "rate",
    settings: { N: 6, g: 1, nonlinearity: "tanh", input: 0 },
    mu: { min: 0.5, max: 2, steps: 3, scale: "linear" },
    tau: { min: 0, max: 1, steps: 3 },
    budget: { networks: 4, starts: 8, tMax: 200, rtol: 1e-6, atol: 1e-9 },
    seed: 1,
    visibility: "private",
    ...overrides,
  };
}

export type Person = Awaited<ReturnType<typeof signedInPerson>>;

/** A group owned by a new person, with an editor and a viewer who joined through invitations. */
export async function groupWithMembers(app: TestApp) {
  const owner = await signedInPerson(app, "lead");
  const group = await owner.client.post("/api/groups", { name: "Attractor Reading Circle" });
  expect(group.status).toBe(201);
  const join = async (role: "editor" | "viewer") => {
    const person = await signedInPerson(app, role);
    expect((await owner.client.post(`/api/groups/${group.body.id}/invites`, { email: person.email, role })).status).toBe(201);
    const token = tokenFromMail((await app.lastMailTo(person.email)).text, "invite");
    expect((await person.client.post(`/api/invites/${token}/accept`)).status).toBe(200);
    return person;
  };
  return { owner, groupId: group.body.id as string, editor: await join("editor"), viewer: await join("viewer") };
}

/**
 * Fills the cache for every cell and τ row of `spec` by running the engine directly and storing
 * through the cells repo (as the fill-cell and theory-row jobs do).
 * @returns the cell keys, by position "i,j"
 */
export async function fillCache(db: Db, spec: MapSpec): Promise<Map<string, string>> {
  const keys = new Map<string, string>();
  for (let j = 0; j < spec.tau.steps; j++) {
    const row = theoryPayloadFor(spec, j);
    const columns = theoryColumnsRow({ ensemble: row.ensemble, params: row.params, mus: row.mus, tau: row.tau, kacRice: row.kacRice });
    await storeTheoryRow(db, { key: row.theoryKey, ensemble: row.ensemble, tau: row.tau, mus: row.mus, columns });
    for (let i = 0; i < spec.mu.steps; i++) {
      const input = cellInputFor(spec, i, j);
      const key = cellKey(input);
      await storeCell(db, { key, input, result: runCell(input), worker: "test-direct" });
      keys.set(`${i},${j}`, key);
    }
  }
  return keys;
}

/** Jobs pg-boss holds for one map in a queue, by state. */
export async function jobsOf(db: Db, queue: string, mapId: string): Promise<Record<string, number>> {
  const rows = await db.execute<{ state: string; n: number }>(
    sql`select state::text as state, count(*)::int as n from pgboss.job where name = ${queue} and data->>'mapId' = ${mapId} group by state`,
  );
  return Object.fromEntries(rows.rows.map((r) => [r.state, r.n]));
}

export const missingId = "00000000-0000-4000-8000-000000000000";
