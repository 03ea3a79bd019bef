import { Link } from "react-router-dom";
import type { ProbeSummary } from "../../../../shared/schemas/probes";
import { formatDate } from "../../../lib/format";
import { formatNumber } from "../../../lib/format-number";
import { ProbeStatusBadge } from "./probe-status";

/** Uploaded matrices: title, N, ĝ, τ̂, μ, owner and group, status. */
export function ProbeList({ probes }: { probes: ProbeSummary[] }) {
  return (
    <ul className="divide-y divide-line" aria-label="Uploaded matrices">
      {probes.map((p) => (
        <li key={p.id} className="flex flex-wrap items-center justify-between gap-x-4 gap-y-1 px-5 py-3">
          <div className="min-w-0">
            <Link to={`/probes/${p.id}`} className="font-medium text-well-700 hover:underline">
              {p.title}
            </Link>
            <p className="text-xs text-ink-soft">
              {p.fileName} · by {p.ownerName}
              {p.groupName ? ` · ${p.groupName}` : ""} · {formatDate(p.createdAt)}
            </p>
          </div>
          <div className="flex items-center gap-3">
            <span className="font-mono text-xs text-ink-soft tabular-nums">
              N = {p.n} · ĝ = {formatNumber(p.gEstimate)} · τ̂ = {formatNumber(p.tauEstimate)} · μ = {formatNumber(p.mu)}
            </span>
            <ProbeStatusBadge status={p.status} />
          </div>
        </li>
      ))}
    </ul>
  );
}
