import type { Estimate } from "../../../shared/schemas/theory";
import { logSumExp } from "./log-space";

/** Largest ln x with x a finite double. */
const LOG_MAX = Math.log(Number.MAX_VALUE);
/** One-sided 95 % normal quantile. */
const Z95 = 1.6448536269514722;
/** One-sided 97.5 % normal quantile. */
const Z975 = 1.959963984540054;

/**
 * Sample mean and its standard error from per-sample logs ℓ_k = ln V_k, V_k ≥ 0, without
 * leaving log space: ln V̄ = logsumexp(ℓ) − ln K and se/V̄ = √(Σ(V_k/V̄ − 1)²/(K(K−1))).
 * @param logs per-sample logs (−∞ for V_k = 0), at least 2
 * @returns mean, se (null beyond the double range), logMean (null when V̄ = 0), logSe = se/V̄
 * @throws RangeError with fewer than 2 samples or a NaN log
 */
export function summarizeLogSamples(logs: ArrayLike<number>): Estimate {
  const k = logs.length;
  if (k < 2) throw new RangeError(`need at least 2 samples for a standard error, got ${k}`);
  const logMean = logSumExp(logs) - Math.log(k);
  if (logMean === -Infinity) return { mean: 0, se: 0, logMean: null, logSe: null };
  let ss = 0;
  for (let i = 0; i < k; i++) ss += (Math.exp(logs[i] - logMean) - 1) ** 2;
  const rel = Math.sqrt(ss / (k * (k - 1)));
  const mean = logMean < LOG_MAX ? Math.exp(logMean) : null;
  const se = mean !== null && Number.isFinite(mean * rel) ? mean * rel : null;
  return { mean, se, logMean, logSe: rel };
}

/**
 * One-sided 95 % upper bound on E N_st. With a positive estimate: mean + 1.645 se (normal
 * approximation). When every sample is exactly 0 (only possible without a shift to integrate,
 * τ = 0), Cauchy–Schwarz E[D·1_S] ≤ √(E[D²]·P(S)) with P(S) below its Clopper–Pearson 97.5 %
 * bound 1 − 0.025^{1/K} for 0 successes in K (Clopper & Pearson, Biometrika 26 (1934) 404) and
 * E[D²] below mean + 1.96 se of the sampled D² = (|det|/μ^N)²; the union gives 95 %.
 * @param stable summary of the stable samples
 * @param totalLogs per-sample ln(|det|/μ^N), used only when every stable sample is 0
 * @returns upper95 (null beyond the double range) and its log
 */
export function stableUpperBound(
  stable: Estimate,
  totalLogs: ArrayLike<number>,
): { upper95: number | null; logUpper95: number } {
  let logUpper: number;
  if (stable.logMean !== null) {
    logUpper = stable.logMean + Math.log1p(Z95 * (stable.logSe ?? 0));
  } else {
    const k = totalLogs.length;
    const squares = Array.from(totalLogs, (v) => 2 * v);
    const second = summarizeLogSamples(squares);
    const logSecond = (second.logMean ?? -Infinity) + Math.log1p(Z975 * (second.logSe ?? 0));
    const logP = Math.log(-Math.expm1(Math.log(0.025) / k));
    logUpper = 0.5 * (logSecond + logP);
  }
  return { upper95: logUpper < LOG_MAX ? Math.exp(logUpper) : null, logUpper95: logUpper };
}
