import { scaleLinear, scaleLog } from "@visx/scale";

export interface AxisSpec {
  min: number;
  max: number;
  steps: number;
  scale: "linear" | "log";
}

/** A continuous scale from axis values to pixels; the type both visx scales share here. */
export type ContinuousPixelScale = ReturnType<typeof scaleLinear<number>> | ReturnType<typeof scaleLog<number>>;

/**
 * The continuous value ↔ pixel scale of a grid axis whose cells are equal bands: cell k's centre
 * sits at axisPoints(axis)[k], so the domain reaches half a step beyond both ends (in log space
 * for a log axis). Curves drawn with this scale line up with the cells.
 */
export function axisScale(axis: AxisSpec, range: [number, number]): ContinuousPixelScale {
  const log = axis.scale === "log" && axis.min > 0;
  if (axis.steps <= 1 || axis.max === axis.min) {
    if (log) return scaleLog<number>({ domain: [axis.min / 1.25, axis.min * 1.25], range });
    const d = Math.max(Math.abs(axis.min) * 0.1, 0.05);
    return scaleLinear<number>({ domain: [axis.min - d, axis.min + d], range });
  }
  if (log) {
    const half = Math.pow(axis.max / axis.min, 0.5 / (axis.steps - 1));
    return scaleLog<number>({ domain: [axis.min / half, axis.max * half], range });
  }
  const half = (axis.max - axis.min) / (axis.steps - 1) / 2;
  return scaleLinear<number>({ domain: [axis.min - half, axis.max + half], range });
}

/** Pixel start and size of band k of `steps` equal bands over `range` (range may run backwards). */
export function band(k: number, steps: number, range: [number, number]): { start: number; size: number } {
  const size = (range[1] - range[0]) / steps;
  const a = range[0] + k * size;
  return size >= 0 ? { start: a, size } : { start: a + size, size: -size };
}

/** Points of a polyline as an SVG path, breaking it where a point is missing (null). */
export function polylinePath(points: readonly ({ x: number; y: number } | null)[]): string {
  let d = "";
  let pen = false;
  for (const p of points) {
    if (!p || !Number.isFinite(p.x) || !Number.isFinite(p.y)) {
      pen = false;
      continue;
    }
    d += `${pen ? "L" : "M"}${p.x.toFixed(1)} ${p.y.toFixed(1)}`;
    pen = true;
  }
  return d;
}
