import type { OdeSystem } from "./types";

/**
 * Starting step size of an explicit method of order 5, following the algorithm of Hairer,
 * Nørsett & Wanner, Solving ODEs I (2nd ed.), §II.4 "Starting step size" (subroutine HINIT of
 * dopri5.f): h0 from ‖x0‖/‖f0‖, one explicit Euler trial step for a second-derivative estimate,
 * then h = min(100 h0, (0.01 / max(‖f'‖, ‖f0‖))^(1/5), hMax). Costs one evaluation of F.
 * @param system the ODE
 * @param x0 start state; f0 = F(x0) already evaluated
 * @param rtol relative tolerance, atol absolute tolerance (define the scale sk = atol + rtol|x0|)
 * @param hMax largest allowed step
 * @param y1 and f1 caller-owned scratch vectors of length n
 * @returns the starting step (NaN when F is not finite at the trial point)
 */
export function initialStep(
  system: OdeSystem,
  x0: Float64Array,
  f0: Float64Array,
  rtol: number,
  atol: number,
  hMax: number,
  y1: Float64Array,
  f1: Float64Array,
): number {
  const n = x0.length;
  let dnf = 0;
  let dny = 0;
  for (let i = 0; i < n; i++) {
    const sk = atol + rtol * Math.abs(x0[i]);
    dnf += (f0[i] / sk) ** 2;
    dny += (x0[i] / sk) ** 2;
  }
  let h = dnf <= 1e-10 || dny <= 1e-10 ? 1e-6 : Math.sqrt(dny / dnf) * 0.01;
  h = Math.min(h, hMax);
  for (let i = 0; i < n; i++) y1[i] = x0[i] + h * f0[i];
  system.rhs(y1, f1);
  let der2 = 0;
  for (let i = 0; i < n; i++) {
    const sk = atol + rtol * Math.abs(x0[i]);
    der2 += ((f1[i] - f0[i]) / sk) ** 2;
  }
  der2 = Math.sqrt(der2) / h;
  const der12 = Math.max(Math.abs(der2), Math.sqrt(dnf));
  const h1 = der12 <= 1e-15 ? Math.max(1e-6, Math.abs(h) * 1e-3) : Math.pow(0.01 / der12, 1 / 5);
  return Math.min(100 * h, h1, hMax);
}
