import { zodResolver } from "@hookform/resolvers/zod";
import { useForm } from "react-hook-form";
import { probeLimits, probeSearchSchema, type ProbeSearchInput, type ProbeView } from "../../../../shared/schemas/probes";
import { Button } from "../../../components/ui/button";
import { FormMessage, TextField } from "../../../components/ui/field";
import { applyServerError } from "../../../lib/form-errors";
import { useStartSearch } from "../api/probe-mutations";
import { formatNumber } from "../../../lib/format-number";
import { duration } from "../lib/format";

/** Work units per minute on two threads, measured by scripts/bench-probe.ts (shared/schemas/probes.ts). */
const WORK_PER_MINUTE = 1.5e7;

function Bar({ label, done, total }: { label: string; done: number; total: number }) {
  const pct = total > 0 ? Math.round((100 * done) / total) : 0;
  return (
    <div className="flex flex-col gap-1">
      <div className="flex justify-between text-xs text-ink-soft">
        <span>{label}</span>
        <span className="font-mono tabular-nums">
          {done} of {total}
        </span>
      </div>
      <div className="h-2 overflow-hidden rounded-full bg-well-50 ring-1 ring-line" role="progressbar" aria-label={label} aria-valuenow={done} aria-valuemin={0} aria-valuemax={total}>
        <div className="h-full bg-well-600 transition-[width]" style={{ width: `${pct}%` }} />
      </div>
    </div>
  );
}

/** Progress of the running search (polled while it runs). */
export function SearchProgress({ probe }: { probe: ProbeView }) {
  const s = probe.search;
  if (!s) return null;
  const compare = s.settings.compareNetworks;
  return (
    <div className="flex flex-col gap-3" aria-live="polite">
      <p className="text-sm text-ink">{s.startedAt ? "Searching: starts run on the worker's threads." : "Queued: waiting for a worker to take the search."}</p>
      <Bar label="Starts on the uploaded matrix" done={s.startsDone} total={s.settings.starts} />
      {compare > 0 && <Bar label="Comparison networks" done={s.networksDone} total={compare} />}
    </div>
  );
}

const FIELDS = ["starts", "compareNetworks", "tMax", "seed", "rtol", "atol"] as const;

/** Settings of a new search: starts, comparison networks, time limit, seed, tolerances. */
export function SearchForm({ probe, siteRole }: { probe: ProbeView; siteRole: "member" | "admin" }) {
  const start = useStartSearch(probe.id);
  const previous = probe.search?.settings;
  const form = useForm<ProbeSearchInput>({
    resolver: zodResolver(probeSearchSchema),
    defaultValues: previous ?? { starts: 64, compareNetworks: 8, tMax: 200, seed: 1, rtol: 1e-6, atol: 1e-9 },
  });
  const { errors } = form.formState;
  const values = form.watch();
  const work = probe.n * probe.n * (Number(values.starts) || 0) * (1 + (Number(values.compareNetworks) || 0));
  const most = probeLimits.maxSearchWork[siteRole];
  const submit = form.handleSubmit((v) => start.mutateAsync(v).catch((e) => applyServerError(e, form.setError, FIELDS)));
  const numeric = { valueAsNumber: true } as const;

  return (
    <form onSubmit={submit} noValidate className="flex flex-col gap-4" aria-label="Search for equilibria">
      <FormMessage message={errors.root?.message} />
      <div className="grid grid-cols-2 gap-4 sm:grid-cols-4">
        <TextField label="Starts" type="number" min={1} max={probeLimits.maxStarts} hint={`1–${probeLimits.maxStarts}`} error={errors.starts?.message} {...form.register("starts", numeric)} />
        <TextField label="Comparison networks K" type="number" min={0} max={probeLimits.maxCompareNetworks} hint={`0–${probeLimits.maxCompareNetworks}`} error={errors.compareNetworks?.message} {...form.register("compareNetworks", numeric)} />
        <TextField label="Time limit t_max" type="number" step="any" error={errors.tMax?.message} {...form.register("tMax", numeric)} />
        <TextField label="Seed" type="number" error={errors.seed?.message} {...form.register("seed", numeric)} />
      </div>
      <details className="text-sm">
        <summary className="cursor-pointer text-well-700">Integrator tolerances</summary>
        <div className="mt-3 grid grid-cols-2 gap-4">
          <TextField label="rtol" type="number" step="any" error={errors.rtol?.message} {...form.register("rtol", numeric)} />
          <TextField label="atol" type="number" step="any" error={errors.atol?.message} {...form.register("atol", numeric)} />
        </div>
      </details>
      <p className={work > most ? "text-xs text-rose-700" : "text-xs text-ink-soft"}>
        Work N² × starts × (1 + K) = {formatNumber(work)} of at most {formatNumber(most)} for {siteRole}s; roughly {duration((work / WORK_PER_MINUTE) * 60)} on two threads when runs use the whole time limit (a rough guide).
      </p>
      <Button type="submit" busy={start.isPending} disabled={probe.status === "searching" || probe.access === "viewer"} className="self-start">
        {probe.search ? "Search again" : "Find equilibria"}
      </Button>
      {probe.access === "viewer" && <p className="text-xs text-ink-soft">You can read this probe; its owner and the group's editors run searches.</p>}
    </form>
  );
}
