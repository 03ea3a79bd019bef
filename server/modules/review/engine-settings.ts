import { DEFAULT_MERGE_TOL } from "../../engine/equilibria/equilibrium-set";
import type { MapReport } from "../../../shared/schemas/review";

/**
 * Engine settings a printed report states beside the map's budget (which carries tMax, rtol and
 * atol). The cell runner uses the engine's defaults for these; the values mirror
 * engine/equilibria/run-settings.ts (resolveRunSettings) and newton.ts (refineEquilibrium),
 * and the merge tolerance is read from equilibrium-set.ts. ENGINE_VERSION changes whenever they do.
 */
export const ENGINE_SETTINGS: MapReport["engineSettings"] = Object.freeze([
  { name: "Integrator", value: "Dormand–Prince 5(4), adaptive, batched over starts", meaning: "How each start is integrated until still or tMax" },
  { name: "Stillness hand-off", value: "‖dx/dt‖∞ < 1e-5", meaning: "A nearly still state is handed to Newton's method" },
  { name: "Verification", value: "‖F(x*)‖∞ < 1e-10", meaning: "A fixed point counts only after Newton refinement reaches this residual" },
  { name: "Merge distance", value: `‖x − y‖∞ ≤ ${DEFAULT_MERGE_TOL.toExponential()} · max(1, ‖x‖∞)`, meaning: "Two refined fixed points closer than this are one" },
  { name: "Basin radius", value: "1e-3 · max(1, state scale)", meaning: "A run entering this ball around a known stable point is counted for it" },
  { name: "Stability", value: "max Re λ(J) < 0", meaning: "Stable when every Jacobian eigenvalue has negative real part" },
  { name: "Escape bound", value: "1e6 · max(1, state scale)", meaning: "A run beyond this is classed as escaping" },
]) as MapReport["engineSettings"];
