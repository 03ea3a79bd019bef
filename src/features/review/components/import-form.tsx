import { useId, useState, type ChangeEvent, type FormEvent } from "react";
import { Button } from "../../../components/ui/button";
import { TextField } from "../../../components/ui/field";
import { isApiError } from "../../../lib/api-client";
import { formatNumber } from "../../../lib/format-number";

type Manifest = Record<string, unknown>;

/** The manifest inside an export.json (its `manifest` block), or a bare manifest; null when neither. */
export function manifestOf(text: string): Manifest | null {
  try {
    const value = JSON.parse(text) as unknown;
    if (!value || typeof value !== "object" || Array.isArray(value)) return null;
    const inner = (value as { manifest?: unknown }).manifest;
    const m = (inner && typeof inner === "object" ? inner : value) as Manifest;
    return typeof m.ensemble === "string" ? m : null;
  } catch {
    return null;
  }
}

function describe(m: Manifest): string[] {
  const axis = (a: unknown) => {
    const x = a as { min?: number; max?: number; steps?: number; scale?: string } | undefined;
    return x ? `${formatNumber(x.min)} – ${formatNumber(x.max)} in ${x.steps} steps${x.scale === "log" ? " (log)" : ""}` : "—";
  };
  const b = (m.budget ?? {}) as { networks?: number; starts?: number };
  return [
    `Ensemble: ${String(m.ensemble)} · settings ${JSON.stringify(m.settings ?? {})}`,
    `μ axis ${axis(m.mu)}; τ axis ${axis(m.tau)}`,
    `Budget: ${b.networks ?? "?"} networks × ${b.starts ?? "?"} starts per cell · seed ${String(m.seed ?? 1)}`,
  ];
}

interface ImportFormProps {
  busy: boolean;
  error: unknown;
  onSubmit: (body: { manifest: Manifest; title?: string }) => void;
}

/** Paste or pick a map's export.json; shows what it would create and creates it. */
export function ImportForm({ busy, error, onSubmit }: ImportFormProps) {
  const textId = useId();
  const [text, setText] = useState("");
  const [title, setTitle] = useState("");
  const manifest = text.trim() ? manifestOf(text) : null;
  const onFile = async (e: ChangeEvent<HTMLInputElement>) => {
    const file = e.target.files?.[0];
    if (file) setText(await file.text());
  };
  const submit = (e: FormEvent) => {
    e.preventDefault();
    if (manifest) onSubmit({ manifest, title: title.trim() || undefined });
  };
  const issues = isApiError(error) ? (error.issues.length ? error.issues.map((i) => `${i.path}: ${i.message}`) : [error.message]) : [];
  return (
    <form onSubmit={submit} className="flex flex-col gap-4">
      <div className="flex flex-col gap-1.5">
        <label htmlFor={`${textId}-file`} className="text-sm font-medium text-ink">Export file (export.json)</label>
        <input id={`${textId}-file`} type="file" accept="application/json,.json" onChange={onFile} className="text-sm text-ink-soft file:mr-3 file:rounded-lg file:border-0 file:bg-well-50 file:px-3 file:py-1.5 file:text-well-800" />
      </div>
      <div className="flex flex-col gap-1.5">
        <label htmlFor={textId} className="text-sm font-medium text-ink">…or paste it (the whole export, or just its manifest)</label>
        <textarea id={textId} value={text} onChange={(e) => setText(e.target.value)} rows={8} spellCheck={false} className="w-full rounded-lg bg-surface p-3 font-mono text-xs text-ink ring-1 ring-line-strong ring-inset focus:ring-2 focus:ring-well-500 focus:outline-none" />
      </div>
      {text.trim() && !manifest && <p role="alert" className="text-sm text-rose-600">This is not a map export or manifest (JSON with an &quot;ensemble&quot; field).</p>}
      {manifest && (
        <div className="rounded-lg bg-well-50 p-3 text-sm text-well-900">
          <p className="font-semibold">{String(manifest.title ?? "Untitled map")}</p>
          {describe(manifest).map((line) => <p key={line} className="font-mono text-xs">{line}</p>)}
          <p className="mt-2 text-xs">The map starts private. Cells already stored with the same settings and seed come from the cache at once.</p>
        </div>
      )}
      <TextField label="Title (optional)" placeholder="keep the manifest's title" value={title} onChange={(e) => setTitle(e.target.value)} />
      {issues.length > 0 && (
        <ul role="alert" className="list-disc pl-5 text-sm text-rose-600">{issues.map((m) => <li key={m}>{m}</li>)}</ul>
      )}
      <div className="flex justify-end">
        <Button type="submit" disabled={!manifest} busy={busy}>Create the map</Button>
      </div>
    </form>
  );
}
