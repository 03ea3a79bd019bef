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

/**
 * One rect per cell, laid out by visx's HeatmapRect (column i along μ, row j along τ, τ growing
 * upwards). Plain host elements with no handlers or inline styles of their own (the parent
 * listens, and styles them through one class), so 4096 cells stay cheap to draw and re-colour.
 */
export const HeatCells = memo(function HeatCells({ muSteps, tauSteps, width, height, paints, active }: HeatCellsProps) {
  const columns = useMemo<Column[]>(
    () => Array.from({ length: muSteps }, (_, i) => ({ i, bins: Array.from({ length: tauSteps }, (_, j) => j) })),
    [muSteps, tauSteps],
  );
  const bw = width / muSteps;
  const bh = height / tauSteps;
  const gap = Math.min(bw, bh) > 8 ? 1 : 0;
  const interactive = active >= 0;
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
            const paint = paints[k];
            return (
              <rect
                key={k}
                data-k={k}
                x={cell.x}
                y={cell.y}
                width={Math.max(0.5, cell.width)}
                height={Math.max(0.5, cell.height)}
                fill={paint.fill}
                fillOpacity={paint.dim ? 0.22 : undefined}
                role={interactive ? "button" : undefined}
                tabIndex={interactive ? (k === active ? 0 : -1) : undefined}
                aria-label={interactive ? paint.label : undefined}
              />
            );
          }),
        )
      }
    </HeatmapRect>
  );
});
