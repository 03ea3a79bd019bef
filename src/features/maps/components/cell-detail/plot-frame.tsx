import { AxisBottom, AxisLeft } from "@visx/axis";
import type { ReactNode } from "react";
import { formatNumber } from "../../../../lib/format-number";
import { SPECIAL_FILLS } from "../../lib/palettes";
import type { ContinuousPixelScale } from "../../../../lib/axis-scale";
import { FONT } from "../heatmap/figure-axes";

export const PLOT_MARGIN = { left: 52, right: 12, top: 10, bottom: 42 };

/** Inner plot size of a chart of outer size width × height. */
export function plotArea(width: number, height: number) {
  return { w: Math.max(60, width - PLOT_MARGIN.left - PLOT_MARGIN.right), h: Math.max(60, height - PLOT_MARGIN.top - PLOT_MARGIN.bottom) };
}

const tick = { fill: SPECIAL_FILLS.inkSoft, fontSize: 10.5, fontFamily: FONT };
const label = { fill: SPECIAL_FILLS.ink, fontSize: 11.5, fontFamily: FONT, textAnchor: "middle" as const };

interface PlotFrameProps {
  width: number;
  height: number;
  x: ContinuousPixelScale;
  y: ContinuousPixelScale;
  xLabel: string;
  yLabel: string;
  title: string;
  children: ReactNode;
}

/** A small chart: axes with labels around a plot area; children draw inside it. */
export function PlotFrame({ width, height, x, y, xLabel, yLabel, title, children }: PlotFrameProps) {
  const { w, h } = plotArea(width, height);
  const fmt = (v: unknown) => formatNumber(Number(v));
  return (
    <svg width={width} height={height} viewBox={`0 0 ${width} ${height}`} role="img" aria-label={title} fontFamily={FONT}>
      <g transform={`translate(${PLOT_MARGIN.left},${PLOT_MARGIN.top})`}>
        <rect width={w} height={h} fill="#fbf8f1" />
        {children}
        <AxisBottom top={h} scale={x} numTicks={Math.max(2, Math.floor(w / 80))} tickFormat={fmt} stroke={SPECIAL_FILLS.inkSoft} tickStroke={SPECIAL_FILLS.inkSoft} tickLabelProps={tick} label={xLabel} labelProps={label} labelOffset={10} />
        <AxisLeft scale={y} numTicks={Math.max(2, Math.floor(h / 40))} tickFormat={fmt} stroke={SPECIAL_FILLS.inkSoft} tickStroke={SPECIAL_FILLS.inkSoft} tickLabelProps={{ ...tick, textAnchor: "end", dx: -2, dy: 3 }} label={yLabel} labelProps={label} labelOffset={22} />
      </g>
    </svg>
  );
}
