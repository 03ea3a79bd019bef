import { randomUUID } from "node:crypto";
import pg from "pg";
import type PgBoss from "pg-boss";
import type { Tx } from "../db/client";
import {
  FILL_CELL_EXHAUSTED_QUEUE, FILL_CELL_QUEUE, MAP_FINISHED_QUEUE, PROBE_SEARCH_QUEUE, THEORY_ROW_QUEUE,
  fillCellPayloadSchema, mapFinishedPayloadSchema, probeSearchPayloadSchema, theoryRowPayloadSchema,
  type QueueName, type QueuePayloads,
} from "./queues";

/** A Drizzle transaction (node-postgres) or a pg client on which BEGIN was issued. */
export type QueueTx = Tx | pg.ClientBase;

/** Per-job options (queue policies set retries and expiry; see boss.ts). */
export interface JobSendOptions {
  /** Job id (a UUID); generated when omitted. */
  id?: string;
  /** Higher runs first (default 0). */
  priority?: number;
  /** Seconds to wait, or a Date, before the job may start. */
  startAfter?: number | Date;
}

const payloadSchemas = {
  [FILL_CELL_QUEUE]: fillCellPayloadSchema,
  [FILL_CELL_EXHAUSTED_QUEUE]: fillCellPayloadSchema,
  [THEORY_ROW_QUEUE]: theoryRowPayloadSchema,
  [MAP_FINISHED_QUEUE]: mapFinishedPayloadSchema,
  [PROBE_SEARCH_QUEUE]: probeSearchPayloadSchema,
} as const;

function isClient(value: unknown): value is pg.ClientBase {
  return typeof (value as pg.ClientBase | null)?.query === "function";
}

/**
 * pg-boss's per-call `db` option bound to the connection of `tx`, so the job rows are written
 * inside that transaction and appear (or vanish) with it. A Drizzle node-postgres transaction
 * keeps its checked-out pg client in `session.client`; the pool itself is refused, since a
 * query on the pool would run outside the transaction.
 * @throws TypeError when `tx` is neither a transaction nor a pg client
 */
export function transactionDb(tx: QueueTx): PgBoss.Db {
  const candidate = isClient(tx) ? tx : (tx as unknown as { session?: { client?: unknown } }).session?.client;
  if (candidate instanceof pg.Pool) throw new TypeError("tx must be a transaction, got the connection pool");
  if (!isClient(candidate)) throw new TypeError("tx must be a Drizzle node-postgres transaction or a pg client");
  const client = candidate;
  return { executeSql: async (text: string, values: unknown[]) => ({ rows: (await client.query(text, values)).rows }) };
}

function checkPayload<Q extends QueueName>(queue: Q, payload: QueuePayloads[Q]): QueuePayloads[Q] {
  const schema = payloadSchemas[queue];
  if (!schema) throw new TypeError(`queue must be one of ${Object.keys(payloadSchemas).join(", ")}, got ${String(queue)}`);
  return schema.parse(payload) as QueuePayloads[Q];
}

/**
 * Enqueues one job inside the caller's transaction (pg-boss `send` with the `db` option): the
 * job exists exactly when the transaction commits. The payload is checked against the queue's
 * schema first.
 * @param boss a started PgBoss (createBoss) whose queues exist
 * @param tx the open transaction
 * @param queue queue name from queues.ts
 * @param payload the job data
 * @returns the job id
 * @throws ZodError on a bad payload; the database error when the insert fails
 */
export async function sendInTransaction<Q extends QueueName>(
  boss: PgBoss, tx: QueueTx, queue: Q, payload: QueuePayloads[Q], options: JobSendOptions = {},
): Promise<string> {
  const data = checkPayload(queue, payload);
  const id = options.id ?? randomUUID();
  const sent = await boss.send(queue, data as object, { ...options, id, db: transactionDb(tx) });
  if (sent === null) throw new Error(`pg-boss did not create job ${id} on ${queue} (a job with that id exists)`);
  return sent;
}

export interface SendManyOptions<P> extends Omit<JobSendOptions, "id"> {
  /**
   * Seconds each job may stay active before pg-boss hands it to another worker, per payload
   * (e.g. a multiple of the cell's estimated compute time); default: the queue's policy. Whole
   * seconds from 1 to 23 hours (pg-boss's limit is under 24 h).
   */
  /** Per-job expiry; undefined for a job keeps the queue's own policy. */
  expireInSeconds?: (payload: P, index: number) => number | undefined;
}

const MAX_EXPIRE_SECONDS = 23 * 3600;

function perJobExpiry(seconds: number | undefined): number | undefined {
  return seconds === undefined ? undefined : expiry(seconds);
}

function expiry(seconds: number): number {
  if (!Number.isFinite(seconds) || seconds < 1) throw new RangeError(`expireInSeconds must be ≥ 1, got ${seconds}`);
  return Math.min(Math.ceil(seconds), MAX_EXPIRE_SECONDS);
}

/**
 * Enqueues many jobs in one statement inside the caller's transaction (pg-boss `insert` with
 * the `db` option). Ids are generated here so they come back in the order of `payloads`.
 * @returns job ids, one per payload, in order
 * @throws ZodError on a bad payload, RangeError on a bad expiry (nothing is sent then)
 */
export async function sendMany<Q extends QueueName>(
  boss: PgBoss, tx: QueueTx, queue: Q, payloads: QueuePayloads[Q][], options: SendManyOptions<QueuePayloads[Q]> = {},
): Promise<string[]> {
  const checked = payloads.map((p) => checkPayload(queue, p));
  if (checked.length === 0) return [];
  const ids = checked.map(() => randomUUID());
  const startAfter = options.startAfter instanceof Date ? options.startAfter.toISOString() : options.startAfter === undefined ? undefined : `${options.startAfter} seconds`;
  const jobs = checked.map((data, k) => ({
    id: ids[k], name: queue, data: data as object, priority: options.priority, startAfter,
    expireInSeconds: perJobExpiry(options.expireInSeconds?.(data, k)),
  }));
  await boss.insert(jobs, { db: transactionDb(tx) });
  return ids;
}
