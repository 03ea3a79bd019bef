// Worker-thread entry for one finite-N Kac–Rice point (used by the theory API's thread pool so
// the Monte Carlo never blocks the web process).
import { EXACT_TOTAL_COLUMN_MAX_N } from "./columns";
import { exactTotalKacRice } from "./exact-total";
import { kacRicePoint, type KacRicePointResult } from "./monte-carlo";

/** One field-network point: N, σ, τ, μ and the Monte Carlo settings. */
export interface KacRiceTask {
  N: number;
  sigma: number;
  tau: number;
  mu: number;
  samples: number;
  seed: number;
}

export interface KacRiceTaskResult {
  point: KacRicePointResult;
  /** exactTotalKacRice for N ≤ 30, else null. */
  exactTotal: number | null;
}

/**
 * Runs kacRicePoint, and exactTotalKacRice when N ≤ 30, for one task.
 * @param task the point and Monte Carlo settings
 * @returns both results
 * @throws RangeError/TypeError naming a bad option (see kacRicePoint)
 */
export default function runKacRiceTask(task: KacRiceTask): KacRiceTaskResult {
  const point = kacRicePoint(task);
  const exactTotal =
    task.N <= EXACT_TOTAL_COLUMN_MAX_N
      ? exactTotalKacRice({ N: task.N, mu: task.mu, tau: task.tau, sigma: task.sigma })
      : null;
  return { point, exactTotal };
}
