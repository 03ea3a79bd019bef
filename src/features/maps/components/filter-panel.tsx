import { layers, layersFor, type LayerId } from "../../../../shared/maps/layers";
import { Button } from "../../../components/ui/button";
import { controlClass } from "../../../components/ui/field";
import { cn } from "../../../lib/cn";
import { filterableLayers, type Criterion } from "../lib/filters";

const small = cn(controlClass(false), "h-9 text-sm");

/** A suggested filter: many stable states, found reliably. */
const PRESET: Criterion[] = [
  { layer: "converged", op: "atLeast", value: 0.9 },
  { layer: "stable-found", op: "atLeast", value: 5 },
];

function CriterionRow({ c, index, ensemble, onChange, onRemove }: { c: Criterion; index: number; ensemble: string; onChange: (c: Criterion) => void; onRemove: () => void }) {
  const share = layers[c.layer].kind === "share";
  const n = index + 1;
  return (
    <li className="grid grid-cols-[4.2rem_minmax(0,1fr)_auto] items-center gap-1.5 rounded-lg bg-paper p-1.5">
      <select aria-label={`Condition ${n}: layer`} className={cn(small, "col-span-3")} value={c.layer} onChange={(e) => onChange({ ...c, layer: e.target.value as LayerId })}>
        {filterableLayers(layersFor(ensemble)).map((l) => (
          <option key={l.id} value={l.id}>
            {l.label}
          </option>
        ))}
      </select>
      <select aria-label={`Condition ${n}: comparison`} className={small} value={c.op} onChange={(e) => onChange({ ...c, op: e.target.value as Criterion["op"] })}>
        <option value="atLeast">≥</option>
        <option value="atMost">≤</option>
      </select>
      <input
        aria-label={`Condition ${n}: value${share ? " (share from 0 to 1)" : ""}`}
        className={small}
        type="number"
        step="any"
        value={Number.isFinite(c.value) ? c.value : ""}
        onChange={(e) => onChange({ ...c, value: e.target.value === "" ? Number.NaN : Number(e.target.value) })}
      />
      <button type="button" onClick={onRemove} aria-label={`Remove condition ${n}`} className="h-9 rounded-lg px-2 text-ink-faint hover:bg-rose-50 hover:text-rose-700">
        ×
      </button>
    </li>
  );
}

/** Conditions on layer values; cells meeting all of them stay bright, the others are dimmed. */
export function FilterPanel(p: { ensemble: string; criteria: Criterion[]; onChange: (c: Criterion[]) => void; matched: number; computed: number }) {
  const { criteria, onChange } = p;
  return (
    <fieldset className="flex flex-col gap-2">
      <legend className="mb-1 text-sm font-medium text-ink">Highlight cells where</legend>
      {criteria.length === 0 ? (
        <p className="text-xs text-ink-soft">No condition: every cell is shown at full strength.</p>
      ) : (
        <ul className="flex flex-col gap-1.5">
          {criteria.map((c, k) => (
            <CriterionRow
              key={k}
              c={c}
              index={k}
              ensemble={p.ensemble}
              onChange={(next) => onChange(criteria.map((x, m) => (m === k ? next : x)))}
              onRemove={() => onChange(criteria.filter((_, m) => m !== k))}
            />
          ))}
        </ul>
      )}
      <div className="flex flex-wrap items-center gap-2">
        <Button size="sm" variant="secondary" onClick={() => onChange([...criteria, { layer: "stable-found", op: "atLeast", value: 2 }])}>
          Add condition
        </Button>
        {criteria.length === 0 ? (
          <Button size="sm" variant="ghost" onClick={() => onChange(PRESET)}>
            Settled ≥ 90 % and ≥ 5 stable
          </Button>
        ) : (
          <Button size="sm" variant="ghost" onClick={() => onChange([])}>
            Clear
          </Button>
        )}
      </div>
      {criteria.length > 0 && (
        <p role="status" className="text-xs text-ink-soft">
          {p.matched} of {p.computed} computed cells match.
        </p>
      )}
    </fieldset>
  );
}
