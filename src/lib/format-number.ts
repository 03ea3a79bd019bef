import type { IntervalJson } from "../../shared/schemas/cell-result";

/**
 * A number for read-outs and legends: up to 3 significant digits, exponent form for very large
 * or very small magnitudes, a true minus sign, "—" for a missing value.
 */
export function formatNumber(v: number | null | undefined, digits = 3): string {
  if (v == null || Number.isNaN(v)) return "—";
  if (!Number.isFinite(v)) return v > 0 ? "∞" : "−∞";
  const a = Math.abs(v);
  let s: string;
  if (a === 0) s = "0";
  else if (a >= 1e5 || a < 1e-3) s = v.toExponential(Math.max(0, digits - 1)).replace(/\.?0+e/, "e").replace("e+", "e");
  else s = String(Number(v.toPrecision(digits)));
  return s.replaceAll("-", "−");
}

/** A share as a percentage: 0.934 → "93.4 %". */
export function formatShare(v: number | null | undefined): string {
  if (v == null || Number.isNaN(v)) return "—";
  return `${formatNumber(v * 100, 3)} %`;
}

/** "[2.1, 4.3]" for an interval's bounds; an open side shows as ±∞. */
export function formatBounds(i: Pick<IntervalJson, "lower" | "upper">, share = false): string {
  const f = share ? formatShare : formatNumber;
  return `[${i.lower == null ? "−∞" : f(i.lower)}, ${i.upper == null ? "∞" : f(i.upper)}]`;
}

/** Seconds as a short duration: 42 s, 3 min 20 s, 2 h 05 min. */
export function formatDuration(seconds: number | null | undefined): string {
  if (seconds == null || !Number.isFinite(seconds) || seconds < 0) return "—";
  if (seconds < 1) return "under 1 s";
  if (seconds < 60) return `${Math.round(seconds)} s`;
  if (seconds < 3600) {
    const m = Math.floor(seconds / 60);
    const s = Math.round(seconds - 60 * m);
    return s ? `${m} min ${s} s` : `${m} min`;
  }
  const h = Math.floor(seconds / 3600);
  const m = Math.round((seconds - 3600 * h) / 60);
  return `${h} h ${String(m).padStart(2, "0")} min`;
}
