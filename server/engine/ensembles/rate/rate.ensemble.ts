import type { Ensemble } from "../ensemble";
import { assertFinite, assertPositive, assertPositiveInteger } from "../checks";
import { networkStream } from "../../random/rng";
import { assertTau, combineElliptic } from "../../spectra/elliptic";
import { getNonlinearity, type NonlinearityId } from "./nonlinearity";
import { rateNetworkFromMatrix, type RateNetwork } from "./rate-network";

/** Parameters of the rate ensemble. */
export interface RateParams {
  /** Number of units N ≥ 1. */
  N: number;
  /** Coupling gain g > 0: off-diagonal couplings have variance g²/N. */
  g: number;
  /** Transfer function φ (default "tanh"). */
  nonlinearity?: NonlinearityId;
  /** Constant input I added to every unit (default 0). */
  input?: number;
}

/** Common random numbers of one rate network: iid standard normal G and H, row-major N×N. */
export interface RateDraws {
  readonly n: number;
  readonly G: Float64Array;
  readonly H: Float64Array;
}

function checkDraws(params: RateParams, draws: RateDraws): void {
  const size = params.N * params.N;
  if (draws.n !== params.N || draws.G.length !== size || draws.H.length !== size) {
    throw new RangeError(`draws are for N = ${draws.n}, but params.N = ${params.N}`);
  }
}

/**
 * Couplings J = (g/√N)(c_s S + c_a A), S = (G+Gᵀ)/√2, A = (H−Hᵀ)/√2, c_s = √((1+τ)/2),
 * c_a = √((1−τ)/2) (science.md §2): off-diagonal variance g²/N, corr(J_ij, J_ji) = τ, diagonal
 * variance g²(1+τ)/N; eigenvalues fill the ellipse of semi-axes g(1+τ), g(1−τ) for large N
 * (Sommers, Crisanti, Sompolinsky & Stein, PRL 60 (1988) 1895).
 * @param params validated rate parameters
 * @param draws the network's G, H
 * @param tau asymmetry τ ∈ [0, 1]
 * @returns a new row-major N×N array
 * @throws RangeError on a bad τ or draws of another N
 */
export function rateCouplings(params: RateParams, draws: RateDraws, tau: number): Float64Array {
  assertTau(tau);
  checkDraws(params, draws);
  const n = params.N;
  return combineElliptic(draws.G, draws.H, n, tau, params.g / Math.sqrt(n), new Float64Array(n * n));
}

/**
 * The rate network ensemble dx/dt = −μx + J φ(x) + I (science.md §2). μ_c = g: the τ = 0
 * transition to chaos at g/μ = 1 (Sompolinsky, Crisanti & Sommers, PRL 61 (1988) 259); for
 * τ > 0 the origin (I = 0) loses stability on the line μ = g(1+τ), the elliptic-law edge.
 */
export const rateEnsemble: Ensemble<RateParams, RateDraws> = {
  id: "rate",
  version: "1",
  label: "Rate network (random couplings, tanh units)",
  validate(params) {
    if (params === null || typeof params !== "object") {
      throw new TypeError(`params must be an object, got ${String(params)}`);
    }
    const nonlinearity = params.nonlinearity ?? "tanh";
    getNonlinearity(nonlinearity);
    return {
      N: assertPositiveInteger("N", params.N),
      g: assertPositive("g", params.g),
      nonlinearity,
      input: assertFinite("input", params.input ?? 0),
    };
  },
  dimension: (params) => assertPositiveInteger("N", params.N),
  draw(params, seed, k) {
    const n = assertPositiveInteger("N", params.N);
    const rng = networkStream("rate", seed, k, n);
    const G = new Float64Array(n * n);
    const H = new Float64Array(n * n);
    rng.fillNormal(G);
    rng.fillNormal(H);
    return { n, G, H };
  },
  build(params, draws, mu, tau): RateNetwork {
    const p = rateEnsemble.validate(params);
    assertPositive("mu", mu);
    return rateNetworkFromMatrix(rateCouplings(p, draws, tau), mu, p.input, p.nonlinearity);
  },
  muCritical: (params) => assertPositive("g", params.g),
  couplings(params, draws, _mu, tau) {
    return rateCouplings(rateEnsemble.validate(params), draws, tau);
  },
};
