import PgBoss from "pg-boss";
import { logger as defaultLogger, type Logger } from "../lib/logger";
import { FILL_CELL_EXHAUSTED_QUEUE, FILL_CELL_QUEUE, MAP_FINISHED_QUEUE, PROBE_SEARCH_QUEUE, THEORY_ROW_QUEUE, type QueueName } from "./queues";

/** Retry and expiry policy of one queue (pg-boss 10 queue options). */
export interface QueuePolicy {
  /** Retries after the first attempt (a job runs at most retryLimit + 1 times). */
  retryLimit: number;
  /** Seconds before the first retry; doubled (with jitter) per retry when retryBackoff. */
  retryDelay: number;
  retryBackoff: boolean;
  /**
   * Seconds a job may stay active. A worker that dies mid-job leaves it active; maintenance
   * fails it after this long and pg-boss retries it on another worker. A handler still running
   * past it is failed (and retried) by its own worker.
   */
  expireInSeconds: number;
  /** Queue that receives a job's payload when its retries are used up. */
  deadLetter?: QueueName;
}

/**
 * Default policies. fill-cell: 3 retries (brief: retryable failures are retried, limit 3);
 * 30 minutes active at most, which covers the largest admin budget measured by
 * `npm run bench:maps` with margin; jobs that exhaust their retries go to fill-cell-exhausted,
 * whose handler marks the cell and its map failed instead of leaving the map waiting forever.
 * probe-search: 2 retries, 3 hours active at most (the work limit of shared/schemas/probes.ts
 * keeps N²·starts·(1 + comparison networks) to about 2 hours on two threads); its handler
 * records the failure on the probe when the last attempt fails.
 */
export const DEFAULT_QUEUE_POLICIES: Record<QueueName, QueuePolicy> = {
  [FILL_CELL_QUEUE]: { retryLimit: 3, retryDelay: 5, retryBackoff: true, expireInSeconds: 30 * 60, deadLetter: FILL_CELL_EXHAUSTED_QUEUE },
  [FILL_CELL_EXHAUSTED_QUEUE]: { retryLimit: 3, retryDelay: 5, retryBackoff: true, expireInSeconds: 5 * 60 },
  [THEORY_ROW_QUEUE]: { retryLimit: 3, retryDelay: 5, retryBackoff: true, expireInSeconds: 15 * 60 },
  [MAP_FINISHED_QUEUE]: { retryLimit: 3, retryDelay: 30, retryBackoff: true, expireInSeconds: 5 * 60 },
  [PROBE_SEARCH_QUEUE]: { retryLimit: 2, retryDelay: 10, retryBackoff: true, expireInSeconds: 3 * 60 * 60 },
};

export interface BossOptions {
  /** PostgreSQL schema of pg-boss's tables (default "pgboss"). */
  schema?: string;
  /** Connections pg-boss holds open (default 4). */
  max?: number;
  /** Seconds between maintenance runs: expiring stuck jobs, archiving, deleting (default 60). */
  maintenanceIntervalSeconds?: number;
  /** Seconds between queue-size "monitor-states" events (default: none). */
  monitorStateIntervalSeconds?: number;
  /** Per-queue policy overrides, merged over DEFAULT_QUEUE_POLICIES. */
  queues?: Partial<Record<QueueName, Partial<QueuePolicy>>>;
  /** Shown in pg_stat_activity (default "equilibrist-queue"). */
  applicationName?: string;
  logger?: Logger;
}

/** The queue policies after merging overrides (the ones createBoss writes). */
export function queuePolicies(overrides: BossOptions["queues"] = {}): Record<QueueName, QueuePolicy> {
  const out = {} as Record<QueueName, QueuePolicy>;
  for (const [name, policy] of Object.entries(DEFAULT_QUEUE_POLICIES) as [QueueName, QueuePolicy][]) {
    out[name] = { ...policy, ...overrides[name] };
  }
  return out;
}

/**
 * Starts pg-boss 10 on `databaseUrl` (creating or migrating its schema) and makes sure every
 * queue exists. Queues without a dead letter are created first, since a dead letter must exist
 * before the queue pointing at it. A new queue gets the merged policy; an existing queue keeps
 * the policy it has, except for queues named in `options.queues`, whose policy is rewritten
 * (so plain processes never undo an explicit override). Jobs copy the queue's policy when they
 * are sent. Start one per process.
 * @param databaseUrl postgres:// URL of the product's database
 * @param options schema, pool size, maintenance interval, queue policies, logger
 * @returns the started PgBoss; stop it with `boss.stop()`
 * @throws when the database cannot be reached or the schema cannot be created
 */
export async function createBoss(databaseUrl: string, options: BossOptions = {}): Promise<PgBoss> {
  const log = options.logger ?? defaultLogger;
  const boss = new PgBoss({
    connectionString: databaseUrl,
    schema: options.schema ?? "pgboss",
    max: options.max ?? 4,
    application_name: options.applicationName ?? "equilibrist-queue",
    maintenanceIntervalSeconds: options.maintenanceIntervalSeconds ?? 60,
    ...(options.monitorStateIntervalSeconds ? { monitorStateIntervalSeconds: options.monitorStateIntervalSeconds } : {}),
  });
  boss.on("error", (err: Error) => log.warn("queue error", { message: err.message }));
  await boss.start();
  const policies = queuePolicies(options.queues);
  const ordered = (Object.keys(policies) as QueueName[]).sort((a, b) => Number(!!policies[a].deadLetter) - Number(!!policies[b].deadLetter));
  for (const name of ordered) {
    const queue = { name, policy: "standard" as const, ...policies[name] };
    await retryConcurrentDdl(() => boss.createQueue(name, queue));
    if (options.queues?.[name]) await boss.updateQueue(name, queue);
  }
  return boss;
}

/**
 * The web and worker processes start together and both create the queues: PostgreSQL may then
 * report a deadlock (40P01) or a duplicate (23505) on pg-boss's queue table. Both are harmless
 * races; try again after a short random pause.
 */
async function retryConcurrentDdl(create: () => Promise<unknown>, attempts = 6): Promise<void> {
  for (let attempt = 1; ; attempt++) {
    try {
      await create();
      return;
    } catch (err) {
      const code = (err as { code?: string }).code;
      if (attempt >= attempts || (code !== "40P01" && code !== "23505")) throw err;
      await new Promise((r) => setTimeout(r, 100 + Math.random() * 400));
    }
  }
}

export type { PgBoss };
