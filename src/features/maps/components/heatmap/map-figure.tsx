import { memo, useCallback, useId, useMemo, useRef, useState, type PointerEvent, type Ref } from "react";
import type { LayerId } from "../../../../../shared/maps/layers";
import type { MapView } from "../../../../../shared/schemas/maps";
import { slotOf, useGridFocus } from "../../hooks/use-grid-focus";
import { cellPaints } from "../../lib/cell-paints";
import { layerScale } from "../../lib/color-scale";
import type { Criterion } from "../../lib/filters";
import { layerValues, stateCounts, type GridModel } from "../../lib/grid-model";
import { overlayCurves, type CurveId } from "../../lib/overlay-curves";
import { SPECIAL_FILLS } from "../../lib/palettes";
import { axisScale, band } from "../../lib/plot-geometry";
import { settingsLine } from "../../lib/map-settings";
import { ColorLegend } from "./color-legend";
import { CurveLayer } from "./curve-layer";
import { FigureAxes, FONT } from "./figure-axes";
import { figureLayout } from "./figure-layout";
import { HeatCells } from "./heat-cells";

export interface MapFigureProps {
  map: MapView;
  grid: GridModel;
  layerId: LayerId;
  criteria: readonly Criterion[];
  curves: ReadonlySet<CurveId>;
  width: number;
  /** Makes the cells focusable and clickable. */
  onOpen?: (i: number, j: number) => void;
  onHover?: (slot: number | null) => void;
  svgRef?: Ref<SVGSVGElement>;
}

function Patterns({ pending, failed }: { pending: string; failed: string }) {
  return (
    <defs>
      <pattern id={pending} width={6} height={6} patternUnits="userSpaceOnUse" patternTransform="rotate(45)">
        <rect width={6} height={6} fill={SPECIAL_FILLS.pending} />
        <line x1={0} y1={0} x2={0} y2={6} stroke={SPECIAL_FILLS.pendingHatch} strokeWidth={2} />
      </pattern>
      <pattern id={failed} width={8} height={8} patternUnits="userSpaceOnUse">
        <rect width={8} height={8} fill={SPECIAL_FILLS.failed} />
        <path d="M1 1L7 7M7 1L1 7" stroke={SPECIAL_FILLS.failedMark} strokeWidth={1.2} />
      </pattern>
    </defs>
  );
}

/**
 * The map as one self-contained SVG figure — title, heatmap with axes (μ, τ and m = μ/μ_c),
 * predicted curves, colour key and settings line — drawn with presentation attributes only, so
 * serialising the element gives the exported SVG as seen. Interactive parts carry
 * data-export="skip".
 */
export const MapFigure = memo(function MapFigure({ map, grid, layerId, criteria, curves, width, onOpen, onHover, svgRef }: MapFigureProps) {
  const uid = useId().replace(/[^a-zA-Z0-9]/g, "");
  const ids = useMemo(() => ({ pending: `hatch${uid}`, failed: `fail${uid}`, clip: `clip${uid}`, gradient: `grad${uid}` }), [uid]);
  const values = useMemo(() => layerValues(grid, layerId), [grid, layerId]);
  const scale = useMemo(() => layerScale(layerId, values), [layerId, values]);
  const paints = useMemo(() => cellPaints(grid, layerId, values, scale, criteria, ids), [grid, layerId, values, scale, criteria, ids]);
  const settings = useMemo(() => settingsLine(map), [map]);
  const counts = stateCounts(grid);
  const subtitle = [`${scale.layer.label} over relaxation rate μ and asymmetry τ`, `${counts.done} of ${grid.cells.length} cells done`];
  const L = figureLayout(width, { mu: grid.muSteps, tau: grid.tauSteps }, map.muCritical != null, scale, { settings, subtitle });
  const x = useMemo(() => axisScale(map.mu, [0, L.plotWidth]), [map.mu, L.plotWidth]);
  const y = useMemo(() => axisScale(map.tau, [L.plotHeight, 0]), [map.tau, L.plotHeight]);
  const curveList = useMemo(() => overlayCurves(map, y.domain() as [number, number]), [map, y]);
  const extras = { pending: counts.pending > 0, failed: counts.failed > 0, empty: Array.from(values).some((v, k) => Number.isNaN(v) && grid.cells[k]?.state === "done") || counts.cancelled > 0 };

  const cellsRef = useRef<SVGGElement>(null);
  const open = useCallback((k: number) => onOpen?.(k % grid.muSteps, Math.floor(k / grid.muSteps)), [onOpen, grid.muSteps]);
  const focus = useGridFocus(cellsRef, grid.muSteps, grid.tauSteps, onOpen ? open : undefined);
  const [hover, setHover] = useState<number | null>(null);
  const interactive = Boolean(onOpen);
  const ring = hover ?? (focus.focused ? focus.active : null);
  const ringBox = ring === null ? null : { x: band(ring % grid.muSteps, grid.muSteps, [0, L.plotWidth]), y: band(Math.floor(ring / grid.muSteps), grid.tauSteps, [L.plotHeight, 0]) };

  const pointer = (e: PointerEvent) => {
    const k = slotOf(e.target);
    if (k === hover) return;
    setHover(k);
    onHover?.(k);
  };
  const leave = () => {
    setHover(null);
    onHover?.(focus.focused ? focus.active : null);
  };

  return (
    <svg ref={svgRef} xmlns="http://www.w3.org/2000/svg" width={L.width} height={L.height} viewBox={`0 0 ${L.width} ${L.height}`} fontFamily={FONT} role="figure" aria-label={`${map.title}: heatmap of ${scale.layer.label}`}>
      <Patterns pending={ids.pending} failed={ids.failed} />
      <rect width={L.width} height={L.height} fill={SPECIAL_FILLS.paper} />
      <text x={12} y={22} fontSize={16} fontWeight={600} fill={SPECIAL_FILLS.ink}>
        {map.title}
      </text>
      {L.subtitle.map((line, k) => (
        <text key={k} x={12} y={40 + k * 15} fontSize={12} fill={SPECIAL_FILLS.inkSoft}>
          {line}
        </text>
      ))}
      <g transform={`translate(${L.left},${L.plotTop})`}>
        <clipPath id={ids.clip}>
          <rect width={L.plotWidth} height={L.plotHeight} />
        </clipPath>
        <g
          ref={cellsRef}
          className={interactive ? "cursor-pointer [&_rect]:outline-none" : undefined}
          shapeRendering="crispEdges"
          role={interactive ? "group" : undefined}
          aria-label={interactive ? "Cells: arrow keys move, Enter opens the cell" : undefined}
          onKeyDown={interactive ? focus.onKeyDown : undefined}
          onFocus={interactive ? (e) => { focus.onFocus(e); onHover?.(slotOf(e.target)); } : undefined}
          onBlur={interactive ? focus.onBlur : undefined}
          onClick={interactive ? (e) => { const k = slotOf(e.target); if (k !== null) open(k); } : undefined}
          onPointerMove={onHover ? pointer : undefined}
          onPointerLeave={onHover ? leave : undefined}
        >
          <HeatCells muSteps={grid.muSteps} tauSteps={grid.tauSteps} width={L.plotWidth} height={L.plotHeight} paints={paints} active={interactive ? focus.active : -1} />
        </g>
        <CurveLayer curves={curveList} shown={curves} x={x} y={y} clipId={ids.clip} />
        {ringBox && (
          <rect data-export="skip" pointerEvents="none" x={ringBox.x.start} y={ringBox.y.start} width={ringBox.x.size} height={ringBox.y.size} fill="none" stroke={SPECIAL_FILLS.ink} strokeWidth={2} />
        )}
        <FigureAxes x={x} y={y} mus={grid.mus} taus={grid.taus} plotWidth={L.plotWidth} plotHeight={L.plotHeight} muCritical={map.muCritical} muLog={map.mu.scale === "log"} />
      </g>
      <g transform={`translate(${L.left},${L.legendTop})`}>
        <ColorLegend scale={scale} width={L.legendWidth} extras={extras} patterns={ids} gradientId={ids.gradient} />
      </g>
      {L.settings.map((line, k) => (
        <text key={k} x={12} y={L.settingsTop + 10 + k * 14} fontSize={10.5} fill={SPECIAL_FILLS.inkSoft}>
          {line}
        </text>
      ))}
    </svg>
  );
});
