/**
 * Parameter checks shared by the ensembles. Each throws a RangeError/TypeError whose message
 * names the parameter and the value it got.
 */

/** @throws TypeError when value is not a number; RangeError when it is not a positive integer */
export function assertPositiveInteger(name: string, value: unknown): number {
  if (typeof value !== "number") throw new TypeError(`${name} must be a number, got ${typeof value}`);
  if (!Number.isSafeInteger(value) || value < 1) {
    throw new RangeError(`${name} must be a positive integer, got ${value}`);
  }
  return value;
}

/** @throws TypeError when value is not a number; RangeError when it is not finite and > 0 */
export function assertPositive(name: string, value: unknown): number {
  if (typeof value !== "number") throw new TypeError(`${name} must be a number, got ${typeof value}`);
  if (!(Number.isFinite(value) && value > 0)) {
    throw new RangeError(`${name} must be a finite number > 0, got ${value}`);
  }
  return value;
}

/** @throws TypeError when value is not a number; RangeError when it is not finite */
export function assertFinite(name: string, value: unknown): number {
  if (typeof value !== "number") throw new TypeError(`${name} must be a number, got ${typeof value}`);
  if (!Number.isFinite(value)) throw new RangeError(`${name} must be finite, got ${value}`);
  return value;
}

/** @throws TypeError when not a Float64Array; RangeError on a wrong length or non-finite entry */
export function assertFiniteArray(name: string, value: unknown, length: number): Float64Array {
  if (!(value instanceof Float64Array)) throw new TypeError(`${name} must be a Float64Array`);
  if (value.length !== length) {
    throw new RangeError(`${name} must have length ${length}, got ${value.length}`);
  }
  for (let i = 0; i < value.length; i++) {
    if (!Number.isFinite(value[i])) throw new RangeError(`${name}[${i}] must be finite, got ${value[i]}`);
  }
  return value;
}
