import type { IntegrateOptions, IntegratorMethod, OdeSystem } from "./types";

/** Integration options with every default filled in (see IntegrateOptions for each default). */
export interface ResolvedIntegrateOptions {
  rtol: number;
  atol: number;
  tMax: number;
  method: IntegratorMethod;
  maxSteps: number;
}

/** The default method, chosen by measurement on the rate network (see integrate.ts). */
export const DEFAULT_METHOD: IntegratorMethod = "dopri5";

function positive(name: string, v: unknown): number {
  if (typeof v !== "number" || !Number.isFinite(v) || v <= 0) {
    throw new RangeError(`${name} must be a positive finite number, got ${String(v)}`);
  }
  return v;
}

/**
 * Fills defaults and validates integration options.
 * @throws RangeError naming the option and value when one is out of range
 */
export function resolveIntegrateOptions(o: IntegrateOptions = {}): ResolvedIntegrateOptions {
  const method = o.method ?? DEFAULT_METHOD;
  if (method !== "dopri5" && method !== "odex") {
    throw new RangeError(`method must be "dopri5" or "odex", got ${String(method)}`);
  }
  const maxSteps = o.maxSteps ?? 1e6;
  if (!Number.isSafeInteger(maxSteps) || maxSteps < 1) {
    throw new RangeError(`maxSteps must be a positive integer, got ${maxSteps}`);
  }
  return {
    rtol: positive("rtol", o.rtol ?? 1e-6),
    atol: positive("atol", o.atol ?? 1e-9),
    tMax: positive("tMax", o.tMax ?? 200),
    method,
    maxSteps,
  };
}

/**
 * Checks a system and a start state before integrating.
 * @throws TypeError when the system lacks n or rhs; RangeError when x0 has the wrong length
 *   or a non-finite entry
 */
export function checkSystemAndStart(system: OdeSystem, x0: Float64Array): void {
  if (!system || typeof system.rhs !== "function" || !Number.isSafeInteger(system.n) || system.n < 1) {
    throw new TypeError("system must have a positive integer n and an rhs(x, out) function");
  }
  if (!(x0 instanceof Float64Array)) throw new TypeError("x0 must be a Float64Array");
  if (x0.length !== system.n) {
    throw new RangeError(`x0 must have length n = ${system.n}, got ${x0.length}`);
  }
  for (let i = 0; i < x0.length; i++) {
    if (!Number.isFinite(x0[i])) throw new RangeError(`x0[${i}] must be finite, got ${x0[i]}`);
  }
}
