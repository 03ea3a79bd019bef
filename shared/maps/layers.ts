import type { CellSummary } from "./cell-summary";

/**
 * What a heatmap can show. Each layer reads one number (or a category) from a cell summary; the
 * server uses the same functions for GET /api/maps/:id/grid?layer= and CSV exports, the client
 * for colouring, read-outs and filters.
 */
export const layerIds = [
  "stable-found",
  "stable-richness",
  "converged",
  "one-stable",
  "sigma-stable",
  "sigma-total",
  "kr-stable",
  "kr-total",
  "found-ratio",
  "regime",
] as const;
export type LayerId = (typeof layerIds)[number];

export interface LayerInfo {
  id: LayerId;
  label: string;
  /** Unit or meaning of the number, shown beside the colour legend. */
  unit: string;
  /** Plain-words help shown in the layer picker. */
  help: string;
  kind: "count" | "share" | "complexity" | "log-count" | "ratio" | "category";
  /** Only meaningful for these ensembles (null: every ensemble). */
  ensembles: readonly string[] | null;
}

export const layers: Record<LayerId, LayerInfo> = {
  "stable-found": { id: "stable-found", label: "Stable states found", unit: "distinct stable equilibria per network (mean; a lower bound)", help: "How many different stable fixed points the runs of one network reached, averaged over the cell's networks. More starts can only raise it.", kind: "count", ensembles: null },
  "stable-richness": { id: "stable-richness", label: "Estimated stable states", unit: "Chao1 estimate per network (mean)", help: "Found stable states plus an estimate of those not yet found, from how many were reached only once or twice (Chao 1984).", kind: "count", ensembles: null },
  converged: { id: "converged", label: "Runs that settled", unit: "share of runs ending on a verified fixed point", help: "Share of all runs in the cell that came to rest on a fixed point verified by Newton's method.", kind: "share", ensembles: null },
  "one-stable": { id: "one-stable", label: "Single stable state", unit: "share of networks with exactly one stable state found", help: "Share of the cell's networks in which every settled run found the same single stable fixed point.", kind: "share", ensembles: null },
  "sigma-stable": { id: "sigma-stable", label: "Σ stable (large N)", unit: "asymptotic complexity (1/N) ln E N_st", help: "Predicted exponential growth rate of the number of stable equilibria as N → ∞ (Ben Arous, Fyodorov & Khoruzhenko 2021). Asymptotic, not finite-N.", kind: "complexity", ensembles: ["field"] },
  "sigma-total": { id: "sigma-total", label: "Σ total (large N)", unit: "asymptotic complexity (1/N) ln E N_tot", help: "Predicted exponential growth rate of the number of all equilibria as N → ∞ (Fyodorov & Khoruzhenko 2016). Asymptotic, not finite-N.", kind: "complexity", ensembles: ["field"] },
  "kr-stable": { id: "kr-stable", label: "Kac–Rice stable (this N)", unit: "ln E N_st at this N (Monte Carlo)", help: "Expected number of stable equilibria at your N from the Kac–Rice formula, evaluated by Monte Carlo with a standard error. Shown as a natural log.", kind: "log-count", ensembles: ["field"] },
  "kr-total": { id: "kr-total", label: "Kac–Rice total (this N)", unit: "ln E N_tot at this N (Monte Carlo)", help: "Expected number of all equilibria at your N from the Kac–Rice formula. Shown as a natural log.", kind: "log-count", ensembles: ["field"] },
  "found-ratio": { id: "found-ratio", label: "Found ÷ predicted", unit: "stable states found per network ÷ Kac–Rice E N_st", help: "How much of the predicted number of stable equilibria the runs found. Below 1 means more starts would find more.", kind: "ratio", ensembles: ["field"] },
  regime: { id: "regime", label: "Predicted regime", unit: "large-N phase of the point", help: "One stable state (m > 1); many equilibria but stable ones exponentially rare; stable ones exponentially many. Asymptotic prediction.", kind: "category", ensembles: ["field"] },
};

export const regimeCodes = { "one-stable": 0, "stable-rare": 1, "stable-abundant": 2 } as const;

/** The number a layer shows for one cell, or null when it has none (pending, or not applicable). */
export function layerValue(layer: LayerId, c: CellSummary): number | null {
  const t = c.theory;
  switch (layer) {
    case "stable-found": return c.stable?.estimate ?? null;
    case "stable-richness": return c.richness?.estimate ?? null;
    case "converged": return c.converged?.estimate ?? null;
    case "one-stable": return c.oneStable?.estimate ?? null;
    case "sigma-stable": return t?.sigmaStable ?? null;
    case "sigma-total": return t?.sigmaTotal ?? null;
    case "kr-stable": return t?.krStable?.logMean ?? null;
    case "kr-total": return t?.krTotal?.logMean ?? null;
    case "found-ratio": {
      const found = c.stable?.estimate;
      const predicted = t?.krStable?.mean;
      return found != null && predicted != null && predicted > 0 ? found / predicted : null;
    }
    case "regime": return t?.regime != null ? regimeCodes[t.regime] : null;
  }
}

/** Layers that apply to an ensemble, in picker order. */
export function layersFor(ensemble: string): LayerInfo[] {
  return layerIds.map((id) => layers[id]).filter((l) => l.ensembles === null || l.ensembles.includes(ensemble));
}
