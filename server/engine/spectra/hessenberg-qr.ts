/**
 * Eigenvalues of an upper Hessenberg matrix by the Francis implicit double-shift QR algorithm:
 * EISPACK `hqr` (R. S. Martin, G. Peters & J. H. Wilkinson, "The QR algorithm for real
 * Hessenberg matrices", Numer. Math. 14 (1970) 219; Wilkinson & Reinsch, Handbook for Automatic
 * Computation vol. II, 1971, contribution II/14; Golub & Van Loan, Matrix Computations, §7.5),
 * written after JAMA's `hqr2` with the Schur-vector accumulation removed: each double step
 * touches only the active window rows/columns l..n, as in `hqr`.
 */

const EPS = 2 ** -52;

interface Shift {
  x: number;
  y: number;
  w: number;
  exshift: number;
}

/**
 * Computes all eigenvalues of the upper Hessenberg matrix h (destroyed).
 * @param h row-major n×n upper Hessenberg matrix, overwritten
 * @param n the order
 * @param re receives the real parts (length n)
 * @param im receives the imaginary parts (length n); conjugate pairs are stored adjacently,
 *   positive imaginary part first
 * @throws Error when an eigenvalue needs more than 30·max(10, n) iterations (as LAPACK dlahqr)
 */
export function hessenbergEigenvalues(
  h: Float64Array,
  n: number,
  re: Float64Array,
  im: Float64Array,
): void {
  const maxIter = 30 * Math.max(10, n);
  const norm = hessenbergNorm(h, n);
  const shift: Shift = { x: 0, y: 0, w: 0, exshift: 0 };
  let hi = n - 1;
  let iter = 0;
  while (hi >= 0) {
    const l = findSmallSubdiagonal(h, n, hi, norm);
    if (l === hi) {
      re[hi] = h[hi * n + hi] + shift.exshift;
      im[hi] = 0;
      hi -= 1;
      iter = 0;
    } else if (l === hi - 1) {
      storeTwoRoots(h, n, hi, shift.exshift, re, im);
      hi -= 2;
      iter = 0;
    } else {
      if (iter >= maxIter) {
        throw new Error(`QR iteration did not converge for eigenvalue ${hi} after ${iter} steps`);
      }
      chooseShift(h, n, l, hi, iter, shift);
      iter += 1;
      doubleShiftSweep(h, n, l, hi, shift);
    }
  }
}

function hessenbergNorm(h: Float64Array, n: number): number {
  let norm = 0;
  for (let i = 0; i < n; i++) {
    for (let j = Math.max(i - 1, 0); j < n; j++) norm += Math.abs(h[i * n + j]);
  }
  return norm;
}

/** Largest l ≤ hi with a negligible subdiagonal h[l][l−1] (or 0): the active block is l..hi. */
function findSmallSubdiagonal(h: Float64Array, n: number, hi: number, norm: number): number {
  let l = hi;
  while (l > 0) {
    let s = Math.abs(h[(l - 1) * n + l - 1]) + Math.abs(h[l * n + l]);
    if (s === 0) s = norm;
    if (Math.abs(h[l * n + l - 1]) < EPS * s) break;
    l -= 1;
  }
  return l;
}

/** Eigenvalues of the deflated trailing 2×2 block at rows hi−1, hi. */
function storeTwoRoots(
  h: Float64Array,
  n: number,
  hi: number,
  exshift: number,
  re: Float64Array,
  im: Float64Array,
): void {
  const a = h[(hi - 1) * n + hi - 1];
  const d = h[hi * n + hi];
  const w = h[hi * n + hi - 1] * h[(hi - 1) * n + hi];
  const p = (a - d) / 2;
  const q = p * p + w;
  const x = d + exshift;
  let z = Math.sqrt(Math.abs(q));
  if (q >= 0) {
    z = p >= 0 ? p + z : p - z;
    re[hi - 1] = x + z;
    re[hi] = z !== 0 ? x - w / z : x + z;
    im[hi - 1] = 0;
    im[hi] = 0;
  } else {
    re[hi - 1] = x + p;
    re[hi] = x + p;
    im[hi - 1] = z;
    im[hi] = -z;
  }
}

/**
 * Francis shift from the trailing 2×2 block, with the ad hoc exceptional shifts of JAMA. An
 * exceptional shift moves every not yet deflated diagonal entry (0..hi) and is added back to
 * each later eigenvalue through `exshift`.
 */
function chooseShift(h: Float64Array, n: number, l: number, hi: number, iter: number, s: Shift) {
  s.x = h[hi * n + hi];
  s.y = h[(hi - 1) * n + hi - 1];
  s.w = h[hi * n + hi - 1] * h[(hi - 1) * n + hi];
  if (iter === 10) {
    // Wilkinson's original exceptional shift.
    s.exshift += s.x;
    for (let i = 0; i <= hi; i++) h[i * n + i] -= s.x;
    const t = Math.abs(h[hi * n + hi - 1]) + Math.abs(h[(hi - 1) * n + hi - 2]);
    s.x = 0.75 * t;
    s.y = s.x;
    s.w = -0.4375 * t * t;
  }
  if (iter === 30) {
    // MATLAB's exceptional shift (as in JAMA).
    let t = (s.y - s.x) / 2;
    t = t * t + s.w;
    if (t > 0) {
      t = Math.sqrt(t);
      if (s.y < s.x) t = -t;
      t = s.x - s.w / ((s.y - s.x) / 2 + t);
      for (let i = 0; i <= hi; i++) h[i * n + i] -= t;
      s.exshift += t;
      s.x = 0.964;
      s.y = 0.964;
      s.w = 0.964;
    }
  }
}

/** One implicit double-shift QR step on the active block l..hi (bulge chase). */
function doubleShiftSweep(h: Float64Array, n: number, l: number, hi: number, s: Shift): void {
  const start = findBulgeStart(h, n, l, hi, s);
  const m = start.m;
  for (let i = m + 2; i <= hi; i++) {
    h[i * n + i - 2] = 0;
    if (i > m + 2) h[i * n + i - 3] = 0;
  }
  let { p, q, r } = start;
  for (let k = m; k <= hi - 1; k++) {
    const notLast = k !== hi - 1;
    let scale = 1;
    if (k !== m) {
      p = h[k * n + k - 1];
      q = h[(k + 1) * n + k - 1];
      r = notLast ? h[(k + 2) * n + k - 1] : 0;
      scale = Math.abs(p) + Math.abs(q) + Math.abs(r);
      if (scale === 0) continue;
      p /= scale;
      q /= scale;
      r /= scale;
    }
    let t = Math.sqrt(p * p + q * q + r * r);
    if (p < 0) t = -t;
    if (t === 0) continue;
    if (k !== m) h[k * n + k - 1] = -t * scale;
    else if (l !== m) h[k * n + k - 1] = -h[k * n + k - 1];
    p += t;
    applyReflector(h, n, k, l, hi, notLast, p / t, q / t, r / t, q / p, r / p);
  }
}

/**
 * Looks for two consecutive small subdiagonal elements (Golub & Van Loan §7.5.5): returns the
 * row m where the double step starts and the scaled first column (p, q, r) of (H − s₁)(H − s₂).
 */
function findBulgeStart(h: Float64Array, n: number, l: number, hi: number, s: Shift) {
  let m = hi - 2;
  let p = 0;
  let q = 0;
  let r = 0;
  for (;;) {
    const z = h[m * n + m];
    const rr = s.x - z;
    const ss = s.y - z;
    p = (rr * ss - s.w) / h[(m + 1) * n + m] + h[m * n + m + 1];
    q = h[(m + 1) * n + m + 1] - z - rr - ss;
    r = h[(m + 2) * n + m + 1];
    const scale = Math.abs(p) + Math.abs(q) + Math.abs(r);
    p /= scale;
    q /= scale;
    r /= scale;
    if (m === l) break;
    const lhs = Math.abs(h[m * n + m - 1]) * (Math.abs(q) + Math.abs(r));
    const rhs =
      EPS * Math.abs(p) * (Math.abs(h[(m - 1) * n + m - 1]) + Math.abs(z) + Math.abs(h[(m + 1) * n + m + 1]));
    if (lhs < rhs) break;
    m -= 1;
  }
  return { m, p, q, r };
}

/** Applies the 3×3 (or 2×2 when last) Householder reflector at k to rows and columns of l..hi. */
function applyReflector(
  h: Float64Array,
  n: number,
  k: number,
  l: number,
  hi: number,
  notLast: boolean,
  x: number,
  y: number,
  z: number,
  q: number,
  r: number,
): void {
  const r0 = k * n;
  const r1 = r0 + n;
  const r2 = r1 + n;
  for (let j = k; j <= hi; j++) {
    let p = h[r0 + j] + q * h[r1 + j];
    if (notLast) {
      p += r * h[r2 + j];
      h[r2 + j] -= p * z;
    }
    h[r0 + j] -= p * x;
    h[r1 + j] -= p * y;
  }
  const iEnd = Math.min(hi, k + 3);
  for (let i = l; i <= iEnd; i++) {
    const row = i * n;
    let p = x * h[row + k] + y * h[row + k + 1];
    if (notLast) {
      p += z * h[row + k + 2];
      h[row + k + 2] -= p * r;
    }
    h[row + k] -= p;
    h[row + k + 1] -= p * q;
  }
}
