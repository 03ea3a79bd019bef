import { assertPositive, assertTau } from "./checks";

/**
 * Relaxation rate below which the origin of dx/dt = −μx + Jφ(x) (zero input, φ'(0) = 1) is
 * unstable: μ = g(1 + τ), the right edge of the elliptic-law support of J (Sommers, Crisanti,
 * Sompolinsky & Stein, PRL 60 (1988) 1895). Asymptotic (N → ∞): at finite N the edge of one
 * matrix fluctuates around it.
 * @param g coupling gain g > 0
 * @param tau correlation τ ∈ [0, 1]
 * @returns μ = g(1 + τ)
 * @throws RangeError when g or τ is out of range
 */
export function originStabilityMu(g: number, tau: number): number {
  assertPositive("g", g);
  assertTau(tau);
  return g * (1 + tau);
}

/** Status of a reference line's source. */
export type LineSourceStatus = "published" | "recalled-unconfirmed" | "not-applicable";

/** One mean-field reference line of the rate network at a given τ. */
export interface RateReferenceLine {
  id: "origin-stability" | "chaos-onset";
  /** μ on the line at this (g, τ), or null where the line does not exist. */
  mu: number | null;
  status: LineSourceStatus;
  /** Human label, including the source and its status. */
  label: string;
}

const CHAOS_TAU0 =
  "onset of chaos at g/μ = 1 (Sompolinsky, Crisanti & Sommers, PRL 61 (1988) 259)";
const CHAOS_TAU_POSITIVE =
  "onset of chaos at g/μ = 1/(1+τ): recalled from Martí, Brunel & Ostojic, PRE 97 (2018) 062314, not yet confirmed from the text";
const NO_CHAOS_TAU1 = "τ = 1: symmetric couplings have an energy function, no chaos (settles to fixed points)";

/**
 * The rate network's mean-field reference lines at (g, τ), each with its source:
 * the origin-stability line μ = g(1+τ) (Sommers et al., PRL 60 (1988) 1895), and the onset of
 * chaos — at τ = 0 the same line g/μ = 1 (Sompolinsky, Crisanti & Sommers, PRL 61 (1988) 259);
 * for 0 < τ < 1 the line g/μ = 1/(1+τ), a claim recalled from Martí, Brunel & Ostojic, PRE 97
 * (2018) 062314 and not yet confirmed from the text; none at τ = 1 (gradient dynamics).
 * @param g coupling gain g > 0
 * @param tau correlation τ ∈ [0, 1]
 * @returns the two lines with μ values and labels
 * @throws RangeError when g or τ is out of range
 */
export function rateReferenceLines(g: number, tau: number): RateReferenceLine[] {
  const mu = originStabilityMu(g, tau);
  const origin: RateReferenceLine = {
    id: "origin-stability",
    mu,
    status: "published",
    label: "origin stable iff μ > g(1+τ), elliptic-law edge (Sommers, Crisanti, Sompolinsky & Stein, PRL 60 (1988) 1895)",
  };
  let chaos: RateReferenceLine;
  if (tau === 1) chaos = { id: "chaos-onset", mu: null, status: "not-applicable", label: NO_CHAOS_TAU1 };
  else if (tau === 0) chaos = { id: "chaos-onset", mu, status: "published", label: CHAOS_TAU0 };
  else chaos = { id: "chaos-onset", mu, status: "recalled-unconfirmed", label: CHAOS_TAU_POSITIVE };
  return [origin, chaos];
}
