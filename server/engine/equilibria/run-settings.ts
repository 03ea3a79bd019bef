import type { Network } from "../ensembles/ensemble";
import type { IntegratorMethod } from "../integrate/types";

/** How each start is run to a still state and what counts as settled (science.md §4). */
export interface RunOptions {
  /** Relative / absolute tolerances of the integrator. Defaults 1e-6 / 1e-9. */
  rtol?: number;
  atol?: number;
  /** Time limit of one run. Default 200. */
  tMax?: number;
  /** Integrator. Default "dopri5" (measured faster; see integrate.ts). */
  method?: IntegratorMethod;
  /** A run is nearly still when ‖dx/dt‖∞ drops below this; Newton takes over. Default 1e-5. */
  stillTol?: number;
  /**
   * Radius of the ball around a known stable equilibrium inside which a run is counted for it
   * without refinement, relative to max(1, stateScale). Default 1e-3.
   */
  basinRadius?: number;
  /** A run escapes when ‖x‖∞ exceeds this times max(1, stateScale), or turns non-finite. Default 1e6. */
  escapeFactor?: number;
  /**
   * Finite-time Lyapunov probe of runs still moving at t = min(lyapunovAt·tMax, 30/μ): window
   * lyapunovDuration/μ (default 20/μ); the run stops as irregular when the exponent exceeds
   * lyapunovThreshold·μ (default 0.02μ) and the kept log-growth exceeds 3 e-folds. Set
   * lyapunovAt to 0 to disable. Default lyapunovAt 0.25.
   */
  lyapunovAt?: number;
  lyapunovDuration?: number;
  lyapunovThreshold?: number;
  /** Runs advanced together by the batched integrator. Default 8. */
  batch?: number;
}

export interface RunSettings {
  rtol: number;
  atol: number;
  tMax: number;
  method: IntegratorMethod;
  stillTol: number;
  basinRadius: number;
  escapeBound: number;
  lyapunovStart: number | null;
  lyapunovDuration: number;
  lyapunovThreshold: number;
  batch: number;
}

function pos(name: string, v: number): number {
  if (typeof v !== "number" || !Number.isFinite(v) || v <= 0) {
    throw new RangeError(`${name} must be a positive finite number, got ${String(v)}`);
  }
  return v;
}

/**
 * Fills the defaults of RunOptions for one network (absolute radii from its stateScale).
 * @throws RangeError naming an option out of range
 */
export function resolveRunSettings(network: Network, o: RunOptions = {}): RunSettings {
  const scale = Math.max(1, network.stateScale);
  const tMax = pos("tMax", o.tMax ?? 200);
  const at = o.lyapunovAt ?? 0.25;
  if (!(at >= 0 && at < 1)) throw new RangeError(`lyapunovAt must be in [0, 1), got ${at}`);
  const method = o.method ?? "dopri5";
  if (method !== "dopri5" && method !== "odex") throw new RangeError(`method must be "dopri5" or "odex", got ${String(method)}`);
  const batch = o.batch ?? 8;
  if (!Number.isSafeInteger(batch) || batch < 1) throw new RangeError(`batch must be a positive integer, got ${batch}`);
  return {
    rtol: pos("rtol", o.rtol ?? 1e-6),
    atol: pos("atol", o.atol ?? 1e-9),
    tMax,
    method,
    stillTol: pos("stillTol", o.stillTol ?? 1e-5),
    basinRadius: pos("basinRadius", o.basinRadius ?? 1e-3) * scale,
    escapeBound: pos("escapeFactor", o.escapeFactor ?? 1e6) * scale,
    lyapunovStart: at === 0 ? null : Math.min(at * tMax, 30 / network.mu),
    lyapunovDuration: pos("lyapunovDuration", o.lyapunovDuration ?? 20) / network.mu,
    lyapunovThreshold: pos("lyapunovThreshold", o.lyapunovThreshold ?? 0.02) * network.mu,
    batch,
  };
}
