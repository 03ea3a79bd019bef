/**
 * Value ↔ pixel scales of a grid axis whose cells are equal bands centred on the axis points
 * (linear, or geometric for a log axis), so cells, estimates and predicted curves line up.
 */
export interface AxisLike {
  min: number;
  max: number;
  steps: number;
  scale: "linear" | "log";
}

export interface PixelScale {
  (v: number): number;
  /** Band edges [start, end] in pixels of cell k. */
  band: (k: number) => [number, number];
  domain: [number, number];
  log: boolean;
}

export function gridScale(axis: AxisLike, range: [number, number]): PixelScale {
  const log = axis.scale === "log" && axis.min > 0;
  const f = log ? Math.log : (v: number) => v;
  let lo: number;
  let hi: number;
  if (axis.steps <= 1 || axis.max === axis.min) {
    const d = log ? Math.log(1.25) : Math.max(Math.abs(axis.min) * 0.1, 0.05);
    [lo, hi] = [f(axis.min) - d, f(axis.min) + d];
  } else {
    const half = (f(axis.max) - f(axis.min)) / (axis.steps - 1) / 2;
    [lo, hi] = [f(axis.min) - half, f(axis.max) + half];
  }
  const toPx = (v: number) => range[0] + ((f(v) - lo) / (hi - lo)) * (range[1] - range[0]);
  const size = (range[1] - range[0]) / Math.max(1, axis.steps);
  const scale = Object.assign(toPx, {
    band: (k: number): [number, number] => [range[0] + k * size, range[0] + (k + 1) * size],
    domain: [log ? Math.exp(lo) : lo, log ? Math.exp(hi) : hi] as [number, number],
    log,
  });
  return scale;
}

/** Up to `most` tick values of the axis points, evenly picked, first and last kept. */
export function gridTicks(points: readonly number[], most = 6): number[] {
  if (points.length <= most) return [...points];
  const step = (points.length - 1) / (most - 1);
  return Array.from({ length: most }, (_, k) => points[Math.round(k * step)]);
}
