import type { ReactNode } from "react";
import type { CellSummary } from "../../../../shared/maps/cell-summary";
import type { IntervalJson } from "../../../../shared/schemas/cell-result";
import { REGIME_LABELS } from "../lib/color-scale";
import { formatBounds, formatNumber, formatShare } from "../../../lib/format-number";

function Row({ label, value, detail }: { label: string; value: ReactNode; detail?: ReactNode }) {
  return (
    <div className="grid grid-cols-[minmax(0,1fr)_auto] gap-x-3 py-1">
      <dt className="text-ink-soft">{label}</dt>
      <dd className="text-right font-mono text-ink tabular-nums">{value}</dd>
      {detail && <dd className="col-span-2 text-right text-[0.7rem] text-ink-faint">{detail}</dd>}
    </div>
  );
}

function IntervalRow({ label, i, share, noun }: { label: string; i: IntervalJson | null; share?: boolean; noun: string }) {
  if (!i) return <Row label={label} value="—" />;
  const f = share ? formatShare : formatNumber;
  return <Row label={label} value={f(i.estimate)} detail={`${Math.round(i.level * 100)} % CI ${formatBounds(i, share)} · n = ${i.n} ${noun}`} />;
}

function Section({ title, note, children }: { title: string; note?: string; children: ReactNode }) {
  return (
    <div className="border-t border-line pt-2 first:border-t-0 first:pt-0">
      <h4 className="text-[0.7rem] font-semibold tracking-[0.1em] text-well-600 uppercase">{title}</h4>
      {note && <p className="text-[0.7rem] text-ink-faint">{note}</p>}
      <dl className="mt-1 text-xs">{children}</dl>
    </div>
  );
}

function TheorySection({ t }: { t: NonNullable<CellSummary["theory"]> }) {
  const st = t.krStable;
  return (
    <>
      {(t.sigmaStable !== null || t.sigmaTotal !== null || t.regime) && (
        <Section title="Large-N prediction" note="Asymptotic (N → ∞), not this N">
          <Row label="Σ stable" value={formatNumber(t.sigmaStable)} />
          <Row label="Σ total" value={formatNumber(t.sigmaTotal)} />
          <Row label="Regime" value={<span className="font-sans">{t.regime ? REGIME_LABELS[t.regime] : "—"}</span>} />
        </Section>
      )}
      {(st || t.krTotal) && (
        <Section title="Kac–Rice at this N" note={`Monte Carlo over ${t.krSamples ?? "?"} random matrices`}>
          <Row
            label="E N stable"
            value={st?.mean === 0 && st.upper95 !== null ? `< ${formatNumber(st.upper95)}` : formatNumber(st?.mean)}
            detail={st?.se != null ? `± ${formatNumber(st.se)} (1 s.e.) · ln = ${formatNumber(st.logMean)}` : undefined}
          />
          <Row label="E N total" value={formatNumber(t.krTotal?.mean)} detail={t.krTotal?.se != null ? `± ${formatNumber(t.krTotal.se)} (1 s.e.)` : undefined} />
          {t.exactTotal !== null && <Row label="E N total, exact" value={formatNumber(t.exactTotal)} />}
        </Section>
      )}
      {t.originStable !== null && (
        <Section title="Origin (large-N line)">
          <Row label="Origin stable" value={<span className="font-sans">{t.originStable ? "yes, μ > g(1+τ)" : "no, μ < g(1+τ)"}</span>} />
        </Section>
      )}
    </>
  );
}

/** Every number of one cell, each with its interval and sample size. */
export function CellReadout({ cell, muCritical }: { cell: CellSummary | undefined; muCritical: number | null }) {
  if (!cell) return <p className="text-sm text-ink-soft">Point at a cell, or move through the grid with the arrow keys, to read its numbers here. Click or tap a cell to open it.</p>;
  const m = cell.theory?.m ?? (muCritical ? cell.mu / muCritical : null);
  const where = `μ = ${formatNumber(cell.mu, 4)} · τ = ${formatNumber(cell.tau, 4)}${m !== null ? ` · m = ${formatNumber(m)}` : ""}`;
  const status = cell.state === "done" ? (cell.fromCache ? "Done, from the cache" : "Computed for this map") : cell.state === "pending" ? "Pending" : cell.state === "failed" ? "Failed" : "Cancelled";
  const runs = `${cell.networks} networks × ${cell.starts} starts`;
  return (
    <div className="flex flex-col gap-2.5">
      <div>
        <p className="font-mono text-sm text-ink">{where}</p>
        <p className="text-xs text-ink-soft">
          {status} · {runs}
        </p>
      </div>
      {cell.state === "done" && (
        <Section title="Found by simulation" note="Found counts are lower bounds of the true number">
          <IntervalRow label="Stable states found" i={cell.stable} noun="networks" />
          <IntervalRow label="Estimated stable (Chao1)" i={cell.richness} noun="networks" />
          <IntervalRow label="Runs that settled" i={cell.converged} share noun="runs" />
          <IntervalRow label="Single stable state" i={cell.oneStable} share noun="networks" />
          <IntervalRow label="Unstable equilibria reached" i={cell.unstableReached} noun="networks" />
          {cell.total && <IntervalRow label="All equilibria (exhaustive)" i={cell.total} noun="networks" />}
        </Section>
      )}
      {cell.theory ? <TheorySection t={cell.theory} /> : <p className="text-xs text-ink-faint">Theory columns for this τ row are not in yet.</p>}
    </div>
  );
}
