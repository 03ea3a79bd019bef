import type { GroupDetail, GroupMember, GroupRole } from "../../../../shared/schemas";
import { Avatar } from "../../../components/ui/avatar";
import { ConfirmButton } from "../../../components/ui/confirm-button";
import { formatDate } from "../../../lib/format";
import { useChangeMemberRole, useRemoveMember } from "../api/group-mutations";
import { RoleBadge, roleLabel } from "./role-badge";

type MemberListProps = { group: GroupDetail; myUserId: string };

const ROLES: GroupRole[] = ["owner", "editor", "viewer"];

/** Members with their roles; owners get role pickers and remove buttons for everyone else. */
export function MemberList({ group, myUserId }: MemberListProps) {
  const manage = group.myRole === "owner";
  return (
    <ul className="divide-y divide-line">
      {group.members.map((member) => (
        <MemberRow key={member.userId} groupId={group.id} member={member} isMe={member.userId === myUserId} manage={manage} />
      ))}
    </ul>
  );
}

type MemberRowProps = { groupId: string; member: GroupMember; isMe: boolean; manage: boolean };

function MemberRow({ groupId, member, isMe, manage }: MemberRowProps) {
  const changeRole = useChangeMemberRole(groupId);
  const remove = useRemoveMember(groupId);
  const editable = manage && !isMe;
  return (
    <li className="flex flex-wrap items-center gap-x-4 gap-y-2 px-5 py-3">
      <Avatar name={member.name} />
      <div className="min-w-0 flex-1 basis-52">
        <p className="truncate text-sm font-medium text-ink">
          {member.name}
          {isMe && <span className="ml-1.5 text-xs font-normal text-ink-faint">(you)</span>}
        </p>
        <p className="truncate text-xs text-ink-soft">
          {member.email} · joined {formatDate(member.joinedAt)}
        </p>
      </div>
      {editable ? (
        <div className="flex items-center gap-2">
          <label className="sr-only" htmlFor={`role-${member.userId}`}>
            Role of {member.name}
          </label>
          <select
            id={`role-${member.userId}`}
            value={member.role}
            disabled={changeRole.isPending}
            onChange={(e) => changeRole.mutate({ userId: member.userId, role: e.target.value as GroupRole })}
            className="h-8 rounded-md bg-surface px-2 text-sm ring-1 ring-line-strong ring-inset focus:ring-2 focus:ring-well-500 focus:outline-none"
          >
            {ROLES.map((r) => (
              <option key={r} value={r}>
                {roleLabel[r]}
              </option>
            ))}
          </select>
          <ConfirmButton
            question={`Remove ${member.name}?`}
            confirmLabel="Remove"
            busy={remove.isPending}
            onConfirm={() => remove.mutate(member.userId)}
          >
            Remove
          </ConfirmButton>
        </div>
      ) : (
        <RoleBadge role={member.role} />
      )}
    </li>
  );
}
