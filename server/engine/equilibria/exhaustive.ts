import type { Network } from "../ensembles/ensemble";
import { createRng } from "../random/rng";
import { deflatedNewton } from "./deflation";
import { analyseEquilibrium } from "./equilibrium";
import { EquilibriumSet } from "./equilibrium-set";
import { refineEquilibrium } from "./newton";
import { normInf } from "../linalg/vector";

export interface ExhaustiveOptions {
  /** Random starts (uniform in the box). Default 40·N + 40. */
  starts?: number;
  /** Deflated attempts from each start after the plain one (stops at the first failure). Default 1. */
  restartsPerStart?: number;
  /** Half-width of the box of starts, in units of the estimated scale of f/μ. Default 5. */
  boxScale?: number;
  /** Explicit half-width of the box (overrides boxScale). */
  box?: number;
  /** Seed of the starts. Default 0. */
  seed?: number;
  /** Substream of the starts (e.g. the network index). Default 0. */
  stream?: number;
  /** Largest N accepted. Default 10. */
  maxN?: number;
  /** Relative merge distance. Default 1e-6. */
  mergeTol?: number;
  /** Newton iterations per attempt (plain and deflated). Default 15. */
  maxIterations?: number;
  /** Candidate points drawn per start; the starts are the candidates of smallest ‖F‖∞. Default 2. */
  oversample?: number;
}

export interface ExhaustiveResult {
  equilibria: EquilibriumSet;
  /** Half-width of the box searched. */
  box: number;
  starts: number;
  newtonIterations: number;
}

/**
 * Estimated per-component standard deviation of f(x) = F(x) + μx, sampled at 64 points
 * x ~ N(0, stateScale²): every equilibrium solves μx = f(x), so |x_i*| = |f_i(x*)|/μ, and for a
 * stationary field (the Gaussian field network) f_i has the same law at every x.
 */
function fieldScale(network: Network, seed: number, stream: number): number {
  const n = network.n;
  const rng = createRng(seed, 0x5ca1e, stream);
  const x = new Float64Array(n);
  const out = new Float64Array(n);
  let ss = 0;
  const samples = 64;
  for (let k = 0; k < samples; k++) {
    for (let i = 0; i < n; i++) x[i] = network.stateScale * rng.normal();
    network.rhs(x, out);
    for (let i = 0; i < n; i++) ss += (out[i] + network.mu * x[i]) ** 2;
  }
  return Math.sqrt(ss / (samples * n));
}

/**
 * Starts of the search: `oversample`·starts uniform points of the box, of which the `starts`
 * with the smallest ‖F‖∞ are kept (one evaluation each, far cheaper than a Newton attempt), in
 * order of increasing residual.
 */
function candidateStarts(network: Network, box: number, starts: number, oversample: number, seed: number, stream: number): Float64Array[] {
  if (!Number.isSafeInteger(oversample) || oversample < 1) throw new RangeError(`oversample must be a positive integer, got ${oversample}`);
  const n = network.n;
  const rng = createRng(seed, 0xe4a5, stream);
  const f = new Float64Array(n);
  const pool: { x: Float64Array; r: number; i: number }[] = [];
  for (let i = 0; i < starts * oversample; i++) {
    const x = Float64Array.from({ length: n }, () => box * (2 * rng.uniform() - 1));
    network.rhs(x, f);
    const r = normInf(f);
    pool.push({ x, r: Number.isFinite(r) ? r : Infinity, i });
  }
  pool.sort((a, b) => a.r - b.r || a.i - b.i);
  return pool.slice(0, starts).map((p) => p.x);
}

/**
 * Searches for all equilibria (stable and unstable) of a small network: deflated Newton
 * (Farrell, Birkisson & Funke, SIAM J. Sci. Comput. 37 (2015) A2026), after a plain damped
 * Newton attempt, from uniform random
 * starts in the box [−B, B]^N (the lowest-residual half of twice as many uniform points),
 * with further deflated attempts from the same start while they find new roots; every root is
 * polished by plain Newton, verified (‖F‖∞ < 1e-10), merged and analysed. The box: B =
 * boxScale · σ_f / μ with σ_f the sampled standard deviation of the components of f = F + μx
 * (equilibria satisfy x = f(x)/μ; with boxScale 5 a Gaussian f_i exceeds the box with
 * probability 6e-7 per component). Found counts are lower bounds of the true number.
 * @param network the system (N ≤ maxN)
 * @param options starts (40N + 40), oversample (2), restartsPerStart (1), maxIterations (15),
 *   boxScale (5) or box, seed (0), stream (0), maxN (10)
 * @returns the distinct verified equilibria with the box and effort
 * @throws RangeError when N > maxN or an option is out of range
 */
export function findAllEquilibria(network: Network, options: ExhaustiveOptions = {}): ExhaustiveResult {
  const n = network.n;
  const maxN = options.maxN ?? 10;
  if (n > maxN) throw new RangeError(`exhaustive search needs N ≤ ${maxN}, got N = ${n}`);
  const starts = options.starts ?? 40 * n + 40;
  if (!Number.isSafeInteger(starts) || starts < 1) throw new RangeError(`starts must be a positive integer, got ${starts}`);
  const seed = options.seed ?? 0;
  const box = options.box ?? (options.boxScale ?? 5) * (fieldScale(network, seed, options.stream ?? 0) / network.mu);
  if (!(box > 0) || !Number.isFinite(box)) throw new RangeError(`box must be positive and finite, got ${box}`);
  const set = new EquilibriumSet(options.mergeTol);
  const roots: Float64Array[] = [];
  const points = candidateStarts(network, box, starts, options.oversample ?? 2, seed, options.stream ?? 0);
  let iterations = 0;
  const maxIterations = options.maxIterations ?? 15;
  for (const x0 of points) {
    // Plain damped Newton first: it reaches the root whose basin holds x0, deflated or not.
    const plain = refineEquilibrium(network, x0, { maxIterations, maxHalvings: 6 });
    iterations += plain.iterations;
    if (plain.converged && set.find(plain.x) < 0) {
      set.add(analyseEquilibrium(network, plain.x, plain.residual));
      roots.push(plain.x);
    }
    for (let r = 0; r < (options.restartsPerStart ?? 1); r++) {
      const d = deflatedNewton(network, x0, roots, { bound: 4 * box, maxIterations });
      iterations += d.iterations;
      if (!d.converged) break;
      const polished = refineEquilibrium(network, d.x);
      iterations += polished.iterations;
      if (!polished.converged || set.find(polished.x) >= 0) break;
      set.add(analyseEquilibrium(network, polished.x, polished.residual));
      roots.push(polished.x);
    }
  }
  return { equilibria: set, box, starts, newtonIterations: iterations };
}
