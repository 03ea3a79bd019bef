import { Link } from "react-router-dom";
import { pagePaths, type ActiveJob, type InFlightMap, type QueueCounts, type WorkerActivity } from "../../../../shared/schemas";
import { Badge } from "../../../components/ui/badge";
import { formatDateTime } from "../../../lib/format";
import { PlainTable, type PlainColumn } from "./plain-table";

const count = (n: number) => (n === 0 ? <span className="text-ink-faint">0</span> : n);

const queueColumns: PlainColumn<QueueCounts>[] = [
  { header: "Queue", cell: (q) => <span className="font-mono text-[0.82rem]">{q.name}</span> },
  { header: "Waiting", numeric: true, cell: (q) => count(q.created) },
  { header: "To retry", numeric: true, cell: (q) => count(q.retry) },
  { header: "Running", numeric: true, cell: (q) => count(q.active) },
  { header: "Done", numeric: true, cell: (q) => count(q.completed) },
  { header: "Failed", numeric: true, cell: (q) => (q.failed === 0 ? count(0) : <span className="text-rose-700">{q.failed}</span>) },
  { header: "Cancelled", numeric: true, cell: (q) => count(q.cancelled) },
];

/** Jobs per pg-boss queue and state. */
export function QueueCountsTable({ queues }: { queues: QueueCounts[] }) {
  return <PlainTable caption="Jobs per queue" columns={queueColumns} rows={queues} rowKey={(q) => q.name} />;
}

function mapLink(id: string | null, title: string | null) {
  if (!id) return <span className="text-ink-faint">—</span>;
  return (
    <Link to={pagePaths.map(id)} className="text-well-600 hover:underline">
      {title ?? "Deleted map"}
    </Link>
  );
}

const jobColumns: PlainColumn<ActiveJob>[] = [
  { header: "Queue", cell: (j) => <span className="font-mono text-[0.82rem]">{j.queue}</span> },
  { header: "Map", cell: (j) => mapLink(j.mapId, j.mapTitle) },
  { header: "Cell (i, j)", numeric: true, cell: (j) => (j.i === null || j.j === null ? "—" : `${j.i}, ${j.j}`) },
  { header: "Started", cell: (j) => formatDateTime(j.startedOn) },
  { header: "Retries", numeric: true, cell: (j) => count(j.retryCount) },
];

/** Jobs a worker holds right now, oldest first. */
export function ActiveJobsTable({ jobs }: { jobs: ActiveJob[] }) {
  return <PlainTable caption="Running jobs" columns={jobColumns} rows={jobs} rowKey={(j) => j.id} />;
}

const workerColumns: PlainColumn<WorkerActivity>[] = [
  { header: "Worker", cell: (w) => <span className="font-mono text-[0.82rem]">{w.name}</span> },
  { header: "Cells in the last hour", numeric: true, cell: (w) => count(w.cellsLastHour) },
  { header: "Last cell stored", cell: (w) => formatDateTime(w.lastCellAt) },
];

/** Worker processes by the cells they stored. */
export function WorkerTable({ workers }: { workers: WorkerActivity[] }) {
  return <PlainTable caption="Workers" columns={workerColumns} rows={workers} rowKey={(w) => w.name} />;
}

const mapColumns: PlainColumn<InFlightMap>[] = [
  { header: "Map", cell: (m) => mapLink(m.id, m.title) },
  { header: "Owner", cell: (m) => m.ownerName },
  { header: "State", cell: (m) => <Badge tone={m.status === "running" ? "well" : "plain"}>{m.status === "running" ? "Filling" : "Waiting"}</Badge> },
  { header: "Cells", numeric: true, cell: (m) => `${m.cellsDone} / ${m.cellsTotal}` },
];

/** Maps still queued or being filled. */
export function InFlightMapsTable({ maps }: { maps: InFlightMap[] }) {
  return <PlainTable caption="Maps in flight" columns={mapColumns} rows={maps} rowKey={(m) => m.id} />;
}
