import type { Estimate } from "../../../../shared/schemas/probes";

/** Up to `digits` significant digits, exponent form for tiny or huge magnitudes, a true minus sign, "—" for none. */
export function num(v: number | null | undefined, digits = 3): string {
  if (v == null || Number.isNaN(v)) return "—";
  if (!Number.isFinite(v)) return v > 0 ? "∞" : "−∞";
  const a = Math.abs(v);
  const s = a !== 0 && (a >= 1e5 || a < 1e-3) ? v.toExponential(digits - 1).replace(/\.?0+e/, "e").replace("e+", "e") : String(Number(v.toPrecision(digits)));
  return s.replace("-", "−");
}

/** "93.4 %". */
export function share(v: number | null | undefined): string {
  return v == null || Number.isNaN(v) ? "—" : `${num(v * 100)} %`;
}

/** "1.51 ± 0.04" (estimate ± one standard error). */
export function plusMinus(e: Estimate | null): string {
  return e ? `${num(e.estimate)} ± ${num(e.se, 2)}` : "—";
}

/** "95 % CI [1.43, 1.59]". */
export function interval(e: { lower: number; upper: number } | null, asShare = false): string {
  if (!e) return "";
  const f = asShare ? share : num;
  return `95 % CI [${f(e.lower)}, ${f(e.upper)}]`;
}

/** "42 s", "3 min 20 s". */
export function duration(seconds: number | null | undefined): string {
  if (seconds == null || !Number.isFinite(seconds)) return "—";
  if (seconds < 1) return "under 1 s";
  if (seconds < 60) return `${Math.round(seconds)} s`;
  const m = Math.floor(seconds / 60);
  const s = Math.round(seconds - 60 * m);
  return s ? `${m} min ${s} s` : `${m} min`;
}
