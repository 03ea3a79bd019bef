import { availableParallelism } from "node:os";
import { Piscina } from "piscina";
import type { CellInput, CellResult } from "../../shared/schemas/cell-result";
import type { TheoryColumns } from "../../shared/schemas/theory";
import type { TheoryRowInput } from "../engine/kac-rice/columns";
import type { MapTask, MapTaskResult } from "../engine/pool/cell.worker";

/** Worker threads computing whole cells and theory rows, one task per thread at a time. */
export interface ComputePool {
  readonly threads: number;
  runCell(input: CellInput): Promise<CellResult>;
  runTheoryRow(input: TheoryRowInput): Promise<TheoryColumns[]>;
  /** Tasks waiting for a thread. */
  readonly queued: number;
  /** Stops the threads (running tasks are abandoned). */
  close(): Promise<void>;
}

export interface ComputePoolOptions {
  /** Threads (default: every core, os.availableParallelism()). */
  threads?: number;
}

/**
 * A piscina 5 pool over server/engine/pool/cell.worker: one whole cell per task, so N threads
 * work on N cells at once (a cell's own networks run serially inside its thread). Under plain
 * TypeScript (vitest) the tsx loader is passed to the threads; under `node --import tsx` they
 * inherit it.
 * @throws RangeError when threads is not a positive integer
 */
export function createComputePool(options: ComputePoolOptions = {}): ComputePool {
  const threads = options.threads ?? availableParallelism();
  if (!Number.isSafeInteger(threads) || threads < 1) throw new RangeError(`threads must be a positive integer, got ${threads}`);
  const isTypeScript = import.meta.url.endsWith(".ts");
  const hasTsx = process.execArgv.some((a) => a.includes("tsx"));
  const piscina = new Piscina<MapTask, MapTaskResult>({
    filename: new URL(`../engine/pool/cell.worker.${isTypeScript ? "ts" : "js"}`, import.meta.url).href,
    minThreads: threads,
    maxThreads: threads,
    execArgv: isTypeScript && !hasTsx ? [...process.execArgv, "--import", "tsx"] : [...process.execArgv],
  });
  return {
    threads,
    async runCell(input) {
      const out = await piscina.run({ kind: "cell", input });
      if (out.kind !== "cell") throw new Error(`compute pool answered ${out.kind} to a cell task`);
      return out.result;
    },
    async runTheoryRow(input) {
      const out = await piscina.run({ kind: "theory-row", input });
      if (out.kind !== "theory-row") throw new Error(`compute pool answered ${out.kind} to a theory-row task`);
      return out.columns;
    },
    get queued() {
      return piscina.queueSize;
    },
    close: () => piscina.destroy(),
  };
}

/**
 * Whether a failure is the engine refusing its input (TypeError/RangeError, thrown in a thread
 * and cloned across by name): retrying gives the same answer, so the cell fails for good.
 * Anything else (database, a thread that died) is worth a retry.
 */
export function isPermanentEngineError(err: unknown): boolean {
  if (err instanceof RangeError || err instanceof TypeError) return true;
  const name = (err as { name?: unknown } | null)?.name;
  return name === "RangeError" || name === "TypeError";
}
