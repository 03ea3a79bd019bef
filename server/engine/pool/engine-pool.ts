import { availableParallelism } from "node:os";
import { Piscina } from "piscina";
import type { CellInput, CellResult } from "../../../shared/schemas/cell-result";
import { validateCellInput } from "../cell/cell-input";
import { mergeNetworks } from "../cell/merge";
import type { NetworkOutput } from "../cell/run-network";
import type { NetworkTask } from "./network.worker";
import type { WarmTask } from "./warm-task";
import { joinRateShares, type RateStartsShare, type RateStartsTask, type ShareTiming } from "./starts-task";
import type { NetworkRun, RunStartsOptions } from "../equilibria/run-starts";

export interface EnginePoolOptions {
  /** Worker threads. Default: every core (os.availableParallelism()). */
  threads?: number;
}

/** A pool of worker threads that run networks of cells. */
export interface EnginePool {
  readonly threads: number;
  /** Runs one network task in a worker. */
  run(task: NetworkTask): Promise<NetworkOutput>;
  /** Runs one share of a rate network's starts in a worker. */
  runStarts(task: RateStartsTask): Promise<RateStartsShare>;
  /**
   * Starts every worker thread and runs one small engine task on each (warmWorker), so thread
   * start-up, module loading (tsx) and JIT compilation are paid before timed work: a long-lived
   * process calls it once after createEnginePool. Resolves to the thread ids warmed (one per
   * thread unless a thread took more than 10 s to start).
   */
  warm(): Promise<number[]>;
  /** Stops the workers. */
  close(): Promise<void>;
}

/** Worker flags: the TypeScript loader is added when this process does not already carry it. */
function workerExecArgv(isTypeScript: boolean): string[] {
  const argv = process.execArgv;
  const hasTsx = argv.some((a) => a.includes("tsx"));
  return isTypeScript && !hasTsx ? [...argv, "--import", "tsx"] : [...argv];
}

/**
 * Creates a piscina (5.3) pool whose workers run `runNetwork` (pool/network.worker). Under tsx
 * the workers inherit the loader; elsewhere (vitest) "--import tsx" is added for the .ts worker.
 * @param options threads (default: all cores)
 * @returns the pool; call close() when done
 * @throws RangeError when threads is not a positive integer
 */
export function createEnginePool(options: EnginePoolOptions = {}): EnginePool {
  const threads = options.threads ?? availableParallelism();
  if (!Number.isSafeInteger(threads) || threads < 1) throw new RangeError(`threads must be a positive integer, got ${threads}`);
  const isTypeScript = import.meta.url.endsWith(".ts");
  const filename = new URL(`./network.worker.${isTypeScript ? "ts" : "js"}`, import.meta.url).href;
  const piscina = new Piscina({
    filename,
    minThreads: threads,
    maxThreads: threads,
    execArgv: workerExecArgv(isTypeScript),
  });
  return {
    threads,
    run: (task) => piscina.run(task) as Promise<NetworkOutput>,
    runStarts: (task) => piscina.run(task, { name: "runRateStarts" }) as Promise<RateStartsShare>,
    warm: async () => {
      const task: WarmTask = { started: new Int32Array(new SharedArrayBuffer(4)), of: threads };
      const done = await Promise.all(Array.from({ length: threads }, () => piscina.run(task, { name: "warmWorker" })));
      return (done as { threadId: number }[]).map((d) => d.threadId);
    },
    close: () => piscina.destroy(),
  };
}

/**
 * Computes one cell with the networks spread over the pool's threads (one task per network, so
 * the queue balances uneven networks) and merges them in network order: the result equals
 * runCell's except `timing`.
 * @param pool an engine pool
 * @param input the cell input (validated here)
 * @returns the CellResult
 * @throws TypeError/RangeError on a bad input; rejects when a worker fails
 */
export async function runCellParallel(pool: EnginePool, input: CellInput): Promise<CellResult> {
  const t0 = performance.now();
  const valid = validateCellInput(input);
  const tasks = Array.from({ length: valid.budget.networks }, (_, k) => pool.run({ input: valid, k }));
  const outputs = await Promise.all(tasks);
  return mergeNetworks(valid, outputs, { wallSeconds: (performance.now() - t0) / 1000, threads: pool.threads });
}

/**
 * Runs the starts of one rate network dx/dt = −μx + J tanh(x) + I over the pool's threads:
 * start i goes to share i mod threads (interleaved, so slow and fast runs spread evenly), each
 * share is run by runStarts in a worker (the basin shortcut then only knows the equilibria of
 * its own share), and the shares are joined in share order
 * (joinRateShares). The result depends on the number of threads, and is deterministic for a
 * given number.
 * @param pool an engine pool
 * @param couplings J, row-major N×N
 * @param mu relaxation rate μ > 0
 * @param input constant input I (number or length-N vector)
 * @param starts start states
 * @param options run options (as runStarts)
 * @returns the joined NetworkRun (no traces), with each share's thread, wall and CPU seconds
 */
export async function runRateStartsParallel(
  pool: EnginePool,
  couplings: Float64Array,
  mu: number,
  input: Float64Array | number,
  starts: Float64Array[],
  options: RunStartsOptions = {},
): Promise<NetworkRun & { shareTimings: ShareTiming[] }> {
  const shares = Math.max(1, Math.min(pool.threads, starts.length));
  const tasks: RateStartsTask[] = Array.from({ length: shares }, (_, s) => {
    const indices = starts.map((_x, i) => i).filter((i) => i % shares === s);
    return { couplings, mu, input, starts: indices.map((i) => starts[i]), indices, options };
  });
  const results = await Promise.all(tasks.map((t) => pool.runStarts(t)));
  return { ...joinRateShares(tasks[0], results), shareTimings: results.map((r) => r.timing) };
}
