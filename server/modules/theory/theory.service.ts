import type {
  BoundaryQuery,
  BoundaryResponse,
  FieldTheoryQuery,
  FieldTheoryResponse,
  RateTheoryQuery,
  RateTheoryResponse,
} from "../../../shared/schemas/theory";
import {
  TYPICAL_INDEX_SHARE_LABEL,
  ellipseAxes,
  expectedRealEigenvaluesLargeN,
  fieldMuCritical,
  logMStable,
  mStable,
  originStabilityMu,
  rateReferenceLines,
  regimeOf,
  sigmaStable,
  sigmaTotal,
  typicalIndexShare,
} from "../../../shared/theory";
import type { KacRiceTaskResult } from "../../engine/kac-rice/kac-rice.worker";
import { InvalidError } from "../../lib/errors";
import { LruCache, normalizedKey } from "./theory.cache";
import type { KacRiceRunner } from "./theory.pool";

const FIELD_LABELS = {
  asymptotic:
    "sigmaTotal, sigmaStable, regime, mStable: large-N (asymptotic) limits of (1/N) ln E N — Fyodorov & Khoruzhenko, PNAS 113 (2016) 6827; Ben Arous, Fyodorov & Khoruzhenko, PNAS 118 (2021) e2023719118",
  finiteN:
    "finiteN: Kac–Rice expectation at this N — Monte Carlo over `samples` elliptic matrices with the scalar shift integrated by quadrature (mean ± se; heavy-tailed at large N, so se may understate the error); exactTotal from the real-eigenvalue density formula for N ≤ 30",
  typicalIndexShare: TYPICAL_INDEX_SHARE_LABEL,
};

const RATE_LABELS = {
  ellipse: "elliptic-law support of J, semi-axes g(1±τ): asymptotic (N → ∞), Sommers, Crisanti, Sompolinsky & Stein, PRL 60 (1988) 1895",
  expectedRealEigenvalues: "√(2N/π·(1+τ)/(1−τ)): asymptotic, Forrester & Nagao, J. Phys. A 41 (2008) 375003",
  m: "m = μ/g (the τ = 0 chaos transition sits at m = 1; Sompolinsky, Crisanti & Sommers, PRL 61 (1988) 259)",
};

/** Public theory values: closed forms at once, the field network's Monte Carlo in a worker. */
export class TheoryService {
  private readonly cache = new LruCache<Promise<unknown>>(500);

  constructor(private readonly runner: KacRiceRunner) {}

  /** Asymptotic and finite-N Kac–Rice values of the Gaussian field network at (N, μ, τ, σ). */
  field(q: FieldTheoryQuery): Promise<FieldTheoryResponse> {
    return this.cached(normalizedKey("field", q), async () => {
      const muC = fieldMuCritical(q.N, q.sigma);
      const m = q.mu / muC;
      const result = await this.runMonteCarlo(q);
      const st = sigmaStable(m, q.tau);
      return {
        N: q.N,
        mu: q.mu,
        tau: q.tau,
        sigma: q.sigma,
        m,
        muC,
        sigmaTotal: sigmaTotal(m),
        sigmaStable: Number.isFinite(st) ? st : null,
        regime: regimeOf(m, q.tau),
        mStable: mStable(q.tau),
        typicalIndexShare: typicalIndexShare(m),
        finiteN: {
          total: result.point.total,
          stable: result.point.stable,
          exactTotal: result.exactTotal,
          samples: q.samples,
          seed: q.seed,
        },
        labels: FIELD_LABELS,
      };
    });
  }

  /** Reference lines and elliptic-law values of the rate network at (N, μ, τ, g). */
  rate(q: RateTheoryQuery): Promise<RateTheoryResponse> {
    return this.cached(normalizedKey("rate", q), async () => {
      const line = originStabilityMu(q.g, q.tau);
      return {
        N: q.N,
        mu: q.mu,
        tau: q.tau,
        g: q.g,
        muC: q.g,
        m: q.mu / q.g,
        originStabilityMu: line,
        originStable: q.mu > line,
        gain: q.g / q.mu,
        ellipse: ellipseAxes(q.g, q.tau),
        expectedRealEigenvalues: expectedRealEigenvaluesLargeN(q.N, q.tau),
        lines: rateReferenceLines(q.g, q.tau),
        labels: RATE_LABELS,
      };
    });
  }

  /** The boundary m_st(τ) between rare and abundant stable equilibria (BFK 2021). */
  boundary(q: BoundaryQuery): Promise<BoundaryResponse> {
    return this.cached(normalizedKey("boundary", q), async () => {
      const log = logMStable(q.tau);
      return { tau: q.tau, mStable: mStable(q.tau), logMStable: Number.isFinite(log) ? log : null };
    });
  }

  private async runMonteCarlo(q: FieldTheoryQuery): Promise<KacRiceTaskResult> {
    try {
      return await this.runner.run({ N: q.N, sigma: q.sigma, tau: q.tau, mu: q.mu, samples: q.samples, seed: q.seed });
    } catch (err) {
      // The engine names the parameter it refuses; the query schema should have caught it first.
      if (err instanceof RangeError || err instanceof TypeError) throw new InvalidError(err.message);
      throw err;
    }
  }

  private cached<T>(key: string, compute: () => Promise<T>): Promise<T> {
    const hit = this.cache.get(key);
    if (hit) return hit as Promise<T>;
    const pending = compute();
    this.cache.set(key, pending);
    pending.catch(() => this.cache.delete(key));
    return pending;
  }
}

export function createTheoryService(runner: KacRiceRunner): TheoryService {
  return new TheoryService(runner);
}
