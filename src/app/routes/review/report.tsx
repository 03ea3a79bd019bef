import { useQuery, type QueryClient } from "@tanstack/react-query";
import { useMemo, useRef, type ReactNode } from "react";
import { Link, useParams, type LoaderFunctionArgs } from "react-router-dom";
import type { MapGrid, MapView } from "../../../../shared/schemas/maps";
import type { MapBoundary, MapReport } from "../../../../shared/schemas/review";
import { Button, buttonClass } from "../../../components/ui/button";
import { LoadingBlock } from "../../../components/ui/spinner";
import { mapQueries } from "../../../features/maps/api/map-queries";
import { MapFigure } from "../../../features/maps/components/heatmap/map-figure";
import { useElementWidth } from "../../../features/maps/hooks/use-element-width";
import { buildGrid } from "../../../features/maps/lib/grid-model";
import { overlayCurves } from "../../../features/maps/lib/overlay-curves";
import { reviewQueries } from "../../../features/review/api/review-queries";
import { AgreementSummary } from "../../../features/review/components/agreement-summary";
import { BoundaryFigure, BoundaryLegend } from "../../../features/review/components/boundary-figure";
import { BoundaryTable } from "../../../features/review/components/boundary-table";
import { DifferenceHeatmap } from "../../../features/review/components/difference-heatmap";
import { FactsTable } from "../../../features/review/components/facts-table";
import { reportFacts } from "../../../features/review/lib/report-facts";
import { requireUser } from "../auth/guards";

/** Largest width of the report's figures: a heading and one figure fit on an A4 page at 96 dpi (narrower screens lay them out narrower). */
const FIGURE_WIDTH = 560;

export const reportLoader =
  (queryClient: QueryClient) =>
  async (args: LoaderFunctionArgs) => {
    await requireUser(queryClient)(args);
    const id = args.params.mapId ?? "";
    await Promise.all([
      queryClient.ensureQueryData(reviewQueries.report(id)),
      queryClient.ensureQueryData(reviewQueries.boundary(id)),
      queryClient.ensureQueryData(mapQueries.detail(id)),
      queryClient.ensureQueryData(mapQueries.grid(id)),
    ]);
    return null;
  };

const PRINT_CSS = `
@page { size: A4; margin: 14mm 12mm; }
@media print {
  html, body { background: #ffffff !important; }
  .report-keep, .report-section tr { break-inside: avoid-page; }
}`;

/** A report section; its heading, note and `lead` (a figure) stay on one printed page. */
function Section({ title, note, lead, children }: { title: string; note?: string; lead?: ReactNode; children?: ReactNode }) {
  return (
    <section className="report-section mt-8 border-t border-line pt-5 print:mt-6">
      <div className="report-keep">
        <h2 className="text-lg font-semibold text-ink">{title}</h2>
        {note && <p className="mt-1 text-sm text-ink-soft">{note}</p>}
        {lead && <div className="mt-3 [&_svg]:h-auto [&_svg]:max-w-full">{lead}</div>}
      </div>
      {children && <div className="mt-3">{children}</div>}
    </section>
  );
}

/** values[j][i] of the one-stable share from the grid's summaries. */
function shareMatrix(map: MapView, grid: MapGrid): (number | null)[][] {
  const out = Array.from({ length: map.tau.steps }, () => Array<number | null>(map.mu.steps).fill(null));
  for (const c of grid.cells) if (c.state === "done" && c.oneStable) out[c.j][c.i] = c.oneStable.estimate;
  return out;
}

function Replication({ report, map, width }: { report: MapReport; map: MapView; width: number }) {
  const partner = [...report.related].sort((a, b) => Number(b.status === "done") - Number(a.status === "done"))[0];
  const cmp = useQuery({ ...reviewQueries.compare(map.id, partner?.id ?? ""), enabled: !!partner });
  if (!partner) return <p className="text-sm text-ink-soft">No replicate yet. A replicate re-runs this map with a new seed; its agreement appears here.</p>;
  if (cmp.isPending) return <LoadingBlock label="Comparing with the replicate…" />;
  if (cmp.isError) return <p className="text-sm text-rose-600">The comparison could not be computed: {cmp.error.message}</p>;
  return (
    <div className="flex flex-col gap-4">
      <p className="text-sm text-ink-soft">
        Compared with <strong className="text-ink">{partner.title}</strong> (its {partner.relation}; {partner.status}).
      </p>
      <AgreementSummary comparison={cmp.data} />
      <div className="report-keep [&_svg]:h-auto [&_svg]:max-w-full">
        <DifferenceHeatmap comparison={cmp.data} mu={map.mu} tau={map.tau} layer="stableFound" width={width} />
      </div>
    </div>
  );
}

function ReportBody({ map, grid, report, boundary, width }: { map: MapView; grid: MapGrid; report: MapReport; boundary: MapBoundary; width: number }) {
  const model = useMemo(() => buildGrid(map, grid.cells), [map, grid.cells]);
  const curves = useMemo(() => new Set(overlayCurves(map, [0, 1]).map((c) => c.id)), [map]);
  const gain = map.ensemble === "rate" ? Number(map.settings.g) : null;
  return (
    <>
      <Section
        title="Map"
        note="Distinct stable equilibria found per network (mean over the cell's networks; a lower bound of the true number), with the predicted large-N curves."
        lead={<MapFigure map={map} grid={model} layerId="stable-found" criteria={[]} curves={curves} width={width} />}
      />
      <Section
        title="Boundary estimate"
        note="Per τ row: the μ where the share of networks with exactly one stable state found crosses ½, against the predicted lines."
        lead={
          <>
            <BoundaryFigure mu={map.mu} tau={map.tau} mus={grid.mu} taus={grid.tau} share={shareMatrix(map, grid)} rows={boundary.rows} ensemble={map.ensemble} muCritical={map.muCritical} gain={gain} width={width} />
            <div className="mt-2"><BoundaryLegend ensemble={map.ensemble} muCritical={map.muCritical} gain={gain} /></div>
          </>
        }
      >
        <BoundaryTable boundary={boundary} />
      </Section>
      <Section title="Replication">
        <Replication report={report} map={map} width={width} />
      </Section>
      <Section title="Settings" note="Everything that determines this map's numbers. The manifest in the map's export.json recreates it exactly.">
        <FactsTable groups={reportFacts(map, report, boundary)} />
      </Section>
    </>
  );
}

/** The printable review report of one map: figure, boundary, replication and every setting. */
export function ReportPage() {
  const id = useParams().mapId ?? "";
  const map = useQuery(mapQueries.detail(id));
  const grid = useQuery(mapQueries.grid(id));
  const report = useQuery(reviewQueries.report(id));
  const boundary = useQuery(reviewQueries.boundary(id));
  const column = useRef<HTMLDivElement>(null);
  const width = Math.min(FIGURE_WIDTH, useElementWidth(column, FIGURE_WIDTH));
  if (map.isPending || grid.isPending || report.isPending || boundary.isPending) return <LoadingBlock className="min-h-screen" label="Preparing the report…" />;
  const failed = map.error ?? grid.error ?? report.error ?? boundary.error;
  if (failed) throw failed;
  const m = map.data!;
  return (
    <div className="min-h-screen bg-paper print:bg-white">
      <style>{PRINT_CSS}</style>
      <div className="border-b border-line bg-surface print:hidden">
        <div className="mx-auto flex max-w-[820px] flex-wrap items-center justify-between gap-3 px-4 py-3">
          <Link to={`/maps/${id}`} className="text-sm text-well-600 hover:underline">← Back to the map</Link>
          <Button size="sm" onClick={() => window.print()}>Print or save as PDF</Button>
        </div>
      </div>
      <main className="mx-auto max-w-[820px] px-4 py-8 sm:px-6 print:max-w-none print:px-0 print:py-0">
        <p className="text-xs font-semibold tracking-[0.12em] text-well-500 uppercase">Equilibrist review report</p>
        <h1 className="mt-1 text-2xl font-semibold text-ink">{m.title}</h1>
        <p className="mt-1 text-sm text-ink-soft">
          {m.ensemble === "field" ? "Gaussian field network" : "Rate network"}, N = {String(m.settings.N)} · by {m.ownerName} · status {m.status}
          {m.description ? ` · ${m.description}` : ""}
        </p>
        <p className="mt-3 text-xs text-ink-soft">
          Results are Monte Carlo estimates over random networks: found counts are lower bounds of the true numbers, intervals are
          95 %, and the predicted lines are asymptotic (large N).
        </p>
        <div ref={column}>
          <ReportBody map={m} grid={grid.data!} report={report.data!} boundary={boundary.data!} width={width} />
        </div>
        <p className="mt-8 text-xs text-ink-faint print:hidden">
          <Link to={`/maps/${id}`} className={buttonClass("ghost", "sm")}>Back to the map</Link>
        </p>
      </main>
    </div>
  );
}
