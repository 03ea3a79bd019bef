import { apiPaths } from "../../../../shared/schemas/api-paths";
import type { ProbeResult } from "../../../../shared/schemas/probes";
import { Badge } from "../../../components/ui/badge";
import { formatNumber, formatShare } from "../../../lib/format-number";

const th = "px-3 py-2 text-left text-xs font-semibold text-ink-soft";
const td = "px-3 py-1.5 font-mono text-xs tabular-nums text-ink";

/**
 * The distinct equilibria the search reached (most visited first): norm, index (unstable
 * directions), largest real part of the Jacobian's spectrum, basin share; each downloadable.
 */
export function EquilibriaTable({ probeId, result }: { probeId: string; result: ProbeResult }) {
  if (result.equilibria.length === 0) {
    return <p className="text-sm text-ink-soft">No start settled on a verified equilibrium within the time limit (see how the runs ended below).</p>;
  }
  return (
    <div className="overflow-x-auto">
      <table className="w-full min-w-[46rem] border-collapse" aria-label="Distinct equilibria">
        <thead className="border-b border-line">
          <tr>
            <th className={th}>#</th>
            <th className={th}>Download</th>
            <th className={th}>Stability</th>
            <th className={th} title="Unstable directions: eigenvalues of the Jacobian with Re λ > 0">Index</th>
            <th className={th}>max Re λ</th>
            <th className={th} title="‖x*‖₂/√N">‖x*‖ rms</th>
            <th className={th}>‖x*‖∞</th>
            <th className={th}>Starts</th>
            <th className={th}>Basin share</th>
            <th className={th}>Mean settle t</th>
          </tr>
        </thead>
        <tbody className="divide-y divide-line">
          {result.equilibria.map((e) => (
            <tr key={e.e}>
              <td className={td}>{e.e}</td>
              <td className="px-3 py-1.5 text-xs whitespace-nowrap">
                <a className="text-well-700 hover:underline" href={apiPaths.probes.equilibrium(probeId, e.e, "csv")} download aria-label={`Equilibrium ${e.e} as CSV`}>
                  CSV
                </a>
                {" · "}
                <a className="text-well-700 hover:underline" href={apiPaths.probes.equilibrium(probeId, e.e, "json")} download aria-label={`Equilibrium ${e.e} as JSON`}>
                  JSON
                </a>
              </td>
              <td className="px-3 py-1.5">{e.stable ? <Badge tone="moss">stable</Badge> : <Badge tone="ember">unstable</Badge>}</td>
              <td className={td}>{e.index}</td>
              <td className={td}>{formatNumber(e.maxRealPart)}</td>
              <td className={td}>{formatNumber(e.normRms)}</td>
              <td className={td}>{formatNumber(e.normInf)}</td>
              <td className={td}>{e.hits}</td>
              <td className={td}>{formatShare(e.basinShare)}</td>
              <td className={td}>{formatNumber(e.meanSettleTime)}</td>
            </tr>
          ))}
        </tbody>
      </table>
      <p className="mt-2 text-xs text-ink-soft">
        {result.stableFound} stable and {result.unstableReached} unstable equilibria reached from {result.starts} starts — a lower bound of how many the matrix has. Each was refined by Newton's method (residual ≤ 1e-10) and classified by the Jacobian −μI + J diag φ'(x*).
      </p>
    </div>
  );
}
