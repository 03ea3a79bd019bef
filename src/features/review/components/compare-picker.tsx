import { Link } from "react-router-dom";
import { Badge } from "../../../components/ui/badge";

export interface CompareCandidate {
  id: string;
  title: string;
  seed: number;
  status: string;
  /** How it relates to the map being compared (replicate, original…), if at all. */
  relation?: string;
}

/**
 * Maps on the same grid that this map can be compared with, replicates first; each opens the
 * comparison page.
 */
export function ComparePicker({ mapId, candidates }: { mapId: string; candidates: CompareCandidate[] }) {
  if (candidates.length === 0) {
    return <p className="text-sm text-ink-soft">No other map you can read has the same μ and τ grid. Replicate this map to get one.</p>;
  }
  return (
    <ul className="flex max-h-80 flex-col divide-y divide-line overflow-y-auto">
      {candidates.map((c) => (
        <li key={c.id}>
          <Link to={`/maps/${mapId}/compare/${c.id}`} className="flex items-center justify-between gap-3 px-1 py-2.5 hover:bg-well-50">
            <span className="min-w-0">
              <span className="block truncate text-sm font-medium text-ink">{c.title}</span>
              <span className="font-mono text-xs text-ink-soft">seed {c.seed} · {c.status}</span>
            </span>
            {c.relation && <Badge tone="well">{c.relation}</Badge>}
          </Link>
        </li>
      ))}
    </ul>
  );
}
