import type { MapView } from "../../../../shared/schemas/maps";
import type { MapBoundary, MapReport } from "../../../../shared/schemas/review";
import { formatNumber } from "../../../lib/format-number";
import { fmtSeconds } from "./format";

export interface FactGroup {
  title: string;
  rows: [label: string, value: string][];
}

function axisText(a: MapView["mu"]): string {
  return `${formatNumber(a.min, 6)} to ${formatNumber(a.max, 6)}, ${a.steps} step${a.steps === 1 ? "" : "s"}, ${a.scale}`;
}

function when(iso: string | null): string {
  return iso ? new Date(iso).toISOString().replace("T", " ").replace(/\.\d+Z$/, " UTC") : "—";
}

/**
 * Every setting a printed report states, grouped: software, model, grid, budget and seeds,
 * engine tolerances, statistics, computation and dates. Values are plain strings, so the table
 * prints as it reads.
 */
export function reportFacts(map: MapView, report: MapReport, boundary: MapBoundary | null): FactGroup[] {
  const b = map.budget;
  const runs = b.networks * b.starts;
  const settings = Object.entries(map.settings).map(([k, v]): [string, string] => [`Parameter ${k}`, typeof v === "number" ? formatNumber(v, 6) : String(v)]);
  return [
    {
      title: "Software",
      rows: [
        ["Software version", `${report.about.name} ${report.about.version}`],
        ["Git commit", report.about.commit],
        ["Engine version", report.about.engineVersion],
        ["Ensemble and version", `${map.ensemble} ${map.ensembleVersion}`],
      ],
    },
    { title: "Model", rows: [["Ensemble", map.ensemble], ...settings, ["Critical rate μ_c", formatNumber(map.muCritical, 6)]] },
    { title: "Grid", rows: [["μ axis", axisText(map.mu)], ["τ axis", axisText(map.tau)], ["Cells", String(map.cellsTotal)]] },
    {
      title: "Budget and seeds",
      rows: [
        ["Networks per cell", String(b.networks)],
        ["Starts per network", String(b.starts)],
        ["Runs per cell", String(runs)],
        ["Time limit tMax", formatNumber(b.tMax, 6)],
        ["Integrator rtol / atol", `${b.rtol.toExponential()} / ${b.atol.toExponential()}`],
        ["Exhaustive search", b.exhaustive ? "yes" : "no"],
        ["Base seed", String(map.seed)],
        ...(map.replicateOf ? ([["Replicate of", map.replicateOf]] as [string, string][]) : []),
      ],
    },
    { title: "Engine tolerances", rows: report.engineSettings.map((s): [string, string] => [s.name, s.value]) },
    {
      title: "Statistics",
      rows: [
        ["Intervals", "95 %: Student t for means, Wilson for shares"],
        ["Boundary fit", "Firth logistic regression on ln μ per τ row"],
        ["Boundary band", boundary ? `percentile bootstrap over networks, ${boundary.resamples} resamples, seed ${boundary.seed}` : "—"],
        ["Replication test", "Welch's t on per-network stable counts, 5 % level"],
        ...(map.ensemble === "field" ? ([["Kac–Rice theory rows", "Monte Carlo, 32 matrices per τ row, seed 1"]] as [string, string][]) : []),
      ],
    },
    {
      title: "Computation",
      rows: [
        ["Status", map.status + (map.failure ? ` (${map.failure})` : "")],
        ["Cells done", `${map.cellsDone} of ${map.cellsTotal} (${map.cellsComputed} computed, ${map.cellsFromCache} from the cache)`],
        ["Engine time of stored cells", `${fmtSeconds(report.computeSeconds)} over ${report.cellsStored} cells`],
        ["Created", when(map.createdAt)],
        ["Started", when(map.startedAt)],
        ["Finished", when(map.finishedAt)],
        ["Report generated", when(report.generatedAt)],
      ],
    },
  ];
}
