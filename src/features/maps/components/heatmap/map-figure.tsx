import { memo, type Ref } from "react";
import type { LayerId } from "../../../../../shared/maps/layers";
import type { MapView } from "../../../../../shared/schemas/maps";
import { useFigureModel } from "../../hooks/use-figure-model";
import type { Criterion } from "../../lib/filters";
import type { GridModel } from "../../lib/grid-model";
import type { CurveId } from "../../lib/overlay-curves";
import { SPECIAL_FILLS } from "../../lib/palettes";
import { CellLayer } from "./cell-layer";
import { ColorLegend } from "./color-legend";
import { CurveLayer } from "./curve-layer";
import { FigureAxes, FONT } from "./figure-axes";

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
  const { ids, scale, paints, layout: L, x, y, curves: curveList, extras } = useFigureModel(map, grid, layerId, criteria, width);
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
        <CellLayer muSteps={grid.muSteps} tauSteps={grid.tauSteps} width={L.plotWidth} height={L.plotHeight} paints={paints} onOpen={onOpen} onHover={onHover} />
        <CurveLayer curves={curveList} shown={curves} x={x} y={y} clipId={ids.clip} />
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
