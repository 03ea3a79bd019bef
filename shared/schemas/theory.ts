import { z } from "zod";

/**
 * Regime of a (μ, τ) point for the Gaussian field network in the large-N limit
 * (Ben Arous, Fyodorov & Khoruzhenko, PNAS 118 (2021) e2023719118):
 * - "one-stable": m > 1, a single stable equilibrium ("trivial" phase in the paper);
 * - "stable-rare": m_st(τ) < m < 1, exponentially many equilibria, stable ones exponentially
 *   rare ("absolute instability");
 * - "stable-abundant": m < m_st(τ), stable equilibria exponentially many too ("relative
 *   instability").
 */
export const regimeSchema = z.enum(["one-stable", "stable-rare", "stable-abundant"]);
export type Regime = z.infer<typeof regimeSchema>;

/**
 * A Monte Carlo estimate of an expected count. Counts grow like e^{NΣ}, so the natural log is
 * always given too: `mean`/`se` are null when the value exceeds the double range (~1.8e308),
 * `logMean` is null only when the estimate is exactly 0; `logSe` = se/mean (delta method).
 */
export const estimateSchema = z.object({
  mean: z.number().nonnegative().nullable(),
  se: z.number().nonnegative().nullable(),
  logMean: z.number().nullable(),
  logSe: z.number().nonnegative().nullable(),
});
export type Estimate = z.infer<typeof estimateSchema>;

/** Finite-N Kac–Rice expectations (Monte Carlo over the elliptic matrix, shift by quadrature). */
export const finiteNKacRiceSchema = z.object({
  total: estimateSchema,
  /**
   * upper95 / logUpper95: one-sided 95 % upper bound (mean + 1.645 se, or a Cauchy–Schwarz and
   * Clopper–Pearson bound when every sample is exactly 0); null on overflow.
   */
  stable: estimateSchema.extend({
    upper95: z.number().nonnegative().nullable(),
    logUpper95: z.number().nullable(),
  }),
  /** Exact total from the real-eigenvalue density formula, where N is small enough. */
  exactTotal: z.number().nullable(),
  /** Number of elliptic matrices sampled. */
  samples: z.number().int().positive(),
  /** Base seed of the Monte Carlo (results are reproducible from it). */
  seed: z.number().int(),
});
export type FiniteNKacRice = z.infer<typeof finiteNKacRiceSchema>;

/** Large-N (asymptotic) complexities: (1/N) ln E N → Σ. Labelled asymptotic in every view. */
export const asymptoticSchema = z.object({
  sigmaTotal: z.number(),
  /** Null when Σ_st = −∞ (τ = 0, m < 1: stable equilibria rarer than any exponential). */
  sigmaStable: z.number().nullable(),
  regime: regimeSchema,
  /** m_st(τ): below it stable equilibria are exponentially many (0 when it underflows). */
  mStable: z.number(),
});

/** Reference lines of the rate network dx/dt = −μx + Jφ(x) + I at this (g, τ). */
export const rateLinesSchema = z.object({
  /** Origin stable iff μ > g(1+τ) (elliptic-law edge; Sommers et al., PRL 60 (1988) 1895). */
  originStabilityMu: z.number(),
  /** Whether the origin is linearly stable at this μ (only meaningful with zero input). */
  originStable: z.boolean(),
  /** g/μ at this point, the coupling gain against the leak. */
  gain: z.number(),
  /** Mean-field onset of chaos μ at this τ (null at τ = 1: no chaos). */
  chaosOnsetMu: z.number().nullable(),
  /** Source and status of the chaos-onset line (τ > 0: recalled, not yet confirmed). */
  chaosOnsetLabel: z.string(),
});

/** Theory columns attached to every cell result. Null parts do not apply to the ensemble. */
export const theoryColumnsSchema = z.object({
  /** Critical relaxation rate μ_c (field: σ√N; rate: g), and m = μ/μ_c. */
  muCritical: z.number().nullable(),
  m: z.number().nullable(),
  asymptotic: asymptoticSchema.nullable(),
  finiteN: finiteNKacRiceSchema.nullable(),
  rateLines: rateLinesSchema.nullable(),
});
export type TheoryColumns = z.infer<typeof theoryColumnsSchema>;
