// Colour arithmetic for the heatmap palettes: sRGB hex ⇄ OKLab (Björn Ottosson, "A perceptual
// color space for image processing", 2020). Interpolating in OKLab keeps a palette's steps
// even to the eye, which plain RGB interpolation does not.

export type Lab = [number, number, number];

function toLinear(c: number): number {
  return c <= 0.04045 ? c / 12.92 : ((c + 0.055) / 1.055) ** 2.4;
}

function fromLinear(c: number): number {
  const v = c <= 0.0031308 ? 12.92 * c : 1.055 * c ** (1 / 2.4) - 0.055;
  return Math.min(1, Math.max(0, v));
}

/** "#rrggbb" → OKLab [L, a, b]. */
export function hexToOklab(hex: string): Lab {
  const m = /^#([0-9a-f]{6})$/i.exec(hex);
  if (!m) throw new TypeError(`hex colour must look like #rrggbb, got ${hex}`);
  const n = parseInt(m[1], 16);
  const r = toLinear(((n >> 16) & 255) / 255);
  const g = toLinear(((n >> 8) & 255) / 255);
  const b = toLinear((n & 255) / 255);
  const l = Math.cbrt(0.4122214708 * r + 0.5363325363 * g + 0.0514459929 * b);
  const mm = Math.cbrt(0.2119034982 * r + 0.6806995451 * g + 0.1073969566 * b);
  const s = Math.cbrt(0.0883024619 * r + 0.2817188376 * g + 0.6299787005 * b);
  return [
    0.2104542553 * l + 0.793617785 * mm - 0.0040720468 * s,
    1.9779984951 * l - 2.428592205 * mm + 0.4505937099 * s,
    0.0259040371 * l + 0.7827717662 * mm - 0.808675766 * s,
  ];
}

/** OKLab [L, a, b] → "#rrggbb" (clipped to the sRGB gamut). */
export function oklabToHex([L, a, b]: Lab): string {
  const l = (L + 0.3963377774 * a + 0.2158037573 * b) ** 3;
  const m = (L - 0.1055613458 * a - 0.0638541728 * b) ** 3;
  const s = (L - 0.0894841775 * a - 1.291485548 * b) ** 3;
  const rgb = [
    4.0767416621 * l - 3.3077115913 * m + 0.2309699292 * s,
    -1.2684380046 * l + 2.6097574011 * m - 0.3413193965 * s,
    -0.0041960863 * l - 0.7034186147 * m + 1.707614701 * s,
  ];
  return `#${rgb.map((c) => Math.round(fromLinear(c) * 255).toString(16).padStart(2, "0")).join("")}`;
}

/**
 * `count` colours evenly spaced along the piecewise-linear OKLab path through `stops`
 * (first stop at index 0, last at count − 1).
 */
export function rampColors(stops: readonly string[], count: number): string[] {
  if (stops.length < 2) throw new RangeError(`a ramp needs at least 2 stops, got ${stops.length}`);
  if (!Number.isInteger(count) || count < 2) throw new RangeError(`count must be an integer ≥ 2, got ${count}`);
  const labs = stops.map(hexToOklab);
  const out: string[] = [];
  for (let k = 0; k < count; k++) {
    const u = (k / (count - 1)) * (labs.length - 1);
    const seg = Math.min(labs.length - 2, Math.floor(u));
    const f = u - seg;
    const [p, q] = [labs[seg], labs[seg + 1]];
    out.push(oklabToHex([p[0] + (q[0] - p[0]) * f, p[1] + (q[1] - p[1]) * f, p[2] + (q[2] - p[2]) * f]));
  }
  return out;
}
