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

// ——— Public theory API (GET /api/theory/…): query and answer contracts ———

/** Largest N the field route accepts (its Monte Carlo costs ~samples·10N³ flops). */
export const THEORY_API_MAX_N = 200;
/** Budget samples·N³ of one field request (32 matrices at N = 200, about 2 s on one core). */
export const THEORY_API_COST_LIMIT = 32 * 200 ** 3;

const positive = (name: string) =>
  z.coerce.number({ error: `${name} must be a number` }).refine((v) => Number.isFinite(v) && v > 0, `${name} must be > 0`);
const tauQuery = z.coerce.number({ error: "tau must be a number" }).min(0, "tau must be in [0, 1]").max(1, "tau must be in [0, 1]");
const unitsQuery = (most: number) =>
  z.coerce
    .number({ error: "N must be a number" })
    .int("N must be a positive integer")
    .min(1, "N must be a positive integer")
    .max(most, `N must be at most ${most}`);

/** GET /api/theory/field?N=&mu=&tau=&sigma=&samples=&seed= */
export const fieldTheoryQuerySchema = z
  .object({
    N: unitsQuery(THEORY_API_MAX_N),
    mu: positive("mu"),
    tau: tauQuery,
    sigma: positive("sigma").default(1),
    samples: z.coerce.number().int().min(2).max(256).default(32),
    seed: z.coerce.number().int().min(0).max(2 ** 31 - 1).default(1),
  })
  .superRefine((q, ctx) => {
    if (q.samples * q.N ** 3 > THEORY_API_COST_LIMIT) {
      const most = Math.max(2, Math.floor(THEORY_API_COST_LIMIT / q.N ** 3));
      ctx.addIssue({ code: "custom", path: ["samples"], message: `At N = ${q.N} at most ${most} samples` });
    }
  });
export type FieldTheoryQuery = z.infer<typeof fieldTheoryQuerySchema>;

export const fieldTheoryResponseSchema = z.object({
  N: z.number().int(),
  mu: z.number(),
  tau: z.number(),
  sigma: z.number(),
  m: z.number(),
  muC: z.number(),
  sigmaTotal: z.number(),
  sigmaStable: z.number().nullable(),
  regime: regimeSchema,
  mStable: z.number(),
  typicalIndexShare: z.number(),
  finiteN: finiteNKacRiceSchema,
  /** What each part is: asymptotic (large N) or finite-N, with sources. */
  labels: z.record(z.string(), z.string()),
});
export type FieldTheoryResponse = z.infer<typeof fieldTheoryResponseSchema>;

/** GET /api/theory/rate?N=&mu=&tau=&g= */
export const rateTheoryQuerySchema = z.object({
  N: unitsQuery(1_000_000),
  mu: positive("mu"),
  tau: tauQuery,
  g: positive("g"),
});
export type RateTheoryQuery = z.infer<typeof rateTheoryQuerySchema>;

export const rateTheoryResponseSchema = z.object({
  N: z.number().int(),
  mu: z.number(),
  tau: z.number(),
  g: z.number(),
  muC: z.number(),
  m: z.number(),
  originStabilityMu: z.number(),
  originStable: z.boolean(),
  gain: z.number(),
  ellipse: z.object({ real: z.number(), imag: z.number() }),
  expectedRealEigenvalues: z.number(),
  lines: z.array(
    z.object({
      id: z.enum(["origin-stability", "chaos-onset"]),
      mu: z.number().nullable(),
      status: z.enum(["published", "recalled-unconfirmed", "not-applicable"]),
      label: z.string(),
    }),
  ),
  /** What each part is (asymptotic, with sources). */
  labels: z.record(z.string(), z.string()),
});
export type RateTheoryResponse = z.infer<typeof rateTheoryResponseSchema>;

/** GET /api/theory/boundary?tau= */
export const boundaryQuerySchema = z.object({ tau: tauQuery });
export type BoundaryQuery = z.infer<typeof boundaryQuerySchema>;

export const boundaryResponseSchema = z.object({
  tau: z.number(),
  mStable: z.number(),
  /** ln m_st(τ), finite where m_st underflows; null at τ = 0 (−∞). */
  logMStable: z.number().nullable(),
});
export type BoundaryResponse = z.infer<typeof boundaryResponseSchema>;
