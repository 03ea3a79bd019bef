import { useMemo } from "react";
import type { MapView } from "../../../../shared/schemas/maps";
import { overlayCurves, type CurveId } from "../lib/overlay-curves";

/** Switches for the predicted curves that apply to the map, each with what it means. */
export function CurveToggles({ map, shown, onChange }: { map: MapView; shown: ReadonlySet<CurveId>; onChange: (next: Set<CurveId>) => void }) {
  const curves = useMemo(() => overlayCurves(map, [0, 1]), [map]);
  if (curves.length === 0) return <p className="text-xs text-ink-faint">No predicted curve applies to this ensemble.</p>;
  return (
    <fieldset className="flex flex-col gap-2">
      <legend className="mb-1 text-sm font-medium text-ink">Predicted curves</legend>
      {curves.map((c) => (
        <label key={c.id} className="flex items-start gap-2 text-sm">
          <input
            type="checkbox"
            className="mt-0.5 h-4 w-4 accent-well-600"
            checked={shown.has(c.id)}
            onChange={(e) => {
              const next = new Set(shown);
              if (e.target.checked) next.add(c.id);
              else next.delete(c.id);
              onChange(next);
            }}
          />
          <span>
            <span className="inline-flex items-center gap-1.5 font-medium text-ink">
              <svg width="22" height="8" aria-hidden="true">
                <line x1="1" y1="4" x2="21" y2="4" stroke={c.color} strokeWidth="2" strokeDasharray={c.dash || undefined} />
              </svg>
              {c.label}
            </span>
            <span className="block text-xs leading-snug text-ink-soft">{c.meaning}</span>
          </span>
        </label>
      ))}
    </fieldset>
  );
}
