import type { EquilibriumSummary, NetworkSummary } from "../../../shared/schemas/cell-result";
import type { NetworkRun, RunClass, RunOutcome } from "../equilibria/run-starts";
import type { ExhaustiveResult } from "../equilibria/exhaustive";
import { chao1 } from "../stats/chao1";

export const RUN_CLASSES: readonly RunClass[] = ["settled", "unverified", "slow", "periodic", "irregular", "escaping", "unclassified"];

/** Zero counts for every run class, in a fixed key order. */
export function emptyRunCounts(): Record<RunClass, number> {
  return Object.fromEntries(RUN_CLASSES.map((c) => [c, 0])) as Record<RunClass, number>;
}

function median(sorted: number[]): number | null {
  if (sorted.length === 0) return null;
  const m = sorted.length >> 1;
  return sorted.length % 2 ? sorted[m] : 0.5 * (sorted[m - 1] + sorted[m]);
}

function summariseEquilibria(run: NetworkRun, starts: number, stable: boolean): EquilibriumSummary[] {
  const { items, hits } = run.equilibria;
  const times = items.map(() => [] as number[]);
  for (const o of run.outcomes) if (o.class === "settled") times[o.equilibrium].push(o.time);
  const rows = items
    .map((e, i) => ({ e, i }))
    .filter(({ e }) => e.stable === stable)
    .map(({ e, i }) => ({
      order: i,
      row: {
        normInf: e.normInf,
        normRms: e.normRms,
        index: e.index,
        maxRealPart: e.maxRealPart,
        stable: e.stable,
        residual: e.residual,
        hits: hits[i],
        basinShare: hits[i] / starts,
        meanSettleTime: times[i].length ? times[i].reduce((a, b) => a + b, 0) / times[i].length : null,
      },
    }));
  rows.sort((a, b) => b.row.hits - a.row.hits || a.order - b.order);
  return rows.map((r) => r.row);
}

/**
 * Per-network summary of runStarts (product.md "What a cell computes"): distinct stable and
 * reached unstable equilibria (most visited first), run classes, Chao1 of stable equilibria
 * from their basin hit counts (Chao 1984), settle times, largest Lyapunov estimate, counters.
 * @param k network index
 * @param run the network's runs
 * @param exhaustive the exhaustive search result, or null
 * @returns the summary (plain JSON data)
 */
export function summariseNetwork(k: number, run: NetworkRun, exhaustive: ExhaustiveResult | null): NetworkSummary {
  const starts = run.outcomes.length;
  const runs = emptyRunCounts();
  for (const o of run.outcomes) runs[o.class] += 1;
  const settled = run.outcomes.filter((o: RunOutcome) => o.class === "settled").map((o) => o.time);
  settled.sort((a, b) => a - b);
  const stable = summariseEquilibria(run, starts, true);
  const lyap = run.outcomes.map((o) => o.lyapunov).filter((v): v is number => v !== null);
  return {
    k,
    stable,
    unstable: summariseEquilibria(run, starts, false),
    runs,
    chao1: chao1(stable.map((s) => s.hits)),
    meanSettleTime: settled.length ? settled.reduce((a, b) => a + b, 0) / settled.length : null,
    medianSettleTime: median(settled),
    maxLyapunov: lyap.length ? Math.max(...lyap) : null,
    exhaustive: exhaustive ? summariseExhaustive(exhaustive) : null,
    counters: { ...run.counters },
  };
}

function summariseExhaustive(r: ExhaustiveResult): NonNullable<NetworkSummary["exhaustive"]> {
  const byIndex: number[] = [];
  for (const e of r.equilibria.items) {
    while (byIndex.length <= e.index) byIndex.push(0);
    byIndex[e.index] += 1;
  }
  return {
    total: r.equilibria.size,
    stable: r.equilibria.items.filter((e) => e.stable).length,
    byIndex,
    box: r.box,
    starts: r.starts,
  };
}
