/**
 * Butcher tableau of the Dormand–Prince 5(4) pair: J. R. Dormand & P. J. Prince, "A family of
 * embedded Runge–Kutta formulae", J. Comput. Appl. Math. 6 (1980) 19–26, Table 2 (the
 * "RK5(4)7M" pair), as printed in Hairer, Nørsett & Wanner, Solving ODEs I, Table II.5.2.
 * The last stage is evaluated at the new point, so its derivative is the next step's first
 * stage (FSAL).
 */

/** Stage coefficients a_{s,j}, s = 2 … 7 (row s−2), against stages 1 … s−1. */
export const A: readonly (readonly number[])[] = [
  [1 / 5],
  [3 / 40, 9 / 40],
  [44 / 45, -56 / 15, 32 / 9],
  [19372 / 6561, -25360 / 2187, 64448 / 6561, -212 / 729],
  [9017 / 3168, -355 / 33, 46732 / 5247, 49 / 176, -5103 / 18656],
  [35 / 384, 0, 500 / 1113, 125 / 192, -2187 / 6784, 11 / 84],
];

/** Error weights e_j = b_j − b̂_j of stages 1 … 7 (dopri5.f constants E1 … E7). */
export const E: readonly number[] = [
  71 / 57600, 0, -71 / 16695, 71 / 1920, -17253 / 339200, 22 / 525, -1 / 40,
];

/** Order used in the step-size exponent. */
export const ORDER = 5;

/** PI step-size control constants of dopri5.f (HNW I §II.4, eq. (4.13) and the PI remark). */
export const CONTROL = {
  /** β of the PI controller (Gustafsson / dopri5.f default 0.04). */
  beta: 0.04,
  /** Safety factor. */
  safety: 0.9,
  /** The step may shrink at most by 1/facMaxShrink … */
  facMin: 0.2,
  /** … and grow at most by facMax per step. */
  facMax: 10,
} as const;
