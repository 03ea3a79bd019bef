import type { Network } from "../ensemble";
import type { FieldDraws } from "./field-draws";

/** Weights of the two parts of the field: f = α Σ sin(θ_k) w_k − β Σ sin(θ'_k) u_k. */
export interface FieldWeights {
  /** α = v √(2/M), v the potential's amplitude. */
  readonly alpha: number;
  /** β = (a/√N) √(2/M), a the antisymmetric field's amplitude. */
  readonly beta: number;
}

/**
 * dx/dt = −μx + f(x), f = −∇V + (1/√N)∇·A with random Fourier features (science.md §1):
 * f(x) = α Σ_k sin(w_k·x + φ_k) w_k − β Σ_k sin(w'_k·x + φ'_k) u_k,
 * ∂f_i/∂x_m = α Σ_k cos(θ_k) w_ki w_km − β Σ_k cos(θ'_k) u_ki w'_km.
 * rhs costs 4MN + M (+ 2N) flops per active part and allocates nothing; a part whose weight
 * is zero (τ = 0 or τ = 1) is skipped.
 */
export class FieldNetwork implements Network {
  readonly n: number;
  readonly rhsFlops: number;

  constructor(
    readonly mu: number,
    readonly weights: FieldWeights,
    readonly draws: FieldDraws,
    readonly stateScale: number,
  ) {
    this.n = draws.n;
    const parts = (weights.alpha !== 0 ? 1 : 0) + (weights.beta !== 0 ? 1 : 0);
    // Per part: M dot products (2MN), M sines (counted as one flop each), M axpys (2MN).
    this.rhsFlops = parts * (4 * draws.m * draws.n + draws.m) + 2 * draws.n;
  }

  rhs(x: Float64Array, out: Float64Array): void {
    const { n, mu } = this;
    for (let i = 0; i < n; i++) out[i] = -mu * x[i];
    const { w, phase, wA, phaseA, u, m } = this.draws;
    if (this.weights.alpha !== 0) addSineSum(x, w, phase, w, this.weights.alpha, n, m, out);
    if (this.weights.beta !== 0) addSineSum(x, wA, phaseA, u, -this.weights.beta, n, m, out);
  }

  jacobian(x: Float64Array, out: Float64Array): void {
    const { n, mu } = this;
    out.fill(0);
    for (let i = 0; i < n; i++) out[i * n + i] = -mu;
    const { w, phase, wA, phaseA, u, m } = this.draws;
    if (this.weights.alpha !== 0) addCosineOuter(x, w, phase, w, this.weights.alpha, n, m, out);
    if (this.weights.beta !== 0) addCosineOuter(x, wA, phaseA, u, -this.weights.beta, n, m, out);
  }
}

/** θ_k = wave_k·x + phase_k. */
function angle(x: Float64Array, wave: Float64Array, phase: Float64Array, k: number, n: number): number {
  let s = phase[k];
  const row = k * n;
  for (let i = 0; i < n; i++) s += wave[row + i] * x[i];
  return s;
}

/** out += c Σ_k sin(θ_k) dir_k. */
function addSineSum(
  x: Float64Array,
  wave: Float64Array,
  phase: Float64Array,
  dir: Float64Array,
  c: number,
  n: number,
  m: number,
  out: Float64Array,
): void {
  for (let k = 0; k < m; k++) {
    const s = c * Math.sin(angle(x, wave, phase, k, n));
    const row = k * n;
    for (let i = 0; i < n; i++) out[i] += s * dir[row + i];
  }
}

/** out += c Σ_k cos(θ_k) dir_k wave_kᵀ (row-major n×n). */
function addCosineOuter(
  x: Float64Array,
  wave: Float64Array,
  phase: Float64Array,
  dir: Float64Array,
  c: number,
  n: number,
  m: number,
  out: Float64Array,
): void {
  for (let k = 0; k < m; k++) {
    const s = c * Math.cos(angle(x, wave, phase, k, n));
    const row = k * n;
    for (let i = 0; i < n; i++) {
      const si = s * dir[row + i];
      const base = i * n;
      for (let j = 0; j < n; j++) out[base + j] += si * wave[row + j];
    }
  }
}
