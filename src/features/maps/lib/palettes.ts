// Equilibrist's own heatmap palettes. Each sequential ramp falls monotonically in OKLab
// lightness (checked in tests/src/maps/palettes.test.ts), so "more" always reads as "darker";
// the diverging ramp is lightest at its centre (Σ = 0, ratio = 1) and darkens both ways.
import type { Regime } from "../../../../shared/schemas/theory";

/** Counts: pale sand → sage → lagoon → deep basin → night violet. */
export const TIDE = ["#fbf6e4", "#dcebc1", "#93c9a3", "#46a09a", "#2a7189", "#2b4a73", "#2e2a55"] as const;

/** Shares of runs or networks: paper → apricot → clay → plum. */
export const KILN = ["#fdf6ec", "#f6d9a9", "#eaa872", "#cf7355", "#a14b62", "#5e2e5e"] as const;

/** Signed values (complexity around 0, log counts around 0, ratios around 1): basin ← paper → ember. */
export const SADDLE = ["#173f5c", "#3f7f99", "#98c5cc", "#f3eee3", "#f1c197", "#dc7c42", "#8f3a17"] as const;

/** The three large-N regimes, as calm, warning and deep. */
export const REGIME_COLORS: Readonly<Record<Regime, string>> = {
  "one-stable": "#b9d8b0",
  "stable-rare": "#e88f55",
  "stable-abundant": "#245d77",
};

/** Fills of cells that have no colour of their own. */
export const SPECIAL_FILLS = {
  /** Drawn under a hatch: still being computed. */
  pending: "#ece6d8",
  pendingHatch: "#c9bfa8",
  /** Done, but this layer has no number for it (e.g. theory row not in yet). */
  empty: "#e2ddd2",
  failed: "#f3d5d9",
  failedMark: "#b13447",
  /** Ink and paper used inside exported figures (no CSS there). */
  ink: "#16202a",
  inkSoft: "#48525f",
  paper: "#fffdf8",
  curveStable: "#8f3a17",
  curveTotal: "#16202a",
  curveOrigin: "#5e2e5e",
} as const;
