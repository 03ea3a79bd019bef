import type { Network } from "../../../../server/engine/ensembles/ensemble";

/**
 * Largest |J_analytic − J_fd| over entries, scaled by max(1, max |J|), where J_fd is the
 * central difference (F(x + h e_m) − F(x − h e_m))/(2h), error O(h²) (common practice).
 */
export function jacobianMismatch(net: Network, x: Float64Array, h = 1e-5): number {
  const n = net.n;
  const analytic = new Float64Array(n * n);
  net.jacobian(x, analytic);
  const plus = new Float64Array(n);
  const minus = new Float64Array(n);
  const probe = Float64Array.from(x);
  let worst = 0;
  let size = 1;
  for (let m = 0; m < n; m++) {
    probe[m] = x[m] + h;
    net.rhs(probe, plus);
    probe[m] = x[m] - h;
    net.rhs(probe, minus);
    probe[m] = x[m];
    for (let i = 0; i < n; i++) {
      const fd = (plus[i] - minus[i]) / (2 * h);
      worst = Math.max(worst, Math.abs(fd - analytic[i * n + m]));
      size = Math.max(size, Math.abs(analytic[i * n + m]));
    }
  }
  return worst / size;
}
