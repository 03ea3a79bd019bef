/**
 * A spectrum arranged for fast evaluation of ln|det(y − J')| = Σ_i ln|y − λ_i| at many real y:
 * real eigenvalues sorted ascending, and one entry (Re λ, (Im λ)²) per complex-conjugate pair.
 */
export interface PreparedSpectrum {
  readonly n: number;
  readonly real: Float64Array;
  readonly pairRe: Float64Array;
  readonly pairIm2: Float64Array;
  /** Spectral abscissa max_i Re λ_i. */
  readonly maxRe: number;
  /** Spectral radius max_i |λ_i|. */
  readonly radius: number;
}

/**
 * Arranges eigenvalues (as returned by spectra/eigenvalues.ts: conjugate pairs with Im ≠ 0)
 * for logAbsCharPoly.
 * @param re real parts
 * @param im imaginary parts (same length)
 * @returns the prepared spectrum
 * @throws RangeError on mismatched lengths, non-finite values or unpaired complex eigenvalues
 */
export function prepareSpectrum(re: Float64Array, im: Float64Array): PreparedSpectrum {
  const n = re.length;
  if (n === 0 || im.length !== n) throw new RangeError(`re and im must have the same non-zero length, got ${n}, ${im.length}`);
  const real: number[] = [];
  const pairRe: number[] = [];
  const pairIm2: number[] = [];
  let upper = 0;
  let lower = 0;
  let maxRe = -Infinity;
  let radius = 0;
  for (let i = 0; i < n; i++) {
    if (!Number.isFinite(re[i]) || !Number.isFinite(im[i])) throw new RangeError(`eigenvalue ${i} is not finite`);
    maxRe = Math.max(maxRe, re[i]);
    radius = Math.max(radius, Math.hypot(re[i], im[i]));
    if (im[i] === 0) real.push(re[i]);
    else if (im[i] > 0) {
      upper += 1;
      pairRe.push(re[i]);
      pairIm2.push(im[i] * im[i]);
    } else lower += 1;
  }
  if (upper !== lower) throw new RangeError(`complex eigenvalues are not in conjugate pairs (${upper} vs ${lower})`);
  real.sort((a, b) => a - b);
  return {
    n,
    real: Float64Array.from(real),
    pairRe: Float64Array.from(pairRe),
    pairIm2: Float64Array.from(pairIm2),
    maxRe,
    radius,
  };
}

const BIG = 1e100;
const SMALL = 1e-100;

/**
 * ln|det(y I − J')| = Σ_i ln|y − λ_i| for real y, by a running product folded into a log
 * whenever it leaves [1e−100, 1e100] (one log per few factors instead of one per eigenvalue).
 * @param spec prepared spectrum of J'
 * @param y real point
 * @returns the log modulus, −∞ when y is a real eigenvalue
 */
export function logAbsCharPoly(spec: PreparedSpectrum, y: number): number {
  let logAcc = 0;
  let prod = 1;
  const { real, pairRe, pairIm2 } = spec;
  for (let i = 0; i < real.length; i++) {
    prod *= Math.abs(y - real[i]);
    if (prod > BIG || prod < SMALL) {
      if (prod === 0) return -Infinity;
      logAcc += Math.log(prod);
      prod = 1;
    }
  }
  for (let i = 0; i < pairRe.length; i++) {
    const d = y - pairRe[i];
    prod *= d * d + pairIm2[i];
    if (prod > BIG || prod < SMALL) {
      if (prod === 0) return -Infinity;
      logAcc += Math.log(prod);
      prod = 1;
    }
  }
  return logAcc + Math.log(prod);
}
