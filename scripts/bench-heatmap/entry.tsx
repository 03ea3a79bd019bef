// Browser side of scripts/bench-heatmap.ts: renders the map figure of a 64 × 64 grid of
// synthetic cell summaries (a smooth made-up field: benchmark input, not results) and times the
// first render and each re-colour on a layer change, with and without the next paint.
import { useState } from "react";
import { flushSync } from "react-dom";
import { createRoot } from "react-dom/client";
import type { CellSummary } from "../../shared/maps/cell-summary";
import type { LayerId } from "../../shared/maps/layers";
import type { MapView } from "../../shared/schemas/maps";
import { MapFigure } from "../../src/features/maps/components/heatmap/map-figure";
import { buildGrid } from "../../src/features/maps/lib/grid-model";

const STEPS = 64;
const interval = (estimate: number, n: number) => ({ estimate, lower: estimate * 0.8, upper: estimate * 1.2, n, level: 0.95 });

const map = {
  id: "00000000-0000-4000-8000-000000000000", title: "Bench map 64 × 64", description: "", ownerId: "00000000-0000-4000-8000-000000000001", ownerName: "Bench",
  groupId: null, groupName: null, visibility: "private", shareToken: null, access: "owner", ensemble: "field", ensembleVersion: "1",
  settings: { N: 20, sigma: 1, lengthScale: 1 }, mu: { min: 0.2, max: 6, steps: STEPS, scale: "linear" }, tau: { min: 0, max: 1, steps: STEPS, scale: "linear" },
  budget: { networks: 8, starts: 16, tMax: 200, rtol: 1e-6, atol: 1e-9, exhaustive: false }, seed: 1, muCritical: Math.sqrt(20), status: "done", failure: null,
  cellsTotal: STEPS * STEPS, cellsDone: STEPS * STEPS, cellsComputed: STEPS * STEPS, cellsFromCache: 0, throughput: null, etaSeconds: null, replicateOf: null,
  createdAt: new Date().toISOString(), startedAt: null, finishedAt: null,
} satisfies MapView;

function syntheticCells(): CellSummary[] {
  const out: CellSummary[] = [];
  for (let j = 0; j < STEPS; j++) {
    for (let i = 0; i < STEPS; i++) {
      const mu = 0.2 + (5.8 * i) / (STEPS - 1);
      const tau = j / (STEPS - 1);
      const m = mu / Math.sqrt(20);
      const rich = Math.max(1, 12 * Math.exp(-3 * m) * (0.3 + tau));
      out.push({
        i, j, mu, tau, state: (i * 7 + j * 3) % 97 === 0 ? "pending" : "done", fromCache: false, networks: 8, starts: 16,
        stable: interval(rich, 8), richness: interval(rich * 1.3, 8), converged: interval(Math.min(1, 0.4 + m / 2), 128), oneStable: interval(m > 1 ? 0.9 : 0.1, 8),
        unstableReached: interval(rich / 3, 8), total: null,
        theory: {
          m, sigmaTotal: m < 1 ? (m * m - 1) / 2 - Math.log(m) : 0, sigmaStable: m < 1 ? -Math.log(m) - (1 - m) - (1 - m) ** 2 / (2 * Math.max(tau, 0.05)) : 0,
          regime: m > 1 ? "one-stable" : tau > 0.5 ? "stable-abundant" : "stable-rare", krTotal: { mean: 3, se: 0.2, logMean: 1.1 },
          krStable: { mean: rich, se: 0.3, logMean: Math.log(rich), upper95: rich + 0.5 }, krSamples: 32, exactTotal: null, originStable: null,
        },
      });
    }
  }
  return out;
}

const grid = buildGrid(map, syntheticCells());
let setLayerOut: (l: LayerId) => void = () => undefined;

function Bench() {
  const [layer, setLayer] = useState<LayerId>("stable-found");
  setLayerOut = setLayer;
  return <MapFigure map={map} grid={grid} layerId={layer} criteria={[]} curves={new Set(["m-one", "m-stable"])} width={1000} onOpen={() => undefined} onHover={() => undefined} />;
}

const nextPaint = () => new Promise<void>((resolve) => requestAnimationFrame(() => setTimeout(resolve, 0)));

async function run() {
  const root = createRoot(document.getElementById("root")!);
  const t0 = performance.now();
  flushSync(() => root.render(<Bench />));
  const firstCommit = performance.now() - t0;
  await nextPaint();
  const firstPaint = performance.now() - t0;
  const order: LayerId[] = ["converged", "sigma-stable", "regime", "kr-stable", "one-stable", "found-ratio", "stable-richness", "stable-found"];
  const changes: { layer: LayerId; commit: number; paint: number }[] = [];
  for (let round = 0; round < 3; round++) {
    for (const layer of order) {
      const s = performance.now();
      flushSync(() => setLayerOut(layer));
      const commit = performance.now() - s;
      await nextPaint();
      changes.push({ layer, commit, paint: performance.now() - s });
    }
  }
  const rects = document.querySelectorAll("rect[data-k]").length;
  // Warm mounts: the same figure drawn again from nothing, once the code is compiled.
  const mounts: { commit: number; paint: number }[] = [];
  for (let round = 0; round < 5; round++) {
    flushSync(() => root.render(<div />));
    await nextPaint();
    const s = performance.now();
    flushSync(() => root.render(<Bench />));
    const commit = performance.now() - s;
    await nextPaint();
    mounts.push({ commit, paint: performance.now() - s });
  }
  (window as unknown as { benchResult: unknown }).benchResult = { rects, firstCommit, firstPaint, changes, mounts };
}

void run();
