import { useId, useMemo } from "react";
import type { LayerId } from "../../../../shared/maps/layers";
import type { MapView } from "../../../../shared/schemas/maps";
import { figureLayout } from "../components/heatmap/figure-layout";
import { cellPaints } from "../lib/cell-paints";
import { layerScale } from "../lib/color-scale";
import type { Criterion } from "../lib/filters";
import { layerValues, stateCounts, type GridModel } from "../lib/grid-model";
import { settingsLine } from "../lib/map-settings";
import { overlayCurves } from "../lib/overlay-curves";
import { axisScale } from "../../../lib/axis-scale";

/**
 * Everything the map figure draws, derived once per input: the layer's values, colour scale
 * and per-cell paints, the layout at this width, the axis scales and the predicted curves.
 * Memoised so a hover or a focus move recomputes nothing.
 */
export function useFigureModel(map: MapView, grid: GridModel, layerId: LayerId, criteria: readonly Criterion[], width: number) {
  const uid = useId().replace(/[^a-zA-Z0-9]/g, "");
  const ids = useMemo(() => ({ pending: `hatch${uid}`, failed: `fail${uid}`, clip: `clip${uid}`, gradient: `grad${uid}` }), [uid]);
  const values = useMemo(() => layerValues(grid, layerId), [grid, layerId]);
  const scale = useMemo(() => layerScale(layerId, values), [layerId, values]);
  const paints = useMemo(() => cellPaints(grid, layerId, values, scale, criteria, ids), [grid, layerId, values, scale, criteria, ids]);
  const settings = useMemo(() => settingsLine(map), [map]);
  const counts = stateCounts(grid);
  const subtitle = [`${scale.layer.label} over relaxation rate μ and asymmetry τ`, `${counts.done} of ${grid.cells.length} cells done`];
  const layout = figureLayout(width, { mu: grid.muSteps, tau: grid.tauSteps }, map.muCritical != null, scale, { settings, subtitle });
  const x = useMemo(() => axisScale(map.mu, [0, layout.plotWidth]), [map.mu, layout.plotWidth]);
  const y = useMemo(() => axisScale(map.tau, [layout.plotHeight, 0]), [map.tau, layout.plotHeight]);
  const curves = useMemo(() => overlayCurves(map, y.domain() as [number, number]), [map, y]);
  const extras = {
    values: values.some((v) => !Number.isNaN(v)),
    pending: counts.pending > 0,
    failed: counts.failed > 0,
    empty: values.some((v, k) => Number.isNaN(v) && grid.cells[k]?.state === "done") || counts.cancelled > 0,
  };
  return { ids, scale, paints, layout, x, y, curves, extras };
}
