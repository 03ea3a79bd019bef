/**
 * Dense LU factorisation with partial (row) pivoting on row-major Float64Array storage, and the
 * triangular solves that use it. Algorithm 3.4.1 (Gaussian elimination with partial pivoting,
 * "kji" outer-product form) of G. H. Golub & C. F. Van Loan, Matrix Computations, 4th ed. (2013),
 * §3.4: P·A = L·U with L unit lower triangular, stored in place of A.
 */

/** An in-place LU factorisation: `lu` holds L (strictly below the diagonal) and U. */
export interface LuFactors {
  readonly n: number;
  /** Row-major n×n: U on and above the diagonal, the multipliers of L below it. */
  readonly lu: Float64Array;
  /** Row permutation: row i of P·A is row perm[i] of A. */
  readonly perm: Int32Array;
  /** True when a pivot was exactly zero or non-finite (A is singular to working precision). */
  singular: boolean;
}

/** Preallocated workspace so that repeated factorisations of one size do not allocate. */
export function createLu(n: number): LuFactors {
  if (!Number.isSafeInteger(n) || n < 1) throw new RangeError(`n must be a positive integer, got ${n}`);
  return { n, lu: new Float64Array(n * n), perm: new Int32Array(n), singular: false };
}

/**
 * Factorises P·A = L·U (Golub & Van Loan 2013, Algorithm 3.4.1, partial pivoting).
 * @param a row-major n×n matrix (not modified)
 * @param f workspace from createLu(n); overwritten
 * @returns f, with `singular` set when a pivot is zero or non-finite
 * @throws RangeError when a's length is not n²
 */
export function factorLu(a: Float64Array, f: LuFactors): LuFactors {
  const { n, lu, perm } = f;
  if (a.length !== n * n) throw new RangeError(`a must have length ${n * n}, got ${a.length}`);
  lu.set(a);
  f.singular = false;
  for (let i = 0; i < n; i++) perm[i] = i;
  for (let k = 0; k < n; k++) {
    let p = k;
    let best = Math.abs(lu[k * n + k]);
    for (let i = k + 1; i < n; i++) {
      const v = Math.abs(lu[i * n + k]);
      if (v > best) { best = v; p = i; }
    }
    if (!(best > 0) || !Number.isFinite(best)) { f.singular = true; continue; }
    if (p !== k) swapRows(lu, n, k, p, perm);
    const pivot = lu[k * n + k];
    for (let i = k + 1; i < n; i++) {
      const row = i * n;
      const l = lu[row + k] / pivot;
      lu[row + k] = l;
      if (l === 0) continue;
      const krow = k * n;
      for (let j = k + 1; j < n; j++) lu[row + j] -= l * lu[krow + j];
    }
  }
  return f;
}

function swapRows(lu: Float64Array, n: number, a: number, b: number, perm: Int32Array): void {
  const ra = a * n;
  const rb = b * n;
  for (let j = 0; j < n; j++) {
    const t = lu[ra + j];
    lu[ra + j] = lu[rb + j];
    lu[rb + j] = t;
  }
  const t = perm[a];
  perm[a] = perm[b];
  perm[b] = t;
}

/**
 * Solves A·x = b with the factors of factorLu (forward then back substitution).
 * @param f factors of A (must not be singular)
 * @param b right-hand side, length n (not modified)
 * @param x output, length n (may not alias b)
 * @returns x
 * @throws RangeError on a singular factorisation or mismatched lengths
 */
export function solveLu(f: LuFactors, b: Float64Array, x: Float64Array): Float64Array {
  const { n, lu, perm } = f;
  if (f.singular) throw new RangeError("solveLu: the matrix is singular to working precision");
  if (b.length !== n || x.length !== n) {
    throw new RangeError(`solveLu: b and x must have length ${n}, got ${b.length} and ${x.length}`);
  }
  for (let i = 0; i < n; i++) {
    let s = b[perm[i]];
    const row = i * n;
    for (let j = 0; j < i; j++) s -= lu[row + j] * x[j];
    x[i] = s;
  }
  for (let i = n - 1; i >= 0; i--) {
    let s = x[i];
    const row = i * n;
    for (let j = i + 1; j < n; j++) s -= lu[row + j] * x[j];
    x[i] = s / lu[row + i];
  }
  return x;
}
