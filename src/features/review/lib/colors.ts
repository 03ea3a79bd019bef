// Colours of the review figures: a diverging ramp for differences between two maps (cool where
// the first map found fewer, warm where it found more, paper at zero) and a sequential ramp for
// shares. Interpolated in linear-light RGB so the midpoints do not go muddy.

const COOL = "#1d5570";
const PAPER = "#f4efe4";
const WARM = "#b4502a";
const SHARE_LOW = "#f7f1e3";
const SHARE_HIGH = "#2a6f83";

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

function mix(a: string, b: string, t: number): string {
  const x = toLinear(a);
  const y = toLinear(b);
  return toHex(x.map((v, k) => v + (y[k] - v) * t));
}

/** Colour of a difference d on a symmetric scale [−extent, extent]. */
export function divergingColor(d: number, extent: number): string {
  if (!(extent > 0)) return PAPER;
  const t = Math.max(-1, Math.min(1, d / extent));
  return t >= 0 ? mix(PAPER, WARM, t) : mix(PAPER, COOL, -t);
}

/** Colour of a share in [0, 1]. */
export function shareColor(s: number): string {
  return mix(SHARE_LOW, SHARE_HIGH, Math.max(0, Math.min(1, s)));
}

export const FIGURE_INK = "#16202a";
export const FIGURE_SOFT = "#48525f";
export const FIGURE_PAPER = "#fffdf8";
export const FIGURE_PENDING = "#e6e0d2";
export const ESTIMATE_COLOR = "#b4502a";
export const PREDICTED_COLOR = "#16202a";
export const PREDICTED_STABLE_COLOR = "#6b3a6b";
