import type { CellInput } from "../../../shared/schemas/cell-result";
import { getEnsemble } from "../ensembles/registry";

export type { CellInput, CellResult, CellBudget, NetworkSummary } from "../../../shared/schemas/cell-result";

/** Version of the engine's dynamics; part of every cell key (bump when results change). */
export const ENGINE_VERSION = "dynamics-3";

function finitePositive(name: string, v: unknown): number {
  if (typeof v !== "number" || !Number.isFinite(v) || v <= 0) {
    throw new RangeError(`${name} must be a positive finite number, got ${String(v)}`);
  }
  return v;
}

function positiveInt(name: string, v: unknown): number {
  if (typeof v !== "number" || !Number.isSafeInteger(v) || v < 1) {
    throw new RangeError(`${name} must be a positive integer, got ${String(v)}`);
  }
  return v;
}

/**
 * Checks a cell input: known ensemble with valid parameters, μ > 0, τ ∈ [0, 1], positive
 * integer budget counts, positive tolerances and tMax, a non-negative safe-integer seed, and
 * N ≤ 10 when the exhaustive search is asked for.
 * @returns the input with the ensemble's validated parameters
 * @throws TypeError/RangeError naming the bad field and its value
 */
export function validateCellInput(input: CellInput): CellInput {
  if (input === null || typeof input !== "object") throw new TypeError(`input must be an object, got ${String(input)}`);
  const ensemble = getEnsemble(input.ensemble);
  const params = ensemble.validate(input.params);
  finitePositive("mu", input.mu);
  if (typeof input.tau !== "number" || !(input.tau >= 0 && input.tau <= 1)) {
    throw new RangeError(`tau must be in [0, 1], got ${String(input.tau)}`);
  }
  if (!Number.isSafeInteger(input.seed) || input.seed < 0) {
    throw new RangeError(`seed must be a non-negative safe integer, got ${String(input.seed)}`);
  }
  const b = input.budget;
  if (b === null || typeof b !== "object") throw new TypeError(`budget must be an object, got ${String(b)}`);
  positiveInt("budget.networks", b.networks);
  positiveInt("budget.starts", b.starts);
  finitePositive("budget.tMax", b.tMax);
  finitePositive("budget.rtol", b.rtol);
  finitePositive("budget.atol", b.atol);
  if (b.exhaustive && ensemble.dimension(params) > 10) {
    throw new RangeError(`budget.exhaustive needs N ≤ 10, got N = ${ensemble.dimension(params)}`);
  }
  return { ...input, params };
}
