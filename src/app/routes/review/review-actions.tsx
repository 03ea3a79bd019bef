import { useQuery, useQueryClient } from "@tanstack/react-query";
import { useState } from "react";
import { Link, useNavigate } from "react-router-dom";
import type { MapView } from "../../../../shared/schemas/maps";
import { Button, buttonClass } from "../../../components/ui/button";
import { LoadingBlock } from "../../../components/ui/spinner";
import { mapKeys, mapQueries } from "../../../features/maps/api/map-queries";
import { Modal } from "../../../components/ui/modal";
import { useReplicateMap } from "../../../features/review/api/review-mutations";
import { ComparePicker, type CompareCandidate } from "../../../features/review/components/compare-picker";
import { ReplicateForm } from "../../../features/review/components/replicate-form";

const sameAxis = (a: MapView["mu"], b: MapView["mu"]) => a.min === b.min && a.max === b.max && a.steps === b.steps && a.scale === b.scale;

/** Maps on the same grid, related ones (replicates, the original, siblings) first. */
export function compareCandidates(map: MapView, all: MapView[]): CompareCandidate[] {
  const relation = (m: MapView) =>
    m.replicateOf === map.id ? "replicate" : m.id === map.replicateOf ? "original" : map.replicateOf && m.replicateOf === map.replicateOf ? "sibling" : undefined;
  return all
    .filter((m) => m.id !== map.id && sameAxis(m.mu, map.mu) && sameAxis(m.tau, map.tau))
    .map((m) => ({ id: m.id, title: m.title, seed: m.seed, status: m.status, relation: relation(m) }))
    .sort((a, b) => Number(!a.relation) - Number(!b.relation));
}

function CompareDialog({ map, onClose }: { map: MapView; onClose: () => void }) {
  const list = useQuery(mapQueries.list({ scope: "all", sort: "newest" }));
  return (
    <Modal title="Compare with another map" onClose={onClose}>
      <p className="mb-3 text-sm text-ink-soft">Maps you can read on the same μ and τ grid. The comparison tests every cell.</p>
      {list.isPending ? <LoadingBlock label="Loading maps…" /> : <ComparePicker mapId={map.id} candidates={compareCandidates(map, list.data?.items ?? [])} />}
    </Modal>
  );
}

function ReplicateDialog({ map, onClose }: { map: MapView; onClose: () => void }) {
  const navigate = useNavigate();
  const queryClient = useQueryClient();
  const replicate = useReplicateMap(map.id, async (created) => {
    queryClient.setQueryData(mapKeys.detail(created.id), created);
    await queryClient.invalidateQueries({ queryKey: mapKeys.lists() });
    navigate(`/maps/${created.id}`);
  });
  return (
    <Modal title="Replicate with a new seed" onClose={onClose}>
      <ReplicateForm title={map.title} seed={map.seed} busy={replicate.isPending} error={replicate.error} onSubmit={(body) => replicate.mutate(body)} onCancel={onClose} />
    </Modal>
  );
}

/** Review actions of the map page: replicate (editors), compare, and the printable report. */
export function ReviewActions({ map }: { map: MapView }) {
  const [open, setOpen] = useState<"replicate" | "compare" | null>(null);
  const writable = map.access === "owner" || map.access === "editor";
  return (
    <>
      {writable && (
        <Button variant="secondary" size="sm" onClick={() => setOpen("replicate")}>
          Replicate
        </Button>
      )}
      <Button variant="secondary" size="sm" onClick={() => setOpen("compare")}>
        Compare
      </Button>
      <Link to={`/maps/${map.id}/report`} className={buttonClass("secondary", "sm")}>
        Report
      </Link>
      {open === "replicate" && <ReplicateDialog map={map} onClose={() => setOpen(null)} />}
      {open === "compare" && <CompareDialog map={map} onClose={() => setOpen(null)} />}
    </>
  );
}
