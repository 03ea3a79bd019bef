import { Piscina } from "piscina";
import type { KacRiceTask, KacRiceTaskResult } from "../../engine/kac-rice/kac-rice.worker";
import { UnavailableError } from "../../lib/errors";

/** Runs Kac–Rice tasks off the web thread. */
export interface KacRiceRunner {
  run(task: KacRiceTask): Promise<KacRiceTaskResult>;
  close(): Promise<void>;
}

export interface KacRicePoolOptions {
  /** Worker threads (default 1: the API must not take the cores the map workers use). */
  threads?: number;
  /** Tasks allowed to wait; beyond it requests get 503 (default 16). */
  maxQueue?: number;
  /** Idle threads exit after this many ms, so an idle server holds none (default 10 000). */
  idleTimeoutMs?: number;
}

/**
 * A piscina pool running server/engine/kac-rice/kac-rice.worker. Threads start on demand and
 * exit when idle. Under plain TypeScript (vitest) the tsx loader is passed to the workers.
 */
export function createKacRicePool(options: KacRicePoolOptions = {}): KacRiceRunner {
  const isTypeScript = import.meta.url.endsWith(".ts");
  const hasTsx = process.execArgv.some((a) => a.includes("tsx"));
  const maxQueue = options.maxQueue ?? 16;
  const piscina = new Piscina<KacRiceTask, KacRiceTaskResult>({
    filename: new URL(`../../engine/kac-rice/kac-rice.worker.${isTypeScript ? "ts" : "js"}`, import.meta.url).href,
    minThreads: 0,
    maxThreads: options.threads ?? 1,
    idleTimeout: options.idleTimeoutMs ?? 10_000,
    maxQueue,
    execArgv: isTypeScript && !hasTsx ? [...process.execArgv, "--import", "tsx"] : [...process.execArgv],
  });
  return {
    run(task) {
      if (piscina.queueSize >= maxQueue) {
        return Promise.reject(new UnavailableError("The theory calculator is busy; try again shortly"));
      }
      return piscina.run(task);
    },
    close: () => piscina.destroy(),
  };
}
