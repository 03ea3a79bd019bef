import { scaleLinear, scaleLog } from "@visx/scale";

/** A grid axis: `steps` points from min to max, evenly spaced (in log space for a log axis). */
export interface AxisSpec {
  min: number;
  max: number;
  steps: number;
  scale: "linear" | "log";
}

/** A continuous scale from axis values to pixels; the type both visx scales share here. */
export type ContinuousPixelScale = ReturnType<typeof scaleLinear<number>> | ReturnType<typeof scaleLog<number>>;

/** Whether the axis is drawn on a log scale (a log axis reaching zero or below falls back to linear). */
export function isLogAxis(axis: AxisSpec): boolean {
  return axis.scale === "log" && axis.min > 0;
}

/**
 * The continuous value ↔ pixel scale of a grid axis whose cells are equal bands: cell k's centre
 * sits at axisPoints(axis)[k], so the domain reaches half a step beyond both ends (in log space
 * for a log axis). Curves drawn with this scale line up with the cells.
 */
export function axisScale(axis: AxisSpec, range: [number, number]): ContinuousPixelScale {
  const log = isLogAxis(axis);
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

/** At most `most` of the values, evenly picked, keeping the first and the last. */
export function pickEvenly(values: readonly number[], most: number): number[] {
  if (values.length <= most) return [...values];
  const step = (values.length - 1) / (most - 1);
  return Array.from({ length: most }, (_, k) => values[Math.round(k * step)]);
}

/**
 * Domains with the same units per pixel on both axes of a w × h plot, covering every point with
 * `margin` to spare (1.1 leaves 10 % of the larger extent).
 */
export function equalAspect(xs: number[], ys: number[], w: number, h: number, margin: number): { x: [number, number]; y: [number, number] } {
  const [x0, x1] = [Math.min(...xs), Math.max(...xs)];
  const [y0, y1] = [Math.min(...ys), Math.max(...ys)];
  const perPx = Math.max((x1 - x0 || 1) / w, (y1 - y0 || 1) / h) * margin;
  const cx = (x0 + x1) / 2;
  const cy = (y0 + y1) / 2;
  return { x: [cx - (perPx * w) / 2, cx + (perPx * w) / 2], y: [cy - (perPx * h) / 2, cy + (perPx * h) / 2] };
}
