import { writeFileSync } from "node:fs";
import { rateNetworkFromMatrix } from "../ensembles/rate/rate-network";
import { runStarts, type NetworkRun } from "../equilibria/run-starts";
import { CliError, parseOptions, positiveOption, requiredOption } from "./args";
import { loadArray } from "./load-array";

/** Output of `engine equilibria` (the format of issue 3). */
export interface EquilibriaReport {
  equilibria: { x: number[]; stable: boolean; index: number; maxRealPart: number; basinShare: number }[];
  runs: { settled: number; unsettled: number; escaped: number };
  wallSeconds: number;
}

const OPTIONS = ["couplings", "starts", "mu", "input", "rtol", "atol", "tmax", "out"] as const;

/** The settings of one `equilibria` invocation, loaded and checked. */
export interface EquilibriaJob {
  j: Float64Array;
  n: number;
  starts: Float64Array[];
  mu: number;
  input: Float64Array | number;
  rtol: number;
  atol: number;
  tMax: number;
  out: string | null;
}

/**
 * Reads the options of `equilibria`: --couplings (N×N .npy/.json), --starts (S×N, or one start
 * of length N), --mu, optional --input (length-N file or one number), --rtol, --atol, --tmax,
 * --out.
 * @throws CliError naming the bad option or file
 */
export function loadEquilibriaJob(argv: string[], requireOut = true, extra: readonly string[] = []): EquilibriaJob {
  const o = parseOptions(argv, [...OPTIONS, ...extra]);
  const J = loadArray(requiredOption(o, "couplings"));
  if (J.shape.length !== 2 || J.shape[0] !== J.shape[1]) throw new CliError(`--couplings must be a square matrix, got shape (${J.shape.join(", ")})`);
  const n = J.shape[0];
  const X = loadArray(requiredOption(o, "starts"));
  const cols = X.shape.length === 1 ? X.shape[0] : X.shape[1];
  if (cols !== n) throw new CliError(`--starts rows must have length N = ${n}, got ${cols}`);
  const count = X.shape.length === 1 ? 1 : X.shape[0];
  const starts = Array.from({ length: count }, (_, i) => X.data.slice(i * n, (i + 1) * n));
  let input: Float64Array | number = 0;
  const rawInput = o.get("input");
  if (rawInput !== undefined) {
    if (Number.isFinite(Number(rawInput))) input = Number(rawInput);
    else {
      const I = loadArray(rawInput);
      if (I.shape.length !== 1 || I.shape[0] !== n) throw new CliError(`--input must be a vector of length N = ${n}`);
      input = I.data;
    }
  }
  return {
    j: J.data,
    n,
    starts,
    mu: positiveOption(o, "mu"),
    input,
    rtol: positiveOption(o, "rtol", 1e-6),
    atol: positiveOption(o, "atol", 1e-9),
    tMax: positiveOption(o, "tmax", 200),
    out: requireOut ? requiredOption(o, "out") : o.get("out") ?? null,
  };
}

/** The report of a finished run, every distinct verified equilibrium reached. */
export function reportOf(run: NetworkRun, wallSeconds: number): EquilibriaReport {
  const S = run.outcomes.length;
  const settled = run.outcomes.filter((r) => r.class === "settled").length;
  const escaped = run.outcomes.filter((r) => r.class === "escaping").length;
  return {
    equilibria: run.equilibria.items.map((e, i) => ({
      x: Array.from(e.x),
      stable: e.stable,
      index: e.index,
      maxRealPart: e.maxRealPart,
      basinShare: run.equilibria.hits[i] / S,
    })),
    runs: { settled, unsettled: S - settled - escaped, escaped },
    wallSeconds,
  };
}

/**
 * `engine equilibria`: the rate network dx/dt = −μx + J tanh(x) + I from the given starts,
 * through the engine's run loop (integrate → nearly still → Newton → verify → merge), written
 * as JSON to --out.
 * @throws CliError on bad options or files
 */
export function equilibriaCommand(argv: string[]): void {
  const job = loadEquilibriaJob(argv);
  const t0 = performance.now();
  const network = rateNetworkFromMatrix(job.j, job.mu, job.input);
  const run = runStarts(network, job.starts, { rtol: job.rtol, atol: job.atol, tMax: job.tMax });
  const report = reportOf(run, (performance.now() - t0) / 1000);
  try {
    writeFileSync(job.out!, JSON.stringify(report) + "\n");
  } catch {
    throw new CliError(`cannot write ${job.out}`);
  }
}
