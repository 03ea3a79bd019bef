import type { CellSummary } from "../../../../shared/maps/cell-summary";
import { layers, layerValue, type LayerId, type LayerInfo } from "../../../../shared/maps/layers";

/** One condition on a layer's value, e.g. "converged ≥ 0.9". */
export interface Criterion {
  layer: LayerId;
  op: "atLeast" | "atMost";
  value: number;
}

/** Layers a filter can use: every numeric layer (the regime is a category). */
export const filterableLayers = (ensembleLayers: readonly LayerInfo[]): LayerInfo[] => ensembleLayers.filter((l) => l.kind !== "category");

/** Whether a finished cell meets every criterion; pending cells and missing values never match. */
export function matchesCriteria(c: CellSummary | undefined, criteria: readonly Criterion[]): boolean {
  if (!c || c.state !== "done") return false;
  return criteria.every((k) => {
    const v = layerValue(k.layer, c);
    if (v == null || !Number.isFinite(k.value)) return false;
    return k.op === "atLeast" ? v >= k.value : v <= k.value;
  });
}

/** A plain-words version for the summary line: "Runs that settled ≥ 0.9 and Stable states found ≥ 5". */
export function describeCriteria(criteria: readonly Criterion[]): string {
  return criteria.map((k) => `${layers[k.layer].label} ${k.op === "atLeast" ? "≥" : "≤"} ${k.value}`).join(" and ");
}
