import type { Ensemble } from "../ensemble";
import { assertPositive, assertPositiveInteger } from "../checks";
import { assertTau } from "../../spectra/elliptic";
import { drawFieldFeatures, type FieldDraws } from "./field-draws";
import { FieldNetwork } from "./field-network";

/** Parameters of the Gaussian field ensemble. */
export interface FieldParams {
  /** Dimension N ≥ 1. */
  N: number;
  /** Jacobian scale σ > 0 (default 1): σ² = (v² + a²)/ℓ⁴. */
  sigma?: number;
  /** Number of random Fourier features M (default 40·N). */
  features?: number;
  /** Correlation length ℓ > 0 of Γ(r²) = exp(−r²/(2ℓ²)) (default 1). */
  lengthScale?: number;
}

/** Largest M·N accepted (three M×N arrays of doubles, 240 MB). */
export const MAX_FEATURE_ENTRIES = 10_000_000;

function checkDraws(p: Required<FieldParams>, draws: FieldDraws): void {
  if (draws.n !== p.N || draws.m !== p.features) {
    throw new RangeError(
      `draws are for N = ${draws.n}, M = ${draws.m}, but params give N = ${p.N}, M = ${p.features}`,
    );
  }
}

/**
 * The Gaussian field network dx/dt = −μx − ∇V + (1/√N)∇·A (Fyodorov & Khoruzhenko, PNAS 113
 * (2016) 6827; Ben Arous, Fyodorov & Khoruzhenko, PNAS 118 (2021) e2023719118), sampled with M
 * random Fourier features (science.md §1). At (μ, τ): v² = τσ²ℓ⁴, a² = (1−τ)σ²ℓ⁴, so the
 * Jacobian of f has E[J_im J_nk] = σ²[(1+ε_N)δ_in δ_mk + (τ−ε_N)(δ_ik δ_mn + δ_im δ_nk)],
 * ε_N = (1−τ)/N, for every M. μ_c = σ√N. stateScale = σℓ/μ: each component of f has standard
 * deviation σℓ√(1−ε_N), and an equilibrium solves μx = f(x).
 */
export const fieldEnsemble: Ensemble<FieldParams, FieldDraws> = {
  id: "field",
  version: "1",
  label: "Gaussian field network (gradient + divergence-free parts)",
  validate(params) {
    if (params === null || typeof params !== "object") {
      throw new TypeError(`params must be an object, got ${String(params)}`);
    }
    const N = assertPositiveInteger("N", params.N);
    const features = assertPositiveInteger("features", params.features ?? 40 * N);
    if (features * N > MAX_FEATURE_ENTRIES) {
      throw new RangeError(`features × N must be at most ${MAX_FEATURE_ENTRIES}, got ${features * N}`);
    }
    return {
      N,
      sigma: assertPositive("sigma", params.sigma ?? 1),
      features,
      lengthScale: assertPositive("lengthScale", params.lengthScale ?? 1),
    } satisfies Required<FieldParams>;
  },
  dimension: (params) => assertPositiveInteger("N", params.N),
  draw(params, seed, k) {
    const p = fieldEnsemble.validate(params) as Required<FieldParams>;
    return drawFieldFeatures(p.N, p.features, p.lengthScale, seed, k);
  },
  build(params, draws, mu, tau) {
    const p = fieldEnsemble.validate(params) as Required<FieldParams>;
    assertPositive("mu", mu);
    assertTau(tau);
    checkDraws(p, draws);
    const l2 = p.lengthScale * p.lengthScale;
    const v = p.sigma * l2 * Math.sqrt(tau);
    const a = p.sigma * l2 * Math.sqrt(1 - tau);
    const root = Math.sqrt(2 / p.features);
    const weights = { alpha: v * root, beta: (a / Math.sqrt(p.N)) * root };
    return new FieldNetwork(mu, weights, draws, (p.sigma * p.lengthScale) / mu);
  },
  muCritical(params) {
    const p = fieldEnsemble.validate(params);
    return (p.sigma ?? 1) * Math.sqrt(p.N);
  },
};
