import { useQuery } from "@tanstack/react-query";
import { Link } from "react-router-dom";
import { buttonClass } from "../../../components/ui/button";
import { EmptyState } from "../../../components/ui/empty-state";
import { LoadingBlock } from "../../../components/ui/spinner";
import { mapQueries, type MapListFilters } from "../api/map-queries";
import { MapCard } from "./map-card";

const EMPTY: Record<MapListFilters["scope"], { title: string; text: string }> = {
  all: { title: "No maps yet", text: "Start one: pick an ensemble, N and ranges of μ and τ. Cells someone already computed are reused at once." },
  mine: { title: "You have made no map yet", text: "Maps you launch appear here with their progress." },
  group: { title: "No group maps", text: "Maps your groups' members share with the group appear here." },
  shared: { title: "Nothing shared with you", text: "When a colleague shares a map with a group you are in, it appears here." },
};

/** The maps matching the filters, as cards; its own loading, error and empty states. */
export function MapList({ filters, myId }: { filters: MapListFilters; myId: string }) {
  // While any listed map is filling, its progress is refreshed every few seconds; idle lists are not polled.
  const list = useQuery({
    ...mapQueries.list(filters),
    refetchInterval: (q) => (q.state.data?.items.some((m) => m.status === "queued" || m.status === "running") ? 5000 : false),
  });
  if (list.isPending) return <LoadingBlock label="Loading maps…" />;
  if (list.isError) return <p className="px-1 py-6 text-sm text-rose-700">Could not load maps: {list.error.message}</p>;
  const items = list.data.items;
  if (items.length === 0) {
    const e = filters.q ? { title: "No map matches", text: `Nothing with “${filters.q}” in its title or description.` } : EMPTY[filters.scope];
    return (
      <EmptyState title={e.title} action={filters.scope === "all" && !filters.q ? <Link to="/maps/new" className={buttonClass("primary", "md")}>New map</Link> : undefined}>
        {e.text}
      </EmptyState>
    );
  }
  return (
    <ul className="flex flex-col gap-3" aria-label="Maps">
      {items.map((m) => (
        <li key={m.id}>
          <MapCard map={m} myId={myId} />
        </li>
      ))}
    </ul>
  );
}
