/** A richness estimate from abundance counts. */
export interface RichnessEstimate {
  /** Estimated number of classes, observed plus unseen. */
  estimate: number;
  /** Classes observed (non-zero counts). */
  observed: number;
  /** Singletons f1 and doubletons f2. */
  f1: number;
  f2: number;
  /** Which form was used. */
  form: "classic" | "bias-corrected";
}

/**
 * Chao1 lower-bound estimator of the number of classes (here: stable equilibria of a network,
 * with abundances = number of starts reaching each) from the singletons f1 and doubletons f2:
 * S_obs + f1² / (2 f2) when f2 > 0 (A. Chao, "Nonparametric estimation of the number of classes
 * in a population", Scand. J. Stat. 11 (1984) 265), and the bias-corrected form
 * S_obs + f1 (f1 − 1) / (2 (f2 + 1)) when f2 = 0 (A. Chao, Biometrics 43 (1987) 783; the form
 * used by EstimateS), which stays finite.
 * @param counts abundance of each observed class (zeros are ignored)
 * @returns estimate with its ingredients
 * @throws RangeError when a count is negative or not an integer
 */
export function chao1(counts: readonly number[]): RichnessEstimate {
  let observed = 0;
  let f1 = 0;
  let f2 = 0;
  counts.forEach((c, i) => {
    if (!Number.isSafeInteger(c) || c < 0) throw new RangeError(`counts[${i}] must be a non-negative integer, got ${c}`);
    if (c > 0) observed++;
    if (c === 1) f1++;
    if (c === 2) f2++;
  });
  if (f2 > 0) return { estimate: observed + (f1 * f1) / (2 * f2), observed, f1, f2, form: "classic" };
  return { estimate: observed + (f1 * (f1 - 1)) / 2, observed, f1, f2, form: "bias-corrected" };
}
