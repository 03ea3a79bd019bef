// Test helpers: standard normal functions for closed-form check values.
// erf by its Maclaurin series for |x| < 3 and the continued fraction of erfc beyond
// (Abramowitz & Stegun, Handbook of Mathematical Functions, 7.1.5 and 7.1.14).

/** erf(x), accurate to ~1e-15 (series / continued fraction). */
export function erf(x: number): number {
  if (x < 0) return -erf(-x);
  if (x < 3) {
    let term = x;
    let sum = x;
    for (let k = 1; k < 200; k++) {
      term *= (-x * x) / k;
      const add = term / (2 * k + 1);
      sum += add;
      if (Math.abs(add) < 1e-17 * Math.abs(sum)) break;
    }
    return (2 / Math.sqrt(Math.PI)) * sum;
  }
  let f = 0;
  for (let k = 60; k >= 1; k--) f = (k / 2) / (x + f);
  return 1 - Math.exp(-x * x) / Math.sqrt(Math.PI) / (x + f);
}

/** Standard normal density φ(x). */
export const normalPdf = (x: number) => Math.exp(-0.5 * x * x) / Math.sqrt(2 * Math.PI);

/** Standard normal distribution function Φ(x). */
export const normalCdf = (x: number) => 0.5 * (1 + erf(x / Math.SQRT2));
