import type { MapComparison } from "../../../../shared/schemas/review";
import { fmtShare } from "../lib/format";

/**
 * The comparison in one sentence: how many tested cells agree at the 5 % level, with a Wilson
 * 95 % interval, what to expect if the maps sample the same thing, and which settings differ.
 */
export function AgreementSummary({ comparison }: { comparison: MapComparison }) {
  const s = comparison.summary;
  const verdict =
    s.agreeShare === null
      ? null
      : s.agreeUpper !== null && s.agreeUpper < 0.95
        ? "Fewer cells agree than the about 95 % expected if both maps sampled the same thing"
        : "In line with the about 95 % expected if both maps sample the same thing";
  return (
    <div className="flex flex-col gap-2">
      <p className="text-lg font-semibold text-ink">
        {s.tested === 0 ? (
          "No cell can be tested yet"
        ) : (
          <>
            {s.agreeing} of {s.tested} tested cells agree <span className="font-normal text-ink-soft">({fmtShare(s.agreeShare)}, 95 % interval {fmtShare(s.agreeLower)} – {fmtShare(s.agreeUpper)})</span>
          </>
        )}
      </p>
      {verdict && <p className="text-sm text-ink">{verdict}.</p>}
      <p className="text-sm text-ink-soft">
        A cell agrees when Welch&apos;s t test on the per-network counts of stable states finds no difference at the 5 % level. If both
        maps sample the same distribution, about 95 % of cells agree by chance alone. The cells of one map share its networks (common
        random numbers), so their verdicts are correlated and the interval is a guide, not a test; with few networks per cell Welch&apos;s
        test is approximate (each cell also shows an exact permutation p-value when it is cheap). {s.cells - s.tested > 0 && `${s.cells - s.tested} cells are not done on both sides yet. `}
        Settings that differ: {s.differingSettings.length ? s.differingSettings.join(", ") : "none"}.
      </p>
    </div>
  );
}
