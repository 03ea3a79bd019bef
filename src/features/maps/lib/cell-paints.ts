import { layers, type LayerId } from "../../../../shared/maps/layers";
import type { LayerScale } from "./color-scale";
import { matchesCriteria, type Criterion } from "./filters";
import { formatNumber, formatShare } from "../../../lib/format-number";
import type { GridModel } from "./grid-model";
import { SPECIAL_FILLS } from "./palettes";

/** How one slot of the grid is drawn. */
export interface CellPaint {
  /** Fill colour or a `url(#pattern)` reference. */
  fill: string;
  /** Accessible name: position and the value shown. */
  label: string;
  /** Dimmed when a filter is on and the cell does not match it. */
  dim: boolean;
}

export interface PatternIds {
  pending: string;
  failed: string;
}

/** A layer's value in words, the way legends and read-outs print it. */
export function formatLayerValue(layerId: LayerId, v: number, scale?: LayerScale): string {
  const layer = layers[layerId];
  if (layer.kind === "category" && scale?.kind === "category") return scale.entries.find((e) => e.code === v)?.label ?? "—";
  return layer.kind === "share" ? formatShare(v) : formatNumber(v);
}

/**
 * Fill, accessible label and dimming of every slot of the grid for one layer: the layer's colour
 * where the cell has a value, a hatch while pending, a mark when failed, a flat grey when done
 * without a value for this layer; cells not meeting the filter are dimmed.
 */
export function cellPaints(
  grid: GridModel,
  layerId: LayerId,
  values: Float64Array,
  scale: LayerScale,
  criteria: readonly Criterion[],
  patterns: PatternIds,
): CellPaint[] {
  const filtering = criteria.length > 0;
  const name = layers[layerId].label;
  return grid.cells.map((c, k) => {
    const i = k % grid.muSteps;
    const j = Math.floor(k / grid.muSteps);
    const where = `μ ${formatNumber(grid.mus[i])}, τ ${formatNumber(grid.taus[j])}`;
    const state = c?.state ?? "pending";
    if (state === "pending") return { fill: `url(#${patterns.pending})`, label: `${where}: pending`, dim: filtering };
    if (state === "failed" || state === "cancelled") {
      return { fill: state === "failed" ? `url(#${patterns.failed})` : SPECIAL_FILLS.empty, label: `${where}: ${state}`, dim: filtering };
    }
    const v = values[k];
    const dim = filtering && !matchesCriteria(c, criteria);
    if (Number.isNaN(v)) return { fill: SPECIAL_FILLS.empty, label: `${where}: ${name} not available`, dim };
    return { fill: scale.colorOf(v), label: `${where}: ${name} ${formatLayerValue(layerId, v, scale)}`, dim };
  });
}
