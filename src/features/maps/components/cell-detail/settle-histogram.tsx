import { scaleLinear } from "@visx/scale";
import type { CellResult } from "../../../../../shared/schemas/cell-result";
import { PlotFrame, plotArea } from "./plot-frame";

type Histogram = CellResult["aggregate"]["settleHistogram"];

/** How long settled runs took to come to rest, over every network of the cell. */
export function SettleHistogram({ histogram, width }: { histogram: Histogram; width: number }) {
  const total = histogram.counts.reduce((a, b) => a + b, 0);
  if (total === 0) return <p className="text-sm text-ink-soft">No run of this cell settled, so there are no settle times.</p>;
  const height = 200;
  const { h } = plotArea(width, height);
  const { w } = plotArea(width, height);
  const edges = histogram.edges;
  const x = scaleLinear<number>({ domain: [edges[0], edges[edges.length - 1]], range: [0, w] });
  const y = scaleLinear<number>({ domain: [0, Math.max(...histogram.counts)], range: [h, 0], nice: true });
  return (
    <PlotFrame width={width} height={height} x={x} y={y} xLabel="time to settle t" yLabel="runs" title={`Settle times of ${total} settled runs`}>
      {histogram.counts.map((c, k) => {
        const x0 = x(edges[k]) ?? 0;
        const x1 = x(edges[k + 1]) ?? 0;
        const top = y(c) ?? h;
        return c > 0 ? <rect key={k} x={x0 + 0.5} width={Math.max(1, x1 - x0 - 1)} y={top} height={h - top} fill="#2f7a8d" /> : null;
      })}
    </PlotFrame>
  );
}
