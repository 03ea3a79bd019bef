/**
 * Special functions for the confidence intervals, built from series and continued fractions
 * whose coefficients are exact (no fitted constants): ln Γ by Stirling's series with upward
 * recursion, the regularised incomplete beta by its continued fraction (modified Lentz), the
 * normal CDF from the regularised incomplete gamma Q(½, z²/2). Accuracy ~1e-14 relative.
 */

/** Stirling-series coefficients B_{2k} / (2k(2k−1)), k = 1 … 8 (Bernoulli numbers; DLMF 5.11.1). */
const STIRLING = [1 / 12, -1 / 360, 1 / 1260, -1 / 1680, 1 / 1188, -691 / 360360, 1 / 156, -3617 / 122400];

/**
 * ln Γ(x) for x > 0: Stirling's series (DLMF 5.11.1) at x + k ≥ 15, recursion Γ(x+1) = xΓ(x).
 * @throws RangeError when x is not positive and finite
 */
export function logGamma(x: number): number {
  if (!(x > 0) || !Number.isFinite(x)) throw new RangeError(`x must be positive and finite, got ${x}`);
  let shift = 0;
  let y = x;
  while (y < 15) {
    shift += Math.log(y);
    y += 1;
  }
  const inv = 1 / y;
  const inv2 = inv * inv;
  let series = 0;
  let pow = inv;
  for (const c of STIRLING) {
    series += c * pow;
    pow *= inv2;
  }
  return (y - 0.5) * Math.log(y) - y + 0.5 * Math.log(2 * Math.PI) + series - shift;
}

/** Continued fraction of I_x(a, b) by the modified Lentz method (DLMF 8.17.22; NR §6.4, §5.2). */
function betaFraction(a: number, b: number, x: number): number {
  const tiny = 1e-300;
  let c = 1;
  let d = 1 - ((a + b) * x) / (a + 1);
  d = Math.abs(d) < tiny ? tiny : d;
  d = 1 / d;
  let h = d;
  for (let m = 1; m <= 500; m++) {
    const m2 = 2 * m;
    for (const num of [(m * (b - m) * x) / ((a + m2 - 1) * (a + m2)), (-(a + m) * (a + b + m) * x) / ((a + m2) * (a + m2 + 1))]) {
      d = 1 + num * d;
      d = Math.abs(d) < tiny ? tiny : d;
      c = 1 + num / c;
      c = Math.abs(c) < tiny ? tiny : c;
      d = 1 / d;
      h *= d * c;
    }
    if (Math.abs(d * c - 1) < 1e-16) break;
  }
  return h;
}

/**
 * Regularised incomplete beta function I_x(a, b) (DLMF 8.17.2), by its continued fraction,
 * using the symmetry I_x(a, b) = 1 − I_{1−x}(b, a) where it converges faster.
 * @throws RangeError when a, b ≤ 0 or x ∉ [0, 1]
 */
export function incompleteBeta(x: number, a: number, b: number): number {
  if (!(a > 0) || !(b > 0)) throw new RangeError(`a and b must be positive, got ${a} and ${b}`);
  if (!(x >= 0 && x <= 1)) throw new RangeError(`x must be in [0, 1], got ${x}`);
  if (x === 0 || x === 1) return x;
  const front = Math.exp(logGamma(a + b) - logGamma(a) - logGamma(b) + a * Math.log(x) + b * Math.log(1 - x));
  if (x < (a + 1) / (a + b + 2)) return (front * betaFraction(a, b, x)) / a;
  return 1 - (front * betaFraction(b, a, 1 - x)) / b;
}

/**
 * Student t CDF with ν degrees of freedom: P(T ≤ t) = 1 − ½ I_{ν/(ν+t²)}(ν/2, ½) for t ≥ 0
 * (DLMF 8.17.5 / Abramowitz & Stegun 26.7.1).
 * @throws RangeError when ν is not positive or t is NaN
 */
export function studentTCdf(t: number, nu: number): number {
  if (!(nu > 0)) throw new RangeError(`degrees of freedom must be positive, got ${nu}`);
  if (Number.isNaN(t)) throw new RangeError("t must not be NaN");
  if (!Number.isFinite(t)) return t > 0 ? 1 : 0;
  const tail = 0.5 * incompleteBeta(nu / (nu + t * t), nu / 2, 0.5);
  return t >= 0 ? 1 - tail : tail;
}

/**
 * Standard normal CDF Φ(z) = ½ erfc(−z/√2), with erfc(u) = Q(½, u²) evaluated by the series of
 * P(½, ·) for u² < 1.5 and the continued fraction of Q(½, ·) otherwise (DLMF 8.11.4, 8.9.2).
 * @throws RangeError when z is NaN
 */
export function normalCdf(z: number): number {
  if (Number.isNaN(z)) throw new RangeError("z must not be NaN");
  if (!Number.isFinite(z)) return z > 0 ? 1 : 0;
  const u = Math.abs(z) / Math.SQRT2;
  const erfc = u * u < 1.5 ? 1 - lowerGammaHalf(u * u) : upperGammaHalf(u * u);
  return z >= 0 ? 1 - 0.5 * erfc : 0.5 * erfc;
}

/** P(½, x) by its power series (DLMF 8.11.4). */
function lowerGammaHalf(x: number): number {
  let term = 1 / 0.5;
  let sum = term;
  for (let k = 1; k < 300; k++) {
    term *= x / (0.5 + k);
    sum += term;
    if (term < sum * 1e-17) break;
  }
  return sum * Math.exp(-x + 0.5 * Math.log(x) - logGamma(0.5));
}

/** Q(½, x) by its continued fraction, modified Lentz (DLMF 8.9.2; NR §6.2). */
function upperGammaHalf(x: number): number {
  const tiny = 1e-300;
  let b = x + 1 - 0.5;
  let c = 1 / tiny;
  let d = 1 / b;
  let h = d;
  for (let i = 1; i < 300; i++) {
    const an = -i * (i - 0.5);
    b += 2;
    d = an * d + b;
    d = Math.abs(d) < tiny ? tiny : d;
    c = b + an / c;
    c = Math.abs(c) < tiny ? tiny : c;
    d = 1 / d;
    const del = d * c;
    h *= del;
    if (Math.abs(del - 1) < 1e-16) break;
  }
  return Math.exp(-x + 0.5 * Math.log(x) - logGamma(0.5)) * h;
}

/**
 * Inverts a continuous increasing CDF by bisection to full double precision (common practice).
 * @param cdf the distribution function
 * @param p probability in (0, 1)
 * @param lo, hi a bracket with cdf(lo) < p < cdf(hi)
 */
export function invertCdf(cdf: (x: number) => number, p: number, lo: number, hi: number): number {
  if (!(p > 0 && p < 1)) throw new RangeError(`p must be in (0, 1), got ${p}`);
  while (cdf(lo) > p) lo *= 2;
  while (cdf(hi) < p) hi *= 2;
  for (let i = 0; i < 200 && hi - lo > 1e-15 * Math.max(1, Math.abs(lo)); i++) {
    const mid = 0.5 * (lo + hi);
    if (cdf(mid) < p) lo = mid;
    else hi = mid;
  }
  return 0.5 * (lo + hi);
}
