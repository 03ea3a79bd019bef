// Calibrates the cost model of server/modules/maps/maps.estimate.ts (benchmark, not a test):
// runs a "quiet" cell (one stable state predicted) and a "busy" cell (runs that do not settle)
// of each ensemble at two sizes on one thread, after a warm-up, and fits seconds per run through
// the two points as a + b × size^p (size: rate N², field M·N with M = 40·N). Rate: p = 1 (the
// matrix-vector product dominates and evaluations per run hardly change with N); field: p from
// the two points (evaluations per run grow with N too), a = 0. Copy the printed figures into
// COST_MODEL. Run: node --import tsx scripts/bench-estimate.ts (~30 s).
import { runCell } from "../server/engine/cell/run-cell";
import type { CellInput } from "../shared/schemas/cell-result";

interface Probe {
  seconds: number;
  evalsPerRun: number;
  secondsPerRun: number;
}

function probe(ensemble: string, params: Record<string, unknown>, mu: number, tau: number, networks: number, starts: number): Probe {
  const input: CellInput = { ensemble, params, mu, tau, seed: 1, budget: { networks, starts, tMax: 200, rtol: 1e-6, atol: 1e-9 } };
  const t0 = performance.now();
  const r = runCell(input);
  const seconds = (performance.now() - t0) / 1000;
  const runs = networks * starts;
  return { seconds, evalsPerRun: r.counters.evaluations / runs, secondsPerRun: seconds / runs };
}

/** a + b·size^p through two (size, seconds per run) points: p = 1 (line, a ≥ 0) or a power law (a = 0). */
function fit(sizes: [number, number], p: [Probe, Probe], power: boolean) {
  const [y0, y1] = [p[0].secondsPerRun, p[1].secondsPerRun];
  if (power) {
    const e = Math.log(y1 / y0) / Math.log(sizes[1] / sizes[0]);
    return { a: 0, b: y0 / sizes[0] ** e, p: e };
  }
  const b = (y1 - y0) / (sizes[1] - sizes[0]);
  return { a: Math.max(0, y0 - b * sizes[0]), b, p: 1 };
}

const fmt = (f: { a: number; b: number; p: number }) => `{ a: ${f.a.toExponential(2)}, b: ${f.b.toExponential(2)}, p: ${f.p.toFixed(2)} }`;

function report(name: string, sizes: [number, number], quiet: [Probe, Probe], busy: [Probe, Probe]) {
  const power = name === "field";
  console.log(`${name}: quiet ${fmt(fit(sizes, quiet, power))}, busy ${fmt(fit(sizes, busy, power))} (seconds per run = a + b × size^p)`);
  for (const [label, p] of [["quiet small", quiet[0]], ["quiet large", quiet[1]], ["busy small", busy[0]], ["busy large", busy[1]]] as const) {
    console.log(`  ${label}: ${p.seconds.toFixed(2)} s, ${p.evalsPerRun.toFixed(0)} evals/run, ${p.secondsPerRun.toExponential(2)} s/run`);
  }
}

probe("rate", { N: 20, g: 1 }, 0.5, 0.5, 2, 8); // warm-up: the JIT compiles the hot loops first

const rateQuiet: [Probe, Probe] = [probe("rate", { N: 6, g: 1 }, 2, 0.5, 2, 8), probe("rate", { N: 100, g: 1 }, 2, 0.5, 2, 8)];
const rateBusy: [Probe, Probe] = [probe("rate", { N: 6, g: 1 }, 0.5, 0, 2, 8), probe("rate", { N: 100, g: 1 }, 0.5, 0, 2, 8)];
report("rate", [36, 10_000], rateQuiet, rateBusy);

const fieldQuiet: [Probe, Probe] = [probe("field", { N: 6 }, 6, 0.5, 2, 8), probe("field", { N: 20 }, 6, 0.5, 2, 8)];
const fieldBusy: [Probe, Probe] = [probe("field", { N: 6 }, 1, 0.5, 2, 8), probe("field", { N: 20 }, 2, 0.5, 2, 8)];
report("field", [6 * 240, 20 * 800], fieldQuiet, fieldBusy);

const t0 = performance.now();
runCell({ ensemble: "rate", params: { N: 8, g: 1 }, mu: 0.5, tau: 0.5, seed: 1, budget: { networks: 2, starts: 8, tMax: 200, rtol: 1e-6, atol: 1e-9, exhaustive: true } });
const withSearch = (performance.now() - t0) / 1000;
const plain = probe("rate", { N: 8, g: 1 }, 0.5, 0.5, 2, 8).seconds;
console.log(`exhaustive search at N = 8: ${((withSearch - plain) / 2).toFixed(3)} s per network`);
