const RADIX = 2;

/**
 * Balances a real row-major n×n matrix in place by a diagonal similarity D⁻¹AD with D made of
 * powers of 2 (exact in floating point), so that each row and its column have comparable
 * off-diagonal 1-norms: B. N. Parlett & C. Reinsch, "Balancing a matrix for calculation of
 * eigenvalues and eigenvectors", Numer. Math. 13 (1969) 293 (EISPACK balanc, scaling only, no
 * permutations). Eigenvalues are unchanged; their computed accuracy improves for graded
 * matrices such as J·diag(φ'(x)) at saturated states.
 * @param a the matrix, overwritten
 * @param n the order
 */
export function balanceMatrix(a: Float64Array, n: number): void {
  let converged = false;
  while (!converged) {
    converged = true;
    for (let i = 0; i < n; i++) {
      let c = 0;
      let r = 0;
      for (let j = 0; j < n; j++) {
        if (j === i) continue;
        c += Math.abs(a[j * n + i]);
        r += Math.abs(a[i * n + j]);
      }
      if (c === 0 || r === 0) continue;
      const s = c + r;
      let f = 1;
      let g = r / RADIX;
      while (c < g) {
        f *= RADIX;
        c *= RADIX * RADIX;
      }
      g = r * RADIX;
      while (c > g) {
        f /= RADIX;
        c /= RADIX * RADIX;
      }
      if ((c + r) / f < 0.95 * s) {
        converged = false;
        const inv = 1 / f;
        for (let j = 0; j < n; j++) a[i * n + j] *= inv;
        for (let j = 0; j < n; j++) a[j * n + i] *= f;
      }
    }
  }
}
