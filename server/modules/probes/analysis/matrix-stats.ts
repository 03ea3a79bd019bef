import type { Estimate, ProbeStats } from "../../../../shared/schemas/probes";

/** Two-sided 95 % normal quantile (common practice). */
const Z95 = 1.959963984540054;

interface Moments {
  count: number;
  mean: number;
  /** Sample standard deviation (divisor count − 1; 0 for one value). */
  sd: number;
}

function moments(values: Float64Array): Moments {
  const count = values.length;
  let s = 0;
  for (let k = 0; k < count; k++) s += values[k];
  const mean = count > 0 ? s / count : 0;
  let ss = 0;
  for (let k = 0; k < count; k++) ss += (values[k] - mean) ** 2;
  return { count, mean, sd: count > 1 ? Math.sqrt(ss / (count - 1)) : 0 };
}

/** Pairs (J_ij, J_ji), i < j, as two aligned arrays. */
function pairsOf(j: Float64Array, n: number): { x: Float64Array; y: Float64Array } {
  const count = (n * (n - 1)) / 2;
  const x = new Float64Array(count);
  const y = new Float64Array(count);
  let p = 0;
  for (let r = 0; r < n; r++) {
    for (let c = r + 1; c < n; c++) {
      x[p] = j[r * n + c];
      y[p] = j[c * n + r];
      p++;
    }
  }
  return { x, y };
}

/**
 * ĝ from the off-diagonal variance: ĝ² = N · s², s² the sample variance of the N(N−1)
 * off-diagonal entries (the rate ensemble has Var J_ij = g²/N, science.md §2). Its standard error
 * treats the pairs {J_ij, J_ji} as the independent units (they are, in the ensemble; the two
 * entries of a pair are correlated by τ): SE(s²) = sd(u_p)/√P with u_p = ((J_ij − m)² +
 * (J_ji − m)²)/2, then SE(ĝ) = N·SE(s²)/(2ĝ) by the delta method; the interval is the square root
 * of s² ± 1.96·SE(s²), times N. Null below N = 3 (fewer than two pairs).
 */
function gEstimate(n: number, x: Float64Array, y: Float64Array, off: Moments): Estimate | null {
  const P = x.length;
  if (P < 2 || off.sd === 0) return null;
  const u = new Float64Array(P);
  for (let p = 0; p < P; p++) u[p] = ((x[p] - off.mean) ** 2 + (y[p] - off.mean) ** 2) / 2;
  const s2 = off.sd * off.sd;
  const se2 = moments(u).sd / Math.sqrt(P);
  const g = Math.sqrt(n * s2);
  return { estimate: g, se: (n * se2) / (2 * g), lower: Math.sqrt(Math.max(0, n * (s2 - Z95 * se2))), upper: Math.sqrt(n * (s2 + Z95 * se2)) };
}

/**
 * τ̂ = Pearson correlation of J_ij with J_ji over the P = N(N−1)/2 pairs i < j (science.md §2:
 * corr(J_ij, J_ji) = τ). Standard error (1 − r²)/√(P − 3) and a 95 % interval from Fisher's z
 * transform, tanh(atanh r ± 1.96/√(P − 3)) (R. A. Fisher, Biometrika 10 (1915) 507; normal
 * theory). Null below N = 4 (P < 4) or when either side of the pairs is constant.
 */
function tauEstimate(x: Float64Array, y: Float64Array): Estimate | null {
  const P = x.length;
  if (P < 4) return null;
  const mx = moments(x);
  const my = moments(y);
  if (mx.sd === 0 || my.sd === 0) return null;
  let sxy = 0;
  for (let p = 0; p < P; p++) sxy += (x[p] - mx.mean) * (y[p] - my.mean);
  const r = Math.max(-1, Math.min(1, sxy / (P - 1) / (mx.sd * my.sd)));
  if (Math.abs(r) === 1) return { estimate: r, se: 0, lower: r, upper: r };
  const w = Z95 / Math.sqrt(P - 3);
  const z = Math.atanh(r);
  return { estimate: r, se: (1 - r * r) / Math.sqrt(P - 3), lower: Math.tanh(z - w), upper: Math.tanh(z + w) };
}

/**
 * Entry statistics of a coupling matrix and its rate-ensemble parameters: ĝ (off-diagonal
 * variance), τ̂ (pair correlation), the off-diagonal mean with the standard error over pairs,
 * diagonal mean/sd/min/max, the diagonal sd the ensemble would have at (ĝ, τ̂) — Var J_ii =
 * g²(1 + τ)/N (science.md §2) —, the mean row sum and the Frobenius norm.
 * @param j couplings, row-major n × n, finite
 * @param n N ≥ 1
 * @returns the statistics (g and tau null when N is too small to estimate them)
 * @throws RangeError when j does not hold n × n entries or an entry is not finite
 */
export function matrixStats(j: Float64Array, n: number): ProbeStats {
  if (!Number.isSafeInteger(n) || n < 1 || j.length !== n * n) throw new RangeError(`j must hold n × n entries for n = ${n}, got ${j.length}`);
  const bad = j.findIndex((v) => !Number.isFinite(v));
  if (bad >= 0) throw new RangeError(`j[${bad}] must be finite, got ${j[bad]}`);
  const { x, y } = pairsOf(j, n);
  const both = new Float64Array(2 * x.length);
  both.set(x);
  both.set(y, x.length);
  const off = moments(both);
  const pairMeans = x.map((v, p) => (v + y[p]) / 2);
  const diag = Float64Array.from({ length: n }, (_, i) => j[i * n + i]);
  const d = moments(diag);
  const g = gEstimate(n, x, y, off);
  const tau = tauEstimate(x, y);
  let rows = 0;
  let ff = 0;
  for (let k = 0; k < j.length; k++) {
    rows += j[k];
    ff += j[k] * j[k];
  }
  return {
    n,
    g,
    tau,
    pairs: x.length,
    offDiagonal: { count: off.count, mean: off.mean, meanSe: x.length > 1 ? moments(pairMeans).sd / Math.sqrt(x.length) : 0, sd: off.sd },
    diagonal: { count: n, mean: d.mean, sd: d.sd, min: Math.min(...diag), max: Math.max(...diag) },
    ensembleDiagonalSd: g && tau ? g.estimate * Math.sqrt((1 + tau.estimate) / n) : null,
    rowSumMean: rows / n,
    frobenius: Math.sqrt(ff),
  };
}
