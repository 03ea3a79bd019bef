import type PgBoss from "pg-boss";
import type { Db } from "../db/client";
import type { Logger } from "../lib/logger";
import { createCellsService } from "../modules/cells/cells.service";
import { createProbePool, type ProbePool } from "../modules/probes/probe.pool";
import { FILL_CELL_EXHAUSTED_QUEUE, FILL_CELL_QUEUE, MAP_FINISHED_QUEUE, PROBE_SEARCH_QUEUE, THEORY_ROW_QUEUE, type QueueName } from "../queue/queues";
import type { ComputePool } from "./compute-pool";
import { fillCell, giveUpCell } from "./fill-cell.job";
import { mapFinished, type MapFinishedHook } from "./map-finished.job";
import { probeSearch } from "./probe-search.job";
import { computeTheoryRow } from "./theory-row.job";

export interface JobWorkersOptions {
  db: Db;
  boss: PgBoss;
  compute: ComputePool;
  /** Stored with every cell this process computes (hostname:pid). */
  workerName: string;
  logger: Logger;
  /** fill-cell and theory-row jobs taken at once (default: the pool's threads). */
  concurrency?: number;
  /** Seconds between polls of an idle queue (default 2; pg-boss allows ≥ 0.5). */
  pollingIntervalSeconds?: number;
  onMapFinished?: MapFinishedHook;
  /** Threads of probe searches (default: a pool as wide as `compute`; idle threads exit). */
  probePool?: ProbePool;
}

export interface JobWorkers {
  /** pg-boss worker ids. */
  readonly ids: string[];
  /** Stops fetching new jobs (in-flight ones finish; boss.stop() waits for them). */
  stop(): Promise<void>;
  /** After boss.stop(): closes the probe pool made here (none when one was passed in). */
  close(): Promise<void>;
}

type Handle = (job: PgBoss.JobWithMetadata<unknown>) => Promise<unknown>;

/** Runs a handler; a failure is logged (pg-boss only records it on the job) and rethrown so the job is retried. */
async function logFailure(logger: Logger, queue: QueueName, job: PgBoss.JobWithMetadata<unknown>, handle: Handle): Promise<unknown> {
  try {
    return await handle(job);
  } catch (err) {
    logger.warn(`${queue} job failed; pg-boss retries it`, { job: job.id, attempt: job.retryCount + 1, of: job.retryLimit + 1, message: (err as Error).message });
    throw err;
  }
}

/**
 * Subscribes this process to the map queues: `concurrency` independent fetch loops each for
 * fill-cell and theory-row (one job per loop at a time, so at most `concurrency` cells are in
 * the pool per queue), one loop each for the dead letter and map-finished. A loop that just
 * finished a job fetches again at once instead of waiting out the polling interval.
 */
export async function startJobWorkers(o: JobWorkersOptions): Promise<JobWorkers> {
  const cells = createCellsService({ db: o.db, boss: o.boss });
  const concurrency = o.concurrency ?? o.compute.threads;
  if (!Number.isSafeInteger(concurrency) || concurrency < 1) throw new RangeError(`concurrency must be a positive integer, got ${concurrency}`);
  const fill = { db: o.db, cells, compute: o.compute, workerName: o.workerName, logger: o.logger };
  const ownProbePool = o.probePool ? null : createProbePool({ threads: o.compute.threads });
  const probePool = o.probePool ?? ownProbePool!;
  const handlers: [QueueName, number, Handle][] = [
    [FILL_CELL_QUEUE, concurrency, (job) => fillCell(fill, job.data)],
    [THEORY_ROW_QUEUE, concurrency, (job) => computeTheoryRow(fill, job.data)],
    [FILL_CELL_EXHAUSTED_QUEUE, 1, (job) => giveUpCell(fill, job)],
    [MAP_FINISHED_QUEUE, 1, (job) => mapFinished({ db: o.db, logger: o.logger, onFinished: o.onMapFinished }, job.data)],
    [PROBE_SEARCH_QUEUE, 1, (job) => probeSearch({ db: o.db, pool: probePool, logger: o.logger }, job)],
  ];
  const ids: string[] = [];
  const options = { batchSize: 1, includeMetadata: true as const, pollingIntervalSeconds: o.pollingIntervalSeconds ?? 2 };
  for (const [queue, loops, handle] of handlers) {
    for (let k = 0; k < loops; k++) {
      const self = { id: "" };
      self.id = await o.boss.work<unknown>(queue, options, async (jobs) => {
        let outcome: unknown;
        for (const job of jobs) outcome = await logFailure(o.logger, queue, job, handle);
        o.boss.notifyWorker(self.id);
        return outcome === undefined ? undefined : { outcome };
      });
      ids.push(self.id);
    }
  }
  return {
    ids,
    async stop() {
      for (const queue of new Set(handlers.map((h) => h[0]))) await o.boss.offWork(queue);
    },
    close: async () => ownProbePool?.close(),
  };
}
