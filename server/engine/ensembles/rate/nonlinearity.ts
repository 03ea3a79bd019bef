/**
 * Single-unit transfer functions φ of the rate network, each with its derivative φ'.
 * Adding one is one entry here; the id is part of the rate ensemble's parameters.
 */
export interface Nonlinearity {
  readonly id: string;
  /** out[j] = φ(x[j]); out may alias x. */
  apply(x: Float64Array, out: Float64Array): void;
  /** out[j] = φ'(x[j]); out may alias x. */
  derivative(x: Float64Array, out: Float64Array): void;
  /** φ'(0), the gain of the linearisation at the origin. */
  readonly slopeAtZero: number;
}

const tanh: Nonlinearity = {
  id: "tanh",
  apply(x, out) {
    for (let j = 0; j < x.length; j++) out[j] = Math.tanh(x[j]);
  },
  derivative(x, out) {
    for (let j = 0; j < x.length; j++) {
      const t = Math.tanh(x[j]);
      out[j] = 1 - t * t;
    }
  },
  slopeAtZero: 1,
};

export const nonlinearities = { tanh } as const satisfies Record<string, Nonlinearity>;

export type NonlinearityId = keyof typeof nonlinearities;

/**
 * Looks up a transfer function by id.
 * @param id "tanh"
 * @returns the Nonlinearity
 * @throws RangeError naming the unknown id
 */
export function getNonlinearity(id: string): Nonlinearity {
  const found = (nonlinearities as Record<string, Nonlinearity>)[id];
  if (!found) {
    throw new RangeError(
      `nonlinearity must be one of ${Object.keys(nonlinearities).join(", ")}, got ${JSON.stringify(id)}`,
    );
  }
  return found;
}
