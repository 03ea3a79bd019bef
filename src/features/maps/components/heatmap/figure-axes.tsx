import { AxisBottom, AxisLeft, AxisTop } from "@visx/axis";
import { scaleLinear, scaleLog } from "@visx/scale";
import { formatNumber } from "../../../../lib/format-number";
import { SPECIAL_FILLS } from "../../lib/palettes";
import type { ContinuousPixelScale } from "../../../../lib/axis-scale";

export const FONT = "Inter, ui-sans-serif, system-ui, sans-serif";

const tickLabel = { fill: SPECIAL_FILLS.inkSoft, fontSize: 11, fontFamily: FONT };
const axisLabel = { fill: SPECIAL_FILLS.ink, fontSize: 12, fontFamily: FONT, fontWeight: 500 };
const fmt = (v: unknown) => formatNumber(Number(v));

interface FigureAxesProps {
  x: ContinuousPixelScale;
  y: ContinuousPixelScale;
  /** Cell centres along μ and τ (ticks never go past them: the axis has no values beyond). */
  mus: number[];
  taus: number[];
  plotWidth: number;
  plotHeight: number;
  /** μ_c: draws a second μ axis on top in m = μ/μ_c. */
  muCritical: number | null;
  muLog: boolean;
}

/** The m = μ/μ_c axis: the μ scale's domain divided by μ_c, over the same pixels. */
function relativeScale(x: ContinuousPixelScale, muCritical: number, muLog: boolean): ContinuousPixelScale {
  const [a, b] = x.domain() as [number, number];
  const config = { domain: [a / muCritical, b / muCritical], range: x.range() as [number, number] };
  return muLog ? scaleLog<number>(config) : scaleLinear<number>(config);
}

/**
 * Tick values of a grid axis: the cell centres themselves when they fit, else the scale's round
 * ticks inside the range the cells cover (half a cell beyond the ends holds no data).
 */
export function gridTicks(scale: ContinuousPixelScale, points: number[], room: number): number[] {
  if (points.length <= room) return points;
  const lo = points[0];
  const hi = points[points.length - 1];
  const eps = (hi - lo) * 1e-9;
  return (scale.ticks(room) as number[]).filter((v) => v >= lo - eps && v <= hi + eps);
}

/** μ along the bottom, τ up the left side, and m = μ/μ_c along the top where the map has μ_c. */
export function FigureAxes({ x, y, mus, taus, plotWidth, plotHeight, muCritical, muLog }: FigureAxesProps) {
  const xTicks = Math.max(2, Math.floor(plotWidth / 90));
  const yTicks = Math.max(2, Math.floor(plotHeight / 48));
  const muTicks = gridTicks(x, mus, xTicks);
  const m = muCritical != null && muCritical > 0 ? relativeScale(x, muCritical, muLog) : null;
  return (
    <g>
      <AxisBottom
        top={plotHeight}
        scale={x}
        tickValues={muTicks}
        tickFormat={fmt}
        stroke={SPECIAL_FILLS.inkSoft}
        tickStroke={SPECIAL_FILLS.inkSoft}
        tickLabelProps={tickLabel}
        label="relaxation rate μ"
        labelProps={{ ...axisLabel, textAnchor: "middle" }}
        labelOffset={14}
      />
      <AxisLeft
        scale={y}
        tickValues={gridTicks(y, taus, yTicks)}
        tickFormat={fmt}
        stroke={SPECIAL_FILLS.inkSoft}
        tickStroke={SPECIAL_FILLS.inkSoft}
        tickLabelProps={{ ...tickLabel, textAnchor: "end", dx: -2, dy: 3 }}
        label="asymmetry τ"
        labelProps={{ ...axisLabel, textAnchor: "middle" }}
        labelOffset={26}
      />
      {m && (
        <AxisTop
          scale={m}
          tickValues={gridTicks(m, mus.map((v) => v / muCritical!), xTicks)}
          tickFormat={fmt}
          stroke={SPECIAL_FILLS.inkSoft}
          tickStroke={SPECIAL_FILLS.inkSoft}
          tickLabelProps={tickLabel}
          label={`m = μ/μ_c  (μ_c = ${formatNumber(muCritical!)})`}
          labelProps={{ ...axisLabel, textAnchor: "middle" }}
          labelOffset={12}
        />
      )}
    </g>
  );
}
