import type { Network } from "../ensembles/ensemble";
import { createRng } from "../random/rng";
import { deflatedNewton } from "./deflation";
import { analyseEquilibrium } from "./equilibrium";
import { EquilibriumSet } from "./equilibrium-set";
import { refineEquilibrium } from "./newton";

export interface ExhaustiveOptions {
  /** Random starts (uniform in the box). Default 40·N + 40. */
  starts?: number;
  /** Further deflated restarts from the same start after each new root. Default 1. */
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
  /** Deflated Newton iterations per attempt. Default 30. */
  maxIterations?: number;
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
 * Searches for all equilibria (stable and unstable) of a small network: deflated Newton
 * (Farrell, Birkisson & Funke, SIAM J. Sci. Comput. 37 (2015) A2026) from uniform random
 * starts in the box [−B, B]^N, restarting from the same start after each new root; every root is
 * polished by plain Newton, verified (‖F‖∞ < 1e-10), merged and analysed. The box: B =
 * boxScale · σ_f / μ with σ_f the sampled standard deviation of the components of f = F + μx
 * (equilibria satisfy x = f(x)/μ; with boxScale 5 a Gaussian f_i exceeds the box with
 * probability 6e-7 per component). Found counts are lower bounds of the true number.
 * @param network the system (N ≤ maxN)
 * @param options starts (40N + 40), restartsPerStart (4), boxScale (5) or box, seed (0), maxN (10)
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
  const rng = createRng(seed, 0xe4a5, options.stream ?? 0);
  const x0 = new Float64Array(n);
  let iterations = 0;
  for (let s = 0; s < starts; s++) {
    for (let i = 0; i < n; i++) x0[i] = box * (2 * rng.uniform() - 1);
    for (let r = 0; r <= (options.restartsPerStart ?? 1); r++) {
      const d = deflatedNewton(network, x0, roots, { bound: 4 * box, maxIterations: options.maxIterations ?? 30 });
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
