// Engine benchmark (prints figures; not a test). `npm run bench:engine [-- options]`
//   (no options)            rate network N = 50, 100, 200 and field network N = 10, 20, 40:
//                           trajectories/s, RHS evaluations/s, RHS GFLOP/s, one cell serial and pooled
//                           (--only rate | --only field for one ensemble)
//   --compare-scipy         the scipy reference (scripts/reference/scipy_rk45_cell.py, N = 100,
//                           32 starts) against our serial and all-core runs on the same J and starts
//   --compare-methods       dopri5 against odex on the rate network, N = 50 and 100
//   --couplings J.npy --starts X0.npy --mu 1 [--input I.npy] [--out eq.json] [--threads 2]
//                           our run on given files (.npy or JSON), equilibria written as JSON
import { execFileSync } from "node:child_process";
import { mkdtempSync, writeFileSync } from "node:fs";
import { availableParallelism, loadavg, tmpdir } from "node:os";
import { join } from "node:path";
import { getEnsemble } from "../server/engine/ensembles/registry";
import { rateNetworkFromMatrix } from "../server/engine/ensembles/rate/rate-network";
import type { Network } from "../server/engine/ensembles/ensemble";
import { runStarts, type RunStartsOptions } from "../server/engine/equilibria/run-starts";
import { batchedSystem } from "../server/engine/integrate/batched-system";
import { runCell } from "../server/engine/cell/run-cell";
import { drawStart } from "../server/engine/cell/run-network";
import { createEnginePool, runCellParallel, runRateStartsParallel, type EnginePool } from "../server/engine/pool/engine-pool";
import type { ShareTiming } from "../server/engine/pool/starts-task";
import { loadEquilibriaJob, reportOf } from "../server/engine/cli/equilibria-command";
import type { CellInput } from "../shared/schemas/cell-result";

const seconds = (t0: number) => (performance.now() - t0) / 1000;
/** CPU seconds of this process (all its threads) since c0: immune to other processes' load. */
const cpuSince = (c0: NodeJS.CpuUsage) => {
  const c = process.cpuUsage(c0);
  return (c.user + c.system) / 1e6;
};
const fmt = (v: number, d = 2) => v.toFixed(d);

/** RHS-only throughput of the batched system (8 states per call), in GFLOP/s. */
function rhsGflops(network: Network): number {
  const sys = batchedSystem(network);
  const n = network.n;
  const B = 8;
  const xs = Float64Array.from({ length: B * n }, (_, i) => Math.sin(i));
  const out = new Float64Array(B * n);
  const reps = Math.max(20, Math.round(2e8 / (network.rhsFlops * B)));
  const t0 = performance.now();
  for (let r = 0; r < reps; r++) {
    if (sys.rhsBatch) sys.rhsBatch(xs, out, B);
    else for (let b = 0; b < B; b++) network.rhs(xs.subarray(b * n, (b + 1) * n), out.subarray(b * n, (b + 1) * n));
  }
  return (reps * B * network.rhsFlops) / seconds(t0) / 1e9;
}

function runFigures(label: string, network: Network, starts: Float64Array[], options: RunStartsOptions = {}): void {
  runStarts(network, starts.slice(0, 8), options); // warm-up (JIT, SIMD tier-up)
  const t0 = performance.now();
  const c0 = process.cpuUsage();
  const run = runStarts(network, starts, options);
  const t = seconds(t0);
  const cpu = cpuSince(c0);
  const evals = run.counters.evaluations + run.counters.probeEvaluations * 2;
  const classes = Object.entries(run.outcomes.reduce<Record<string, number>>((a, o) => ((a[o.class] = (a[o.class] ?? 0) + 1), a), {}));
  console.log(
    `${label}: ${starts.length} runs in ${fmt(t, 3)} s (CPU ${fmt(cpu, 3)} s) → ${fmt(starts.length / t, 1)} trajectories/s, ` +
      `${fmt(evals / t / 1e3, 1)}k RHS/s, ${fmt((evals * network.rhsFlops) / t / 1e9)} GFLOP/s in integration ` +
      `(RHS alone ${fmt(rhsGflops(network))} GFLOP/s); ${run.equilibria.size} equilibria; ${classes.map(([k, v]) => `${k} ${v}`).join(", ")}`,
  );
}

async function cellFigures(pool: EnginePool, input: CellInput): Promise<void> {
  const t0 = performance.now();
  let c0 = process.cpuUsage();
  const serial = runCell(input);
  const ts = seconds(t0);
  const cs = cpuSince(c0);
  c0 = process.cpuUsage();
  const parallel = await runCellParallel(pool, input);
  const cp = cpuSince(c0);
  const same = JSON.stringify({ ...serial, timing: null }) === JSON.stringify({ ...parallel, timing: null });
  console.log(
    `  cell ${input.budget.networks} networks × ${input.budget.starts} starts: serial ${fmt(ts, 3)} s, ` +
      `pool of ${pool.threads} ${fmt(parallel.timing.wallSeconds, 3)} s (×${fmt(ts / parallel.timing.wallSeconds)}), identical: ${same}; ` +
      `CPU serial ${fmt(cs, 3)} s, pool ${fmt(cp, 3)} s in all threads`,
  );
}

async function standard(pool: EnginePool, only: string | undefined): Promise<void> {
  const base = { ensemble: "rate", mu: 1, tau: 0.5, seed: 1, budget: { networks: 8, starts: 16, tMax: 200, rtol: 1e-6, atol: 1e-9 } };
  for (const N of only === "field" ? [] : [50, 100, 200]) {
    const input: CellInput = { ...base, params: { N, g: 2 } };
    const ens = getEnsemble("rate");
    const net = ens.build(input.params, ens.draw(input.params, 1, 0), 1, 0.5);
    runFigures(`rate N=${N} g=2 τ=0.5`, net, Array.from({ length: 32 }, (_, s) => drawStart(input, N, 0, s, net.stateScale)));
    await cellFigures(pool, input);
  }
  for (const N of only === "rate" ? [] : [10, 20, 40]) {
    // the field's RHS costs O(M·N) with M = 40N sines: a smaller cell keeps the benchmark short
    const input: CellInput = { ...base, ensemble: "field", params: { N }, mu: 0.7 * Math.sqrt(N), budget: { ...base.budget, networks: 4, starts: 8 } };
    const ens = getEnsemble("field");
    const net = ens.build(input.params, ens.draw(input.params, 1, 0), input.mu, 0.5);
    runFigures(`field N=${N} M=${40 * N} m=0.7 τ=0.5`, net, Array.from({ length: 32 }, (_, s) => drawStart(input, N, 0, s, net.stateScale)));
    await cellFigures(pool, input);
  }
}

const median = (v: number[]) => [...v].sort((a, b) => a - b)[v.length >> 1];

/** Per worker thread of one pooled run: tasks, wall seconds inside tasks, thread CPU seconds. */
function perThread(shares: ShareTiming[]): string {
  const by = new Map<number, { tasks: number; wall: number; cpu: number | null }>();
  for (const s of shares) {
    const e = by.get(s.threadId) ?? { tasks: 0, wall: 0, cpu: 0 };
    e.tasks += 1;
    e.wall += s.wallSeconds;
    e.cpu = e.cpu === null || s.cpuSeconds === null ? null : e.cpu + s.cpuSeconds;
    by.set(s.threadId, e);
  }
  const rows = [...by.entries()].sort((a, b) => a[0] - b[0]);
  return rows.map(([id, e]) => `thread ${id}: ${e.tasks} tasks, wall ${fmt(e.wall, 3)} s, CPU ${e.cpu === null ? "n/a" : fmt(e.cpu, 3) + " s"}`).join("; ");
}

/** The scipy reference and our runs on the same J and starts, alternated 3 times (medians). */
async function compareScipy(pool: EnginePool): Promise<void> {
  const dir = mkdtempSync(join(tmpdir(), "eqb-bench-"));
  const scipyRun = () => {
    const out = execFileSync("python3", ["scripts/reference/scipy_rk45_cell.py", "--n", "100", "--starts", "32", "--write", "--dir", dir], { encoding: "utf8" });
    return JSON.parse(out.trim().split("\n").pop()!);
  };
  let ref = scipyRun();
  const job = loadEquilibriaJob(["--couplings", join(dir, "J.npy"), "--starts", join(dir, "X0.npy"), "--mu", "1"], false);
  const net = rateNetworkFromMatrix(job.j, 1);
  let par = await runRateStartsParallel(pool, job.j, 1, 0, job.starts); // warm the workers
  const shareLists = () => [] as ShareTiming[][];
  const times = { scipy: [] as number[], scipyCpu: [] as number[], serial: [] as number[], pool: [] as number[], serialCpu: [] as number[], poolCpu: [] as number[], shares: shareLists() };
  const probeOff = { lyapunovAt: 0 };
  let serial = runStarts(net, job.starts);
  const timesOff = { serial: [] as number[], pool: [] as number[], serialCpu: [] as number[], poolCpu: [] as number[], shares: shareLists() };
  for (let rep = 0; rep < 3; rep++) {
    ref = scipyRun();
    times.scipy.push(ref.wallSeconds);
    times.scipyCpu.push(ref.cpuSeconds);
    for (const [opts, into] of [[{}, times], [probeOff, timesOff]] as const) {
      let t0 = performance.now();
      const c0 = process.cpuUsage();
      serial = runStarts(net, job.starts, opts);
      into.serial.push(seconds(t0));
      into.serialCpu.push(cpuSince(c0));
      t0 = performance.now();
      const p0 = process.cpuUsage();
      par = await runRateStartsParallel(pool, job.j, 1, 0, job.starts, opts);
      into.pool.push(seconds(t0));
      into.poolCpu.push(cpuSince(p0));
      into.shares.push(par.shareTimings);
    }
  }
  const s = median(times.scipy);
  const rep = (r: typeof serial) => JSON.stringify(reportOf(r, 0).runs);
  console.log(`median of 3 alternated runs (N = 100, 32 starts, rtol 1e-6, atol 1e-9, t ≤ 200, still at 1e-5; 1-min load average ${fmt(loadavg()[0])} on ${availableParallelism()} cores):`);
  const sc = median(times.scipyCpu);
  console.log(`scipy (${ref.source}): ${fmt(s, 3)} s (CPU ${fmt(sc, 3)} s), ${ref.evaluations} evaluations, runs ${JSON.stringify(ref.runs)}, ${ref.distinct} distinct`);
  for (const [label, t] of [["with Lyapunov probes", times], ["without probes (scipy's work)", timesOff]] as const) {
    const [a, b, ac] = [median(t.serial), median(t.pool), median(t.serialCpu)];
    console.log(
      `ours ${label}: serial ${fmt(a, 3)} s (${fmt(s / a)}× scipy), ${pool.threads} threads ${fmt(b, 3)} s (${fmt(s / b)}× scipy); ` +
        `CPU serial ${fmt(ac, 3)} s (${fmt(sc / ac)}× scipy's CPU; ideal on ${pool.threads} cores ${fmt((pool.threads * sc) / ac)}×)`,
    );
    console.log(`  pool, median run: CPU ${fmt(median(t.poolCpu), 3)} s in all threads; ${perThread(t.shares[t.pool.indexOf(b)])}`);
  }
  console.log(`ours: ${serial.counters.evaluations} evaluations, runs ${rep(serial)} (${rep(par)} on the pool), ${serial.equilibria.size} distinct`);
}

function compareMethods(): void {
  for (const N of [50, 100]) {
    const ens = getEnsemble("rate");
    const input: CellInput = { ensemble: "rate", params: { N, g: 2 }, mu: 1, tau: 0.5, seed: 2, budget: { networks: 1, starts: 32, tMax: 200, rtol: 1e-6, atol: 1e-9 } };
    const net = ens.build(input.params, ens.draw(input.params, 2, 0), 1, 0.5);
    const starts = Array.from({ length: 32 }, (_, s) => drawStart(input, N, 0, s, net.stateScale));
    for (const method of ["dopri5", "odex"] as const) runFigures(`N=${N} ${method}`, net, starts, { method, lyapunovAt: 0 });
  }
}

async function onFiles(argv: string[], pool: EnginePool): Promise<void> {
  const job = loadEquilibriaJob(argv, false, ["threads"]);
  const t0 = performance.now();
  const run = await runRateStartsParallel(pool, job.j, job.mu, job.input, job.starts, { rtol: job.rtol, atol: job.atol, tMax: job.tMax });
  const report = reportOf(run, seconds(t0));
  console.log(`N=${job.n}, ${job.starts.length} starts on ${pool.threads} threads: ${fmt(report.wallSeconds, 3)} s, runs ${JSON.stringify(report.runs)}, ${report.equilibria.length} distinct`);
  if (job.out) writeFileSync(job.out, JSON.stringify(report) + "\n");
}

async function main(): Promise<void> {
  const argv = process.argv.slice(2);
  const ti = argv.indexOf("--threads");
  const threads = ti >= 0 ? Number(argv[ti + 1]) : availableParallelism();
  const pool = createEnginePool({ threads });
  try {
    await pool.warm(); // thread start-up, tsx and JIT kept out of every timed region, as in a long-lived worker
    if (argv.includes("--compare-scipy")) await compareScipy(pool);
    else if (argv.includes("--compare-methods")) compareMethods();
    else if (argv.includes("--couplings")) await onFiles(argv, pool);
    else {
      const oi = argv.indexOf("--only");
      await standard(pool, oi >= 0 ? argv[oi + 1] : undefined);
    }
  } finally {
    await pool.close();
  }
}

await main();
