import type { MapStatus } from "../../../../shared/schemas/maps";
import { Badge, type BadgeTone } from "../../../components/ui/badge";

const look: Record<MapStatus, { tone: BadgeTone; label: string }> = {
  queued: { tone: "plain", label: "Queued" },
  running: { tone: "well", label: "Filling" },
  done: { tone: "moss", label: "Complete" },
  cancelled: { tone: "ember", label: "Cancelled" },
  failed: { tone: "rose", label: "Failed" },
};

/** A map's status in a word. */
export function StatusBadge({ status }: { status: MapStatus }) {
  const { tone, label } = look[status];
  return (
    <Badge tone={tone}>
      {status === "running" && <span aria-hidden="true" className="mr-1.5 h-1.5 w-1.5 animate-pulse rounded-full bg-well-500" />}
      {label}
    </Badge>
  );
}
