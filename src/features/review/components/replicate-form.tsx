import { useState, type FormEvent } from "react";
import type { ReplicateBody } from "../../../../shared/schemas/review";
import { Button } from "../../../components/ui/button";
import { TextField } from "../../../components/ui/field";
import { isApiError } from "../../../lib/api-client";

interface ReplicateFormProps {
  title: string;
  seed: number;
  busy: boolean;
  error: unknown;
  onSubmit: (body: ReplicateBody) => void;
  onCancel: () => void;
}

/** Launch a replicate: the same manifest with a new base seed (random unless one is typed). */
export function ReplicateForm({ title, seed, busy, error, onSubmit, onCancel }: ReplicateFormProps) {
  const [text, setText] = useState("");
  const [local, setLocal] = useState<string | null>(null);
  const submit = (e: FormEvent) => {
    e.preventDefault();
    const trimmed = text.trim();
    if (trimmed === "") return onSubmit({});
    const n = Number(trimmed);
    if (!Number.isInteger(n) || n < 0 || n > 2 ** 31 - 1) return setLocal("A seed is a whole number from 0 to 2147483647");
    if (n === seed) return setLocal(`That is the original's seed; choose another to replicate`);
    setLocal(null);
    onSubmit({ seed: n });
  };
  const server = isApiError(error) ? error.issues.find((i) => i.path === "seed")?.message ?? error.message : null;
  return (
    <form onSubmit={submit} className="flex flex-col gap-4" noValidate>
      <p className="text-sm text-ink-soft">
        Re-runs <strong className="text-ink">{title}</strong> with the same ensemble, settings, grid and budget and a different base
        seed (the original used {seed}). The new map is linked to this one, and its cells are fresh computations: the seed is part of
        every cell&apos;s key.
      </p>
      <TextField label="New base seed" inputMode="numeric" placeholder="leave empty for a random seed" value={text} onChange={(e) => setText(e.target.value)} error={local ?? server ?? undefined} />
      <div className="flex justify-end gap-2">
        <Button variant="secondary" onClick={onCancel}>Cancel</Button>
        <Button type="submit" busy={busy}>Launch replicate</Button>
      </div>
    </form>
  );
}
