import { useQuery, type QueryClient } from "@tanstack/react-query";
import { useState } from "react";
import { Link, useNavigate, useParams, useSearchParams, type LoaderFunctionArgs } from "react-router-dom";
import type { LayerId } from "../../../../shared/maps/layers";
import { Button } from "../../../components/ui/button";
import { Card, CardBody, CardHeader } from "../../../components/ui/card";
import { ConfirmButton } from "../../../components/ui/confirm-button";
import { PageHeader } from "../../../components/ui/page-header";
import { LoadingBlock } from "../../../components/ui/spinner";
import { groupQueries } from "../../../features/groups/api/group-queries";
import { useCancelMap, useDeleteMap } from "../../../features/maps/api/map-mutations";
import { mapQueries } from "../../../features/maps/api/map-queries";
import { MapFacts } from "../../../features/maps/components/map-facts";
import { MapProgress } from "../../../features/maps/components/map-progress";
import { MapWorkspace } from "../../../features/maps/components/map-workspace";
import { ShareDialog } from "../../../features/maps/components/share-dialog";
import { useMapEvents } from "../../../features/maps/hooks/use-map-events";
import { ENSEMBLE_LABELS } from "../../../features/maps/lib/map-settings";
import { ReviewActions } from "../review/review-actions";

export const mapViewLoader =
  (queryClient: QueryClient) =>
  async ({ params }: LoaderFunctionArgs) => {
    const id = params.mapId ?? "";
    await Promise.all([queryClient.ensureQueryData(mapQueries.detail(id)), queryClient.ensureQueryData(mapQueries.grid(id))]);
    void queryClient.prefetchQuery(groupQueries.list());
    return null;
  };

function MapActions({ id, access, status, onShare }: { id: string; access: string; status: string; onShare: () => void }) {
  const navigate = useNavigate();
  const cancel = useCancelMap(id);
  const remove = useDeleteMap(id);
  const writable = access === "owner" || access === "editor";
  if (!writable) return null;
  return (
    <>
      {(status === "queued" || status === "running") && (
        <ConfirmButton variant="secondary" question="Stop filling? Finished cells are kept." confirmLabel="Stop" busy={cancel.isPending} onConfirm={() => cancel.mutate()}>
          Cancel filling
        </ConfirmButton>
      )}
      <Button variant="secondary" size="sm" onClick={onShare}>
        Share
      </Button>
      {access === "owner" && (
        <ConfirmButton question="Delete this map? Its cells stay cached." confirmLabel="Delete" busy={remove.isPending} onConfirm={() => remove.mutate(undefined, { onSuccess: () => navigate("/", { replace: true }) })}>
          Delete
        </ConfirmButton>
      )}
    </>
  );
}

export function MapViewPage() {
  const id = useParams().mapId ?? "";
  const navigate = useNavigate();
  const [search, setSearch] = useSearchParams();
  const [sharing, setSharing] = useState(false);
  const map = useQuery(mapQueries.detail(id));
  const grid = useQuery(mapQueries.grid(id));
  const groups = useQuery({ ...groupQueries.list(), enabled: sharing });
  const live = useMapEvents(id, map.data?.status);

  if (map.isPending || grid.isPending) return <LoadingBlock label="Loading the map…" />;
  if (map.isError) throw map.error;
  if (grid.isError) throw grid.error;
  const m = map.data;
  const layer = (search.get("layer") ?? "stable-found") as LayerId;

  return (
    <>
      <nav aria-label="Breadcrumb" className="mb-3 text-sm">
        <Link to="/" className="text-well-600 hover:underline">
          Maps
        </Link>
        <span className="mx-1.5 text-ink-faint">/</span>
        <span className="text-ink-soft">{m.title}</span>
      </nav>
      <PageHeader
        title={m.title}
        description={`${ENSEMBLE_LABELS[m.ensemble] ?? m.ensemble}, N = ${String(m.settings.N)} · by ${m.ownerName}${m.description ? ` · ${m.description}` : ""}`}
        actions={
          <>
            <ReviewActions map={m} />
            <MapActions id={id} access={m.access} status={m.status} onShare={() => setSharing(true)} />
          </>
        }
      />
      <Card className="mb-6">
        <CardBody>
          <MapProgress map={m} live={live} />
        </CardBody>
      </Card>
      <MapWorkspace
        map={m}
        grid={grid.data}
        layer={layer}
        onLayer={(l) => setSearch({ layer: l }, { replace: true })}
        onOpenCell={(i, j) => navigate(`/maps/${id}/cells/${i}/${j}`)}
      />
      <Card className="mt-6">
        <CardHeader title="Settings" description="Everything that determines this map's numbers; exports embed the same." />
        <CardBody>
          <MapFacts map={m} />
        </CardBody>
      </Card>
      {sharing && <ShareDialog map={m} groups={groups.data?.items ?? []} onClose={() => setSharing(false)} />}
    </>
  );
}
