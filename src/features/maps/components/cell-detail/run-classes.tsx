import type { RunClassName } from "../../../../../shared/schemas/cell-result";
import { formatShare } from "../../../../lib/format-number";

const CLASSES: { id: RunClassName; label: string; help: string; color: string }[] = [
  { id: "settled", label: "Settled", help: "came to rest on a fixed point verified by Newton's method", color: "#3a7648" },
  { id: "unverified", label: "Unverified", help: "slowed to near rest, but Newton could not verify a fixed point there", color: "#b9d8b0" },
  { id: "slow", label: "Still moving", help: "still converging at the time limit; Newton found no stable fixed point near it", color: "#f1c197" },
  { id: "periodic", label: "Periodic-looking", help: "returned close to earlier states, like a cycle", color: "#6a5a9c" },
  { id: "irregular", label: "Irregular", help: "kept moving irregularly; the finite-time Lyapunov estimate was positive", color: "#db6c2c" },
  { id: "escaping", label: "Escaping", help: "grew without bound", color: "#b13447" },
  { id: "unclassified", label: "Unclassified", help: "still moving at the time limit, neither converging nor returning", color: "#cbc2ad" },
];

/** What the cell's runs did, counted over every network and start. */
export function RunClasses({ runs }: { runs: Partial<Record<RunClassName, number>> }) {
  const total = CLASSES.reduce((a, c) => a + (runs[c.id] ?? 0), 0);
  if (total === 0) return <p className="text-sm text-ink-soft">No runs recorded.</p>;
  return (
    <div className="flex flex-col gap-3">
      <div className="flex h-3 overflow-hidden rounded-full ring-1 ring-line" aria-hidden="true">
        {CLASSES.map((c) => ((runs[c.id] ?? 0) > 0 ? <div key={c.id} style={{ width: `${((runs[c.id] ?? 0) / total) * 100}%`, background: c.color }} /> : null))}
      </div>
      <ul className="grid grid-cols-1 gap-x-6 gap-y-1.5 text-sm sm:grid-cols-2">
        {CLASSES.map((c) => (
          <li key={c.id} className="flex items-start gap-2">
            <span aria-hidden="true" className="mt-1 h-2.5 w-2.5 shrink-0 rounded-sm" style={{ background: c.color }} />
            <span className="min-w-0">
              <span className="font-medium text-ink">{c.label}</span>{" "}
              <span className="font-mono text-xs text-ink-soft tabular-nums">
                {runs[c.id] ?? 0} of {total} ({formatShare((runs[c.id] ?? 0) / total)})
              </span>
              <span className="block text-xs text-ink-faint">{c.help}</span>
            </span>
          </li>
        ))}
      </ul>
    </div>
  );
}
