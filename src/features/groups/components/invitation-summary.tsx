import type { Invitation } from "../../../../shared/schemas";
import { Badge } from "../../../components/ui/badge";
import { formatDate } from "../../../lib/format";
import { roleDescription, roleLabel } from "./role-badge";

/** What an invitation offers: the group, the role, who sent it, and whether it still holds. */
export function InvitationSummary({ invitation }: { invitation: Invitation }) {
  return (
    <div className="rounded-[var(--radius-card)] bg-surface p-5 ring-1 ring-line">
      <p className="text-xs font-semibold uppercase tracking-[0.12em] text-well-500">Group</p>
      <p className="mt-1 text-lg font-semibold text-ink">{invitation.groupName}</p>
      <dl className="mt-4 grid grid-cols-[auto_1fr] gap-x-4 gap-y-2 text-sm">
        <dt className="text-ink-faint">Role</dt>
        <dd className="text-ink">
          {roleLabel[invitation.role]} <span className="text-ink-soft">— {roleDescription[invitation.role]}</span>
        </dd>
        <dt className="text-ink-faint">For</dt>
        <dd className="text-ink [overflow-wrap:anywhere]">{invitation.email}</dd>
        {invitation.invitedByName && (
          <>
            <dt className="text-ink-faint">From</dt>
            <dd className="text-ink">{invitation.invitedByName}</dd>
          </>
        )}
        <dt className="text-ink-faint">Status</dt>
        <dd>
          {invitation.status === "pending" && <Badge tone="well">Open until {formatDate(invitation.expiresAt)}</Badge>}
          {invitation.status === "accepted" && <Badge tone="moss">Already accepted</Badge>}
          {invitation.status === "expired" && <Badge tone="rose">Expired</Badge>}
        </dd>
      </dl>
    </div>
  );
}
