const EPS = 2 ** -52;

/**
 * Reduces a real symmetric row-major n×n matrix (destroyed) to tridiagonal form by Householder
 * similarity transformations with the symmetric rank-2 update A ← A − v wᵀ − w vᵀ (Golub &
 * Van Loan, Matrix Computations, Algorithm 8.3.1; about 2n³ flops on the full matrix).
 * @param a the symmetric matrix, overwritten
 * @param n the order
 * @param d receives the diagonal (length n)
 * @param e receives the subdiagonal: e[i] = T[i][i−1], e[0] = 0 (length n)
 */
export function tridiagonalize(a: Float64Array, n: number, d: Float64Array, e: Float64Array): void {
  const v = new Float64Array(n);
  const w = new Float64Array(n);
  e[0] = 0;
  for (let k = 0; k < n - 2; k++) {
    let norm2 = 0;
    for (let i = k + 1; i < n; i++) norm2 += a[i * n + k] ** 2;
    const x0 = a[(k + 1) * n + k];
    const norm = Math.sqrt(norm2);
    if (norm === 0) {
      e[k + 1] = 0;
      continue;
    }
    const alpha = x0 > 0 ? -norm : norm;
    let vv = 0;
    for (let i = k + 1; i < n; i++) {
      v[i] = a[i * n + k] - (i === k + 1 ? alpha : 0);
      vv += v[i] * v[i];
    }
    e[k + 1] = alpha;
    rankTwoUpdate(a, n, k + 1, v, w, 2 / vv);
  }
  if (n >= 2) e[n - 1] = a[(n - 1) * n + n - 2];
  for (let i = 0; i < n; i++) d[i] = a[i * n + i];
}

/** A22 ← H A22 H with H = I − β v vᵀ on rows/columns s..n−1 (w = βA22v − (β²vᵀA22v/2) v). */
function rankTwoUpdate(a: Float64Array, n: number, s: number, v: Float64Array, w: Float64Array, beta: number) {
  let pv = 0;
  for (let i = s; i < n; i++) {
    let p = 0;
    for (let j = s; j < n; j++) p += a[i * n + j] * v[j];
    w[i] = beta * p;
    pv += w[i] * v[i];
  }
  const half = (beta * pv) / 2;
  for (let i = s; i < n; i++) w[i] -= half * v[i];
  for (let i = s; i < n; i++) {
    const row = i * n;
    for (let j = s; j < n; j++) a[row + j] -= v[i] * w[j] + w[i] * v[j];
  }
}

/**
 * Eigenvalues of a symmetric tridiagonal matrix by the implicit QL algorithm with Wilkinson
 * shifts: EISPACK tql1 (Bowdler, Martin, Reinsch & Wilkinson, Numer. Math. 11 (1968) 293;
 * Handbook for Automatic Computation vol. II, contribution II/3), as in JAMA's tql2 without
 * the eigenvector update.
 * @param d diagonal (length n), overwritten with the eigenvalues (unsorted)
 * @param e subdiagonal with e[i] = T[i][i−1] (e[0] ignored), destroyed
 * @param n the order
 * @throws Error when an eigenvalue needs more than 30·max(10, n) iterations
 */
export function tridiagonalEigenvalues(d: Float64Array, e: Float64Array, n: number): void {
  for (let i = 1; i < n; i++) e[i - 1] = e[i];
  e[n - 1] = 0;
  let shift = 0;
  let tst1 = 0;
  for (let l = 0; l < n; l++) {
    tst1 = Math.max(tst1, Math.abs(d[l]) + Math.abs(e[l]));
    let m = l;
    while (m < n - 1 && Math.abs(e[m]) > EPS * tst1) m += 1;
    let iter = 0;
    while (m > l && Math.abs(e[l]) > EPS * tst1) {
      if (++iter > 30 * Math.max(10, n)) {
        throw new Error(`tridiagonal QL did not converge for eigenvalue ${l} after ${iter - 1} steps`);
      }
      shift += qlStep(d, e, l, m, n);
    }
    d[l] += shift;
    e[l] = 0;
  }
}

/** One implicit QL step with Wilkinson shift on the block l..m; returns the shift applied. */
function qlStep(d: Float64Array, e: Float64Array, l: number, m: number, n: number): number {
  const g0 = d[l];
  let p = (d[l + 1] - g0) / (2 * e[l]);
  let r = Math.hypot(p, 1);
  if (p < 0) r = -r;
  d[l] = e[l] / (p + r);
  d[l + 1] = e[l] * (p + r);
  const dl1 = d[l + 1];
  const h0 = g0 - d[l];
  for (let i = l + 2; i < n; i++) d[i] -= h0;
  p = d[m];
  let c = 1;
  let c2 = 1;
  let c3 = 1;
  const el1 = e[l + 1];
  let s = 0;
  let s2 = 0;
  for (let i = m - 1; i >= l; i--) {
    c3 = c2;
    c2 = c;
    s2 = s;
    const g = c * e[i];
    const h = c * p;
    r = Math.hypot(p, e[i]);
    e[i + 1] = s * r;
    s = e[i] / r;
    c = p / r;
    p = c * d[i] - s * g;
    d[i + 1] = h + s * (c * g + s * d[i]);
  }
  p = (-s * s2 * c3 * el1 * e[l]) / dl1;
  e[l] = s * p;
  d[l] = c * p;
  return h0;
}

/** True when a[i*n+j] === a[j*n+i] for all i, j (exact, bit-for-bit symmetry). */
export function isExactlySymmetric(a: Float64Array, n: number): boolean {
  for (let i = 0; i < n; i++) {
    for (let j = i + 1; j < n; j++) if (a[i * n + j] !== a[j * n + i]) return false;
  }
  return true;
}
