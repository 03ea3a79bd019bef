/**
 * Logistic regression of binomial outcomes on one covariate, logit P(success | x) = a + b·x,
 * fitted by Newton's method on the log-likelihood, which for the canonical logit link is
 * iteratively reweighted least squares (McCullagh & Nelder, Generalized Linear Models, 2nd ed.,
 * 1989, §2.5 and §4.4). Optionally with Firth's penalty (D. Firth, "Bias reduction of maximum
 * likelihood estimates", Biometrika 80 (1993) 27), whose estimates stay finite when the data
 * are separated (every failure below every success), where the maximum-likelihood fit has none.
 */

export interface LogisticFitOptions {
  /** "ml" (default): maximum likelihood; "firth": Firth's penalised likelihood ℓ + ½ ln det I. */
  method?: "ml" | "firth";
  /** Newton iterations at most. Default 100. */
  maxIterations?: number;
  /** Converged when every coefficient moves less than this (in standardised x). Default 1e-10. */
  tolerance?: number;
  /** Starting (a, b), e.g. the fit to the full data when refitting bootstrap resamples. Default (0, 0). */
  start?: readonly [number, number];
}

export interface LogisticFit {
  /** a in logit p = a + b·x. */
  intercept: number;
  /** b in logit p = a + b·x. */
  slope: number;
  /** Inverse Fisher information at the fit, [[var a, cov], [cov, var b]]. */
  covariance: [[number, number], [number, number]];
  /** √ of the covariance's diagonal: [se a, se b]. */
  standardErrors: [number, number];
  /** Σ y ln p + (n − y) ln(1 − p) at the fit (binomial coefficients left out; no penalty). */
  logLikelihood: number;
  iterations: number;
  method: "ml" | "firth";
  /** Total number of trials behind the fit. */
  trials: number;
}

interface Groups {
  /** Standardised covariate u = (x − centre)/scale. */
  u: number[];
  y: number[];
  n: number[];
  centre: number;
  scale: number;
}

/** ln(1 + e^z) without overflow. */
function softplus(z: number): number {
  return z > 0 ? z + Math.log1p(Math.exp(-z)) : Math.log1p(Math.exp(z));
}

function sigmoid(z: number): number {
  return z >= 0 ? 1 / (1 + Math.exp(-z)) : Math.exp(z) / (1 + Math.exp(z));
}

function checkData(x: readonly number[], successes: readonly number[], trials: readonly number[]): Groups {
  if (x.length !== successes.length || x.length !== trials.length) {
    throw new RangeError(`x, successes and trials must have equal lengths, got ${x.length}, ${successes.length}, ${trials.length}`);
  }
  const kept: number[] = [];
  for (let i = 0; i < x.length; i++) {
    if (!Number.isFinite(x[i])) throw new RangeError(`x[${i}] must be finite, got ${x[i]}`);
    if (!Number.isSafeInteger(trials[i]) || trials[i] < 0) throw new RangeError(`trials[${i}] must be a non-negative integer, got ${trials[i]}`);
    if (!Number.isSafeInteger(successes[i]) || successes[i] < 0 || successes[i] > trials[i]) {
      throw new RangeError(`successes[${i}] must be an integer in [0, ${trials[i]}], got ${successes[i]}`);
    }
    if (trials[i] > 0) kept.push(i);
  }
  const total = kept.reduce((s, i) => s + trials[i], 0);
  if (total === 0) throw new RangeError("trials must not all be zero");
  const centre = kept.reduce((s, i) => s + trials[i] * x[i], 0) / total;
  const spread = Math.sqrt(kept.reduce((s, i) => s + trials[i] * (x[i] - centre) ** 2, 0) / total);
  if (!(spread > 1e-12 * Math.max(1, Math.abs(centre)))) throw new RangeError("x must take at least two distinct values among groups with trials");
  return { u: kept.map((i) => (x[i] - centre) / spread), y: kept.map((i) => successes[i]), n: kept.map((i) => trials[i]), centre, scale: spread };
}

/**
 * True when the outcomes are (quasi-)completely separated by x: a threshold c puts every
 * failure at x ≤ c and every success at x ≥ c, or the reverse (including all successes or all
 * failures). The maximum-likelihood fit then does not exist (Albert & Anderson, Biometrika 71
 * (1984) 1).
 * @throws RangeError on malformed data (see fitLogistic)
 */
export function isSeparated(x: readonly number[], successes: readonly number[], trials: readonly number[]): boolean {
  checkData(x, successes, trials);
  let maxFail = -Infinity, minFail = Infinity, maxSucc = -Infinity, minSucc = Infinity;
  for (let i = 0; i < x.length; i++) {
    if (successes[i] > 0) { maxSucc = Math.max(maxSucc, x[i]); minSucc = Math.min(minSucc, x[i]); }
    if (trials[i] - successes[i] > 0) { maxFail = Math.max(maxFail, x[i]); minFail = Math.min(minFail, x[i]); }
  }
  return maxFail <= minSucc || maxSucc <= minFail;
}

interface Step {
  /** Fisher information of (α, β) in standardised u: [i00, i01, i11]. */
  info: [number, number, number];
  /** (Penalised) score. */
  score: [number, number];
  /** (Penalised) objective, to be maximised. */
  objective: number;
  logLik: number;
}

function evaluate(g: Groups, alpha: number, beta: number, firth: boolean): Step | null {
  let i00 = 0, i01 = 0, i11 = 0, logLik = 0;
  const p = g.u.map((u) => sigmoid(alpha + beta * u));
  for (let k = 0; k < g.u.length; k++) {
    const eta = alpha + beta * g.u[k];
    logLik -= g.y[k] * softplus(-eta) + (g.n[k] - g.y[k]) * softplus(eta);
    const w = g.n[k] * p[k] * (1 - p[k]);
    i00 += w; i01 += w * g.u[k]; i11 += w * g.u[k] * g.u[k];
  }
  const det = i00 * i11 - i01 * i01;
  if (!(det > 0)) return null;
  let s0 = 0, s1 = 0;
  for (let k = 0; k < g.u.length; k++) {
    let r = g.y[k] - g.n[k] * p[k];
    if (firth) {
      const w = g.n[k] * p[k] * (1 - p[k]);
      const h = (w * (i11 - 2 * i01 * g.u[k] + i00 * g.u[k] * g.u[k])) / det;
      r += h * (0.5 - p[k]);
    }
    s0 += r; s1 += r * g.u[k];
  }
  const objective = firth ? logLik + 0.5 * Math.log(det) : logLik;
  return { info: [i00, i01, i11], score: [s0, s1], objective, logLik };
}

/** Newton step I⁻¹U, each component capped at 5 (as logistf does) to keep the first steps sane. */
function newtonStep(s: Step): [number, number] {
  const [i00, i01, i11] = s.info;
  const det = i00 * i11 - i01 * i01;
  const d0 = (i11 * s.score[0] - i01 * s.score[1]) / det;
  const d1 = (-i01 * s.score[0] + i00 * s.score[1]) / det;
  const big = Math.max(Math.abs(d0), Math.abs(d1));
  return big > 5 ? [(d0 * 5) / big, (d1 * 5) / big] : [d0, d1];
}

function checkOptions(o: LogisticFitOptions): Required<Omit<LogisticFitOptions, "start">> & { start: readonly [number, number] } {
  const method = o.method ?? "ml";
  if (method !== "ml" && method !== "firth") throw new RangeError(`method must be "ml" or "firth", got ${String(method)}`);
  const maxIterations = o.maxIterations ?? 100;
  if (!Number.isSafeInteger(maxIterations) || maxIterations < 1) throw new RangeError(`maxIterations must be a positive integer, got ${maxIterations}`);
  const tolerance = o.tolerance ?? 1e-10;
  if (!(tolerance > 0)) throw new RangeError(`tolerance must be positive, got ${tolerance}`);
  const start = o.start ?? [0, 0];
  if (!Number.isFinite(start[0]) || !Number.isFinite(start[1])) throw new RangeError(`start must hold two finite numbers, got ${String(start)}`);
  return { method, maxIterations, tolerance, start };
}

/**
 * Fits logit P(success | x) = a + b·x to grouped binomial data by Newton–Raphson / IRLS
 * (McCullagh & Nelder 1989, §4.4), with step halving when the (penalised) log-likelihood does
 * not rise. x is standardised internally and the coefficients mapped back. With method
 * "firth" the score is Firth's modified score U* = Σ x_k (y_k − n_k p_k + h_k (½ − p_k)), h_k
 * the hat-matrix diagonal (Firth 1993, eq. 9 for the logit link).
 * @param x covariate of each group (e.g. ln μ of a cell)
 * @param successes successes in each group (e.g. networks with exactly one stable state)
 * @param trials trials in each group; groups with 0 trials are ignored
 * @param options method ("ml"), maxIterations (100), tolerance (1e-10), start ([0, 0])
 * @returns coefficients, covariance (inverse Fisher information), log-likelihood
 * @throws RangeError on malformed data, x with a single value, separated data with method
 *   "ml" (use "firth"), or no convergence
 */
export function fitLogistic(x: readonly number[], successes: readonly number[], trials: readonly number[], options: LogisticFitOptions = {}): LogisticFit {
  const o = checkOptions(options);
  const g = checkData(x, successes, trials);
  const firth = o.method === "firth";
  if (!firth && isSeparated(x, successes, trials)) {
    throw new RangeError("the outcomes are separated by x, so the maximum-likelihood fit does not exist; use method \"firth\"");
  }
  // (a, b) in x → (α, β) in u = (x − c)/s: α = a + b·c, β = b·s.
  let alpha = o.start[0] + o.start[1] * g.centre, beta = o.start[1] * g.scale;
  let s = evaluate(g, alpha, beta, firth);
  if (!s) {
    alpha = 0; beta = 0;
    s = evaluate(g, 0, 0, firth) as Step;
  }
  for (let it = 1; it <= o.maxIterations; it++) {
    const [d0, d1] = newtonStep(s);
    let t = 1;
    let next = evaluate(g, alpha + d0, beta + d1, firth);
    for (let h = 0; h < 30 && (!next || next.objective < s.objective - 1e-12 * Math.abs(s.objective)); h++) {
      t /= 2;
      next = evaluate(g, alpha + t * d0, beta + t * d1, firth);
    }
    if (!next) throw new RangeError("the logistic fit left the region where the information is positive definite");
    alpha += t * d0;
    beta += t * d1;
    s = next;
    if (Math.max(Math.abs(t * d0), Math.abs(t * d1)) < o.tolerance) return mapBack(g, alpha, beta, s, it, o.method);
  }
  throw new RangeError(`the logistic fit did not converge in ${o.maxIterations} iterations`);
}

/** Coefficients and covariance of (a, b) in x from those of (α, β) in u = (x − c)/s. */
function mapBack(g: Groups, alpha: number, beta: number, s: Step, iterations: number, method: "ml" | "firth"): LogisticFit {
  const [i00, i01, i11] = s.info;
  const det = i00 * i11 - i01 * i01;
  const v00 = i11 / det, v01 = -i01 / det, v11 = i00 / det;
  const k = g.centre / g.scale;
  // a = α − β c/s, b = β/s: a linear map J = [[1, −c/s], [0, 1/s]], Cov = J V Jᵀ.
  const a00 = v00 - 2 * k * v01 + k * k * v11;
  const a01 = (v01 - k * v11) / g.scale;
  const a11 = v11 / (g.scale * g.scale);
  return {
    intercept: alpha - beta * k,
    slope: beta / g.scale,
    covariance: [[a00, a01], [a01, a11]],
    standardErrors: [Math.sqrt(a00), Math.sqrt(a11)],
    logLikelihood: s.logLik,
    iterations,
    method,
    trials: g.n.reduce((a, b) => a + b, 0),
  };
}

/**
 * The covariate value at which a fitted logistic curve reaches probability p: x = (logit p − a)/b.
 * @param fit intercept a and slope b
 * @param p probability in (0, 1) (default ½: x = −a/b)
 * @returns x, or null when the slope is 0 (the curve never crosses p)
 * @throws RangeError when p ∉ (0, 1)
 */
export function logisticCrossing(fit: Pick<LogisticFit, "intercept" | "slope">, p = 0.5): number | null {
  if (!(p > 0 && p < 1)) throw new RangeError(`p must be in (0, 1), got ${p}`);
  if (fit.slope === 0) return null;
  return (Math.log(p / (1 - p)) - fit.intercept) / fit.slope;
}
