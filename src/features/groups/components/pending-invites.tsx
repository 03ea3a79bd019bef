import type { GroupInvite } from "../../../../shared/schemas";
import { ConfirmButton } from "../../../components/ui/confirm-button";
import { EmptyState } from "../../../components/ui/empty-state";
import { formatDate } from "../../../lib/format";
import { useRevokeInvite } from "../api/group-mutations";
import { RoleBadge } from "./role-badge";

type PendingInvitesProps = { groupId: string; invites: GroupInvite[] };

export function PendingInvites({ groupId, invites }: PendingInvitesProps) {
  const revoke = useRevokeInvite(groupId);
  if (invites.length === 0) {
    return (
      <EmptyState title="No pending invitations" className="py-8">
        Invitations you send wait here until they are accepted or expire.
      </EmptyState>
    );
  }
  return (
    <ul className="divide-y divide-line">
      {invites.map((invite) => (
        <li key={invite.id} className="flex flex-wrap items-center gap-x-4 gap-y-2 px-5 py-3">
          <div className="min-w-0 flex-1 basis-52">
            <p className="text-sm font-medium text-ink [overflow-wrap:anywhere]">{invite.email}</p>
            <p className="mt-1 flex flex-wrap items-center gap-x-2 gap-y-1 text-xs text-ink-soft">
              <RoleBadge role={invite.role} />
              <span>
                {invite.invitedByName ? `from ${invite.invitedByName} · ` : ""}expires {formatDate(invite.expiresAt)}
              </span>
            </p>
          </div>
          <ConfirmButton
            question="Withdraw?"
            confirmLabel="Withdraw"
            busy={revoke.isPending && revoke.variables === invite.id}
            onConfirm={() => revoke.mutate(invite.id)}
          >
            Withdraw
          </ConfirmButton>
        </li>
      ))}
    </ul>
  );
}
