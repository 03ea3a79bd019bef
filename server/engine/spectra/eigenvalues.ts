import { balanceMatrix } from "./balance";
import { reduceToHessenberg } from "./hessenberg";
import { hessenbergEigenvalues } from "./hessenberg-qr";

/** Eigenvalues λ_j = re[j] + i·im[j] of a real matrix. */
export interface Spectrum {
  re: Float64Array;
  im: Float64Array;
}

/**
 * Checks that `a` is a finite real row-major n×n matrix.
 * @throws RangeError naming the parameter and value on a bad size or a non-finite entry
 */
export function assertSquareMatrix(a: Float64Array, n: number, name = "a"): void {
  if (!(a instanceof Float64Array)) {
    throw new TypeError(`${name} must be a Float64Array`);
  }
  if (!Number.isSafeInteger(n) || n < 1) {
    throw new RangeError(`n must be a positive integer, got ${n}`);
  }
  if (a.length !== n * n) {
    throw new RangeError(`${name} must have length n*n = ${n * n}, got ${a.length}`);
  }
  for (let i = 0; i < a.length; i++) {
    if (!Number.isFinite(a[i])) {
      throw new RangeError(`${name}[${i}] (row ${Math.floor(i / n)}, column ${i % n}) is ${a[i]}`);
    }
  }
}

/**
 * All eigenvalues of a real n×n matrix, without eigenvectors: balancing by powers of 2
 * (Parlett & Reinsch 1969, EISPACK balanc), Householder reduction to upper Hessenberg form
 * (EISPACK orthes), then the Francis implicit double-shift QR algorithm (EISPACK hqr;
 * Wilkinson & Reinsch, Handbook for Automatic Computation vol. II, 1971; Golub & Van Loan,
 * Matrix Computations, §7.4–7.5). About 10n³ flops.
 * @param a real row-major matrix (index i*n + j), length n*n; not modified
 * @param n the order
 * @returns real and imaginary parts; complex conjugate pairs are adjacent (positive imaginary
 *   part first); no particular order otherwise
 * @throws RangeError on a size mismatch or a non-finite entry; Error when QR fails to converge
 */
export function eigenvalues(a: Float64Array, n: number): Spectrum {
  assertSquareMatrix(a, n);
  const h = Float64Array.from(a);
  const re = new Float64Array(n);
  const im = new Float64Array(n);
  balanceMatrix(h, n);
  reduceToHessenberg(h, n, new Float64Array(n), new Float64Array(n));
  hessenbergEigenvalues(h, n, re, im);
  return { re, im };
}

/**
 * Spectral abscissa: the largest real part max_j Re λ_j.
 * @param re real parts of the eigenvalues (non-empty)
 * @returns the maximum
 * @throws RangeError when re is empty or holds a non-finite value
 */
export function maxRealPart(re: Float64Array): number {
  if (re.length === 0) throw new RangeError("re must be non-empty, got length 0");
  let best = -Infinity;
  for (let i = 0; i < re.length; i++) {
    if (!Number.isFinite(re[i])) throw new RangeError(`re[${i}] is ${re[i]}`);
    if (re[i] > best) best = re[i];
  }
  return best;
}

/**
 * Instability index: the number of eigenvalues with real part above `tolerance`.
 * @param re real parts of the eigenvalues
 * @param tolerance threshold (default 0: strictly positive real parts)
 * @returns the count
 * @throws RangeError when tolerance or an entry is not finite
 */
export function countPositive(re: Float64Array, tolerance = 0): number {
  if (!Number.isFinite(tolerance)) throw new RangeError(`tolerance must be finite, got ${tolerance}`);
  let count = 0;
  for (let i = 0; i < re.length; i++) {
    if (!Number.isFinite(re[i])) throw new RangeError(`re[${i}] is ${re[i]}`);
    if (re[i] > tolerance) count += 1;
  }
  return count;
}
