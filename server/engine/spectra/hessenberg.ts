/**
 * Reduces a real row-major n×n matrix, in place, to upper Hessenberg form by orthogonal
 * (Householder) similarity transformations: EISPACK `orthes` (R. S. Martin & J. H. Wilkinson,
 * "Similarity reduction of a general matrix to Hessenberg form", Numer. Math. 12 (1968) 349;
 * Wilkinson & Reinsch, Handbook for Automatic Computation vol. II, 1971, contribution II/13),
 * in the arrangement of JAMA's `orthes`. The eigenvalues are unchanged.
 * Entries below the subdiagonal are set to exactly zero.
 * @param h the matrix, overwritten with its Hessenberg form (row-major, index i*n + j)
 * @param n the order
 * @param ort scratch of length ≥ n
 * @param acc scratch of length ≥ n
 */
export function reduceToHessenberg(
  h: Float64Array,
  n: number,
  ort: Float64Array,
  acc: Float64Array,
): void {
  const high = n - 1;
  for (let m = 1; m <= high - 1; m++) {
    let scale = 0;
    for (let i = m; i <= high; i++) scale += Math.abs(h[i * n + m - 1]);
    if (scale === 0) continue;
    let hh = 0;
    for (let i = high; i >= m; i--) {
      ort[i] = h[i * n + m - 1] / scale;
      hh += ort[i] * ort[i];
    }
    let g = Math.sqrt(hh);
    if (ort[m] > 0) g = -g;
    hh -= ort[m] * g;
    ort[m] -= g;
    applyLeft(h, n, m, ort, acc, hh);
    applyRight(h, n, m, ort, hh);
    ort[m] *= scale;
    h[m * n + m - 1] = scale * g;
    for (let i = m + 1; i <= high; i++) h[i * n + m - 1] = 0;
  }
}

/** H ← (I − u uᵀ/hh) H on rows m..n−1, columns m..n−1 (row-wise, cache friendly). */
function applyLeft(
  h: Float64Array,
  n: number,
  m: number,
  u: Float64Array,
  acc: Float64Array,
  hh: number,
): void {
  acc.fill(0, m, n);
  for (let i = m; i < n; i++) {
    const ui = u[i];
    const row = i * n;
    for (let j = m; j < n; j++) acc[j] += ui * h[row + j];
  }
  for (let j = m; j < n; j++) acc[j] /= hh;
  for (let i = m; i < n; i++) {
    const ui = u[i];
    const row = i * n;
    for (let j = m; j < n; j++) h[row + j] -= acc[j] * ui;
  }
}

/** H ← H (I − u uᵀ/hh) on rows 0..n−1, columns m..n−1. */
function applyRight(h: Float64Array, n: number, m: number, u: Float64Array, hh: number): void {
  for (let i = 0; i < n; i++) {
    const row = i * n;
    let f = 0;
    for (let j = m; j < n; j++) f += u[j] * h[row + j];
    f /= hh;
    for (let j = m; j < n; j++) h[row + j] -= f * u[j];
  }
}
