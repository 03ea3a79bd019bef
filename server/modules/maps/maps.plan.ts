import type { TheoryRowPayload } from "../../queue/queues";
import { InvalidError } from "../../lib/errors";
import { cellInputFor, cellKey, theoryPayloadFor, type MapSpec } from "./cell-key";

/** One grid position of a planned map. */
export interface PlannedCell {
  i: number;
  j: number;
  mu: number;
  tau: number;
  cellKey: string;
  theoryKey: string;
}

export interface MapPlan {
  cells: PlannedCell[];
  /** One theory-row payload per τ row, by j. */
  theoryRows: TheoryRowPayload[];
}

/**
 * Every position's cell key and every τ row's theory payload. The engine's own checks run
 * here (e.g. the field network's features × N cap), so a body the shared schema let through
 * but the engine refuses answers 422 before anything is stored.
 * @throws InvalidError naming "settings" when the ensemble refuses the parameters
 */
export function planMap(spec: MapSpec): MapPlan {
  try {
    const theoryRows = Array.from({ length: spec.tau.steps }, (_, j) => theoryPayloadFor(spec, j));
    const cells: PlannedCell[] = [];
    for (let j = 0; j < spec.tau.steps; j++) {
      for (let i = 0; i < spec.mu.steps; i++) {
        const input = cellInputFor(spec, i, j);
        cells.push({ i, j, mu: input.mu, tau: input.tau, cellKey: cellKey(input), theoryKey: theoryRows[j].theoryKey });
      }
    }
    return { cells, theoryRows };
  } catch (err) {
    if (err instanceof RangeError || err instanceof TypeError) {
      throw new InvalidError("The engine refuses these settings", [{ path: "settings", message: err.message }]);
    }
    throw err;
  }
}
