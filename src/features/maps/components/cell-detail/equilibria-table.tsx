import { useMemo, useState } from "react";
import type { EquilibriumSummary, NetworkSummary } from "../../../../../shared/schemas/cell-result";
import { cn } from "../../../../lib/cn";
import { formatNumber, formatShare } from "../../../../lib/format-number";

type Row = EquilibriumSummary & { kind: "stable" | "unstable"; rank: number };
type Key = "rank" | "normRms" | "normInf" | "index" | "maxRealPart" | "basinShare" | "hits" | "meanSettleTime" | "residual";

const COLUMNS: { key: Key; label: string; title: string }[] = [
  { key: "rank", label: "#", title: "Order found: most visited first, stable before unstable" },
  { key: "normRms", label: "‖x‖ rms", title: "Root-mean-square size ‖x*‖₂/√N" },
  { key: "normInf", label: "‖x‖∞", title: "Largest |x_i*|" },
  { key: "index", label: "Index", title: "Unstable directions: eigenvalues of the Jacobian with positive real part" },
  { key: "maxRealPart", label: "max Re λ", title: "Largest real part of the Jacobian's eigenvalues (negative: stable)" },
  { key: "basinShare", label: "Basin", title: "Share of this network's starts that ended here" },
  { key: "hits", label: "Starts", title: "Starts that reached it" },
  { key: "meanSettleTime", label: "Settle t", title: "Mean time to settle of the runs that reached it" },
  { key: "residual", label: "Residual", title: "‖dx/dt‖ at the Newton-refined point" },
];

function rowsOf(net: NetworkSummary): Row[] {
  return [
    ...net.stable.map((e, k) => ({ ...e, kind: "stable" as const, rank: k + 1 })),
    ...net.unstable.map((e, k) => ({ ...e, kind: "unstable" as const, rank: net.stable.length + k + 1 })),
  ];
}

function cellText(r: Row, key: Key): string {
  if (key === "basinShare") return formatShare(r.basinShare);
  if (key === "rank" || key === "index" || key === "hits") return String(r[key]);
  return formatNumber(r[key]);
}

/** The equilibria one network's runs reached, verified by Newton; columns sort on click. */
export function EquilibriaTable({ network }: { network: NetworkSummary }) {
  const [sort, setSort] = useState<{ key: Key; dir: 1 | -1 }>({ key: "rank", dir: 1 });
  const rows = useMemo(() => {
    const v = (r: Row) => (r[sort.key] ?? Number.POSITIVE_INFINITY) as number;
    return rowsOf(network).sort((a, b) => (v(a) - v(b)) * sort.dir || a.rank - b.rank);
  }, [network, sort]);
  if (rows.length === 0) return <p className="px-5 py-6 text-sm text-ink-soft">No run of this network settled on a verified equilibrium.</p>;
  return (
    <div className="overflow-x-auto">
      <table className="w-full min-w-[40rem] text-sm">
        <caption className="sr-only">Equilibria of network {network.k}; select a column header to sort</caption>
        <thead>
          <tr className="border-b border-line text-left text-xs text-ink-soft">
            <th scope="col" className="px-3 py-2 font-medium">
              Kind
            </th>
            {COLUMNS.map((c) => (
              <th key={c.key} scope="col" aria-sort={sort.key === c.key ? (sort.dir === 1 ? "ascending" : "descending") : "none"} className="px-2 py-2 text-right font-medium">
                <button type="button" title={c.title} className="inline-flex items-center gap-1 hover:text-ink" onClick={() => setSort((s) => ({ key: c.key, dir: s.key === c.key ? (-s.dir as 1 | -1) : 1 }))}>
                  {c.label}
                  <span aria-hidden="true" className="text-ink-faint">{sort.key === c.key ? (sort.dir === 1 ? "▲" : "▼") : "↕"}</span>
                </button>
              </th>
            ))}
          </tr>
        </thead>
        <tbody className="divide-y divide-line">
          {rows.map((r) => (
            <tr key={`${r.kind}-${r.rank}`}>
              <td className="px-3 py-1.5">
                <span className={cn("inline-flex rounded-full px-2 py-0.5 text-xs font-medium", r.kind === "stable" ? "bg-moss-50 text-moss-700" : "bg-ember-50 text-ember-700")}>{r.kind}</span>
              </td>
              {COLUMNS.map((c) => (
                <td key={c.key} className="px-2 py-1.5 text-right font-mono text-xs tabular-nums text-ink">
                  {cellText(r, c.key)}
                </td>
              ))}
            </tr>
          ))}
        </tbody>
      </table>
    </div>
  );
}
