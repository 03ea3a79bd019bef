import type { MapView } from "../../../../shared/schemas/maps";
import { formatDateTime } from "../../../lib/format";
import { formatDuration, formatNumber } from "../../../lib/format-number";
import { StatusBadge } from "./status-badge";

type Progress = Pick<MapView, "status" | "cellsTotal" | "cellsDone" | "cellsComputed" | "cellsFromCache" | "throughput" | "etaSeconds" | "failure" | "finishedAt">;

/** How far the map has filled: a bar (computed and cached parts), counts, throughput and ETA. */
export function MapProgress({ map, live }: { map: Progress; live?: boolean }) {
  const total = Math.max(1, map.cellsTotal);
  const computed = (map.cellsComputed / total) * 100;
  const cached = (map.cellsFromCache / total) * 100;
  const filling = map.status === "queued" || map.status === "running";
  return (
    <div className="flex flex-col gap-2">
      <div className="flex flex-wrap items-center gap-x-3 gap-y-1 text-sm">
        <StatusBadge status={map.status} />
        <span className="font-medium text-ink tabular-nums">
          {map.cellsDone} of {map.cellsTotal} cells
        </span>
        <span className="text-ink-soft">
          {map.cellsComputed} computed · {map.cellsFromCache} from the cache
        </span>
        {live && filling && <span className="text-xs text-well-600">live</span>}
      </div>
      <div
        role="progressbar"
        aria-label="Cells filled"
        aria-valuemin={0}
        aria-valuemax={map.cellsTotal}
        aria-valuenow={map.cellsDone}
        className="flex h-2.5 overflow-hidden rounded-full bg-well-50 ring-1 ring-line"
      >
        <div className="h-full bg-well-600 transition-[width]" style={{ width: `${computed}%` }} />
        <div className="h-full bg-well-300 transition-[width]" style={{ width: `${cached}%` }} />
      </div>
      {filling ? (
        <p className="text-xs text-ink-soft">
          {map.throughput != null ? `${formatNumber(map.throughput)} cells per minute` : "Waiting for the first cell"}
          {map.etaSeconds != null && ` · about ${formatDuration(map.etaSeconds)} left`}
        </p>
      ) : map.status === "failed" ? (
        <p className="text-xs text-rose-700">Stopped: {map.failure ?? "a cell failed"}</p>
      ) : map.finishedAt ? (
        <p className="text-xs text-ink-soft">Finished {formatDateTime(map.finishedAt)}</p>
      ) : null}
    </div>
  );
}
