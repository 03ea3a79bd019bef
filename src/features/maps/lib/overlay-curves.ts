import { boundaryCurve, originStabilityCurve } from "../../../../shared/theory/curves";
import { SPECIAL_FILLS } from "./palettes";

export type CurveId = "m-one" | "m-stable" | "origin";

/** A predicted line over the (μ, τ) plane, with what it means and where it comes from. */
export interface OverlayCurve {
  id: CurveId;
  label: string;
  meaning: string;
  points: { mu: number; tau: number }[];
  color: string;
  dash: string;
}

interface CurveMap {
  ensemble: string;
  settings: Record<string, unknown>;
  muCritical: number | null;
}

const SAMPLES = 81;

function tausOver([lo, hi]: [number, number]): number[] {
  const a = Math.max(0, Math.min(lo, hi));
  const b = Math.min(1, Math.max(lo, hi));
  return Array.from({ length: SAMPLES }, (_, k) => a + ((b - a) * k) / (SAMPLES - 1));
}

/**
 * The predicted curves that apply to a map, sampled over the τ range shown:
 * field network — m = 1 (μ = σ√N, Fyodorov & Khoruzhenko 2016) and m_st(τ) (Ben Arous,
 * Fyodorov & Khoruzhenko 2021); rate network — the origin's stability line μ = g(1+τ)
 * (elliptic law, Sommers et al. 1988). All are large-N results.
 */
export function overlayCurves(map: CurveMap, tauRange: [number, number]): OverlayCurve[] {
  const taus = tausOver(tauRange);
  const out: OverlayCurve[] = [];
  const muC = map.muCritical;
  if (map.ensemble === "field" && muC != null && muC > 0) {
    out.push({
      id: "m-one",
      label: "m = 1",
      meaning: "Right of it one equilibrium; left of it exponentially many (Fyodorov & Khoruzhenko 2016). Large-N.",
      points: [
        { mu: muC, tau: taus[0] },
        { mu: muC, tau: taus[taus.length - 1] },
      ],
      color: SPECIAL_FILLS.curveTotal,
      dash: "6 4",
    });
    out.push({
      id: "m-stable",
      label: "m_st(τ)",
      meaning: "Left of it stable equilibria are exponentially many too; between it and m = 1 they are exponentially rare (Ben Arous, Fyodorov & Khoruzhenko 2021). Large-N.",
      points: boundaryCurve(taus).map((p) => ({ mu: muC * p.mStable, tau: p.tau })),
      color: SPECIAL_FILLS.curveStable,
      dash: "",
    });
  }
  const g = Number(map.settings.g);
  if (map.ensemble === "rate" && Number.isFinite(g) && g > 0) {
    out.push({
      id: "origin",
      label: "μ = g(1+τ)",
      meaning: "Right of it the origin is stable, left of it unstable: the elliptic-law edge (Sommers, Crisanti, Sompolinsky & Stein 1988). Large-N, zero input.",
      points: originStabilityCurve(g, taus),
      color: SPECIAL_FILLS.curveOrigin,
      dash: "",
    });
  }
  return out;
}
