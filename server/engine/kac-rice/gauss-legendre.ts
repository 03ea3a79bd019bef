/** Nodes x_i ∈ (−1, 1) and weights w_i of a Gauss–Legendre rule. */
export interface GaussRule {
  readonly nodes: Float64Array;
  readonly weights: Float64Array;
}

const cache = new Map<number, GaussRule>();

/**
 * The q-point Gauss–Legendre rule on [−1, 1], exact for polynomials of degree 2q − 1: nodes by
 * Newton's method on P_q from the Chebyshev-like guess cos(π(i − 1/4)/(q + 1/2)), weights
 * 2/((1 − x²) P_q′(x)²) (Abramowitz & Stegun, Handbook of Mathematical Functions, 25.4.29;
 * Press et al., Numerical Recipes, §4.6 gauleg). Cached per q.
 * @param q number of nodes, an integer in [1, 200]
 * @returns the rule (shared, do not modify)
 * @throws RangeError when q is out of range
 */
export function gaussLegendre(q: number): GaussRule {
  if (!Number.isSafeInteger(q) || q < 1 || q > 200) {
    throw new RangeError(`q must be an integer in [1, 200], got ${q}`);
  }
  const hit = cache.get(q);
  if (hit) return hit;
  const nodes = new Float64Array(q);
  const weights = new Float64Array(q);
  for (let i = 0; i < Math.ceil(q / 2); i++) {
    let x = Math.cos((Math.PI * (i + 0.75)) / (q + 0.5));
    let dp = 1;
    for (let iter = 0; iter < 100; iter++) {
      let p0 = 1;
      let p1 = x;
      for (let k = 2; k <= q; k++) {
        const p2 = ((2 * k - 1) * x * p1 - (k - 1) * p0) / k;
        p0 = p1;
        p1 = p2;
      }
      dp = (q * (x * p1 - p0)) / (x * x - 1);
      const dx = p1 / dp;
      x -= dx;
      if (Math.abs(dx) < 1e-16) break;
    }
    nodes[i] = -x;
    nodes[q - 1 - i] = x;
    weights[i] = weights[q - 1 - i] = 2 / ((1 - x * x) * dp * dp);
  }
  const rule = { nodes, weights };
  cache.set(q, rule);
  return rule;
}
