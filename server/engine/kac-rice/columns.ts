import type { FiniteNKacRice, TheoryColumns } from "../../../shared/schemas/theory";
import {
  fieldMuCritical,
  mStable,
  originStabilityMu,
  rateMuCritical,
  rateReferenceLines,
  regimeOf,
  sigmaStable,
  sigmaTotal,
} from "../../../shared/theory";
import { exactTotalKacRice } from "./exact-total";
import { kacRiceRow, type KacRicePointResult } from "./monte-carlo";

/** Monte Carlo settings of the finite-N Kac–Rice columns. */
export interface KacRiceSettings {
  /** Number of sampled matrices K ≥ 2. */
  samples: number;
  /** Base seed (safe integer). */
  seed: number;
}

/** Input of theoryColumnsRow: the ensemble id with the parameters theory needs. */
export interface TheoryRowInput {
  /** "field", "rate", or another registered id (which gets all-null columns: no theory). */
  ensemble: string;
  /** Ensemble parameters: field needs { N, sigma }, rate needs { N, g }; other keys are ignored. */
  params: { N: number; sigma?: number; g?: number };
  /** Relaxation rates μ > 0 of the row. */
  mus: readonly number[];
  /** Asymmetry τ ∈ [0, 1] of the row. */
  tau: number;
  /** When given (field only), the finite-N Kac–Rice Monte Carlo; omitted: finiteN is null. */
  kacRice?: KacRiceSettings;
}

/** The exact total is added to the finite-N columns up to this N (cost grows like N²). */
export const EXACT_TOTAL_COLUMN_MAX_N = 30;

const NO_THEORY: TheoryColumns = { muCritical: null, m: null, asymptotic: null, finiteN: null, rateLines: null };

function finiteN(r: KacRicePointResult, settings: KacRiceSettings, exactTotal: number | null): FiniteNKacRice {
  return { total: r.total, stable: r.stable, exactTotal, samples: r.samples, seed: settings.seed };
}

function fieldRow(input: TheoryRowInput, sigma: number): TheoryColumns[] {
  const { N } = input.params;
  const muC = fieldMuCritical(N, sigma);
  const mSt = mStable(input.tau);
  const mc = input.kacRice
    ? kacRiceRow({ N, sigma, tau: input.tau, mus: input.mus, samples: input.kacRice.samples, seed: input.kacRice.seed })
    : null;
  return input.mus.map((mu, j) => {
    const m = mu / muC;
    const st = sigmaStable(m, input.tau);
    const exact = mc && N <= EXACT_TOTAL_COLUMN_MAX_N ? exactTotalKacRice({ N, mu, tau: input.tau, sigma }) : null;
    return {
      muCritical: muC,
      m,
      asymptotic: {
        sigmaTotal: sigmaTotal(m),
        sigmaStable: Number.isFinite(st) ? st : null,
        regime: regimeOf(m, input.tau),
        mStable: mSt,
      },
      finiteN: mc && input.kacRice ? finiteN(mc[j], input.kacRice, exact) : null,
      rateLines: null,
    };
  });
}

function rateRow(input: TheoryRowInput, g: number): TheoryColumns[] {
  const muC = rateMuCritical(g);
  const line = originStabilityMu(g, input.tau);
  const chaos = rateReferenceLines(g, input.tau)[1];
  return input.mus.map((mu) => ({
    muCritical: muC,
    m: mu / muC,
    asymptotic: null,
    finiteN: null,
    rateLines: {
      originStabilityMu: line,
      originStable: mu > line,
      gain: g / mu,
      chaosOnsetMu: chaos.mu,
      chaosOnsetLabel: chaos.label,
    },
  }));
}

function checkRowInput(input: TheoryRowInput): void {
  if (input === null || typeof input !== "object") throw new TypeError("input must be an object");
  if (!Array.isArray(input.mus) || input.mus.length === 0) throw new TypeError("mus must be a non-empty array");
  for (const mu of input.mus) if (!(mu > 0) || !Number.isFinite(mu)) throw new RangeError(`mu must be > 0, got ${mu}`);
  if (typeof input.tau !== "number" || !(input.tau >= 0 && input.tau <= 1)) {
    throw new RangeError(`tau must be in [0, 1], got ${input.tau}`);
  }
  if (!input.params || typeof input.params !== "object") throw new TypeError("params must be an object");
}

/**
 * The theory columns (shared/schemas/theory.ts) of every cell of one τ row. Field network:
 * μ_c = σ√N, m, the asymptotic Σ_tot (Fyodorov & Khoruzhenko, PNAS 113 (2016) 6827), Σ_st,
 * regime and m_st(τ) (Ben Arous, Fyodorov & Khoruzhenko, PNAS 118 (2021) e2023719118), and —
 * when `kacRice` is given — the finite-N Kac–Rice Monte Carlo of kacRiceRow (one set of matrices
 * for the whole row) with the exact total for N ≤ 30. Rate network: μ_c = g, m = μ/g and the
 * reference lines of rate-lines.ts (no closed-form complexity: asymptotic and finiteN null).
 * Any other ensemble id: all columns null.
 * @param input ensemble id, parameters, μ values, τ and optional Monte Carlo settings
 * @returns one TheoryColumns per μ, in order
 * @throws RangeError/TypeError naming a bad parameter
 */
export function theoryColumnsRow(input: TheoryRowInput): TheoryColumns[] {
  checkRowInput(input);
  if (input.ensemble === "field") return fieldRow(input, input.params.sigma as number);
  if (input.ensemble === "rate") return rateRow(input, input.params.g as number);
  return input.mus.map(() => ({ ...NO_THEORY }));
}

/**
 * The theory columns of one cell: theoryColumnsRow with a single μ (see there). For a whole τ
 * row call theoryColumnsRow, which shares the sampled matrices across μ.
 * @param input as TheoryRowInput with `mu` instead of `mus`
 * @returns the cell's TheoryColumns
 * @throws RangeError/TypeError naming a bad parameter
 */
export function theoryColumns(input: Omit<TheoryRowInput, "mus"> & { mu: number }): TheoryColumns {
  const { mu, ...rest } = input;
  return theoryColumnsRow({ ...rest, mus: [mu] })[0];
}
