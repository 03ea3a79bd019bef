import type { CellSummary } from "../../../shared/maps/cell-summary";
import { layerValue } from "../../../shared/maps/layers";
import type { IntervalJson } from "../../../shared/schemas/cell-result";
import type { CreateMap } from "../../../shared/schemas/maps";

/**
 * CSV export of a map: `#` comment lines with every setting, then one row per cell (j, then i)
 * with its position, every layer's value, confidence bounds and sample sizes.
 */

type Column = [name: string, value: (c: CellSummary) => string | number | boolean | null];

function interval(name: string, pick: (c: CellSummary) => IntervalJson | null): Column[] {
  return [
    [name, (c) => pick(c)?.estimate ?? null],
    [`${name}_lower95`, (c) => pick(c)?.lower ?? null],
    [`${name}_upper95`, (c) => pick(c)?.upper ?? null],
    [`${name}_n`, (c) => pick(c)?.n ?? null],
  ];
}

/** Every CSV column: header name and how to read it from a cell summary. */
export const csvColumns: readonly Column[] = [
  ["i", (c) => c.i],
  ["j", (c) => c.j],
  ["mu", (c) => c.mu],
  ["tau", (c) => c.tau],
  ["m", (c) => c.theory?.m ?? null],
  ["state", (c) => c.state],
  ["from_cache", (c) => c.fromCache],
  ["networks", (c) => c.networks],
  ["starts", (c) => c.starts],
  ...interval("stable_found", (c) => c.stable),
  ...interval("stable_richness", (c) => c.richness),
  ...interval("converged_share", (c) => c.converged),
  ...interval("one_stable_share", (c) => c.oneStable),
  ...interval("unstable_reached", (c) => c.unstableReached),
  ...interval("exhaustive_total", (c) => c.total),
  ["sigma_stable_asymptotic", (c) => layerValue("sigma-stable", c)],
  ["sigma_total_asymptotic", (c) => layerValue("sigma-total", c)],
  ["kr_stable_log", (c) => layerValue("kr-stable", c)],
  ["kr_stable_mean", (c) => c.theory?.krStable?.mean ?? null],
  ["kr_stable_se", (c) => c.theory?.krStable?.se ?? null],
  ["kr_stable_upper95", (c) => c.theory?.krStable?.upper95 ?? null],
  ["kr_total_log", (c) => layerValue("kr-total", c)],
  ["kr_total_mean", (c) => c.theory?.krTotal?.mean ?? null],
  ["kr_total_se", (c) => c.theory?.krTotal?.se ?? null],
  ["kr_samples", (c) => c.theory?.krSamples ?? null],
  ["exact_total", (c) => c.theory?.exactTotal ?? null],
  ["found_ratio", (c) => layerValue("found-ratio", c)],
  ["regime_asymptotic", (c) => c.theory?.regime ?? null],
  ["origin_stable", (c) => c.theory?.originStable ?? null],
];

function field(v: string | number | boolean | null): string {
  if (v === null) return "";
  const s = String(v);
  return /[",\n\r]/.test(s) ? `"${s.replace(/"/g, '""')}"` : s;
}

function oneLine(s: string): string {
  return s.replace(/[\r\n]+/g, " ");
}

export interface CsvMeta {
  manifest: CreateMap;
  engineVersion: string;
  ensembleVersion: string;
  exportedAt: string;
}

/** The `#` header: settings a reader needs to reproduce or judge the numbers. */
export function csvHeader(meta: CsvMeta): string[] {
  const m = meta.manifest;
  return [
    `# Equilibrist map export: ${oneLine(m.title)}`,
    `# exported ${meta.exportedAt}; engine ${meta.engineVersion}; ensemble ${m.ensemble} version ${meta.ensembleVersion}`,
    `# settings ${JSON.stringify(m.settings)}`,
    `# mu axis ${JSON.stringify(m.mu)}; tau axis ${JSON.stringify(m.tau)}`,
    `# budget ${JSON.stringify(m.budget)}; seed ${m.seed}`,
    "# found counts are lower bounds of the true numbers; *_lower95/_upper95 are 95 % intervals over n networks (runs for shares)",
    "# sigma_* and regime_* are asymptotic (large N); kr_* are finite-N Kac-Rice Monte Carlo estimates (log = natural log)",
  ];
}

/** The whole CSV text: header comments, column names, one row per cell. */
export function mapCsv(meta: CsvMeta, cells: readonly CellSummary[]): string {
  const lines = [...csvHeader(meta), csvColumns.map(([name]) => name).join(",")];
  for (const c of cells) lines.push(csvColumns.map(([, read]) => field(read(c))).join(","));
  return `${lines.join("\n")}\n`;
}

/** A file name from the title: letters, digits and dashes. */
export function exportFileName(title: string, ext: "csv" | "json" | "npy"): string {
  const base = title.toLowerCase().replace(/[^a-z0-9]+/g, "-").replace(/^-+|-+$/g, "").slice(0, 60) || "map";
  return `${base}.${ext}`;
}

/**
 * A coupling matrix as CSV: N rows of N comma-separated values, row i holding J_i1 … J_iN, with
 * the shortest text that reads back to the same double (JavaScript's number-to-string).
 */
export function couplingsCsv(data: Float64Array, n: number): string {
  const rows: string[] = [];
  for (let i = 0; i < n; i++) rows.push(Array.from(data.subarray(i * n, (i + 1) * n), String).join(","));
  return rows.join("\n") + "\n";
}
