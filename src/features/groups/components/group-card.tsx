import { Link } from "react-router-dom";
import type { Group } from "../../../../shared/schemas";
import { formatDate, plural } from "../../../lib/format";
import { RoleBadge } from "./role-badge";

export function GroupCard({ group }: { group: Group }) {
  return (
    <Link
      to={`/groups/${group.id}`}
      className="group flex flex-col gap-3 rounded-[var(--radius-card)] bg-surface p-5 shadow-[var(--shadow-card)] ring-1 ring-line transition hover:ring-well-300"
    >
      <div className="flex items-start justify-between gap-3">
        <h3 className="min-w-0 truncate text-base font-semibold text-ink group-hover:text-well-700">{group.name}</h3>
        <RoleBadge role={group.myRole} />
      </div>
      <p className="text-sm text-ink-soft">
        {plural(group.memberCount, "member")} · since {formatDate(group.createdAt)}
      </p>
    </Link>
  );
}
