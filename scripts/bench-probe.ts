// Probe search throughput (a benchmark, not a test): `node --import tsx scripts/bench-probe.ts [N…]`.
// For each N, a rate-ensemble matrix (g = 1.5, τ = 0.4, μ = 1) is searched from 16 starts on a
// probe pool of 2 threads, without comparison networks; prints wall time, right-hand-side
// evaluations per start, and the search work N² × starts per minute, the unit of the work limit
// probeLimits.maxSearchWork (shared/schemas/probes.ts).
import { probeSearchSchema } from "../shared/schemas/probes";
import { rateCouplings, rateEnsemble } from "../server/engine/ensembles/rate/rate.ensemble";
import { matrixStats } from "../server/modules/probes/analysis/matrix-stats";
import { createProbePool, sharedMatrix } from "../server/modules/probes/probe.pool";
import { runProbeSearch } from "../server/modules/probes/probe-search";

const sizes = process.argv.slice(2).map(Number).filter((n) => n > 0);
const pool = createProbePool({ threads: 2 });
const starts = 16;
for (const n of sizes.length ? sizes : [100, 300, 600]) {
  const params = rateEnsemble.validate({ N: n, g: 1.5 });
  const J = rateCouplings(params, rateEnsemble.draw(params, 1, 0), 0.4);
  const settings = probeSearchSchema.parse({ starts, compareNetworks: 0 });
  const t0 = performance.now();
  const out = await runProbeSearch(pool, { couplings: sharedMatrix(J), n, mu: 1, nonlinearity: "tanh", input: null, stats: matrixStats(J, n) }, settings);
  const seconds = (performance.now() - t0) / 1000;
  const perStart = out.merged.result.counters.evaluations / starts;
  console.log(`N=${n} starts=${starts} threads=2: ${seconds.toFixed(1)} s, ${perStart.toFixed(0)} evaluations/start, work N²·S per minute = ${((n * n * starts) / (seconds / 60)).toExponential(2)}, distinct equilibria ${out.merged.result.equilibria.length}`);
}
await pool.close();
