import { HeatmapRect } from "@visx/heatmap";
import { memo, useMemo } from "react";
import type { CellPaint } from "../../lib/cell-paints";


interface HeatCellsProps {
  muSteps: number;
  tauSteps: number;
  width: number;
  height: number;
  paints: readonly CellPaint[];
  /** Slot that takes Tab focus (roving tabindex); −1 when the grid is not interactive. */
  active: number;
}

type Column = { i: number; bins: number[] };

const CellRect = memo(function CellRect(p: { k: number; x: number; y: number; w: number; h: number; paint: CellPaint; tabbable: boolean | null }) {
  const interactive = p.tabbable !== null;
  return (
    <rect
      data-k={p.k}
      x={p.x}
      y={p.y}
      width={p.w}
      height={p.h}
      fill={p.paint.fill}
      fillOpacity={p.paint.dim ? 0.22 : 1}
      role={interactive ? "button" : undefined}
      tabIndex={interactive ? (p.tabbable ? 0 : -1) : undefined}
      aria-label={interactive ? p.paint.label : undefined}
      style={interactive ? { cursor: "pointer", outline: "none" } : undefined}
    />
  );
});

/**
 * One rect per cell, laid out by visx's HeatmapRect (column i along μ, row j along τ, τ growing
 * upwards). Each rect is memoised on its paint, so a layer change repaints in one pass and
 * moving the keyboard focus touches two cells only.
 */
export const HeatCells = memo(function HeatCells({ muSteps, tauSteps, width, height, paints, active }: HeatCellsProps) {
  const columns = useMemo<Column[]>(
    () => Array.from({ length: muSteps }, (_, i) => ({ i, bins: Array.from({ length: tauSteps }, (_, j) => j) })),
    [muSteps, tauSteps],
  );
  const bw = width / muSteps;
  const bh = height / tauSteps;
  const gap = Math.min(bw, bh) > 8 ? 1 : 0;
  return (
    <HeatmapRect<Column, number>
      data={columns}
      bins={(c) => c.bins}
      count={(j) => j}
      binWidth={bw}
      binHeight={bh}
      gap={gap}
      xScale={(i) => i * bw}
      yScale={(j) => (tauSteps - 1 - j) * bh}
    >
      {(grid) =>
        grid.flatMap((col) =>
          col.map((cell) => {
            const k = cell.column + cell.row * muSteps;
            return (
              <CellRect
                key={k}
                k={k}
                x={cell.x}
                y={cell.y}
                w={Math.max(0.5, cell.width)}
                h={Math.max(0.5, cell.height)}
                paint={paints[k]}
                tabbable={active < 0 ? null : k === active}
              />
            );
          }),
        )
      }
    </HeatmapRect>
  );
});
