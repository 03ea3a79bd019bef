import { createHash } from "node:crypto";
import type { CellInput } from "../../../shared/schemas/cell-result";
import { axisPoints, budgetSchema, type Budget } from "../../../shared/schemas/maps";
import type { TheoryRowPayload } from "../../queue/queues";
import { ENGINE_VERSION } from "../../engine/cell/cell-input";
import { getEnsemble } from "../../engine/ensembles/registry";

/**
 * Cache keys of cells and theory rows. A cell's key hashes everything that determines its
 * result, so any map of any account that needs the same cell finds the stored one; a theory
 * row's key does the same for the theory columns of one τ row.
 */

/** What a map needs to name its cells: the manifest's shape (a stored row maps onto it). */
export interface MapSpec {
  ensemble: string;
  settings: Record<string, unknown>;
  mu: { min: number; max: number; steps: number; scale?: "linear" | "log" };
  tau: { min: number; max: number; steps: number; scale?: "linear" | "log" };
  budget: Partial<Budget> & { networks: number; starts: number };
  seed: number;
}

/** The columns of a stored map row that MapSpec needs (server/db/schema/maps.ts). */
export interface MapRowSpec {
  ensemble: string;
  settings: unknown;
  muAxis: unknown;
  tauAxis: unknown;
  budget: unknown;
  seed: number;
}

/**
 * Kac–Rice Monte Carlo settings of map theory rows (field network only): 32 matrices, seed 1.
 * A fixed constant, not the map's seed, so every map with the same N, σ, τ and μ values shares
 * the row. The rate network's rows have no Monte Carlo.
 */
export const MAP_KAC_RICE = Object.freeze({ samples: 32, seed: 1 });

/** Part of every theory key; bump when theoryColumnsRow changes its numbers. */
export const THEORY_ROW_VERSION = "theory-1";

/** JSON with object keys sorted at every depth; throws on values JSON cannot carry exactly. */
export function canonicalJson(value: unknown): string {
  if (value === null) return "null";
  if (typeof value === "number") {
    if (!Number.isFinite(value)) throw new RangeError(`canonicalJson: non-finite number ${value}`);
    return JSON.stringify(Object.is(value, -0) ? 0 : value);
  }
  if (typeof value === "string" || typeof value === "boolean") return JSON.stringify(value);
  if (Array.isArray(value)) return `[${value.map(canonicalJson).join(",")}]`;
  if (typeof value === "object") {
    const entries = Object.entries(value as Record<string, unknown>)
      .filter(([, v]) => v !== undefined)
      .sort(([a], [b]) => (a < b ? -1 : a > b ? 1 : 0));
    return `{${entries.map(([k, v]) => `${JSON.stringify(k)}:${canonicalJson(v)}`).join(",")}}`;
  }
  throw new TypeError(`canonicalJson: cannot encode a ${typeof value}`);
}

function sha256(text: string): string {
  return createHash("sha256").update(text).digest("hex");
}

/** A stored map row as a MapSpec (the jsonb columns hold the validated manifest parts). */
export function mapSpecFromRow(row: MapRowSpec): MapSpec {
  return {
    ensemble: row.ensemble,
    settings: row.settings as MapSpec["settings"],
    mu: row.muAxis as MapSpec["mu"],
    tau: row.tauAxis as MapSpec["tau"],
    budget: row.budget as MapSpec["budget"],
    seed: row.seed,
  };
}

function checkPosition(name: "i" | "j", v: number, steps: number): void {
  if (!Number.isSafeInteger(v) || v < 0 || v >= steps) {
    throw new RangeError(`${name} must be an integer in [0, ${steps - 1}], got ${v}`);
  }
}

/**
 * The engine's input for grid position (i, j): i indexes μ (axisPoints(mu)[i]), j indexes τ.
 * Parameters are validated by the ensemble (defaults filled), the budget's defaults filled, so
 * equal cells give equal inputs however the manifest spelled them.
 * @throws RangeError/TypeError on an unknown ensemble, bad parameters or a position off the grid
 */
export function cellInputFor(map: MapSpec, i: number, j: number): CellInput {
  checkPosition("i", i, map.mu.steps);
  checkPosition("j", j, map.tau.steps);
  const ensemble = getEnsemble(map.ensemble);
  const params = ensemble.validate(map.settings) as Record<string, unknown>;
  const budget = budgetSchema.parse(map.budget);
  return {
    ensemble: map.ensemble,
    params,
    mu: axisPoints(map.mu)[i],
    tau: axisPoints(map.tau)[j],
    budget,
    seed: map.seed,
  };
}

/**
 * Cell key: sha256 hex of the canonical JSON of { ensemble, ensembleVersion, engineVersion,
 * params, mu, tau, budget, seed }. Pass an input from cellInputFor (defaults filled).
 */
export function cellKey(input: CellInput): string {
  return sha256(
    canonicalJson({
      ensemble: input.ensemble,
      ensembleVersion: getEnsemble(input.ensemble).version,
      engineVersion: ENGINE_VERSION,
      params: input.params,
      mu: input.mu,
      tau: input.tau,
      budget: input.budget,
      seed: input.seed,
    }),
  );
}

/** The parameters theory reads: field { N, sigma }, rate { N, g } (defaults filled). */
function theoryParams(map: MapSpec): TheoryRowPayload["params"] {
  const p = getEnsemble(map.ensemble).validate(map.settings) as { N: number; sigma?: number; g?: number };
  if (map.ensemble === "field") return { N: p.N, sigma: p.sigma };
  if (map.ensemble === "rate") return { N: p.N, g: p.g };
  return { N: p.N };
}

/** Theory key: sha256 hex of the canonical JSON of the row payload without its key. */
export function theoryKey(payload: Omit<TheoryRowPayload, "theoryKey">): string {
  return sha256(
    canonicalJson({
      version: THEORY_ROW_VERSION,
      ensemble: payload.ensemble,
      params: payload.params,
      tau: payload.tau,
      mus: payload.mus,
      kacRice: payload.kacRice ?? null,
    }),
  );
}

/**
 * The theory-row job payload of τ row j: every μ of the map, the theory parameters, and the
 * Kac–Rice settings MAP_KAC_RICE for the field network (none for the rate network).
 * @throws RangeError when j is off the grid or the parameters are invalid
 */
export function theoryPayloadFor(map: MapSpec, j: number): TheoryRowPayload {
  checkPosition("j", j, map.tau.steps);
  const body = {
    ensemble: map.ensemble,
    params: theoryParams(map),
    tau: axisPoints(map.tau)[j],
    mus: axisPoints(map.mu),
    ...(map.ensemble === "field" ? { kacRice: { ...MAP_KAC_RICE } } : {}),
  };
  return { theoryKey: theoryKey(body), ...body };
}
