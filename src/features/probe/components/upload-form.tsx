import { zodResolver } from "@hookform/resolvers/zod";
import { useForm } from "react-hook-form";
import { z } from "zod";
import { probeLimits } from "../../../../shared/schemas/probes";
import { Button } from "../../../components/ui/button";
import { FormMessage, SelectField, TextField } from "../../../components/ui/field";
import { applyServerError } from "../../../lib/form-errors";
import { useUploadProbe } from "../api/probe-mutations";

const MB = probeLimits.maxFileBytes / (1024 * 1024);
const ACCEPT = probeLimits.extensions.join(",");

function fileRule(required: boolean) {
  return z.custom<FileList | undefined>().superRefine((files, ctx) => {
    const f = files?.[0];
    if (!f) {
      if (required) ctx.addIssue({ code: "custom", message: "Choose a matrix file" });
      return;
    }
    const ext = f.name.includes(".") ? f.name.slice(f.name.lastIndexOf(".")).toLowerCase() : "";
    if (!(probeLimits.extensions as readonly string[]).includes(ext)) ctx.addIssue({ code: "custom", message: `"${f.name}" is not ${probeLimits.extensions.join(", ")}` });
    if (f.size > probeLimits.maxFileBytes) ctx.addIssue({ code: "custom", message: `${f.name} is ${(f.size / 2 ** 20).toFixed(1)} MB; the limit is ${MB} MB` });
  });
}

const formSchema = z.object({
  matrix: fileRule(true),
  input: fileRule(false),
  mu: z
    .string()
    .trim()
    .min(1, "Enter μ, the relaxation rate")
    .refine((v) => Number.isFinite(Number(v)) && Number(v) > 0 && Number(v) <= 1e4, "μ must be a number in (0, 10 000]"),
  nonlinearity: z.enum(["tanh"]),
  title: z.string().trim().max(120),
  groupId: z.string(),
});
type UploadValues = z.input<typeof formSchema>;

export interface GroupChoice {
  id: string;
  name: string;
}

/**
 * Upload of a coupling matrix J (and optionally a constant input vector I) for the rate
 * network dx/dt = −μx + J φ(x) + I. The limits are stated on the form.
 */
export function UploadForm({ groups, onUploaded }: { groups: GroupChoice[]; onUploaded: (id: string) => void }) {
  const upload = useUploadProbe();
  const form = useForm<UploadValues>({
    resolver: zodResolver(formSchema),
    defaultValues: { mu: "1", nonlinearity: "tanh", title: "", groupId: "" },
  });
  const { errors } = form.formState;
  const submit = form.handleSubmit((v) =>
    upload
      .mutateAsync({
        matrix: (v.matrix as FileList)[0], input: (v.input as FileList | undefined)?.[0] ?? null, mu: Number(v.mu),
        nonlinearity: v.nonlinearity, title: v.title || undefined, groupId: v.groupId || undefined,
      })
      .then(
        (probe) => onUploaded(probe.id),
        (error) => applyServerError(error, form.setError, ["matrix", "input", "mu", "title", "groupId"]),
      ),
  );
  const fileError = (e: unknown) => (e as { message?: string } | undefined)?.message;

  return (
    <form onSubmit={submit} noValidate className="flex flex-col gap-4" aria-label="Upload a coupling matrix">
      <FormMessage message={errors.root?.message} />
      <p className="rounded-lg bg-well-50 px-3 py-2 text-sm text-well-800 ring-1 ring-well-100">
        A square matrix J as CSV (numbers only, no header), NumPy .npy (float32 or float64, C order) or Matrix Market .mtx (coordinate or array).
        Limits: N ≤ {probeLimits.maxN} and at most {MB} MB per file.
      </p>
      {upload.isPending && (
        <p role="status" className="text-xs text-ink-soft">
          Reading the file and computing all N eigenvalues of J: seconds for N of a few hundred, about a minute at N = 2000.
        </p>
      )}
      <TextField type="file" accept={ACCEPT} label="Coupling matrix J" hint="Row i holds the couplings into unit i: dx_i/dt = −μ x_i + Σ_j J_ij φ(x_j) + I_i." error={fileError(errors.matrix)} className="[&_input]:pt-2" {...form.register("matrix")} />
      <TextField type="file" accept={ACCEPT} label="Input vector I (optional)" hint="One value per unit, as a row or a column; leave empty for I = 0." error={fileError(errors.input)} className="[&_input]:pt-2" {...form.register("input")} />
      <div className="grid grid-cols-1 gap-4 sm:grid-cols-2">
        <TextField label="Relaxation rate μ" inputMode="decimal" hint="The leak of every unit, μ > 0." error={errors.mu?.message} {...form.register("mu")} />
        <SelectField label="Nonlinearity φ" options={[{ value: "tanh", label: "tanh" }]} error={errors.nonlinearity?.message} {...form.register("nonlinearity")} />
      </div>
      <TextField label="Title (optional)" placeholder="e.g. Trained ring attractor, seed 3" hint="Defaults to the file name." error={errors.title?.message} {...form.register("title")} />
      <SelectField label="Share with a group" options={[{ value: "", label: "Only me" }, ...groups.map((g) => ({ value: g.id, label: g.name }))]} hint="Members read it; its editors and owners may run searches." error={errors.groupId?.message} {...form.register("groupId")} />
      <Button type="submit" busy={upload.isPending} className="self-start">
        Upload and analyse
      </Button>
    </form>
  );
}
