import { sql } from "drizzle-orm";
import type PgBoss from "pg-boss";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { ZodError } from "zod";
import { openDatabase, type Database } from "../../../server/db/client";
import { DEFAULT_QUEUE_POLICIES, createBoss } from "../../../server/queue/boss";
import { FILL_CELL_EXHAUSTED_QUEUE, FILL_CELL_QUEUE, MAP_FINISHED_QUEUE } from "../../../server/queue/queues";
import { sendInTransaction, sendMany, transactionDb } from "../../../server/queue/send";
import { createTestDatabase, type TestDatabase } from "../../helpers/db-template";

let testDb: TestDatabase;
let database: Database;
let boss: PgBoss;
const mapId = "3f6c1d2e-8b4a-4c1f-9e2d-5a7b8c9d0e1f";
const payload = (i: number) => ({ mapId, i, j: 0, cellKey: `${i}`.padStart(64, "c") });

beforeAll(async () => {
  testDb = await createTestDatabase();
  database = openDatabase(testDb.url, { max: 3 });
  boss = await createBoss(testDb.url, { max: 2 });
});
afterAll(async () => {
  await boss?.stop({ graceful: false });
  await database?.close();
  await testDb?.drop();
});

describe("createBoss", () => {
  it("creates every queue with its policy; fill-cell's dead letter is fill-cell-exhausted", async () => {
    const q = await boss.getQueue(FILL_CELL_QUEUE);
    expect(q).toMatchObject({ retryLimit: 3, retryDelay: 5, retryBackoff: true, expireInSeconds: 1800, deadLetter: FILL_CELL_EXHAUSTED_QUEUE });
    expect(await boss.getQueue(MAP_FINISHED_QUEUE)).toMatchObject({ retryLimit: DEFAULT_QUEUE_POLICIES[MAP_FINISHED_QUEUE].retryLimit });
  });

  it("rewrites only the policies it is given: a plain start leaves an override in place", async () => {
    const tuned = await createBoss(testDb.url, { max: 1, queues: { [MAP_FINISHED_QUEUE]: { expireInSeconds: 42 } } });
    const plain = await createBoss(testDb.url, { max: 1 });
    expect((await boss.getQueue(MAP_FINISHED_QUEUE))?.expireInSeconds).toBe(42);
    await tuned.stop({ graceful: false });
    await plain.stop({ graceful: false });
  });
});

describe("sendInTransaction and sendMany", () => {
  it("a job sent in a transaction exists after commit and not after rollback", async () => {
    const kept = await database.db.transaction((tx) => sendInTransaction(boss, tx, MAP_FINISHED_QUEUE, { mapId }));
    expect((await boss.getJobById(MAP_FINISHED_QUEUE, kept))?.data).toEqual({ mapId });
    let dropped = "";
    await expect(
      database.db.transaction(async (tx) => {
        dropped = await sendInTransaction(boss, tx, MAP_FINISHED_QUEUE, { mapId });
        throw new Error("roll back");
      }),
    ).rejects.toThrow("roll back");
    expect(dropped).toMatch(/^[0-9a-f-]{36}$/);
    expect(await boss.getJobById(MAP_FINISHED_QUEUE, dropped)).toBeNull();
  });

  it("sendMany returns ids in payload order and applies per-job expiry", async () => {
    const payloads = [payload(1), payload(2), payload(3)];
    const ids = await database.db.transaction((tx) => sendMany(boss, tx, FILL_CELL_QUEUE, payloads, { expireInSeconds: (p) => 100 * p.i + 0.5 }));
    for (const [k, id] of ids.entries()) {
      const job = await boss.getJobById<{ i: number }>(FILL_CELL_QUEUE, id);
      expect(job?.data.i).toBe(payloads[k].i);
      expect(Number(job?.expireInSeconds)).toBe(100 * payloads[k].i + 1);
    }
  });

  it("refuses a bad payload before sending anything, and a pool in place of a transaction", async () => {
    const before = await database.db.execute<{ n: number }>(sql`select count(*)::int as n from pgboss.job where name = ${FILL_CELL_QUEUE}`);
    await expect(
      database.db.transaction((tx) => sendMany(boss, tx, FILL_CELL_QUEUE, [payload(4), { ...payload(5), i: -1 }])),
    ).rejects.toBeInstanceOf(ZodError);
    const after = await database.db.execute<{ n: number }>(sql`select count(*)::int as n from pgboss.job where name = ${FILL_CELL_QUEUE}`);
    expect(after.rows[0].n).toBe(before.rows[0].n);
    expect(() => transactionDb(database.db as never)).toThrow(TypeError);
    expect(() => transactionDb({} as never)).toThrow(/transaction/);
  });
});
