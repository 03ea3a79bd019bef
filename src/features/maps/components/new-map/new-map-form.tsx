import { zodResolver } from "@hookform/resolvers/zod";
import { useForm, type Path } from "react-hook-form";
import { mapLimits } from "../../../../../shared/maps/limits";
import type { SiteRole } from "../../../../../shared/schemas/auth";
import { createMapSchema, type CreateMap, type MapView } from "../../../../../shared/schemas/maps";
import { Button } from "../../../../components/ui/button";
import { Card, CardBody, CardHeader } from "../../../../components/ui/card";
import { FormMessage, SelectField, TextField } from "../../../../components/ui/field";
import { cn } from "../../../../lib/cn";
import { applyServerError } from "../../../../lib/form-errors";
import { useCreateMap } from "../../api/map-mutations";
import { ENSEMBLE_LABELS } from "../../lib/map-settings";
import { EstimatePanel } from "./estimate-panel";
import { AxisFields, BudgetFields, SettingsFields, type MapForm } from "./map-fields";
import { ensembleDefaults, FORM_FIELDS, HELP, initialValues, type FormEnsemble, type MapFormValues } from "./new-map-defaults";

const ENSEMBLE_HELP: Record<FormEnsemble, string> = {
  rate: "dx/dt = −μx + J tanh(x) + I, with Gaussian couplings J of gain g and correlation τ between J_ij and J_ji. The standard model of neural circuits.",
  field: "dx/dt = −μx + f(x), f a random Gaussian field whose gradient share is τ. Its number of equilibria is known in closed form.",
};

// Messages of the shared schema where it names none: a blank or non-numeric number field.
const parseErrors = {
  error: (issue: { code: string; expected?: string }) => (issue.code === "invalid_type" && issue.expected === "number" ? "Enter a number" : undefined),
};

function EnsembleChoice({ form }: { form: MapForm }) {
  const current = form.watch("ensemble");
  const choose = (e: FormEnsemble) => {
    if (e === current) return;
    const d = structuredClone(ensembleDefaults[e]);
    form.reset({ ...form.getValues(), ensemble: e, settings: d.settings, mu: d.mu } as MapFormValues, { keepDefaultValues: true });
  };
  return (
    <fieldset className="grid grid-cols-1 gap-3 sm:grid-cols-2">
      <legend className="mb-2 text-sm font-medium text-ink">Ensemble</legend>
      {(["rate", "field"] as const).map((e) => (
        <label key={e} className={cn("flex cursor-pointer gap-3 rounded-xl p-3.5 ring-1 transition", current === e ? "bg-well-50 ring-2 ring-well-500" : "ring-line-strong hover:bg-paper")}>
          <input type="radio" name="ensemble" value={e} checked={current === e} onChange={() => choose(e)} className="mt-1 h-4 w-4 accent-well-600" />
          <span>
            <span className="font-medium text-ink">{ENSEMBLE_LABELS[e]}</span>
            <span className="mt-0.5 block text-xs leading-relaxed text-ink-soft">{ENSEMBLE_HELP[e]}</span>
          </span>
        </label>
      ))}
    </fieldset>
  );
}

function SharingFields({ form, groups }: { form: MapForm; groups: { id: string; name: string }[] }) {
  const visibility = form.watch("visibility");
  return (
    <div className="grid grid-cols-1 gap-4 sm:grid-cols-2">
      <SelectField
        label="Who can open it"
        hint="You can change this later, and create a read-only link from the map."
        options={[
          { value: "private", label: "Only me" },
          { value: "group", label: "A group I belong to" },
          { value: "link", label: "Anyone with a read-only link" },
        ]}
        {...form.register("visibility")}
      />
      {visibility === "group" && (
        <SelectField
          label="Group"
          error={form.formState.errors.groupId?.message}
          options={[{ value: "", label: groups.length ? "Choose a group" : "You are in no group yet" }, ...groups.map((g) => ({ value: g.id, label: g.name }))]}
          {...form.register("groupId", { setValueAs: (v) => (v ? v : null) })}
        />
      )}
    </div>
  );
}

/** The new-map form: shared zod schema on the client, the server's cost estimate before launch, its 422s on the fields. */
export function NewMapForm({ role, groups, onLaunched }: { role: SiteRole; groups: { id: string; name: string }[]; onLaunched: (map: MapView) => void }) {
  const create = useCreateMap();
  const form = useForm<MapFormValues, unknown, unknown>({ resolver: zodResolver(createMapSchema, parseErrors), defaultValues: initialValues("rate"), mode: "onTouched" }) as MapForm;
  const limits = mapLimits[role];
  const { errors } = form.formState;
  const submit = form.handleSubmit((values) =>
    create.mutateAsync(values as CreateMap).then(onLaunched, (e) => applyServerError(e, form.setError, FORM_FIELDS as unknown as Path<MapFormValues>[])),
  );
  return (
    <form onSubmit={submit} noValidate className="grid grid-cols-1 items-start gap-6 lg:grid-cols-[minmax(0,1fr)_20rem]">
      <div className="flex min-w-0 flex-col gap-6">
        <Card>
          <CardHeader title="What to map" />
          <CardBody className="flex flex-col gap-4">
            <TextField label="Title" hint={HELP.title} error={errors.title?.message} {...form.register("title")} />
            <TextField label="Description" hint={HELP.description} error={errors.description?.message} {...form.register("description")} />
            <EnsembleChoice form={form} />
          </CardBody>
        </Card>
        <Card>
          <CardHeader title="Network" description="Fixed across the whole map." />
          <CardBody>
            <SettingsFields form={form} limits={limits} />
          </CardBody>
        </Card>
        <Card>
          <CardHeader title="Grid" description="Each cell is one (μ, τ) point." />
          <CardBody className="flex flex-col gap-6">
            <AxisFields form={form} axis="mu" />
            <AxisFields form={form} axis="tau" />
          </CardBody>
        </Card>
        <Card>
          <CardHeader title="Budget per cell" description="The same networks (common random numbers) are used in every cell, so the map is smooth." />
          <CardBody>
            <BudgetFields form={form} limits={limits} />
          </CardBody>
        </Card>
        <Card>
          <CardHeader title="Sharing" />
          <CardBody>
            <SharingFields form={form} groups={groups} />
          </CardBody>
        </Card>
      </div>
      <Card className="lg:sticky lg:top-20">
        <CardHeader title="Before you launch" />
        <CardBody className="flex flex-col gap-4">
          <EstimatePanel form={form} />
          <FormMessage message={errors.root?.message} />
          <Button type="submit" busy={create.isPending} className="w-full">
            Launch map
          </Button>
          <p className="text-xs text-ink-faint">Cells already stored by anyone are reused; the rest are computed on the server and fill in live.</p>
        </CardBody>
      </Card>
    </form>
  );
}
