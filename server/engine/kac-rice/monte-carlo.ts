import type { Estimate } from "../../../shared/schemas/theory";
import { createRng } from "../random/rng";
import { eigenvalues } from "../spectra/eigenvalues";
import { summarizeLogSamples, stableUpperBound } from "./estimate";
import type { LogIntegrateOptions } from "./log-integrate";
import { sampleShiftedJacobian, shiftDecomposition } from "./shift-decomposition";
import { integrateShift } from "./shift-integral";
import { prepareSpectrum } from "./spectrum";

/** Options of kacRiceRow. */
export interface KacRiceRowOptions {
  /** Number of units N ≥ 1. */
  N: number;
  /** Jacobian scale σ > 0 (μ_c = σ√N). */
  sigma: number;
  /** Asymmetry τ ∈ [0, 1]. */
  tau: number;
  /** Relaxation rates μ > 0 of the row (the matrices are shared by all of them). */
  mus: readonly number[];
  /** Number of sampled matrices K ≥ 2. */
  samples: number;
  /** Base seed (safe integer); sample k uses the stream (seed, KAC_RICE_STREAM, N, k). */
  seed: number;
  /** Quadrature over the shift (defaults of LogIntegrateOptions). */
  quadrature?: LogIntegrateOptions;
}

/** Finite-N Kac–Rice expectations at one μ. */
export interface KacRicePointResult {
  mu: number;
  /** m = μ/(σ√N). */
  m: number;
  total: Estimate;
  stable: Estimate & { upper95: number | null; logUpper95: number };
  samples: number;
}

/** Stream tag of the Kac–Rice samples (keeps them apart from the networks' own streams). */
export const KAC_RICE_STREAM = 0x4b52;

function checkRow(o: KacRiceRowOptions): void {
  if (!Number.isSafeInteger(o.N) || o.N < 1) throw new RangeError(`N must be a positive integer, got ${o.N}`);
  if (!(o.sigma > 0) || !Number.isFinite(o.sigma)) throw new RangeError(`sigma must be > 0, got ${o.sigma}`);
  if (!Number.isSafeInteger(o.samples) || o.samples < 2) throw new RangeError(`samples must be an integer ≥ 2, got ${o.samples}`);
  if (!Array.isArray(o.mus) || o.mus.length === 0) throw new TypeError("mus must be a non-empty array");
  for (const mu of o.mus) if (!(mu > 0) || !Number.isFinite(mu)) throw new RangeError(`mu must be > 0, got ${mu}`);
  if (!Number.isSafeInteger(o.seed)) throw new TypeError(`seed must be a safe integer, got ${o.seed}`);
}

/**
 * Finite-N Kac–Rice expectations of the Gaussian field network along a row of μ at fixed N, τ:
 * E N_tot = E|det(μ − J)|/μ^N and E N_st = E[det(μ − J) 1{max Re λ(J) < μ}]/μ^N (Kac–Rice,
 * exact at every N for this ensemble; Fyodorov & Khoruzhenko, PNAS 113 (2016) 6827). J is split
 * as J' + ξI (shift-decomposition.ts); K matrices J' are sampled and their eigenvalues computed
 * once for the whole row; the shift ξ is integrated by quadrature in log space for each μ
 * (shift-integral.ts); the outer average over J' is plain Monte Carlo, with standard errors.
 * Deterministic given the seed. Cost: K eigenvalue computations (~10N³ flops each) plus
 * K·|mus|·(a few hundred)·N logs/multiplies.
 * @param options see KacRiceRowOptions
 * @returns one result per μ, in the order of `mus`
 * @throws RangeError/TypeError naming a bad option
 */
export function kacRiceRow(options: KacRiceRowOptions): KacRicePointResult[] {
  checkRow(options);
  const { N, sigma, tau, mus, samples, seed } = options;
  const dec = shiftDecomposition(N, tau);
  const s = Math.sqrt(dec.shiftVariance);
  const logTotal = mus.map(() => new Float64Array(samples));
  const logStable = mus.map(() => new Float64Array(samples));
  const matrix = new Float64Array(N * N);
  for (let k = 0; k < samples; k++) {
    sampleShiftedJacobian(createRng(seed, KAC_RICE_STREAM, N, k), dec, matrix);
    const { re, im } = eigenvalues(matrix, N);
    const spec = prepareSpectrum(re, im);
    mus.forEach((mu, j) => {
      const r = integrateShift(spec, mu / sigma, s, options.quadrature);
      logTotal[j][k] = r.logTotal;
      logStable[j][k] = r.logStable;
    });
  }
  const muC = sigma * Math.sqrt(N);
  return mus.map((mu, j) => {
    const stable = summarizeLogSamples(logStable[j]);
    return {
      mu,
      m: mu / muC,
      total: summarizeLogSamples(logTotal[j]),
      stable: { ...stable, ...stableUpperBound(stable, logTotal[j]) },
      samples,
    };
  });
}

/**
 * kacRiceRow at a single μ (see there).
 * @param options as KacRiceRowOptions with one `mu` instead of `mus`
 * @returns the expectations at μ
 * @throws RangeError/TypeError naming a bad option
 */
export function kacRicePoint(
  options: Omit<KacRiceRowOptions, "mus"> & { mu: number },
): KacRicePointResult {
  const { mu, ...rest } = options;
  return kacRiceRow({ ...rest, mus: [mu] })[0];
}
