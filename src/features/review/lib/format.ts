import { formatNumber } from "../../../lib/format-number";

/**
 * Numbers of the review pages on top of formatNumber: p-values in the usual reporting form,
 * shares as percentages, signed differences, durations; "—" for a missing value.
 */

/** "p < 0.001", "p = 0.034", "p = 1". */
export function fmtP(p: number | null | undefined): string {
  if (p == null || Number.isNaN(p)) return "—";
  if (p < 0.001) return "p < 0.001";
  return `p = ${Number(p.toPrecision(2))}`;
}

/** 0.889 → "89 %". */
export function fmtShare(v: number | null | undefined, digits = 2): string {
  if (v == null || Number.isNaN(v)) return "—";
  return `${Number((v * 100).toPrecision(digits))} %`;
}

/** A signed difference: "+0.25", "−1.1", "0". */
export function fmtSigned(v: number | null | undefined): string {
  if (v == null || Number.isNaN(v)) return "—";
  return v > 0 ? `+${formatNumber(v)}` : formatNumber(v);
}

/** Seconds as "42 s", "3.5 min", "2.1 h". */
export function fmtSeconds(s: number | null | undefined): string {
  if (s == null || !Number.isFinite(s)) return "—";
  if (s < 90) return `${formatNumber(s, 2)} s`;
  if (s < 5400) return `${formatNumber(s / 60, 2)} min`;
  return `${formatNumber(s / 3600, 2)} h`;
}
