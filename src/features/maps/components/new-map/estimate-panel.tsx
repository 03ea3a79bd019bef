import { useQuery } from "@tanstack/react-query";
import { useWatch } from "react-hook-form";
import { createMapSchema, type CreateMap } from "../../../../../shared/schemas/maps";
import { Spinner } from "../../../../components/ui/spinner";
import { isApiError } from "../../../../lib/api-client";
import { mapQueries } from "../../api/map-queries";
import { useDebouncedValue } from "../../hooks/use-debounced-value";
import { formatDuration } from "../../../../lib/format-number";
import type { MapForm } from "./map-fields";

function Figure({ label, value, note }: { label: string; value: string; note?: string }) {
  return (
    <div>
      <dt className="text-xs text-ink-soft">{label}</dt>
      <dd className="text-lg font-semibold text-ink tabular-nums">{value}</dd>
      {note && <dd className="text-xs text-ink-faint">{note}</dd>}
    </div>
  );
}

/**
 * The cost of the map as the form stands: the server's estimate (cells, cells already in the
 * shared cache, CPU time from its measured engine throughput), asked again whenever the
 * settings have been still for half a second and pass the shared schema.
 */
export function EstimatePanel({ form }: { form: MapForm }) {
  const values = useWatch({ control: form.control });
  // The title does not change the cost: estimate before one is typed.
  const parsed = createMapSchema.safeParse({ ...values, title: values.title?.trim() || "Untitled" });
  const body = useDebouncedValue<CreateMap | null>(parsed.success ? { ...parsed.data, estimateOnly: undefined } : null, 500);
  const estimate = useQuery({ ...mapQueries.estimate(body as CreateMap), enabled: body !== null });
  const steps = (values.mu?.steps ?? 0) * (values.tau?.steps ?? 0);
  const runs = (values.budget?.networks ?? 0) * (values.budget?.starts ?? 0);

  return (
    <div className="flex flex-col gap-3" aria-live="polite" aria-label="Cost estimate">
      <p className="text-sm text-ink-soft">
        {Number.isFinite(steps) && steps > 0 ? `${values.mu?.steps} × ${values.tau?.steps} grid` : "Grid not set"}
        {Number.isFinite(runs) && runs > 0 ? ` · ${runs} runs per cell` : ""}
      </p>
      {!parsed.success ? (
        <p className="text-sm text-ink-faint">Complete the settings (the marked fields) to see what the map will cost.</p>
      ) : estimate.isError ? (
        <div role="alert" className="rounded-lg bg-rose-50 px-3 py-2 text-sm text-rose-700 ring-1 ring-rose-100">
          {isApiError(estimate.error) && estimate.error.issues.length ? estimate.error.issues.map((i) => <p key={i.path + i.message}>{i.message}</p>) : estimate.error.message}
        </div>
      ) : !estimate.data ? (
        <p className="flex items-center gap-2 text-sm text-ink-soft">
          <Spinner className="h-4 w-4" /> Estimating…
        </p>
      ) : (
        <dl className="grid grid-cols-2 gap-3">
          <Figure label="Cells to compute" value={String(estimate.data.cells - estimate.data.cachedCells)} note={`of ${estimate.data.cells}`} />
          <Figure label="Already cached" value={String(estimate.data.cachedCells)} note="reused at once" />
          <div className="col-span-2">
            <Figure label="Estimated compute time" value={formatDuration(estimate.data.estimatedSeconds)} note="CPU time on one core, shared out over the worker threads; chaotic cells can take a few times longer." />
          </div>
          {estimate.isFetching && <p className="col-span-2 text-xs text-ink-faint">Updating…</p>}
        </dl>
      )}
    </div>
  );
}
