import type { CellInput, CellResult } from "../../../shared/schemas/cell-result";
import { validateCellInput } from "./cell-input";
import { mergeNetworks } from "./merge";
import { runNetwork } from "./run-network";

/**
 * Computes one cell serially: validates the input, runs networks k = 0 … K−1 (runNetwork) and
 * aggregates them (mergeNetworks). Identical inputs give identical results bit for bit, except
 * `timing`, which holds the wall time (use runCellParallel of engine/pool for every core; its
 * result equals this one outside `timing`).
 * @param input ensemble id, parameters, μ, τ, budget { networks, starts, tMax, rtol, atol,
 *   exhaustive? } and seed
 * @returns the CellResult (theory: null)
 * @throws TypeError/RangeError naming a bad input field
 */
export function runCell(input: CellInput): CellResult {
  const t0 = performance.now();
  const valid = validateCellInput(input);
  const outputs = Array.from({ length: valid.budget.networks }, (_, k) => runNetwork(valid, k));
  return mergeNetworks(valid, outputs, { wallSeconds: (performance.now() - t0) / 1000, threads: 1 });
}
