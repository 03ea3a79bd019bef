// Colours of the review figures: a diverging ramp for differences between two maps (cool where
// the first map found fewer, warm where it found more, paper at zero) and a sequential ramp for
// shares. Interpolated in linear-light RGB so the midpoints do not go muddy.

/** Ramps as colour stops, interpolated piecewise (first stop = the neutral end). */
const COOL = ["#f4efe4", "#c9dde9", "#7eaed0", "#3b76a6", "#1b4a72"];
const WARM = ["#f4efe4", "#f5d2b4", "#e6a06d", "#c7673a", "#8f3a17"];
const SHARE = ["#f7f1e3", "#e3ecc8", "#a9d3b2", "#5ea9a4", "#2f7c8f", "#1f4e6b"];

function toLinear(hex: string): [number, number, number] {
  const n = parseInt(hex.slice(1), 16);
  const c = [(n >> 16) & 255, (n >> 8) & 255, n & 255].map((v) => v / 255);
  return c.map((v) => (v <= 0.04045 ? v / 12.92 : ((v + 0.055) / 1.055) ** 2.4)) as [number, number, number];
}

function toHex(rgb: number[]): string {
  const s = rgb.map((v) => {
    const c = v <= 0.0031308 ? 12.92 * v : 1.055 * v ** (1 / 2.4) - 0.055;
    return Math.round(Math.min(1, Math.max(0, c)) * 255).toString(16).padStart(2, "0");
  });
  return `#${s.join("")}`;
}

/** The colour at t ∈ [0, 1] along `stops`. */
function ramp(stops: readonly string[], t: number): string {
  const u = Math.max(0, Math.min(1, t)) * (stops.length - 1);
  const k = Math.min(stops.length - 2, Math.floor(u));
  const x = toLinear(stops[k]);
  const y = toLinear(stops[k + 1]);
  return toHex(x.map((v, c) => v + (y[c] - v) * (u - k)));
}

/** Colour of a difference d on a symmetric scale [−extent, extent]. */
export function divergingColor(d: number, extent: number): string {
  if (!(extent > 0)) return COOL[0];
  const t = Math.max(-1, Math.min(1, d / extent));
  return t >= 0 ? ramp(WARM, t) : ramp(COOL, -t);
}

/** Colour of a share in [0, 1]. */
export function shareColor(s: number): string {
  return ramp(SHARE, s);
}

export const FIGURE_INK = "#16202a";
export const FIGURE_SOFT = "#48525f";
export const FIGURE_PAPER = "#fffdf8";
export const FIGURE_PENDING = "#e6e0d2";
export const ESTIMATE_COLOR = "#b4502a";
export const PREDICTED_COLOR = "#16202a";
export const PREDICTED_STABLE_COLOR = "#6b3a6b";
