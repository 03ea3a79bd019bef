import type { BoundaryRow, MapBoundary } from "../../../../shared/schemas/review";
import { formatNumber } from "../../../lib/format-number";
import { fmtSigned } from "../lib/format";

const STATUS_WORDS: Record<BoundaryRow["status"], string> = {
  crossed: "",
  "above-range": "share stays below ½: boundary above the largest μ",
  "below-range": "share stays above ½: boundary below the smallest μ",
  "no-trend": "share does not rise with μ",
  "too-few": "fewer than two cells done",
};

function band(r: BoundaryRow): string {
  if (r.low === null || r.high === null) return r.status === "crossed" ? "not determined" : "—";
  return `${formatNumber(r.low)} – ${formatNumber(r.high)}`;
}

function lost(r: BoundaryRow): string {
  if (r.muLost === null) return "—";
  return `${formatNumber(r.muLost)} (none at ${formatNumber(r.muLostBelow)})`;
}

/**
 * The boundary per τ row beside the predicted values: μ½ with its bootstrap band, the predicted
 * μ and the difference, the m_st(τ) line (field network) and the μ below which no stable
 * equilibrium was found.
 */
export function BoundaryTable({ boundary }: { boundary: MapBoundary }) {
  const field = boundary.ensemble === "field";
  return (
    <div className="overflow-x-auto">
      <table className="w-full min-w-[36rem] border-collapse text-sm">
        <caption className="sr-only">Boundary estimate per τ row</caption>
        <thead>
          <tr className="border-b border-line-strong text-left text-xs font-semibold text-ink-soft">
            <th scope="col" className="py-2 pr-3">τ</th>
            <th scope="col" className="py-2 pr-3">μ½ (estimate)</th>
            <th scope="col" className="py-2 pr-3">95 % band</th>
            <th scope="col" className="py-2 pr-3">{field ? "Predicted μ (m = 1)" : "Predicted μ = g(1 + τ)"}</th>
            <th scope="col" className="py-2 pr-3">μ½ − predicted</th>
            {field && <th scope="col" className="py-2 pr-3">μ at m_st(τ)</th>}
            <th scope="col" className="py-2">Stable states last found at μ</th>
          </tr>
        </thead>
        <tbody className="font-mono text-[0.82rem]">
          {boundary.rows.map((r) => (
            <tr key={r.j} className="border-b border-line align-top">
              <th scope="row" className="py-1.5 pr-3 text-left font-medium">{formatNumber(r.tau)}</th>
              <td className="py-1.5 pr-3">
                {r.muHalf === null ? <span className="font-sans text-xs text-ink-soft">{STATUS_WORDS[r.status]}</span> : formatNumber(r.muHalf)}
              </td>
              <td className="py-1.5 pr-3">{band(r)}</td>
              <td className="py-1.5 pr-3">{formatNumber(r.predictedMu)}</td>
              <td className="py-1.5 pr-3">{fmtSigned(r.difference)}</td>
              {field && <td className="py-1.5 pr-3">{formatNumber(r.predictedMuStable)}</td>}
              <td className="py-1.5">{lost(r)}</td>
            </tr>
          ))}
        </tbody>
      </table>
      <p className="mt-3 text-xs text-ink-soft">
        {boundary.method} Each row uses {boundary.rows[0]?.networks ?? 0} networks per cell; bands with more than 2.5 % of resamples
        without a crossing are reported as not determined. Found counts are lower bounds, so μ½ and the last-found μ are
        statements about what the runs found at this budget. Predicted lines are large-N results.
      </p>
    </div>
  );
}
