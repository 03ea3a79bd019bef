import { cx, type Complex } from "./complex";
import { gaussLegendre } from "./gauss-legendre";
import { shiftDecomposition } from "./shift-decomposition";

/** Options of exactTotalKacRice. */
export interface ExactTotalOptions {
  /** Number of units, an integer in [1, EXACT_TOTAL_MAX_N]. */
  N: number;
  /** Relaxation rate μ > 0. */
  mu: number;
  /** Asymmetry τ ∈ [0, 1]. */
  tau: number;
  /** Jacobian scale σ > 0 (default 1). */
  sigma?: number;
}

/** Largest N accepted by exactTotalKacRice (the recursion stays accurate well past it). */
export const EXACT_TOTAL_MAX_N = 40;

const GL = gaussLegendre(16);

/** ∫_a^b f(u) du along the straight segment, composite 16-point Gauss–Legendre. */
function segmentIntegral(f: (u: Complex) => Complex, a: Complex, b: Complex, pieces: number): Complex {
  const d = cx.sub(b, a);
  let sum = cx.of(0);
  for (let p = 0; p < pieces; p++) {
    for (let i = 0; i < GL.nodes.length; i++) {
      const s = (p + 0.5 + 0.5 * GL.nodes[i]) / pieces;
      sum = cx.add(sum, cx.scale(f(cx.add(a, cx.scale(d, s))), (0.5 * GL.weights[i]) / pieces));
    }
  }
  return cx.mul(sum, d);
}

/** Normalised polynomials c_k = C_k/√(k!), C_{k+1} = zC_k − k t C_{k−1}: returns c_0..c_n. */
function normalisedC(z: Complex, t: number, n: number): Complex[] {
  const c: Complex[] = [cx.of(1), z];
  for (let k = 1; k < n; k++) {
    c.push(cx.scale(cx.sub(cx.mul(z, c[k]), cx.scale(c[k - 1], Math.sqrt(k) * t)), 1 / Math.sqrt(k + 1)));
  }
  return c;
}

/** c_n alone, without allocating. */
function normalisedLast(z: Complex, t: number, n: number): Complex {
  if (n === 0) return cx.of(1);
  let prev = cx.of(1);
  let cur = z;
  for (let k = 1; k < n; k++) {
    const next = cx.scale(cx.sub(cx.mul(z, cur), cx.scale(prev, Math.sqrt(k) * t)), 1 / Math.sqrt(k + 1));
    prev = cur;
    cur = next;
  }
  return cur;
}

/** F_N(z) = E|det(z − X_N)| for real elliptic X_N of correlation t (science.md §1 closed form). */
function makeDensityMoment(n: number, t: number): (z: Complex) => Complex {
  const s2 = 1 + t;
  const weighted = (u: Complex) => cx.mul(cx.exp(cx.scale(cx.mul(u, u), -0.5 / s2)), normalisedLast(u, t, n - 1));
  const pieces = (len: number) => Math.max(1, Math.ceil(len / Math.sqrt(s2)));
  let base = 0; // Ĩ(0): 0 for odd N; (N−2)!!√(1+t)/√((N−1)!) − ∫_0^∞ w c_{N−1} for even N
  if (n % 2 === 0) {
    let k = Math.sqrt(s2);
    for (let j = n - 2; j > 1; j -= 2) k *= j;
    let fact = 1;
    for (let j = 2; j < n; j++) fact *= j;
    const top = Math.sqrt(s2) * (Math.sqrt(2 * n) + 14);
    base = k / Math.sqrt(fact) - segmentIntegral(weighted, cx.of(0), cx.of(top), pieces(top)).re;
  }
  let logPref = (n / 2) * Math.LN2 + 0.5 * Math.log(s2 / Math.PI);
  for (let j = n - 1; j > 0; j -= 2) logPref += Math.log(j / 2); // Γ((N+1)/2)
  if (n % 2 === 0) logPref += 0.5 * Math.log(Math.PI);
  const pref = Math.exp(logPref);
  return (z: Complex) => {
    const c = normalisedC(z, t, n);
    let squares = cx.of(0);
    for (let k = 0; k < n; k++) squares = cx.add(squares, cx.mul(c[k], c[k]));
    const gauss = cx.exp(cx.scale(cx.mul(z, z), -0.5 / s2));
    const tilde = cx.add(cx.of(base), segmentIntegral(weighted, cx.of(0), z, pieces(cx.abs(z))));
    const second = cx.scale(cx.mul(c[n], tilde), Math.sqrt(n) / s2);
    return cx.scale(cx.add(cx.mul(gauss, squares), second), pref);
  };
}

function checkExact(o: ExactTotalOptions): number {
  if (!Number.isSafeInteger(o.N) || o.N < 1 || o.N > EXACT_TOTAL_MAX_N) {
    throw new RangeError(`N must be an integer in [1, ${EXACT_TOTAL_MAX_N}], got ${o.N}`);
  }
  if (!(o.mu > 0) || !Number.isFinite(o.mu)) throw new RangeError(`mu must be > 0, got ${o.mu}`);
  const sigma = o.sigma ?? 1;
  if (!(sigma > 0) || !Number.isFinite(sigma)) throw new RangeError(`sigma must be > 0, got ${sigma}`);
  return o.mu / sigma;
}

/** Composite Gauss–Legendre of g over [−W, W], W grown until |g| is 40 nats below its peak. */
function integrateLine(g: (w: number) => number): number {
  let top = Math.abs(g(0));
  let w = 0;
  for (; w < 400; w += 0.5) {
    const edge = Math.max(Math.abs(g(w)), Math.abs(g(-w)));
    top = Math.max(top, edge);
    if (w >= 8 && edge < top * 4e-18) break;
  }
  const pieces = Math.ceil((2 * w) / 0.5);
  let sum = 0;
  for (let p = 0; p < pieces; p++) {
    const a = -w + p * 0.5;
    for (let i = 0; i < GL.nodes.length; i++) sum += 0.25 * GL.weights[i] * g(a + 0.25 * (1 + GL.nodes[i]));
  }
  return sum;
}

/**
 * Exact finite-N E N_tot of the Gaussian field network from the real-eigenvalue density of the
 * elliptic ensemble (Edelman–Kostlan–Shub trick, Edelman, Kostlan & Shub, J. AMS 7 (1994) 247,
 * as used by Fyodorov & Khoruzhenko, PNAS 113 (2016) 6827): with α = 1 + ε_N, γ = τ − ε_N,
 * t = γ/α, E N_tot = μ^{−N} α^{N/2} ∫ N(ξ; 0, γ) F_N((μ − ξ)/√α) dξ, where F_N(z) = E|det(z − X_N)|
 * has the closed form of science.md §1 (evaluated with the normalised recursion c_k = C_k/√k!
 * and Gauss–Legendre for its Gaussian-weighted integral). For γ < 0 (τ < 1/(N+1)) the shift's
 * variance is negative and the formula is continued analytically,
 * E = μ^{−N} α^{N/2} ∫ Re F_N((μ − i√|γ| w)/√α) φ(w) dw.
 * @param options N ∈ [1, 40], μ > 0, τ ∈ [0, 1], σ > 0 (default 1)
 * @returns E N_tot (≥ 1 up to rounding)
 * @throws RangeError on bad options, or when the result leaves the double range
 */
export function exactTotalKacRice(options: ExactTotalOptions): number {
  const mu = checkExact(options);
  const n = options.N;
  const d = shiftDecomposition(n, options.tau);
  const F = makeDensityMoment(n, d.t);
  const root = Math.sqrt(d.alpha);
  const norm = Math.exp((n / 2) * Math.log(d.alpha) - n * Math.log(mu));
  const sd = Math.sqrt(Math.abs(d.gamma));
  const phi = (w: number) => Math.exp(-0.5 * w * w) / Math.sqrt(2 * Math.PI);
  let value: number;
  if (d.gamma === 0) value = F(cx.of(mu / root)).re;
  else if (d.gamma > 0) value = integrateLine((w) => phi(w) * F(cx.of((mu - sd * w) / root)).re);
  else value = integrateLine((w) => phi(w) * F(cx.of(mu / root, (-sd * w) / root)).re);
  const result = norm * value;
  if (!Number.isFinite(result)) throw new RangeError(`exact E N_tot left the double range at N = ${n}, mu = ${options.mu}`);
  return result;
}
