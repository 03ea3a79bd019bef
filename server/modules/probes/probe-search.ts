import type { ProbeComparison, ProbeSearchSettings } from "../../../shared/schemas/probes";
import { validateCellInput } from "../../engine/cell/cell-input";
import { mergeNetworks } from "../../engine/cell/merge";
import { compactComparison, planComparison, type ProbeFacts } from "./analysis/comparison";
import { mergeChunks, type MergedSearch } from "./analysis/merge-chunks";
import type { StartsChunkResult } from "./analysis/search-chunk";
import type { ProbePool } from "./probe.pool";

/** Traced starts of the uploaded matrix (units 0–3 of starts 0, 1, 2). */
export const TRACED_STARTS = 3;

export interface SearchProgress {
  startsDone: number;
  networksDone: number;
}

export interface SearchOutcome {
  merged: MergedSearch;
  comparison: ProbeComparison | null;
  /** Why there is no comparison, when there is none. */
  skippedComparison: string | null;
}

/** Chunks of at least 8 starts (the batched integrator's width), at most 16 chunks. */
export function chunkBounds(starts: number): { first: number; count: number }[] {
  const size = Math.max(8, Math.ceil(starts / 16));
  const out: { first: number; count: number }[] = [];
  for (let first = 0; first < starts; first += size) out.push({ first, count: Math.min(size, starts - first) });
  return out;
}

/**
 * The equilibrium search of a probe: its S starts split into chunks and the K comparison
 * networks (planComparison), all run at once on the pool's threads; chunks are merged
 * (mergeChunks) and the networks aggregated as a cell (mergeNetworks).
 * @param pool the probe pool
 * @param probe the matrix (a shared view, see sharedMatrix), N, μ, φ, input and statistics
 * @param settings starts, tolerances, comparison networks, seed
 * @param onProgress called after every finished chunk or network
 * @returns the merged search and the comparison (or why it was skipped)
 * @throws the engine's RangeError/TypeError on a bad matrix or setting; a thread's failure
 */
export async function runProbeSearch(
  pool: ProbePool,
  probe: ProbeFacts & { couplings: Float64Array },
  settings: ProbeSearchSettings,
  onProgress: (p: SearchProgress) => void = () => {},
): Promise<SearchOutcome> {
  const t0 = performance.now();
  const progress: SearchProgress = { startsDone: 0, networksDone: 0 };
  const plan = planComparison(probe, settings);
  const cellInput = "input" in plan ? validateCellInput(plan.input) : null;
  const input = probe.input ?? 0;
  const chunks = chunkBounds(settings.starts).map(async ({ first, count }): Promise<StartsChunkResult> => {
    const chunk = await pool.startsChunk({
      couplings: probe.couplings, n: probe.n, mu: probe.mu, input, nonlinearity: probe.nonlinearity, seed: settings.seed,
      first, count, tMax: settings.tMax, rtol: settings.rtol, atol: settings.atol, traceStarts: TRACED_STARTS,
    });
    progress.startsDone += count;
    onProgress({ ...progress });
    return chunk;
  });
  const networks = cellInput
    ? Array.from({ length: cellInput.budget.networks }, async (_, k) => {
        const out = await pool.network(cellInput, k);
        progress.networksDone += 1;
        onProgress({ ...progress });
        return out;
      })
    : [];
  const [chunkResults, outputs] = await Promise.all([Promise.all(chunks), Promise.all(networks)]);
  const wallSeconds = (performance.now() - t0) / 1000;
  const merged = mergeChunks(chunkResults, settings.starts, wallSeconds);
  if (!cellInput || !("input" in plan)) return { merged, comparison: null, skippedComparison: "skipped" in plan ? plan.skipped : null };
  const cell = mergeNetworks(cellInput, outputs, { wallSeconds, threads: pool.threads });
  return { merged, comparison: compactComparison(cellInput, cell, plan.notes, wallSeconds), skippedComparison: null };
}
