import { scaleLinear } from "@visx/scale";
import { useState } from "react";
import type { CellResult } from "../../../../../shared/schemas/cell-result";
import { cn } from "../../../../lib/cn";
import { polylinePath } from "../../lib/plot-geometry";
import { PlotFrame, plotArea } from "./plot-frame";

type Trace = CellResult["traces"][number];

export const UNIT_COLORS = ["#245d77", "#dc7c42", "#3a7648", "#a14b62", "#6a5a9c", "#8a7a3a"];

function extent(values: number[][]): [number, number] {
  let lo = Infinity;
  let hi = -Infinity;
  for (const row of values) for (const v of row) if (Number.isFinite(v)) [lo, hi] = [Math.min(lo, v), Math.max(hi, v)];
  if (!Number.isFinite(lo)) return [-1, 1];
  const pad = (hi - lo) * 0.06 || 0.5;
  return [lo - pad, hi + pad];
}

function TraceChart({ trace, width }: { trace: Trace; width: number }) {
  const height = 220;
  const { w, h } = plotArea(width, height);
  const x = scaleLinear<number>({ domain: [0, Math.max(1e-9, trace.t[trace.t.length - 1] ?? 1)], range: [0, w] });
  const y = scaleLinear<number>({ domain: extent(trace.x), range: [h, 0] });
  return (
    <PlotFrame width={width} height={height} x={x} y={y} xLabel="time t" yLabel="x_i(t)" title={`Trajectories of units ${trace.units.join(", ")} from start ${trace.start}`}>
      {trace.x.map((row, u) => (
        <path key={u} d={polylinePath(row.map((v, p) => ({ x: x(trace.t[p]) ?? 0, y: y(v) ?? 0 })))} fill="none" stroke={UNIT_COLORS[u % UNIT_COLORS.length]} strokeWidth={1.6} />
      ))}
    </PlotFrame>
  );
}

/** Trajectories of a few units from a few starts of network 0, one start at a time. */
export function TracePlot({ traces, width }: { traces: Trace[]; width: number }) {
  const [pick, setPick] = useState(0);
  if (traces.length === 0) return <p className="text-sm text-ink-soft">No trajectories were recorded for this cell.</p>;
  const trace = traces[Math.min(pick, traces.length - 1)];
  return (
    <div className="flex flex-col gap-2">
      <div className="flex flex-wrap items-center gap-2" role="group" aria-label="Start shown">
        {traces.map((t, k) => (
          <button key={t.start} type="button" aria-pressed={k === pick} onClick={() => setPick(k)} className={cn("rounded-full px-2.5 py-0.5 text-xs ring-1 ring-inset", k === pick ? "bg-well-700 text-white ring-well-700" : "text-ink-soft ring-line-strong hover:bg-well-50")}>
            start {t.start}
          </button>
        ))}
        <span className="flex flex-wrap gap-3 text-xs text-ink-soft">
          {trace.units.map((u, k) => (
            <span key={u} className="inline-flex items-center gap-1">
              <span aria-hidden="true" className="inline-block h-0.5 w-4" style={{ background: UNIT_COLORS[k % UNIT_COLORS.length] }} />
              unit {u}
            </span>
          ))}
        </span>
      </div>
      <TraceChart trace={trace} width={width} />
    </div>
  );
}
