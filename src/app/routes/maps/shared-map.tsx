import { useQuery, type QueryClient } from "@tanstack/react-query";
import { Link, Outlet, useNavigate, useParams, useSearchParams, type LoaderFunctionArgs } from "react-router-dom";
import type { LayerId } from "../../../../shared/maps/layers";
import { Wordmark } from "../../../components/brand/logo-mark";
import { buttonClass } from "../../../components/ui/button";
import { Card, CardBody, CardHeader } from "../../../components/ui/card";
import { PageHeader } from "../../../components/ui/page-header";
import { LoadingBlock } from "../../../components/ui/spinner";
import { mapQueries } from "../../../features/maps/api/map-queries";
import { CellDetailView } from "../../../features/maps/components/cell-detail/cell-detail-view";
import { MapFacts } from "../../../features/maps/components/map-facts";
import { MapProgress } from "../../../features/maps/components/map-progress";
import { MapWorkspace } from "../../../features/maps/components/map-workspace";
import { useMapEvents } from "../../../features/maps/hooks/use-map-events";
import { ENSEMBLE_LABELS } from "../../../features/maps/lib/map-settings";
import { cellTitle } from "./cell-detail";

// Pages a read-only link opens (/s/:token), signed in or not. Every read carries ?share=TOKEN.

async function sharedMap(queryClient: QueryClient, token: string) {
  return queryClient.ensureQueryData(mapQueries.shared(token));
}

export const sharedMapLoader =
  (queryClient: QueryClient) =>
  async ({ params }: LoaderFunctionArgs) => {
    const token = params.token ?? "";
    const map = await sharedMap(queryClient, token);
    queryClient.setQueryData(mapQueries.detail(map.id).queryKey, map);
    await queryClient.ensureQueryData(mapQueries.grid(map.id, token));
    return null;
  };

export const sharedCellLoader =
  (queryClient: QueryClient) =>
  async ({ params }: LoaderFunctionArgs) => {
    const token = params.token ?? "";
    const map = await sharedMap(queryClient, token);
    await queryClient.ensureQueryData(mapQueries.cell(map.id, Number(params.i), Number(params.j), token));
    return null;
  };

/** A bare frame for link readers: the mark, a read-only note, a way to sign in. */
export function SharedLayout() {
  return (
    <div className="flex min-h-screen flex-col">
      <header className="bg-well-900">
        <div className="mx-auto flex h-14 max-w-6xl items-center gap-4 px-4 sm:px-6">
          <Link to="/" aria-label="Equilibrist home">
            <Wordmark />
          </Link>
          <span className="hidden rounded-full bg-well-800 px-2.5 py-0.5 text-xs text-well-100 sm:inline">Shared map · read-only</span>
          <Link to="/sign-in" className="ml-auto text-sm font-medium text-well-100 hover:text-white">
            Sign in
          </Link>
        </div>
      </header>
      <main className="mx-auto w-full max-w-6xl flex-1 px-4 py-8 sm:px-6">
        <Outlet />
      </main>
    </div>
  );
}

export function SharedMapPage() {
  const token = useParams().token ?? "";
  const navigate = useNavigate();
  const [search, setSearch] = useSearchParams();
  const shared = useQuery(mapQueries.shared(token));
  const id = shared.data?.id ?? "";
  const map = useQuery({ ...mapQueries.detail(id, token), enabled: Boolean(id) });
  const grid = useQuery({ ...mapQueries.grid(id, token), enabled: Boolean(id) });
  const live = useMapEvents(id, map.data?.status, token);
  if (shared.isError) throw shared.error;
  if (map.isError) throw map.error;
  if (grid.isError) throw grid.error;
  if (!map.data || !grid.data) return <LoadingBlock label="Opening the shared map…" />;
  const m = map.data;
  return (
    <>
      <PageHeader eyebrow="Shared with you" title={m.title} description={`${ENSEMBLE_LABELS[m.ensemble] ?? m.ensemble}, N = ${String(m.settings.N)} · by ${m.ownerName}. Read-only: you can look, open cells and export, not change it.`} />
      <Card className="mb-6">
        <CardBody>
          <MapProgress map={m} live={live} />
        </CardBody>
      </Card>
      <MapWorkspace map={m} grid={grid.data} layer={(search.get("layer") ?? "stable-found") as LayerId} onLayer={(l) => setSearch({ layer: l }, { replace: true })} onOpenCell={(i, j) => navigate(`/s/${encodeURIComponent(token)}/cells/${i}/${j}`)} share={token} />
      <Card className="mt-6">
        <CardHeader title="Settings" />
        <CardBody>
          <MapFacts map={m} />
        </CardBody>
      </Card>
    </>
  );
}

export function SharedCellPage() {
  const params = useParams();
  const token = params.token ?? "";
  const [i, j] = [Number(params.i), Number(params.j)];
  const shared = useQuery(mapQueries.shared(token));
  const id = shared.data?.id ?? "";
  const cell = useQuery({ ...mapQueries.cell(id, i, j, token), enabled: Boolean(id) });
  if (shared.isError) throw shared.error;
  if (cell.isError) throw cell.error;
  if (!shared.data || !cell.data) return <LoadingBlock label="Loading the cell…" />;
  const s = cell.data.summary;
  return (
    <>
      <nav aria-label="Breadcrumb" className="mb-3 text-sm">
        <Link to={`/s/${encodeURIComponent(token)}`} className="text-well-600 hover:underline">
          {shared.data.title}
        </Link>
        <span className="mx-1.5 text-ink-faint">/</span>
        <span className="text-ink-soft">
          cell ({i}, {j})
        </span>
      </nav>
      <PageHeader title={cellTitle(shared.data, s.mu, s.tau)} description={`${s.networks} networks × ${s.starts} starts per network · read-only`} />
      <CellDetailView map={shared.data} detail={cell.data} share={token} />
      <p className="mt-6 text-center">
        <Link to={`/s/${encodeURIComponent(token)}`} className={buttonClass("secondary", "sm")}>
          Back to the map
        </Link>
      </p>
    </>
  );
}
