import type PgBoss from "pg-boss";
import type { Tx } from "../../db/client";
import { UnavailableError } from "../../lib/errors";
import {
  FILL_CELL_QUEUE, MAP_FINISHED_QUEUE, THEORY_ROW_QUEUE,
  type FillCellPayload, type MapFinishedPayload, type TheoryRowPayload,
} from "../../queue/queues";
import { DEFAULT_QUEUE_POLICIES } from "../../queue/boss";
import { sendInTransaction, sendMany, transactionDb } from "../../queue/send";

/** Jobs one map operation enqueues, all inside the caller's transaction. */
export interface MapJobBatch {
  fillCells: FillCellPayload[];
  /** Estimated CPU seconds of each fill-cell (same order), to size its expiry. */
  fillCellSeconds?: number[];
  theoryRows: TheoryRowPayload[];
  /** Enqueued when the map is done at once (every cell cached). */
  mapFinished?: MapFinishedPayload;
}

/**
 * The maps service's view of the job queue. Every call runs inside the service's transaction:
 * when it throws, the transaction (map, positions, jobs) rolls back as a whole.
 */
export interface MapJobs {
  /** Enqueues the batch; returns the fill-cell job ids in the order of `fillCells`. */
  enqueue(tx: Tx, jobs: MapJobBatch): Promise<{ fillCellIds: string[] }>;
  /** Cancels fill-cell jobs that have not finished (pg-boss `cancel`). */
  cancelFillCells(tx: Tx, jobIds: string[]): Promise<void>;
}

/**
 * A fill-cell job whose estimated cost is large may stay active three times that long, so a big
 * cell is not timed out and retried while it is still computing (a dead worker's job is retried
 * once the time has passed). Smaller jobs keep the queue's own expiry (undefined here).
 */
export function fillCellExpiry(estimatedSeconds: number | undefined): number | undefined {
  const wanted = Math.ceil(3 * (estimatedSeconds ?? 0));
  return wanted > DEFAULT_QUEUE_POLICIES[FILL_CELL_QUEUE].expireInSeconds ? wanted : undefined;
}

/** Largest number of ids pg-boss is asked to cancel in one statement. */
const CANCEL_CHUNK = 1000;

/** MapJobs on a started pg-boss (server/queue/boss.ts), writing through the transaction's client. */
export function bossMapJobs(boss: PgBoss): MapJobs {
  return {
    async enqueue(tx, jobs) {
      const seconds = jobs.fillCellSeconds;
      const fillCellIds = await sendMany(boss, tx, FILL_CELL_QUEUE, jobs.fillCells, {
        expireInSeconds: (_payload, k) => fillCellExpiry(seconds?.[k]),
      });
      await sendMany(boss, tx, THEORY_ROW_QUEUE, jobs.theoryRows);
      if (jobs.mapFinished) await sendInTransaction(boss, tx, MAP_FINISHED_QUEUE, jobs.mapFinished);
      return { fillCellIds };
    },
    async cancelFillCells(tx, jobIds) {
      const db = transactionDb(tx);
      for (let k = 0; k < jobIds.length; k += CANCEL_CHUNK) {
        await boss.cancel(FILL_CELL_QUEUE, jobIds.slice(k, k + CANCEL_CHUNK), { db });
      }
    },
  };
}

/** MapJobs for an app started without a queue: any change that needs jobs answers 503. */
export const noMapJobs: MapJobs = {
  enqueue: async () => {
    throw new UnavailableError("The job queue is not running; maps cannot be filled right now");
  },
  cancelFillCells: async () => undefined,
};
