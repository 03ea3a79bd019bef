import { useMemo, useRef, useState } from "react";
import { layers, layersFor, type LayerId } from "../../../../shared/maps/layers";
import type { MapGrid, MapView } from "../../../../shared/schemas/maps";
import { Card, CardBody } from "../../../components/ui/card";
import { useElementWidth } from "../hooks/use-element-width";
import { matchesCriteria, type Criterion } from "../lib/filters";
import { buildGrid } from "../lib/grid-model";
import { overlayCurves, type CurveId } from "../lib/overlay-curves";
import { CellReadout } from "./cell-readout";
import { CurveToggles } from "./curve-toggles";
import { ExportButtons } from "./export-buttons";
import { FilterPanel } from "./filter-panel";
import { MapFigure } from "./heatmap/map-figure";
import { LayerPicker } from "./layer-picker";

interface MapWorkspaceProps {
  map: MapView;
  grid: MapGrid;
  layer: LayerId;
  onLayer: (layer: LayerId) => void;
  onOpenCell: (i: number, j: number) => void;
  /** Share-link token of a signed-out reader (read routes carry it). */
  share?: string;
}

/** The map's working surface: heatmap figure, the controls beside it and the hovered cell's numbers. */
export function MapWorkspace({ map, grid, layer, onLayer, onOpenCell, share }: MapWorkspaceProps) {
  const model = useMemo(() => buildGrid(map, grid.cells), [map, grid.cells]);
  const layerId = layersFor(map.ensemble).some((l) => l.id === layer) ? layer : "stable-found";
  const [criteria, setCriteria] = useState<Criterion[]>([]);
  const [curves, setCurves] = useState<Set<CurveId>>(() => new Set(overlayCurves(map, [0, 1]).map((c) => c.id)));
  const [hover, setHover] = useState<number | null>(null);
  const box = useRef<HTMLDivElement>(null);
  const figure = useRef<SVGSVGElement>(null);
  const width = useElementWidth(box);
  const matched = criteria.length ? model.cells.filter((c) => matchesCriteria(c, criteria)).length : 0;
  const computed = model.cells.filter((c) => c?.state === "done").length;

  // Phones read top to bottom: layer, figure, curves and filter, read-out. Wide screens put the
  // figure on the left across all rows and the three panels beside it.
  return (
    <div className="grid grid-cols-1 items-start gap-4 lg:grid-cols-[minmax(0,1fr)_19rem] lg:grid-rows-[auto_auto_1fr] lg:gap-x-6">
      <Card className="lg:col-start-2 lg:row-start-1">
        <CardBody>
          <LayerPicker ensemble={map.ensemble} value={layerId} onChange={onLayer} />
        </CardBody>
      </Card>
      <div className="flex min-w-0 flex-col gap-4 lg:col-start-1 lg:row-span-3 lg:row-start-1">
        <Card className="overflow-hidden">
          <div ref={box} className="w-full">
            <MapFigure map={map} grid={model} layerId={layerId} criteria={criteria} curves={curves} width={width} onOpen={onOpenCell} onHover={setHover} svgRef={figure} />
          </div>
        </Card>
        <div className="flex flex-wrap items-center justify-between gap-3">
          <p className="text-xs text-ink-soft">Click a cell, or focus the grid and press Enter, to open its networks and equilibria.</p>
          <ExportButtons mapId={map.id} title={map.title} layerLabel={layers[layerId].label} figure={figure} share={share} />
        </div>
      </div>
      <Card className="lg:col-start-2 lg:row-start-2">
        <CardBody className="flex flex-col gap-5">
          <CurveToggles map={map} shown={curves} onChange={setCurves} />
          <FilterPanel ensemble={map.ensemble} criteria={criteria} onChange={setCriteria} matched={matched} computed={computed} />
        </CardBody>
      </Card>
      <Card aria-label="Cell read-out" className="lg:col-start-2 lg:row-start-3">
        <CardBody>
          <h3 className="mb-2 text-sm font-semibold text-ink">Cell read-out</h3>
          <CellReadout cell={hover === null ? undefined : model.cells[hover]} muCritical={map.muCritical} />
        </CardBody>
      </Card>
    </div>
  );
}
