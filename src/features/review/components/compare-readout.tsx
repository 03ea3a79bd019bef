import type { CompareCell } from "../../../../shared/schemas/review";
import { formatNumber } from "../../../lib/format-number";
import { fmtP, fmtShare, fmtSigned } from "../lib/format";

/** The hovered cell of a comparison: both values, their difference and the tests. */
export function CompareReadout({ cell, names }: { cell: CompareCell | null; names: [string, string] }) {
  if (!cell) return <p className="text-sm text-ink-soft">Point at or tap a cell to see both maps&apos; numbers and the test.</p>;
  const row = (label: string, a: string, b: string, d: string) => (
    <tr className="border-b border-line">
      <th scope="row" className="py-1 pr-2 text-left font-normal text-ink-soft">{label}</th>
      <td className="py-1 pr-2 font-mono">{a}</td>
      <td className="py-1 pr-2 font-mono">{b}</td>
      <td className="py-1 font-mono">{d}</td>
    </tr>
  );
  return (
    <div className="flex flex-col gap-2 text-sm">
      <p className="font-mono text-xs text-ink-soft">μ = {formatNumber(cell.mu)}, τ = {formatNumber(cell.tau)}</p>
      <table className="w-full border-collapse">
        <thead>
          <tr className="text-left text-xs text-ink-soft">
            <th />
            <th scope="col" className="truncate pr-2 font-medium" title={names[0]}>First</th>
            <th scope="col" className="truncate pr-2 font-medium" title={names[1]}>Second</th>
            <th scope="col" className="font-medium">Difference</th>
          </tr>
        </thead>
        <tbody>
          {row("Stable found", formatNumber(cell.a.stableFound), formatNumber(cell.b.stableFound), fmtSigned(cell.difference.stableFound))}
          {row("One stable", fmtShare(cell.a.oneStable), fmtShare(cell.b.oneStable), fmtSigned(cell.difference.oneStable))}
          {row("Networks", String(cell.a.networks), String(cell.b.networks), "")}
        </tbody>
      </table>
      {cell.welch ? (
        <p>
          Welch: t = {formatNumber(cell.welch.t)}, df = {formatNumber(cell.welch.df)}, {fmtP(cell.welch.pValue)}
          {cell.permutationP !== null && <>; exact permutation {fmtP(cell.permutationP)}</>}.{" "}
          <strong className={cell.agree ? "text-moss-700" : "text-ember-700"}>{cell.agree ? "Agree" : "Differ"} at 5 %</strong>
        </p>
      ) : (
        <p className="text-ink-soft">Not testable yet (needs two done networks on each side).</p>
      )}
    </div>
  );
}
