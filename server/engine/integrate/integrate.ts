import { integrateMany } from "./integrate-many";
import { integrateOdex } from "./odex-adapter";
import { checkSystemAndStart, resolveIntegrateOptions } from "./options";
import type { IntegrateOptions, IntegrationResult, OdeSystem } from "./types";

/**
 * Integrates the autonomous ODE dx/dt = F(x) from x(0) = x0 up to tMax, or until the observer
 * asks to stop, with an adaptive explicit method:
 * - "dopri5" (default): Dormand–Prince 5(4) with PI step-size control and FSAL (Dormand &
 *   Prince, J. Comput. Appl. Math. 6 (1980) 19; control of Hairer, Nørsett & Wanner, Solving
 *   ODEs I, §II.4–5), on Float64Array with preallocated buffers;
 * - "odex": Hairer's GBS extrapolation code through the odex package (HNW I §II.9).
 * The default is the one measured faster on our workloads (rate network, N = 50 and 100, 32
 * starts; scripts/bench-engine.ts --compare-methods): see the figures in the engine report.
 * @param system the ODE: dimension n and rhs(x, out)
 * @param x0 start state, length n, finite
 * @param options rtol (1e-6), atol (1e-9), tMax (200), method ("dopri5"), maxSteps (1e6),
 *   onStep observer (return true to stop)
 * @returns final state, time reached, why it ended, and step counters
 * @throws TypeError on a malformed system; RangeError on bad options or a bad x0
 */
export function integrate(system: OdeSystem, x0: Float64Array, options: IntegrateOptions = {}): IntegrationResult {
  checkSystemAndStart(system, x0);
  const o = resolveIntegrateOptions(options);
  if (o.method === "odex") return integrateOdex(system, x0, o, options.onStep);
  let result: IntegrationResult | null = null;
  const onStep = options.onStep;
  integrateMany(
    system,
    1,
    {
      start: () => x0,
      onStep: onStep ? (_id, t, x, dxdt) => onStep(t, x, dxdt) : undefined,
      onEnd: (_id, r) => { result = r; },
    },
    { ...o, capacity: 1 },
  );
  return result!;
}
