import { threadId } from "node:worker_threads";
import { createRng } from "../random/rng";
import { rateNetworkFromMatrix } from "../ensembles/rate/rate-network";
import { runStarts } from "../equilibria/run-starts";

/** One warm-up task per worker thread: a shared counter lets each task wait for the others. */
export interface WarmTask {
  /** Int32Array over a SharedArrayBuffer of length 1: the tasks started so far. */
  started: Int32Array;
  /** Tasks sent together (the pool's threads). */
  of: number;
}

const N = 48;
const STARTS = 8;
const WAIT_MS = 10_000;

/**
 * Worker side of EnginePool.warm: registers on the shared counter and waits (Atomics.wait, at
 * most 10 s) until all `of` tasks have started — so each lands on its own thread, none sitting
 * idle while another thread takes two — then integrates a small rate network (N = 48, 8 starts,
 * t ≤ 60, one Lyapunov probe each) so the engine's code is compiled and optimised before timed
 * work arrives.
 * @param task the shared counter and the number of tasks
 * @returns the worker's thread id and the number of runs made
 */
export function warmWorker(task: WarmTask): { threadId: number; runs: number } {
  const now = Atomics.add(task.started, 0, 1) + 1;
  if (now >= task.of) Atomics.notify(task.started, 0);
  const until = Date.now() + WAIT_MS;
  for (let seen = now; seen < task.of && Date.now() < until; seen = Atomics.load(task.started, 0)) {
    Atomics.wait(task.started, 0, seen, until - Date.now());
  }
  const rng = createRng(20261201);
  const j = Float64Array.from({ length: N * N }, () => (2 * rng.normal()) / Math.sqrt(N));
  const starts = Array.from({ length: STARTS }, () => Float64Array.from({ length: N }, () => rng.normal()));
  return { threadId, runs: runStarts(rateNetworkFromMatrix(j, 1), starts, { tMax: 60 }).outcomes.length };
}
