import { get, type Path, type UseFormReturn } from "react-hook-form";
import type { MapLimits } from "../../../../../shared/maps/limits";
import { SelectField, TextField } from "../../../../components/ui/field";
import { HELP, type MapFormValues } from "./new-map-defaults";

export type MapForm = UseFormReturn<MapFormValues, unknown, unknown>;

/** Empty stays empty (undefined) so optional numbers can be left out; anything else is a number. */
const toNumber = (v: unknown) => (v === "" || v == null ? undefined : Number(v));

function errorOf(form: MapForm, name: Path<MapFormValues>): string | undefined {
  return (get(form.formState.errors, name) as { message?: string } | undefined)?.message;
}

export function NumberField({ form, name, label, hint, step = "any" }: { form: MapForm; name: Path<MapFormValues>; label: string; hint?: string; step?: string }) {
  return <TextField type="number" inputMode="decimal" step={step} label={label} hint={hint} error={errorOf(form, name)} {...form.register(name, { setValueAs: toNumber })} />;
}

function ScaleField({ form, name }: { form: MapForm; name: "mu.scale" | "tau.scale" }) {
  return (
    <SelectField
      label="Spacing"
      hint={HELP.scale}
      error={errorOf(form, name)}
      options={[
        { value: "linear", label: "Even steps" },
        { value: "log", label: "Log (even ratios)" },
      ]}
      {...form.register(name)}
    />
  );
}

export function SettingsFields({ form, limits }: { form: MapForm; limits: MapLimits }) {
  const ensemble = form.watch("ensemble");
  if (ensemble === "field") {
    return (
      <div className="grid grid-cols-1 gap-4 sm:grid-cols-2">
        <NumberField form={form} name="settings.N" label="Units N" step="1" hint={`${HELP.fieldN} At most ${limits.maxFieldN}.`} />
        <NumberField form={form} name="settings.sigma" label="Jacobian scale σ" hint={HELP.sigma} />
        <NumberField form={form} name="settings.features" label="Random features M" step="1" hint={HELP.features} />
        <NumberField form={form} name="settings.lengthScale" label="Correlation length ℓ" hint={HELP.lengthScale} />
      </div>
    );
  }
  return (
    <div className="grid grid-cols-1 gap-4 sm:grid-cols-2">
      <NumberField form={form} name="settings.N" label="Units N" step="1" hint={`${HELP.rateN} At most ${limits.maxRateN}.`} />
      <NumberField form={form} name="settings.g" label="Coupling gain g" hint={HELP.g} />
      <SelectField label="Nonlinearity φ" hint="The units' response function." options={[{ value: "tanh", label: "tanh" }]} error={errorOf(form, "settings.nonlinearity")} {...form.register("settings.nonlinearity")} />
      <NumberField form={form} name="settings.input" label="Constant input I" hint={HELP.input} />
    </div>
  );
}

export function AxisFields({ form, axis }: { form: MapForm; axis: "mu" | "tau" }) {
  const mu = axis === "mu";
  return (
    <fieldset className="grid grid-cols-1 gap-4 sm:grid-cols-4">
      <legend className="mb-2 text-sm font-semibold text-ink">{mu ? "Relaxation rate μ (horizontal)" : "Asymmetry τ (vertical)"}</legend>
      <NumberField form={form} name={`${axis}.min`} label="From" hint={mu ? HELP.muMin : HELP.tauMin} />
      <NumberField form={form} name={`${axis}.max`} label="To" hint={mu ? HELP.muMax : HELP.tauMax} />
      <NumberField form={form} name={`${axis}.steps`} label="Steps" step="1" hint={HELP.steps} />
      <ScaleField form={form} name={`${axis}.scale`} />
    </fieldset>
  );
}

export function BudgetFields({ form, limits }: { form: MapForm; limits: MapLimits }) {
  const exhaustiveError = errorOf(form, "budget.exhaustive");
  return (
    <div className="flex flex-col gap-4">
      <div className="grid grid-cols-1 gap-4 sm:grid-cols-2">
        <NumberField form={form} name="budget.networks" label="Networks per cell K" step="1" hint={HELP.networks} />
        <NumberField form={form} name="budget.starts" label="Starts per network S" step="1" hint={`${HELP.starts} K × S at most ${limits.maxRunsPerCell} for your account.`} />
        <NumberField form={form} name="budget.tMax" label="Time limit t_max" hint={HELP.tMax} />
        <NumberField form={form} name="seed" label="Base seed" step="1" hint={HELP.seed} />
        <NumberField form={form} name="budget.rtol" label="Relative tolerance" hint={HELP.rtol} />
        <NumberField form={form} name="budget.atol" label="Absolute tolerance" hint={HELP.atol} />
      </div>
      <label className="flex items-start gap-2.5 text-sm">
        <input type="checkbox" className="mt-0.5 h-4 w-4 accent-well-600" aria-invalid={exhaustiveError ? true : undefined} {...form.register("budget.exhaustive")} />
        <span>
          <span className="font-medium text-ink">Exhaustive search</span>
          <span className="block text-xs text-ink-faint">{HELP.exhaustive}</span>
          {exhaustiveError && (
            <span role="alert" className="block text-sm text-rose-600">
              {exhaustiveError}
            </span>
          )}
        </span>
      </label>
    </div>
  );
}
