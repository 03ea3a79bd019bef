import type { Estimate } from "../../../../shared/schemas/probes";
import { formatNumber, formatShare } from "../../../lib/format-number";

/** "1.51 ± 0.04" (estimate ± one standard error). */
export function plusMinus(e: Estimate | null): string {
  return e ? `${formatNumber(e.estimate)} ± ${formatNumber(e.se, 2)}` : "—";
}

/** "95 % CI [1.43, 1.59]". */
export function interval(e: { lower: number; upper: number } | null, asShare = false): string {
  if (!e) return "";
  const f = asShare ? formatShare : formatNumber;
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
