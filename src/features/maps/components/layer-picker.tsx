import { useId } from "react";
import { layersFor, type LayerId } from "../../../../shared/maps/layers";
import { controlClass } from "../../../components/ui/field";
import { cn } from "../../../lib/cn";

const MEASURED: readonly LayerId[] = ["stable-found", "stable-richness", "converged", "one-stable"];

/** Chooses the heatmap's layer among those that apply to the ensemble, with the layer's help. */
export function LayerPicker({ ensemble, value, onChange }: { ensemble: string; value: LayerId; onChange: (id: LayerId) => void }) {
  const id = useId();
  const available = layersFor(ensemble);
  const measured = available.filter((l) => MEASURED.includes(l.id));
  const predicted = available.filter((l) => !MEASURED.includes(l.id));
  const chosen = available.find((l) => l.id === value) ?? available[0];
  return (
    <div className="flex flex-col gap-1.5">
      <label htmlFor={id} className="text-sm font-medium text-ink">
        Layer
      </label>
      <select id={id} value={chosen.id} onChange={(e) => onChange(e.target.value as LayerId)} className={cn(controlClass(false), "pr-8")} aria-describedby={`${id}-help`}>
        <optgroup label="Found by simulation">
          {measured.map((l) => (
            <option key={l.id} value={l.id}>
              {l.label}
            </option>
          ))}
        </optgroup>
        {predicted.length > 0 && (
          <optgroup label="Predicted and compared">
            {predicted.map((l) => (
              <option key={l.id} value={l.id}>
                {l.label}
              </option>
            ))}
          </optgroup>
        )}
      </select>
      <p id={`${id}-help`} className="text-xs leading-relaxed text-ink-soft">
        {chosen.help}
      </p>
    </div>
  );
}
