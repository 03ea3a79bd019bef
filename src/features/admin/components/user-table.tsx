import type { AdminUser, SiteRole } from "../../../../shared/schemas";
import { Avatar } from "../../../components/ui/avatar";
import { Badge } from "../../../components/ui/badge";
import { formatDate, plural } from "../../../lib/format";
import { useChangeSiteRole } from "../api/admin-mutations";

type UserTableProps = { users: AdminUser[]; myUserId: string };

/** Accounts with their site role; an admin changes everyone's role but their own. */
export function UserTable({ users, myUserId }: UserTableProps) {
  const changeRole = useChangeSiteRole();
  return (
    <ul className="divide-y divide-line">
      {users.map((u) => (
        <li key={u.id} className="flex flex-wrap items-center gap-x-4 gap-y-2 px-5 py-3">
          <Avatar name={u.name} />
          <div className="min-w-0 flex-1 basis-48">
            <p className="truncate text-sm font-medium text-ink">
              {u.name}
              {u.id === myUserId && <span className="ml-1.5 text-xs font-normal text-ink-faint">(you)</span>}
            </p>
            <p className="truncate text-xs text-ink-soft">{u.email}</p>
          </div>
          <p className="w-40 text-xs text-ink-soft">
            {plural(u.groupCount, "group")} · joined {formatDate(u.createdAt)}
          </p>
          {u.id === myUserId ? (
            <Badge tone="ember">Admin</Badge>
          ) : (
            <>
              <label className="sr-only" htmlFor={`site-role-${u.id}`}>
                Site role of {u.name}
              </label>
              <select
                id={`site-role-${u.id}`}
                value={u.siteRole}
                disabled={changeRole.isPending && changeRole.variables?.userId === u.id}
                onChange={(e) => changeRole.mutate({ userId: u.id, siteRole: e.target.value as SiteRole })}
                className="h-8 rounded-md bg-surface px-2 text-sm ring-1 ring-line-strong ring-inset focus:ring-2 focus:ring-well-500 focus:outline-none"
              >
                <option value="member">Member</option>
                <option value="admin">Admin</option>
              </select>
            </>
          )}
        </li>
      ))}
    </ul>
  );
}
