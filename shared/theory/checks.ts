/**
 * Argument checks shared by the theory formulas. Each throws a RangeError/TypeError that names
 * the parameter and its value, so a formula never returns NaN silently.
 */

/** @throws TypeError when value is not a number; RangeError when it is not finite. */
export function assertFinite(name: string, value: number): number {
  if (typeof value !== "number") throw new TypeError(`${name} must be a number, got ${typeof value}`);
  if (!Number.isFinite(value)) throw new RangeError(`${name} must be finite, got ${value}`);
  return value;
}

/** @throws RangeError unless value is a finite number > 0. */
export function assertPositive(name: string, value: number): number {
  assertFinite(name, value);
  if (!(value > 0)) throw new RangeError(`${name} must be > 0, got ${value}`);
  return value;
}

/** @throws RangeError unless value is a safe integer ≥ 1. */
export function assertPositiveInteger(name: string, value: number): number {
  assertFinite(name, value);
  if (!Number.isSafeInteger(value) || value < 1) {
    throw new RangeError(`${name} must be a positive integer, got ${value}`);
  }
  return value;
}

/** @throws RangeError unless τ is a finite number in [0, 1]. */
export function assertTau(value: number, name = "tau"): number {
  assertFinite(name, value);
  if (value < 0 || value > 1) throw new RangeError(`${name} must be in [0, 1], got ${value}`);
  return value;
}
