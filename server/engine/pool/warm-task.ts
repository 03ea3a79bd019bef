import { threadId } from "node:worker_threads";
import { validateCellInput } from "../cell/cell-input";
import { runNetwork } from "../cell/run-network";

/** One warm-up task per worker thread: a shared counter lets each task wait for the others. */
export interface WarmTask {
  /** Int32Array over a SharedArrayBuffer of length 1: the tasks started so far. */
  started: Int32Array;
  /** Tasks sent together (the pool's threads). */
  of: number;
}

const WAIT_MS = 10_000;
/** A small rate cell (N = 48, 8 starts, t ≤ 60): draws, integration with one probe per run, Newton, spectra, summary. */
const WARM_INPUT = {
  ensemble: "rate",
  params: { N: 48, g: 2 },
  mu: 1,
  tau: 0.5,
  seed: 20261201,
  budget: { networks: 1, starts: 8, tMax: 60, rtol: 1e-6, atol: 1e-9 },
};

/**
 * Worker side of EnginePool.warm: registers on the shared counter and waits (Atomics.wait, at
 * most 10 s) until all `of` tasks have started — so each lands on its own thread, none sitting
 * idle while another thread takes two — then computes network 0 of a small rate cell (runNetwork:
 * N = 48, 8 starts, t ≤ 60) so the engine's code is compiled and optimised before timed work.
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
  const out = runNetwork(validateCellInput(WARM_INPUT), 0);
  return { threadId, runs: Object.values(out.summary.runs).reduce((a, b) => a + b, 0) };
}
