import type { ReactNode } from "react";
import type { IntervalJson } from "../../../../shared/schemas/cell-result";
import type { ProbeComparison, ProbeResult } from "../../../../shared/schemas/probes";
import { formatNumber, formatShare } from "../../../lib/format-number";

const th = "px-3 py-2 text-left text-xs font-semibold text-ink-soft";

function Ci({ i, asShare }: { i: IntervalJson; asShare?: boolean }) {
  const f = asShare ? formatShare : formatNumber;
  return (
    <>
      {f(i.estimate)}
      <span className="block text-[0.7rem] text-ink-faint">
        95 % CI [{i.lower == null ? "−∞" : f(i.lower)}, {i.upper == null ? "∞" : f(i.upper)}] · n = {i.n}
      </span>
    </>
  );
}

function Row({ label, matrix, ensemble }: { label: string; matrix: ReactNode; ensemble: ReactNode }) {
  return (
    <tr>
      <th scope="row" className="px-3 py-2 text-left text-sm font-normal text-ink-soft">
        {label}
      </th>
      <td className="px-3 py-2 font-mono text-sm tabular-nums text-ink">{matrix}</td>
      <td className="px-3 py-2 font-mono text-sm tabular-nums text-ink">{ensemble}</td>
    </tr>
  );
}

/** The uploaded matrix beside K random rate networks with its estimated g and τ. */
export function ComparisonTable({ result, comparison }: { result: ProbeResult; comparison: ProbeComparison }) {
  const a = comparison.aggregate;
  return (
    <div className="flex flex-col gap-3">
      <div className="overflow-x-auto">
        <table className="w-full min-w-[30rem] border-collapse" aria-label="Matrix and ensemble side by side">
          <thead className="border-b border-line">
            <tr>
              <th className={th} />
              <th className={th}>Uploaded matrix</th>
              <th className={th}>
                {comparison.networks} random networks, g = {formatNumber(comparison.params.g)}, τ = {formatNumber(comparison.tau)}
              </th>
            </tr>
          </thead>
          <tbody className="divide-y divide-line">
            <Row label="Distinct stable equilibria found" matrix={result.stableFound} ensemble={<Ci i={a.meanStable} />} />
            <Row label="Unstable equilibria reached" matrix={result.unstableReached} ensemble={<Ci i={a.meanUnstableReached} />} />
            <Row label="Runs that settled" matrix={<Ci i={{ ...result.convergedShare, level: 0.95 }} asShare />} ensemble={<Ci i={a.convergedShare} asShare />} />
            <Row label="Networks with exactly one stable state" matrix={result.stableFound === 1 ? "yes" : "no"} ensemble={<Ci i={a.oneStableShare} asShare />} />
            <Row label="Runs still irregular at the end" matrix={result.runs.irregular ?? 0} ensemble={a.runs.irregular ?? 0} />
          </tbody>
        </table>
      </div>
      <p className="text-xs text-ink-soft">
        Each side ran {comparison.starts} starts per network (seed {comparison.seed}), μ = {formatNumber(comparison.mu)}, N = {comparison.params.N}, φ = {comparison.params.nonlinearity}, I = {formatNumber(comparison.params.input)}. Ensemble values are means over networks with 95 % intervals; found counts on both sides are lower bounds.
        {" "}Per network, stable found: {comparison.perNetwork.map((p) => p.stableFound).join(", ")}.
      </p>
      {comparison.notes.length > 0 && (
        <ul className="list-disc pl-5 text-xs text-ember-700">
          {comparison.notes.map((n) => (
            <li key={n}>{n}</li>
          ))}
        </ul>
      )}
    </div>
  );
}
