import { useQuery, type QueryClient } from "@tanstack/react-query";
import { useRef, useState } from "react";
import { Link, useParams, type LoaderFunctionArgs } from "react-router-dom";
import type { CompareCell } from "../../../../shared/schemas/review";
import { buttonClass } from "../../../components/ui/button";
import { Card, CardBody, CardHeader } from "../../../components/ui/card";
import { PageHeader } from "../../../components/ui/page-header";
import { LoadingBlock } from "../../../components/ui/spinner";
import { mapQueries } from "../../../features/maps/api/map-queries";
import { useElementWidth } from "../../../features/maps/hooks/use-element-width";
import { reviewQueries } from "../../../features/review/api/review-queries";
import { AgreementSummary } from "../../../features/review/components/agreement-summary";
import { CompareReadout } from "../../../features/review/components/compare-readout";
import { DIFFERENCE_LABELS, DifferenceHeatmap, type DifferenceLayer } from "../../../features/review/components/difference-heatmap";
import { cn } from "../../../lib/cn";

export const compareLoader =
  (queryClient: QueryClient) =>
  async ({ params }: LoaderFunctionArgs) => {
    const id = params.mapId ?? "";
    const otherId = params.otherId ?? "";
    await Promise.all([queryClient.ensureQueryData(reviewQueries.compare(id, otherId)), queryClient.ensureQueryData(mapQueries.detail(id))]);
    return null;
  };

function LayerToggle({ value, onChange }: { value: DifferenceLayer; onChange: (l: DifferenceLayer) => void }) {
  return (
    <div role="radiogroup" aria-label="Layer" className="inline-flex rounded-lg bg-paper p-0.5 ring-1 ring-line">
      {(Object.keys(DIFFERENCE_LABELS) as DifferenceLayer[]).map((l) => (
        <button key={l} type="button" role="radio" aria-checked={value === l} onClick={() => onChange(l)} className={cn("rounded-md px-3 py-1 text-sm", value === l ? "bg-surface font-medium text-ink shadow-sm ring-1 ring-line" : "text-ink-soft hover:text-ink")}>
          {DIFFERENCE_LABELS[l]}
        </button>
      ))}
    </div>
  );
}

/** Two maps on one grid, cell by cell: agreement, difference heatmap, the hovered cell's tests. */
export function ComparePage() {
  const { mapId = "", otherId = "" } = useParams();
  const cmp = useQuery(reviewQueries.compare(mapId, otherId));
  const map = useQuery(mapQueries.detail(mapId));
  const [layer, setLayer] = useState<DifferenceLayer>("stableFound");
  const [hover, setHover] = useState<CompareCell | null>(null);
  const box = useRef<HTMLDivElement>(null);
  const width = useElementWidth(box);
  if (cmp.isPending || map.isPending) return <LoadingBlock label="Comparing the maps…" />;
  if (cmp.isError) throw cmp.error;
  if (map.isError) throw map.error;
  const c = cmp.data;
  const m = map.data;
  return (
    <>
      <nav aria-label="Breadcrumb" className="mb-3 text-sm">
        <Link to="/" className="text-well-600 hover:underline">Maps</Link>
        <span className="mx-1.5 text-ink-faint">/</span>
        <Link to={`/maps/${c.a.id}`} className="text-well-600 hover:underline">{c.a.title}</Link>
        <span className="mx-1.5 text-ink-faint">/</span>
        <span className="text-ink-soft">Comparison</span>
      </nav>
      <PageHeader
        eyebrow="Cell-by-cell comparison"
        title={<>{c.a.title} <span className="font-normal text-ink-soft">vs</span> {c.b.title}</>}
        description={`First: seed ${c.a.seed} (${c.a.status}). Second: seed ${c.b.seed} (${c.b.status}). ${c.mu.length} × ${c.tau.length} cells.`}
        actions={
          <>
            <Link to={`/maps/${c.b.id}`} className={buttonClass("secondary", "sm")}>Open the second map</Link>
            <Link to={`/maps/${c.a.id}/report`} className={buttonClass("secondary", "sm")}>Report</Link>
          </>
        }
      />
      <Card className="mb-6"><CardBody><AgreementSummary comparison={c} /></CardBody></Card>
      <div className="grid grid-cols-1 items-start gap-6 lg:grid-cols-[minmax(0,1fr)_20rem]">
        <Card className="overflow-hidden">
          <CardHeader title="Difference heatmap" description="Warm: the first map found more; cool: fewer. Rings mark cells that differ at the 5 % level." actions={<LayerToggle value={layer} onChange={setLayer} />} />
          <div ref={box} className="w-full">
            {width > 0 && <DifferenceHeatmap comparison={c} mu={m.mu} tau={m.tau} layer={layer} width={width} onHover={setHover} />}
          </div>
        </Card>
        <Card className="lg:sticky lg:top-20">
          <CardHeader title="Cell" />
          <CardBody><CompareReadout cell={hover} names={[c.a.title, c.b.title]} /></CardBody>
        </Card>
      </div>
    </>
  );
}
