import { useQuery, type QueryClient } from "@tanstack/react-query";
import { Link, useParams, type LoaderFunctionArgs } from "react-router-dom";
import type { MapView } from "../../../../shared/schemas/maps";
import { PageHeader } from "../../../components/ui/page-header";
import { LoadingBlock } from "../../../components/ui/spinner";
import { mapQueries } from "../../../features/maps/api/map-queries";
import { CellDetailView } from "../../../features/maps/components/cell-detail/cell-detail-view";
import { formatNumber } from "../../../lib/format-number";

function position(params: Record<string, string | undefined>) {
  return { i: Number(params.i ?? -1), j: Number(params.j ?? -1) };
}

export const cellDetailLoader =
  (queryClient: QueryClient) =>
  async ({ params }: LoaderFunctionArgs) => {
    const id = params.mapId ?? "";
    const { i, j } = position(params);
    await Promise.all([queryClient.ensureQueryData(mapQueries.detail(id)), queryClient.ensureQueryData(mapQueries.cell(id, i, j))]);
    return null;
  };

/** The heading of a cell page: where it sits on the map, in μ, τ and m. */
export function cellTitle(map: MapView, mu: number, tau: number): string {
  const m = map.muCritical ? ` · m = ${formatNumber(mu / map.muCritical)}` : "";
  return `Cell μ = ${formatNumber(mu, 4)}, τ = ${formatNumber(tau, 4)}${m}`;
}

export function CellDetailPage() {
  const params = useParams();
  const id = params.mapId ?? "";
  const { i, j } = position(params);
  const map = useQuery(mapQueries.detail(id));
  const cell = useQuery(mapQueries.cell(id, i, j));
  if (map.isPending || cell.isPending) return <LoadingBlock label="Loading the cell…" />;
  if (map.isError) throw map.error;
  if (cell.isError) throw cell.error;
  const s = cell.data.summary;
  return (
    <>
      <nav aria-label="Breadcrumb" className="mb-3 text-sm">
        <Link to="/" className="text-well-600 hover:underline">
          Maps
        </Link>
        <span className="mx-1.5 text-ink-faint">/</span>
        <Link to={`/maps/${id}`} className="text-well-600 hover:underline">
          {map.data.title}
        </Link>
        <span className="mx-1.5 text-ink-faint">/</span>
        <span className="text-ink-soft">
          cell ({i}, {j})
        </span>
      </nav>
      <PageHeader title={cellTitle(map.data, s.mu, s.tau)} description={`${s.networks} networks × ${s.starts} starts per network · position i = ${i} along μ, j = ${j} along τ`} />
      <CellDetailView map={map.data} detail={cell.data} />
    </>
  );
}
