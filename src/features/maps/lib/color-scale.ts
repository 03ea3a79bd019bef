import { scaleLinear, scaleLog } from "@visx/scale";
import { layers, regimeCodes, type LayerId, type LayerInfo } from "../../../../shared/maps/layers";
import type { Regime } from "../../../../shared/schemas/theory";
import { pickEvenly } from "../../../lib/axis-scale";
import { rampColors } from "./oklab";
import { KILN, REGIME_COLORS, SADDLE, TIDE } from "./palettes";

const LUT_SIZE = 256;
// Lookup tables are built once per palette: re-colouring a 64 × 64 map is then 4096 lookups.
const luts = { tide: rampColors(TIDE, LUT_SIZE), kiln: rampColors(KILN, LUT_SIZE), saddle: rampColors(SADDLE, LUT_SIZE) };

export interface ContinuousScale {
  kind: "continuous";
  layer: LayerInfo;
  /** Value domain (in the layer's own units) mapped onto the palette's ends. */
  domain: [number, number];
  /** "log" for ratios: the colour follows log10 of the value. */
  transform: "linear" | "log";
  /** The neutral value of a diverging scale (0 or 1), null for sequential ones. */
  center: number | null;
  lut: readonly string[];
  ticks: number[];
  colorOf: (v: number) => string;
}

export interface CategoryScale {
  kind: "category";
  layer: LayerInfo;
  entries: { code: number; label: string; color: string }[];
  colorOf: (v: number) => string;
}

export type LayerScale = ContinuousScale | CategoryScale;

export const REGIME_LABELS: Readonly<Record<Regime, string>> = {
  "one-stable": "One stable state (m > 1)",
  "stable-rare": "Many equilibria, stable ones rare",
  "stable-abundant": "Stable equilibria abundant",
};

function finite(values: ArrayLike<number>): number[] {
  const out: number[] = [];
  for (let k = 0; k < values.length; k++) if (Number.isFinite(values[k])) out.push(values[k]);
  return out;
}

function extent(vs: number[]): [number, number] {
  let lo = Infinity;
  let hi = -Infinity;
  for (const v of vs) {
    if (v < lo) lo = v;
    if (v > hi) hi = v;
  }
  return [lo, hi];
}

function domainFor(kind: LayerInfo["kind"], vs: number[]): { domain: [number, number]; center: number | null } {
  if (kind === "share") return { domain: [0, 1], center: null };
  if (kind === "ratio") {
    const a = Math.max(Math.log10(2), ...vs.filter((v) => v > 0).map((v) => Math.abs(Math.log10(v))));
    return { domain: [10 ** -a, 10 ** a], center: 1 };
  }
  if (kind === "complexity" || kind === "log-count") {
    const a = Math.max(1e-3, ...vs.map(Math.abs));
    return { domain: [-a, a], center: 0 };
  }
  if (vs.length === 0) return { domain: [0, 1], center: null };
  const [lo, hi] = extent(vs);
  return { domain: hi - lo < 1 ? [lo, lo + 1] : [lo, hi], center: null };
}

function continuous(layer: LayerInfo, values: ArrayLike<number>): ContinuousScale {
  const { domain, center } = domainFor(layer.kind, finite(values));
  const transform = layer.kind === "ratio" ? "log" : "linear";
  const lut = layer.kind === "share" ? luts.kiln : center !== null ? luts.saddle : luts.tide;
  const t = transform === "log" ? Math.log10 : (v: number) => v;
  const lo = t(domain[0]);
  const span = t(domain[1]) - lo || 1;
  const colorOf = (v: number) => {
    const u = v <= 0 && transform === "log" ? 0 : (t(v) - lo) / span;
    return lut[Math.round(Math.min(1, Math.max(0, u)) * (LUT_SIZE - 1))];
  };
  const ticks = pickEvenly(transform === "log" ? scaleLog({ domain }).ticks(5) : scaleLinear({ domain }).ticks(5), 7);
  return { kind: "continuous", layer, domain, transform, center, lut, ticks, colorOf };
}

function category(layer: LayerInfo): CategoryScale {
  const entries = (Object.keys(regimeCodes) as Regime[]).map((r) => ({ code: regimeCodes[r] as number, label: REGIME_LABELS[r], color: REGIME_COLORS[r] }));
  const byCode = new Map<number, string>(entries.map((e) => [e.code, e.color]));
  return { kind: "category", layer, entries, colorOf: (v) => byCode.get(v) ?? "#000000" };
}

/**
 * The colour scale of one layer over the values present on the map (NaN for cells without a
 * value): shares on [0, 1]; counts from the smallest to the largest value; complexities and
 * log counts symmetric around 0; ratios symmetric around 1 on a log scale; regimes categorical.
 */
export function layerScale(layerId: LayerId, values: ArrayLike<number>): LayerScale {
  const layer = layers[layerId];
  return layer.kind === "category" ? category(layer) : continuous(layer, values);
}

/** What the legend must say about the nature of the number (found ≠ true, asymptotic ≠ finite N). */
export function layerCaveat(layer: LayerInfo): string {
  switch (layer.kind) {
    case "count":
      return layer.id === "stable-found" ? "lower bound: more starts can only find more" : "estimate from the runs' repeat visits";
    case "share":
      return "Monte Carlo share with a Wilson 95 % interval in the read-out";
    case "complexity":
      return "asymptotic (large N), not this N";
    case "log-count":
      return "finite-N Kac–Rice, Monte Carlo";
    case "ratio":
      return "found (a lower bound) ÷ finite-N prediction";
    case "category":
      return "asymptotic (large N) prediction";
  }
}
