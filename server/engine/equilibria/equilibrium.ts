import type { Network } from "../ensembles/ensemble";
import { countPositive, eigenvalues, maxRealPart } from "../spectra/eigenvalues";
import { normInf } from "../linalg/vector";

/** A verified equilibrium of one network with its linear stability. */
export interface Equilibrium {
  /** The refined point x*, F(x*) ≈ 0. */
  x: Float64Array;
  /** ‖F(x*)‖∞ (< 1e-10 for a verified equilibrium). */
  residual: number;
  /** ‖x*‖∞ and ‖x*‖₂/√N (root-mean-square per unit). */
  normInf: number;
  normRms: number;
  /** Eigenvalues of the Jacobian at x*, sorted by real part (descending), then imaginary part. */
  re: Float64Array;
  im: Float64Array;
  /** Largest real part of the spectrum (spectral abscissa). */
  maxRealPart: number;
  /** Number of eigenvalues with positive real part (unstable directions). */
  index: number;
  /** max Re λ < 0. */
  stable: boolean;
}

/**
 * Linear stability of an equilibrium: the eigenvalues of the Jacobian ∂F/∂x at x* (eigenvalues-
 * only Hessenberg + Francis QR of spectra/eigenvalues.ts), computed once per distinct
 * equilibrium. Stable iff max Re λ < 0 (Lyapunov's indirect method); index = number of
 * eigenvalues with Re λ > 0.
 * @param network the system
 * @param x the refined point, length n
 * @param residual ‖F(x)‖∞ measured by the refinement
 * @returns the equilibrium record (x is copied)
 * @throws RangeError when x has the wrong length or the Jacobian is not finite
 */
export function analyseEquilibrium(network: Network, x: Float64Array, residual: number): Equilibrium {
  const n = network.n;
  if (x.length !== n) throw new RangeError(`x must have length ${n}, got ${x.length}`);
  const jac = new Float64Array(n * n);
  network.jacobian(x, jac);
  const spec = eigenvalues(jac, n);
  const order = Array.from({ length: n }, (_, i) => i).sort(
    (a, b) => spec.re[b] - spec.re[a] || spec.im[b] - spec.im[a] || a - b,
  );
  const re = Float64Array.from(order, (i) => spec.re[i]);
  const im = Float64Array.from(order, (i) => spec.im[i]);
  let ss = 0;
  for (let i = 0; i < n; i++) ss += x[i] * x[i];
  const top = maxRealPart(re);
  return {
    x: Float64Array.from(x),
    residual,
    normInf: normInf(x),
    normRms: Math.sqrt(ss / n),
    re,
    im,
    maxRealPart: top,
    index: countPositive(re),
    stable: top < 0,
  };
}
