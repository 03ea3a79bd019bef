import { useQuery } from "@tanstack/react-query";
import { useMemo } from "react";
import { Link } from "react-router-dom";
import type { MapView } from "../../../../shared/schemas/maps";
import { formatDate } from "../../../lib/format";
import { mapQueries } from "../api/map-queries";
import { buildGrid } from "../lib/grid-model";
import { ENSEMBLE_LABELS } from "../lib/map-settings";
import { mapThumbnail } from "../lib/thumbnail";
import { StatusBadge } from "./status-badge";

function Thumbnail({ map }: { map: MapView }) {
  const filling = map.status === "queued" || map.status === "running";
  const grid = useQuery({ ...mapQueries.grid(map.id), refetchInterval: filling ? 10_000 : false });
  const src = useMemo(() => (grid.data ? mapThumbnail(buildGrid(map, grid.data.cells), "stable-found") : null), [grid.data, map]);
  return (
    <div className="flex h-20 w-28 shrink-0 items-center justify-center overflow-hidden rounded-lg bg-paper ring-1 ring-line">
      {src ? (
        <img src={src} alt={`Thumbnail: stable states found over μ and τ`} className="h-full w-full" style={{ imageRendering: "pixelated" }} />
      ) : (
        <span className="text-[0.65rem] text-ink-faint">{grid.isError ? "no preview" : "…"}</span>
      )}
    </div>
  );
}

/** One map in a list: thumbnail of its main layer, status and progress, ensemble and N. */
export function MapCard({ map, myId }: { map: MapView; myId: string }) {
  const share = map.cellsTotal ? (map.cellsDone / map.cellsTotal) * 100 : 0;
  return (
    <Link to={`/maps/${map.id}`} className="group flex gap-4 rounded-[var(--radius-card)] bg-surface p-4 shadow-[var(--shadow-card)] ring-1 ring-line transition hover:ring-well-300">
      <Thumbnail map={map} />
      <div className="flex min-w-0 flex-1 flex-col gap-1.5">
        <div className="flex items-start justify-between gap-2">
          <h3 className="line-clamp-2 min-w-0 text-[0.95rem] font-semibold text-ink group-hover:text-well-700">{map.title}</h3>
          <StatusBadge status={map.status} />
        </div>
        <p className="text-xs text-ink-soft">
          {ENSEMBLE_LABELS[map.ensemble] ?? map.ensemble} · N = {String(map.settings.N)} · {map.mu.steps} × {map.tau.steps} cells
        </p>
        <div className="flex items-center gap-2">
          <div className="h-1.5 flex-1 overflow-hidden rounded-full bg-well-50 ring-1 ring-line" aria-hidden="true">
            <div className="h-full bg-well-500" style={{ width: `${share}%` }} />
          </div>
          <span className="text-xs text-ink-soft tabular-nums">
            {map.cellsDone}/{map.cellsTotal}
          </span>
        </div>
        <p className="truncate text-xs text-ink-faint">
          {map.ownerId === myId ? "Yours" : `By ${map.ownerName}`}
          {map.groupName ? ` · ${map.groupName}` : ""} · {formatDate(map.createdAt)}
        </p>
      </div>
    </Link>
  );
}
