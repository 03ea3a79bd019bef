import { useQuery, type QueryClient } from "@tanstack/react-query";
import type { ReactNode } from "react";
import { QUEUE_HISTORY_HOURS, type AdminQueue } from "../../../../shared/schemas";
import { Card, CardHeader } from "../../../components/ui/card";
import { EmptyState } from "../../../components/ui/empty-state";
import { LoadingBlock } from "../../../components/ui/spinner";
import { adminQueries, isQueueBusy, QUEUE_POLL_MS } from "../../../features/admin/api/admin-queries";
import { ActiveJobsTable, InFlightMapsTable, QueueCountsTable, WorkerTable } from "../../../features/admin/components/queue-tables";
import { plural } from "../../../lib/format";

export const adminQueueLoader = (queryClient: QueryClient) => async () => {
  await queryClient.ensureQueryData(adminQueries.queue());
  return null;
};

function Panel({ title, description, children }: { title: string; description: string; children: ReactNode }) {
  return (
    <Card>
      <CardHeader title={title} description={description} />
      {children}
    </Card>
  );
}

function BusyPanels({ view }: { view: AdminQueue }) {
  return (
    <>
      <Panel title="Maps in flight" description={`${plural(view.inFlightMaps.length, "map")} waiting or filling.`}>
        {view.inFlightMaps.length ? <InFlightMapsTable maps={view.inFlightMaps} /> : <EmptyState title="No map is waiting" />}
      </Panel>
      <Panel title="Running jobs" description="Jobs a worker holds now, oldest first.">
        {view.activeJobs.length ? (
          <ActiveJobsTable jobs={view.activeJobs} />
        ) : (
          <EmptyState title="No job is running">Jobs are waiting; they start when a worker process takes them.</EmptyState>
        )}
      </Panel>
    </>
  );
}

/**
 * The compute queue: jobs per queue, the jobs and maps in progress, and the worker processes.
 * Refreshes every few seconds while anything waits or runs, and stays still while idle.
 */
export function AdminQueuePage() {
  const queue = useQuery(adminQueries.queue());
  if (queue.isPending) return <LoadingBlock />;
  if (queue.isError) return <p className="text-sm text-rose-700">Could not load the queue: {queue.error.message}</p>;
  const view = queue.data;
  const busy = isQueueBusy(view);

  return (
    <div className="grid gap-6">
      {busy ? (
        <BusyPanels view={view} />
      ) : (
        <Card>
          <EmptyState title="Nothing is running">
            No map is waiting and no job is queued. New maps appear here as soon as they are created.
          </EmptyState>
        </Card>
      )}
      <Panel
        title="Queues"
        description={`Waiting and running now; done, failed and cancelled over the last ${QUEUE_HISTORY_HOURS} h.${busy ? ` Refreshes every ${QUEUE_POLL_MS / 1000} s.` : ""}`}
      >
        {view.queues.length ? <QueueCountsTable queues={view.queues} /> : <EmptyState title="No queue yet">No process has started the job queue on this database.</EmptyState>}
      </Panel>
      <Panel title="Workers" description={`Processes that stored a cell in the last ${QUEUE_HISTORY_HOURS} h.`}>
        {view.workers.length ? <WorkerTable workers={view.workers} /> : <EmptyState title="No worker has stored a cell lately" />}
      </Panel>
    </div>
  );
}
