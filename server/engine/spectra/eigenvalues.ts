import { balanceMatrix } from "./balance";
import { reduceToHessenberg } from "./hessenberg";
import { hessenbergEigenvalues } from "./hessenberg-qr";
import { isExactlySymmetric, tridiagonalEigenvalues, tridiagonalize } from "./symmetric";

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
 * Matrix Computations, §7.4–7.5). About 10n³ flops. An exactly symmetric input (a_ij === a_ji
 * bit for bit, e.g. the elliptic ensemble at τ = 1) takes the faster symmetric path of
 * `symmetricEigenvalues` instead.
 * @param a real row-major matrix (index i*n + j), length n*n; not modified
 * @param n the order
 * @returns real and imaginary parts; complex conjugate pairs are adjacent (positive imaginary
 *   part first); no particular order otherwise (ascending for the symmetric path)
 * @throws RangeError on a size mismatch or a non-finite entry; Error when QR fails to converge
 */
export function eigenvalues(a: Float64Array, n: number): Spectrum {
  assertSquareMatrix(a, n);
  if (isExactlySymmetric(a, n)) return symmetricSpectrum(a, n);
  const h = Float64Array.from(a);
  const re = new Float64Array(n);
  const im = new Float64Array(n);
  balanceMatrix(h, n);
  reduceToHessenberg(h, n, new Float64Array(n), new Float64Array(n));
  hessenbergEigenvalues(h, n, re, im);
  return { re, im };
}

/**
 * Eigenvalues of the symmetric part (A + Aᵀ)/2 of a real n×n matrix (A itself when it is
 * symmetric): Householder tridiagonalisation (Golub & Van Loan, Algorithm 8.3.1) and the
 * implicit QL algorithm (EISPACK tql1; Wilkinson & Reinsch, Handbook vol. II, 1971), about
 * 2n³ flops, several times faster than the general path.
 * @param a real row-major matrix, length n*n; not modified
 * @param n the order
 * @returns the eigenvalues in ascending order in re; im is all zeros
 * @throws RangeError on a size mismatch or a non-finite entry; Error when QL fails to converge
 */
export function symmetricEigenvalues(a: Float64Array, n: number): Spectrum {
  assertSquareMatrix(a, n);
  const s = new Float64Array(n * n);
  for (let i = 0; i < n; i++) {
    for (let j = 0; j < n; j++) s[i * n + j] = 0.5 * (a[i * n + j] + a[j * n + i]);
  }
  return symmetricSpectrum(s, n);
}

function symmetricSpectrum(a: Float64Array, n: number): Spectrum {
  const work = Float64Array.from(a);
  const re = new Float64Array(n);
  const e = new Float64Array(n);
  tridiagonalize(work, n, re, e);
  tridiagonalEigenvalues(re, e, n);
  re.sort((x, y) => x - y);
  return { re, im: new Float64Array(n) };
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
