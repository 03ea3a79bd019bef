import { AxisBottom, AxisLeft, AxisTop } from "@visx/axis";
import { scaleLinear, scaleLog } from "@visx/scale";
import { formatNumber } from "../../lib/format-number";
import { SPECIAL_FILLS } from "../../lib/palettes";
import type { ContinuousPixelScale } from "../../lib/plot-geometry";

export const FONT = "Inter, ui-sans-serif, system-ui, sans-serif";

const tickLabel = { fill: SPECIAL_FILLS.inkSoft, fontSize: 11, fontFamily: FONT };
const axisLabel = { fill: SPECIAL_FILLS.ink, fontSize: 12, fontFamily: FONT, fontWeight: 500 };
const fmt = (v: unknown) => formatNumber(Number(v));

interface FigureAxesProps {
  x: ContinuousPixelScale;
  y: ContinuousPixelScale;
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

/** μ along the bottom, τ up the left side, and m = μ/μ_c along the top where the map has μ_c. */
export function FigureAxes({ x, y, plotWidth, plotHeight, muCritical, muLog }: FigureAxesProps) {
  const xTicks = Math.max(2, Math.floor(plotWidth / 90));
  const yTicks = Math.max(2, Math.floor(plotHeight / 48));
  return (
    <g>
      <AxisBottom
        top={plotHeight}
        scale={x}
        numTicks={xTicks}
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
        numTicks={yTicks}
        tickFormat={fmt}
        stroke={SPECIAL_FILLS.inkSoft}
        tickStroke={SPECIAL_FILLS.inkSoft}
        tickLabelProps={{ ...tickLabel, textAnchor: "end", dx: -2, dy: 3 }}
        label="asymmetry τ"
        labelProps={{ ...axisLabel, textAnchor: "middle" }}
        labelOffset={26}
      />
      {muCritical != null && muCritical > 0 && (
        <AxisTop
          scale={relativeScale(x, muCritical, muLog)}
          numTicks={xTicks}
          tickFormat={fmt}
          stroke={SPECIAL_FILLS.inkSoft}
          tickStroke={SPECIAL_FILLS.inkSoft}
          tickLabelProps={tickLabel}
          label={`m = μ/μ_c  (μ_c = ${formatNumber(muCritical)})`}
          labelProps={{ ...axisLabel, textAnchor: "middle" }}
          labelOffset={12}
        />
      )}
    </g>
  );
}
