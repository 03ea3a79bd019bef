import type { CellSummary } from "../../../../shared/maps/cell-summary";
import { layerValue, type LayerId } from "../../../../shared/maps/layers";
import { axisPoints, type MapView } from "../../../../shared/schemas/maps";

/** A map's cells laid out for drawing: position (i along μ, j along τ) at index i + j·muSteps. */
export interface GridModel {
  muSteps: number;
  tauSteps: number;
  mus: number[];
  taus: number[];
  cells: (CellSummary | undefined)[];
}

type Axes = Pick<MapView, "mu" | "tau">;

/** Lays `cells` out on the map's grid; positions the server has not listed stay undefined. */
export function buildGrid(map: Axes, cells: readonly CellSummary[]): GridModel {
  const muSteps = map.mu.steps;
  const tauSteps = map.tau.steps;
  const slots = new Array<CellSummary | undefined>(muSteps * tauSteps);
  for (const c of cells) if (c.i < muSteps && c.j < tauSteps) slots[c.i + c.j * muSteps] = c;
  return { muSteps, tauSteps, mus: axisPoints(map.mu), taus: axisPoints(map.tau), cells: slots };
}

/** One layer's number for every slot (NaN where the cell has none: pending, failed, not applicable). */
export function layerValues(grid: GridModel, layer: LayerId): Float64Array {
  const out = new Float64Array(grid.cells.length).fill(Number.NaN);
  grid.cells.forEach((c, k) => {
    if (c?.state !== "done") return;
    const v = layerValue(layer, c);
    if (v != null) out[k] = v;
  });
  return out;
}

/** The list with the cell at (c.i, c.j) replaced by `c` (added when absent); a new array. */
export function upsertCell(cells: readonly CellSummary[], c: CellSummary): CellSummary[] {
  const at = cells.findIndex((x) => x.i === c.i && x.j === c.j);
  if (at < 0) return [...cells, c];
  const next = cells.slice();
  next[at] = c;
  return next;
}

/** Counts by fill state, for progress labels and legends. */
export function stateCounts(grid: GridModel): Record<CellSummary["state"], number> {
  const out = { pending: 0, done: 0, failed: 0, cancelled: 0 };
  for (const c of grid.cells) out[c?.state ?? "pending"] += 1;
  return out;
}
