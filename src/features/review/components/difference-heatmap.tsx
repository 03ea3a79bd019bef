import { useId } from "react";
import type { CompareCell, MapComparison } from "../../../../shared/schemas/review";
import { divergingColor, FIGURE_INK, FIGURE_PAPER, FIGURE_PENDING, FIGURE_SOFT } from "../lib/colors";
import { formatNumber } from "../../../lib/format-number";
import { fmtSigned } from "../lib/format";
import { axisScale, band, pickEvenly, type AxisSpec } from "../../../lib/axis-scale";

export type DifferenceLayer = "stableFound" | "oneStable";

export const DIFFERENCE_LABELS: Record<DifferenceLayer, string> = {
  stableFound: "Stable states found per network",
  oneStable: "Share of networks with one stable state",
};

interface DifferenceHeatmapProps {
  comparison: MapComparison;
  mu: AxisSpec;
  tau: AxisSpec;
  layer: DifferenceLayer;
  width: number;
  onHover?: (cell: CompareCell | null) => void;
  /** Smaller labels and no title for the printed report. */
  compact?: boolean;
}

const M = { left: 52, right: 14, top: 34, bottom: 84 };

/** Largest |a − b| of the layer, rounded up to a tidy legend end. */
function extentOf(cells: CompareCell[], layer: DifferenceLayer): number {
  const most = Math.max(0, ...cells.map((c) => Math.abs(c.difference[layer] ?? 0)));
  if (most === 0) return layer === "oneStable" ? 0.1 : 0.5;
  const p = 10 ** Math.floor(Math.log10(most));
  return Math.ceil(most / p) * p;
}

/** Below this width the ring's key goes under the colour bar. */
const NARROW = 460;

function Legend({ extent, width, y }: { extent: number; width: number; y: number }) {
  const w = Math.min(240, width - M.left - M.right);
  const ring = width < NARROW ? { x: 0, y: 34 } : { x: w + 18, y: 0 };
  const stops = Array.from({ length: 9 }, (_, k) => -extent + (2 * extent * k) / 8);
  return (
    <g transform={`translate(${M.left},${y})`}>
      <text y={-6} fontSize={11} fill={FIGURE_SOFT}>first − second</text>
      {stops.map((d, k) => (
        <rect key={k} x={(k * w) / 9} width={w / 9 + 0.5} height={10} fill={divergingColor(d, extent)} />
      ))}
      <text y={24} fontSize={11} fill={FIGURE_INK}>{fmtSigned(-extent)}</text>
      <text x={w / 2} y={24} fontSize={11} fill={FIGURE_INK} textAnchor="middle">0</text>
      <text x={w} y={24} fontSize={11} fill={FIGURE_INK} textAnchor="end">{fmtSigned(extent)}</text>
      <g transform={`translate(${ring.x},${ring.y})`}>
        <circle cx={5} cy={5} r={3.2} fill="none" stroke={FIGURE_INK} strokeWidth={1.4} />
        <text x={14} y={9} fontSize={11} fill={FIGURE_INK}>differs at 5 %</text>
      </g>
    </g>
  );
}

/**
 * Heatmap of the difference between two maps cell by cell (first − second) with a diverging
 * colour scale; a ring marks cells where Welch's test rejects equal means at the 5 % level,
 * hatching marks cells not testable yet.
 */
export function DifferenceHeatmap({ comparison, mu, tau, layer, width, onHover, compact }: DifferenceHeatmapProps) {
  const plotW = Math.max(120, width - M.left - M.right);
  const plotH = Math.max(100, Math.min(plotW * 0.62, 44 * tau.steps + 40));
  const height = M.top + plotH + M.bottom + (width < NARROW ? 22 : 0);
  const xRange: [number, number] = [0, plotW];
  const yRange: [number, number] = [plotH, 0];
  const x = axisScale(mu, xRange);
  const y = axisScale(tau, yRange);
  const extent = extentOf(comparison.cells, layer);
  const hatch = `hatch${useId().replace(/[^a-zA-Z0-9]/g, "")}`;
  const ringR = Math.max(2.5, Math.min(7, Math.min(plotW / mu.steps, plotH / tau.steps) * 0.18));

  return (
    <svg width={width} height={height} viewBox={`0 0 ${width} ${height}`} role="img" aria-label={`Difference of ${DIFFERENCE_LABELS[layer]} between the two maps`} fontFamily="Inter, sans-serif">
      <defs>
        <pattern id={hatch} width={6} height={6} patternUnits="userSpaceOnUse" patternTransform="rotate(45)">
          <rect width={6} height={6} fill={FIGURE_PENDING} />
          <line x1={0} y1={0} x2={0} y2={6} stroke="#c9bfa8" strokeWidth={2} />
        </pattern>
      </defs>
      <rect width={width} height={height} fill={FIGURE_PAPER} />
      {!compact && <text x={M.left} y={20} fontSize={13} fontWeight={600} fill={FIGURE_INK}>{DIFFERENCE_LABELS[layer]}: first − second</text>}
      <g transform={`translate(${M.left},${M.top})`} onPointerLeave={() => onHover?.(null)}>
        {comparison.cells.map((c) => {
          const bx = band(c.i, mu.steps, xRange);
          const by = band(c.j, tau.steps, yRange);
          const d = c.difference[layer];
          return (
            <g key={`${c.i},${c.j}`} onPointerEnter={() => onHover?.(c)} onClick={() => onHover?.(c)}>
              <rect x={bx.start} y={by.start} width={bx.size + 0.4} height={by.size + 0.4} fill={d === null ? `url(#${hatch})` : divergingColor(d, extent)} />
              {c.agree === false && <circle cx={bx.start + bx.size / 2} cy={by.start + by.size / 2} r={ringR} fill="none" stroke={FIGURE_INK} strokeWidth={1.4} />}
            </g>
          );
        })}
        <rect width={plotW} height={plotH} fill="none" stroke={FIGURE_SOFT} strokeWidth={0.8} />
        {pickEvenly(comparison.mu, 6).map((v) => (
          <text key={`x${v}`} x={x(v)} y={plotH + 15} fontSize={11} textAnchor="middle" fill={FIGURE_INK}>{formatNumber(v)}</text>
        ))}
        <text x={plotW / 2} y={plotH + 31} fontSize={11} textAnchor="middle" fill={FIGURE_SOFT}>relaxation rate μ</text>
        {pickEvenly(comparison.tau, 6).map((v) => (
          <text key={`y${v}`} x={-6} y={y(v) + 4} fontSize={11} textAnchor="end" fill={FIGURE_INK}>{formatNumber(v)}</text>
        ))}
        <text transform={`translate(${-38},${plotH / 2}) rotate(-90)`} fontSize={11} textAnchor="middle" fill={FIGURE_SOFT}>asymmetry τ</text>
      </g>
      <Legend extent={extent} width={width} y={M.top + plotH + 50} />
    </svg>
  );
}
