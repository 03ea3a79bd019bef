import type { Network } from "../ensemble";
import { assertFinite, assertFiniteArray, assertPositive } from "../checks";
import { getNonlinearity, type Nonlinearity } from "./nonlinearity";

/** A rate network dx/dt = −μx + J φ(x) + I with its coupling matrix exposed. */
export interface RateNetwork extends Network {
  /** The couplings J, row-major n×n (shared, do not modify). */
  readonly couplings: Float64Array;
  /** The constant input I, one entry per unit. */
  readonly input: Float64Array;
  /** The transfer function φ. */
  readonly nonlinearity: Nonlinearity;
}

class MatrixRateNetwork implements RateNetwork {
  readonly rhsFlops: number;
  readonly stateScale: number;
  private readonly phi: Float64Array;

  constructor(
    readonly n: number,
    readonly mu: number,
    readonly couplings: Float64Array,
    readonly input: Float64Array,
    readonly nonlinearity: Nonlinearity,
  ) {
    this.phi = new Float64Array(n);
    // 2N² for J·φ, N for φ (one transcendental counted as one flop), 3N for −μx + (·) + I.
    this.rhsFlops = 2 * n * n + 4 * n;
    this.stateScale = rateStateScale(couplings, input, n, mu);
  }

  rhs(x: Float64Array, out: Float64Array): void {
    const { n, mu, couplings: j, input, phi } = this;
    this.nonlinearity.apply(x, phi);
    for (let i = 0; i < n; i++) {
      const row = i * n;
      let s0 = 0;
      let s1 = 0;
      let s2 = 0;
      let s3 = 0;
      let c = 0;
      for (; c + 3 < n; c += 4) {
        s0 += j[row + c] * phi[c];
        s1 += j[row + c + 1] * phi[c + 1];
        s2 += j[row + c + 2] * phi[c + 2];
        s3 += j[row + c + 3] * phi[c + 3];
      }
      for (; c < n; c++) s0 += j[row + c] * phi[c];
      out[i] = -mu * x[i] + (s0 + s1 + (s2 + s3)) + input[i];
    }
  }

  jacobian(x: Float64Array, out: Float64Array): void {
    const { n, mu, couplings: j, phi } = this;
    this.nonlinearity.derivative(x, phi);
    for (let i = 0; i < n; i++) {
      const row = i * n;
      for (let c = 0; c < n; c++) out[row + c] = j[row + c] * phi[c];
      out[row + i] -= mu;
    }
  }
}

/**
 * Per-component state scale of a rate network: (rms row norm of J + rms of I)/μ. Since |φ| ≤ 1
 * for tanh, every equilibrium satisfies |x_i| ≤ (Σ_j |J_ij| + |I_i|)/μ, and the rms row norm
 * ‖J‖_F/√N (≈ g for the ensemble) is the typical size of (Jφ)_i.
 */
function rateStateScale(j: Float64Array, input: Float64Array, n: number, mu: number): number {
  let jj = 0;
  for (let i = 0; i < j.length; i++) jj += j[i] * j[i];
  let ii = 0;
  for (let i = 0; i < n; i++) ii += input[i] * input[i];
  const scale = (Math.sqrt(jj / n) + Math.sqrt(ii / n)) / mu;
  return scale > 0 ? scale : 1 / mu;
}

/**
 * Builds the rate network dx/dt = −μx + J φ(x) + I from a given coupling matrix (science.md §2;
 * Sompolinsky, Crisanti & Sommers, PRL 61 (1988) 259). rhs costs 2N² + 4N flops and allocates
 * nothing (a preallocated φ(x) buffer, so one network must not be shared between threads);
 * jacobian writes −μI + J diag(φ'(x)). stateScale = (‖J‖_F/√N + ‖I‖/√N)/μ per component
 * (1/μ when both vanish). rhs does not check x: non-finite states give non-finite derivatives,
 * which the integrator reports as escaping.
 * @param j couplings J, row-major n×n, finite (kept by reference, not copied)
 * @param mu relaxation rate μ > 0
 * @param input constant input I: one number for every unit, or a vector of length n (default 0)
 * @param nonlinearity id of φ (default "tanh")
 * @returns the Network
 * @throws RangeError/TypeError naming a bad argument (non-square J, μ ≤ 0, non-finite values)
 */
export function rateNetworkFromMatrix(
  j: Float64Array,
  mu: number,
  input: number | Float64Array = 0,
  nonlinearity = "tanh",
): RateNetwork {
  if (!(j instanceof Float64Array)) throw new TypeError("J must be a Float64Array");
  const n = Math.round(Math.sqrt(j.length));
  if (n < 1 || n * n !== j.length) {
    throw new RangeError(`J must be a square n×n matrix, got ${j.length} entries`);
  }
  assertFiniteArray("J", j, n * n);
  assertPositive("mu", mu);
  const phi = getNonlinearity(nonlinearity);
  let inputVector: Float64Array;
  if (typeof input === "number") {
    inputVector = new Float64Array(n).fill(assertFinite("input", input));
  } else {
    inputVector = Float64Array.from(assertFiniteArray("input", input, n));
  }
  return new MatrixRateNetwork(n, mu, j, inputVector, phi);
}
