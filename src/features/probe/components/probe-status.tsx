import type { ProbeStatus } from "../../../../shared/schemas/probes";
import { Badge, type BadgeTone } from "../../../components/ui/badge";

const LOOK: Record<ProbeStatus, { tone: BadgeTone; label: string }> = {
  ready: { tone: "plain", label: "Analysed" },
  searching: { tone: "well", label: "Searching" },
  done: { tone: "moss", label: "Equilibria found" },
  failed: { tone: "rose", label: "Search failed" },
};

export function ProbeStatusBadge({ status }: { status: ProbeStatus }) {
  return <Badge tone={LOOK[status].tone}>{LOOK[status].label}</Badge>;
}
