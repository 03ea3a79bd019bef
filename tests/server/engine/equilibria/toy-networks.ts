// Hand-written small networks with known behaviour for the run-loop tests.
import type { Network } from "../../../../server/engine/ensembles/ensemble";

function net(n: number, rhs: Network["rhs"], jacobian: Network["jacobian"]): Network {
  return { n, mu: 1, rhsFlops: 10 * n, stateScale: 1, rhs, jacobian };
}

/** Hopf normal form: stable limit cycle r = 1 of period 2π (closed form), unstable origin. */
export const hopf = net(
  2,
  (x, o) => {
    const r2 = x[0] * x[0] + x[1] * x[1];
    o[0] = (1 - r2) * x[0] - x[1];
    o[1] = x[0] + (1 - r2) * x[1];
  },
  (x, o) => {
    const [a, b] = [x[0], x[1]];
    o.set([1 - 3 * a * a - b * b, -1 - 2 * a * b, 1 - 2 * a * b, 1 - a * a - 3 * b * b]);
  },
);

/** Lorenz system σ = 10, r = 28, b = 8/3 (chaotic; E. N. Lorenz, J. Atmos. Sci. 20 (1963) 130). */
export const lorenz = net(
  3,
  (x, o) => {
    o[0] = 10 * (x[1] - x[0]);
    o[1] = x[0] * (28 - x[2]) - x[1];
    o[2] = x[0] * x[1] - (8 / 3) * x[2];
  },
  (x, o) => o.set([-10, 10, 0, 28 - x[2], -1, -x[0], x[1], x[0], -8 / 3]),
);

/** dx/dt = e^{−x}: x = ln(t + e^{x0}) creeps on for ever, speed ~1/t, no equilibrium. */
export const creeping = net(1, (x, o) => { o[0] = Math.exp(-x[0]); }, (x, o) => { o[0] = -Math.exp(-x[0]); });

/** dx/dt = x²: blows up in finite time from x0 > 0 (closed form x0/(1 − x0 t)). */
export const blowUp = net(1, (x, o) => { o[0] = x[0] * x[0]; }, (x, o) => { o[0] = 2 * x[0]; });

/** A right-hand side that returns NaN once |x| > 2 (a broken model must not crash the cell). */
export const poisoned = net(1, (x, o) => { o[0] = Math.abs(x[0]) > 2 ? NaN : 1; }, (_x, o) => { o[0] = 0; });

/** F_i = x_i − x_i³ for i = 0, 1: nine equilibria {−1, 0, 1}², (±1, ±1) stable (closed form). */
export const quartic2 = net(
  2,
  (x, o) => {
    o[0] = x[0] - x[0] ** 3;
    o[1] = x[1] - x[1] ** 3;
  },
  (x, o) => o.set([1 - 3 * x[0] ** 2, 0, 0, 1 - 3 * x[1] ** 2]),
);

/** Two uncoupled Hopf oscillators with frequencies 1 and √2: a quasi-periodic 2-torus (closed form). */
export const torus = net(
  4,
  (x, o) => {
    const w = [1, Math.SQRT2];
    for (let k = 0; k < 2; k++) {
      const [a, b] = [x[2 * k], x[2 * k + 1]];
      const r2 = a * a + b * b;
      o[2 * k] = (1 - r2) * a - w[k] * b;
      o[2 * k + 1] = w[k] * a + (1 - r2) * b;
    }
  },
  (x, o) => {
    o.fill(0);
    const w = [1, Math.SQRT2];
    for (let k = 0; k < 2; k++) {
      const [a, b] = [x[2 * k], x[2 * k + 1]];
      const [i, j] = [2 * k, 2 * k + 1];
      o[i * 4 + i] = 1 - 3 * a * a - b * b;
      o[i * 4 + j] = -w[k] - 2 * a * b;
      o[j * 4 + i] = w[k] - 2 * a * b;
      o[j * 4 + j] = 1 - a * a - 3 * b * b;
    }
  },
);
