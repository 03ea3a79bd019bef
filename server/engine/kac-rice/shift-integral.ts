import { logIntegrate, type LogIntegrateOptions } from "./log-integrate";
import { logAbsCharPoly, type PreparedSpectrum } from "./spectrum";

/** Logs of one matrix's Kac–Rice integrands, already divided by μ^N. */
export interface ShiftIntegral {
  /** ln E_ξ |det(μ − ξ − J')| / μ^N. */
  logTotal: number;
  /** ln E_ξ [det(μ − ξ − J') 1{ξ + max Re λ(J') < μ}] / μ^N (−∞ when it is 0). */
  logStable: number;
}

const LOG_SQRT_2PI = 0.5 * Math.log(2 * Math.PI);

/** Envelope E(w) = −w²/2 + N ln(μ + s|w| + R) ≥ L(w), and its maximiser w_e > 0. */
function envelope(spec: PreparedSpectrum, mu: number, s: number) {
  const c = mu + spec.radius;
  const at = (w: number) => -0.5 * w * w + spec.n * Math.log(c + s * Math.abs(w));
  const peak = (-c + Math.sqrt(c * c + 4 * spec.n * s * s)) / (2 * s);
  return { at, peak };
}

/** First |w| beyond the envelope's peak where the envelope is `drop` nats below `ref`. */
function tailStart(at: (w: number) => number, from: number, ref: number, drop: number, sign: 1 | -1): number {
  let w = from;
  for (let i = 0; i < 400 && at(w) > ref - drop; i++) w = w * 1.25 + sign;
  return w;
}

/**
 * One matrix's Kac–Rice integrals over the scalar shift ξ = s·w, w ~ N(0, 1), by quadrature:
 * ∫ φ(w) |det(μ − s w − J')| dw / μ^N and the same restricted to the stable side
 * w < (μ − max Re λ)/s, where det > 0 (science.md §1, numerical advice). The integrand is
 * handled in log space through ln|det(y − J')| = Σ ln|y − λ_i|, split at the kinks y = real λ_i,
 * on a range fixed by the envelope E(w) = −w²/2 + N ln(μ + s|w| + ρ(J')) ≥ L(w): the dominant ξ
 * is a large deviation of order √N, far outside the bulk of N(0, s²), and is captured because the
 * range follows the integrand, not the Gaussian. With s = 0 both reduce to point values.
 * @param spec prepared spectrum of J' (σ = 1 units)
 * @param mu relaxation rate in σ units, μ/σ > 0
 * @param s shift standard deviation √η ≥ 0
 * @param options quadrature options (see LogIntegrateOptions)
 * @returns the two logs
 * @throws RangeError on μ ≤ 0 or s < 0
 */
export function integrateShift(
  spec: PreparedSpectrum,
  mu: number,
  s: number,
  options: LogIntegrateOptions = {},
): ShiftIntegral {
  if (!(mu > 0) || !Number.isFinite(mu)) throw new RangeError(`mu must be > 0, got ${mu}`);
  if (!(s >= 0) || !Number.isFinite(s)) throw new RangeError(`shift sd must be ≥ 0, got ${s}`);
  const logMuN = spec.n * Math.log(mu);
  if (s === 0) {
    const logTotal = logAbsCharPoly(spec, mu) - logMuN;
    return { logTotal, logStable: mu > spec.maxRe ? logTotal : -Infinity };
  }
  const margin = options.margin ?? 40;
  const L = (w: number) => -0.5 * w * w + logAbsCharPoly(spec, mu - s * w);
  const env = envelope(spec, mu, s);
  const ref = Math.max(L(0), L(1), L(-1));
  const W = tailStart(env.at, env.peak + 2, ref, margin + 5, 1);
  const breaks = Array.from(spec.real, (r) => (mu - r) / s).sort((a, b) => a - b);
  const logTotal = logIntegrate(L, -W, W, breaks, options);

  const ws = (mu - spec.maxRe) / s;
  const nearEdge = Math.max(L(ws - 0.5), L(ws - 1), L(ws - 2), ws > 0.5 ? L(0) : -Infinity);
  const refStable = Number.isFinite(nearEdge) ? nearEdge : ref;
  const lo = tailStart(env.at, Math.min(ws - 1, -env.peak - 2), refStable, margin + 5, -1);
  const hi = Math.min(ws, W);
  const logStable = logIntegrate(L, lo, hi, [], options);
  return { logTotal: logTotal - LOG_SQRT_2PI - logMuN, logStable: logStable - LOG_SQRT_2PI - logMuN };
}
