import { axisPoints } from "../../../../shared/schemas/maps";
import type { AxisSpec as Axis } from "../../../lib/axis-scale";

/** Where a probe sits on a rate-network map. */
export interface Placement {
  /** The probe's μ in the map's units: (μ/ĝ) · g_map, so that μ/g is the same on both. */
  mu: number;
  /** τ̂ (may lie outside [0, 1]). */
  tau: number;
  /** Nearest cell: i along μ, j along τ. */
  i: number;
  j: number;
  /** Whether the point lies within the map's axis ranges. */
  insideMu: boolean;
  insideTau: boolean;
}

function nearest(points: number[], v: number, log: boolean): number {
  const f = (x: number) => (log ? Math.log(x) : x);
  let best = 0;
  for (let k = 1; k < points.length; k++) if (Math.abs(f(points[k]) - f(v)) < Math.abs(f(points[best]) - f(v))) best = k;
  return best;
}

/**
 * Places a matrix with estimated gain ĝ and symmetry τ̂ at relaxation rate μ on a rate-network
 * map of gain g_map: the rate network's behaviour depends on μ and g only through μ/g (rescale
 * time by g), so the probe's point is μ_map = (μ/ĝ)·g_map at τ = τ̂; the nearest cell is the
 * closest axis point on each axis (in log space on a log axis).
 * @returns the placement, or null when ĝ or τ̂ is undefined or g_map is not positive
 */
export function placeOnMap(probe: { mu: number; g: number | null; tau: number | null }, map: { mu: Axis; tau: Axis; g: number }): Placement | null {
  if (probe.g == null || probe.tau == null || !(probe.g > 0) || !(map.g > 0)) return null;
  const mu = (probe.mu / probe.g) * map.g;
  const mus = axisPoints(map.mu);
  const taus = axisPoints(map.tau);
  return {
    mu,
    tau: probe.tau,
    i: nearest(mus, mu, map.mu.scale === "log"),
    j: nearest(taus, probe.tau, false),
    insideMu: mu >= map.mu.min && mu <= map.mu.max,
    insideTau: probe.tau >= map.tau.min && probe.tau <= map.tau.max,
  };
}
