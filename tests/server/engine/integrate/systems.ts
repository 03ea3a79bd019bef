// Small test systems with known solutions, shared by the integrator tests.
import type { OdeSystem } from "../../../../server/engine/integrate/types";

/** dx/dt = −x: x(t) = x0 e^{−t} (closed form). */
export const decay = (n: number): OdeSystem => ({
  n,
  rhs(x, out) {
    for (let i = 0; i < n; i++) out[i] = -x[i];
  },
});

/** Arenstorf orbit, Hairer–Nørsett–Wanner I §II.0 eq. (0.1), as a first-order system of 4. */
export const ARENSTORF_MU = 0.012277471;
export const ARENSTORF_PERIOD = 17.0652165601579625588917206249; // HNW I §II.0
export const arenstorfStart = () =>
  Float64Array.from([0.994, 0, 0, -2.00158510637908252240537862224]); // HNW I §II.0 eq. (0.2)

export const arenstorf: OdeSystem = {
  n: 4,
  rhs(y, out) {
    const mu = ARENSTORF_MU;
    const mup = 1 - mu;
    const [y1, y2, v1, v2] = [y[0], y[1], y[2], y[3]];
    const d1 = Math.pow((y1 + mu) ** 2 + y2 ** 2, 1.5);
    const d2 = Math.pow((y1 - mup) ** 2 + y2 ** 2, 1.5);
    out[0] = v1;
    out[1] = v2;
    out[2] = y1 + 2 * v2 - (mup * (y1 + mu)) / d1 - (mu * (y1 - mup)) / d2;
    out[3] = y2 - 2 * v1 - (mup * y2) / d1 - (mu * y2) / d2;
  },
};
