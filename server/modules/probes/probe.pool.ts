import { availableParallelism } from "node:os";
import { Piscina } from "piscina";
import type { CellInput } from "../../../shared/schemas/cell-result";
import type { NetworkOutput } from "../../engine/cell/run-network";
import type { StartsChunkResult, StartsChunkTask } from "./analysis/search-chunk";
import type { ProbeTask, ProbeTaskResult } from "./probe.worker";

/** Runs probe computations off the calling thread. */
export interface ProbePool {
  readonly threads: number;
  /** Eigenvalues of the couplings. */
  spectrum(couplings: Float64Array, n: number): Promise<{ re: number[]; im: number[] }>;
  /** A slice of a search's starts on the uploaded matrix. */
  startsChunk(task: StartsChunkTask): Promise<StartsChunkResult>;
  /** Network k of the comparison cell. */
  network(input: CellInput, k: number): Promise<NetworkOutput>;
  close(): Promise<void>;
}

export interface ProbePoolOptions {
  /** Threads (default: every core). The web server uses 1, so uploads never take the cores of the map workers. */
  threads?: number;
  /** Idle threads exit after this many ms, so an idle process holds none (default 10 000). */
  idleTimeoutMs?: number;
}

/**
 * A matrix in memory every thread can read without a copy: a Float64Array over a
 * SharedArrayBuffer (structured clone shares it instead of copying N² doubles per task).
 */
export function sharedMatrix(data: Float64Array): Float64Array {
  const shared = new Float64Array(new SharedArrayBuffer(data.byteLength));
  shared.set(data);
  return shared;
}

async function run<K extends ProbeTaskResult["kind"]>(piscina: Piscina<ProbeTask, ProbeTaskResult>, task: ProbeTask & { kind: K }) {
  const out = await piscina.run(task);
  if (out.kind !== task.kind) throw new Error(`probe pool answered ${out.kind} to a ${task.kind} task`);
  return out as Extract<ProbeTaskResult, { kind: K }>;
}

/**
 * A piscina 5 pool over probe.worker (spectrum, search chunks, comparison networks). Threads
 * start on demand and exit when idle; under plain TypeScript (vitest) the tsx loader is passed
 * to them, under `node --import tsx` they inherit it.
 * @throws RangeError when threads is not a positive integer
 */
export function createProbePool(options: ProbePoolOptions = {}): ProbePool {
  const threads = options.threads ?? availableParallelism();
  if (!Number.isSafeInteger(threads) || threads < 1) throw new RangeError(`threads must be a positive integer, got ${threads}`);
  const isTypeScript = import.meta.url.endsWith(".ts");
  const hasTsx = process.execArgv.some((a) => a.includes("tsx"));
  const piscina = new Piscina<ProbeTask, ProbeTaskResult>({
    filename: new URL(`./probe.worker.${isTypeScript ? "ts" : "js"}`, import.meta.url).href,
    minThreads: 0,
    maxThreads: threads,
    idleTimeout: options.idleTimeoutMs ?? 10_000,
    execArgv: isTypeScript && !hasTsx ? [...process.execArgv, "--import", "tsx"] : [...process.execArgv],
  });
  return {
    threads,
    spectrum: async (couplings, n) => {
      const { re, im } = await run(piscina, { kind: "spectrum", couplings, n });
      return { re, im };
    },
    startsChunk: async (task) => (await run(piscina, { kind: "starts", task })).chunk,
    network: async (input, k) => (await run(piscina, { kind: "network", input, k })).output,
    close: () => piscina.destroy(),
  };
}
