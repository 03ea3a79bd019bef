import type { z } from "zod";
import type { createMapSchema } from "../../../../../shared/schemas/maps";

/** What the new-map form edits: the create body before zod fills its defaults. */
export type MapFormValues = z.input<typeof createMapSchema>;
export type FormEnsemble = MapFormValues["ensemble"];

const budget = { networks: 6, starts: 12, tMax: 200, rtol: 1e-6, atol: 1e-9, exhaustive: false };

/**
 * Starting points per ensemble, chosen so the μ axis straddles the predicted change:
 * rate network with g = 1 — the origin's stability line μ = g(1+τ) runs from 1 to 2;
 * field network with N = 20, σ = 1 — μ_c = σ√N ≈ 4.5, so μ from 0.5 to 6 covers m ≈ 0.1 … 1.3.
 */
export const ensembleDefaults: Record<FormEnsemble, Pick<MapFormValues, "settings" | "mu" | "tau" | "budget">> = {
  rate: {
    settings: { N: 50, g: 1, nonlinearity: "tanh", input: 0 },
    mu: { min: 0.25, max: 2.5, steps: 10, scale: "linear" },
    tau: { min: 0, max: 1, steps: 6, scale: "linear" },
    budget,
  },
  field: {
    settings: { N: 20, sigma: 1, lengthScale: 1 },
    mu: { min: 0.5, max: 6, steps: 10, scale: "linear" },
    tau: { min: 0, max: 1, steps: 6, scale: "linear" },
    budget: { ...budget, starts: 16 },
  },
};

/** The whole form's first values for an ensemble. */
export function initialValues(ensemble: FormEnsemble): MapFormValues {
  return {
    title: "",
    description: "",
    ensemble,
    ...structuredClone(ensembleDefaults[ensemble]),
    seed: 1,
    visibility: "private",
    groupId: null,
  } as MapFormValues;
}

/** Every field the server may name in a 422, so its message lands on the field. */
export const FORM_FIELDS = [
  "title", "description", "settings.N", "settings.g", "settings.input", "settings.nonlinearity", "settings.sigma",
  "settings.features", "settings.lengthScale", "mu.min", "mu.max", "mu.steps", "mu.scale", "tau.min", "tau.max",
  "tau.steps", "tau.scale", "budget.networks", "budget.starts", "budget.tMax", "budget.rtol", "budget.atol",
  "budget.exhaustive", "seed", "visibility", "groupId",
] as const;

/** Plain-words help under each field. */
export const HELP = {
  title: "A name you will recognise in your list, e.g. “tanh units, N = 50, weak input”.",
  description: "Optional: what the map is for. Readers of a shared map see it.",
  rateN: "Number of units in each random network. Larger N is closer to theory but slower (cost grows like N²).",
  g: "Coupling strength: J has entries of variance g²/N. Around μ = g(1+τ) the origin loses stability.",
  input: "A constant drive added to every unit. With 0 the origin is always a fixed point.",
  fieldN: "Dimension of the state. Cost grows like N × features.",
  sigma: "Scale of the random field's Jacobian. It sets μ_c = σ√N, where equilibria multiply.",
  features: "Random Fourier features M used to sample the field. Empty means 40 × N; more is closer to a Gaussian field.",
  lengthScale: "Correlation length ℓ of the random field.",
  muMin: "Smallest relaxation rate μ (the leak). Small μ: coupling dominates, many equilibria.",
  muMax: "Largest μ. Large μ: the leak dominates and one stable state remains.",
  steps: "Number of grid points along this axis (at most 64).",
  scale: "Spacing of the points: even steps, or even ratios (log; needs min > 0).",
  tauMin: "Smallest asymmetry τ: 0 means no reciprocity between J_ij and J_ji.",
  tauMax: "Largest τ: 1 means fully symmetric couplings (a gradient system).",
  networks: "Random networks K sampled per cell. Means and intervals are over these networks.",
  starts: "Random starting points S per network. More starts find more of the stable states.",
  tMax: "Time limit of one run. Runs that have not settled by then are classified as moving.",
  rtol: "Relative tolerance of the adaptive ODE solver.",
  atol: "Absolute tolerance of the adaptive ODE solver.",
  exhaustive: "Also search every equilibrium, stable or not, by Newton with deflation (N ≤ 10 only). Slow.",
  seed: "Base seed: the same seed gives the same networks and starts, so the map is reproducible.",
} as const;
