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

export const estimateSchema = z.object({ mean: z.number(), se: z.number().nonnegative() });

/** Finite-N Kac–Rice expectations (Monte Carlo over the elliptic matrix, shift by quadrature). */
export const finiteNKacRiceSchema = z.object({
  total: estimateSchema,
  stable: estimateSchema.extend({ upper95: z.number().nonnegative() }),
  /** Exact total from the real-eigenvalue density formula, where N is small enough. */
  exactTotal: z.number().nullable(),
  /** Number of elliptic matrices sampled. */
  samples: z.number().int().positive(),
});

/** Large-N (asymptotic) complexities: (1/N) ln E N → Σ. Labelled asymptotic in every view. */
export const asymptoticSchema = z.object({
  sigmaTotal: z.number(),
  sigmaStable: z.number(),
  regime: regimeSchema,
  /** m_st(τ): below it stable equilibria are exponentially many. */
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
});

/** Theory columns attached to every cell result. Null parts do not apply to the ensemble. */
export const theoryColumnsSchema = z.object({
  /** Critical relaxation rate μ_c (field: σ√N; rate: g(1+τ)), and m = μ/μ_c. */
  muCritical: z.number().nullable(),
  m: z.number().nullable(),
  asymptotic: asymptoticSchema.nullable(),
  finiteN: finiteNKacRiceSchema.nullable(),
  rateLines: rateLinesSchema.nullable(),
});
export type TheoryColumns = z.infer<typeof theoryColumnsSchema>;
