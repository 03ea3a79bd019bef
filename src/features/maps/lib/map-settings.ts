import type { MapView } from "../../../../shared/schemas/maps";
import { formatNumber } from "../../../lib/format-number";

export const ENSEMBLE_LABELS: Readonly<Record<string, string>> = {
  rate: "Rate network",
  field: "Gaussian field network",
};

type SettingsMap = Pick<MapView, "ensemble" | "ensembleVersion" | "settings" | "mu" | "tau" | "budget" | "seed">;

function num(v: unknown): string {
  return typeof v === "number" ? formatNumber(v, 4) : String(v ?? "—");
}

/** The ensemble's fixed settings in words: "N = 50", "g = 1.5", "tanh", "input 0". */
export function settingsParts(map: Pick<MapView, "ensemble" | "settings">): string[] {
  const s = map.settings;
  if (map.ensemble === "field") {
    const N = Number(s.N);
    const M = typeof s.features === "number" ? s.features : 40 * N;
    return [`N = ${num(s.N)}`, `σ = ${num(s.sigma)}`, `M = ${num(M)} features`, `ℓ = ${num(s.lengthScale ?? 1)}`];
  }
  return [`N = ${num(s.N)}`, `g = ${num(s.g)}`, String(s.nonlinearity ?? "tanh"), `input ${num(s.input ?? 0)}`];
}

function axisPart(name: string, a: MapView["mu"]): string {
  return `${name} ${formatNumber(a.min, 4)}–${formatNumber(a.max, 4)} in ${a.steps} ${a.scale === "log" ? "log " : ""}steps`;
}

/**
 * Every setting that determines the map's numbers, for the figure's settings line and the
 * detail panel: ensemble and version, its parameters, both axes, budget, tolerances, seed.
 */
export function settingsLine(map: SettingsMap): string[] {
  const b = map.budget;
  return [
    `${ENSEMBLE_LABELS[map.ensemble] ?? map.ensemble} (${map.ensembleVersion})`,
    ...settingsParts(map),
    axisPart("μ", map.mu),
    axisPart("τ", map.tau),
    `K = ${b.networks} networks × S = ${b.starts} starts`,
    `t ≤ ${num(b.tMax)}`,
    `rtol ${num(b.rtol)}, atol ${num(b.atol)}`,
    ...(b.exhaustive ? ["exhaustive search"] : []),
    `seed ${map.seed}`,
  ];
}
