import type { AdminGroup } from "../../../../shared/schemas";
import { formatDate, plural } from "../../../lib/format";

/** Every group on the site, with its owners: an overview, not a place to edit membership. */
export function GroupTable({ groups }: { groups: AdminGroup[] }) {
  return (
    <ul className="divide-y divide-line">
      {groups.map((g) => (
        <li key={g.id} className="flex flex-wrap items-center gap-x-4 gap-y-1 px-5 py-3">
          <div className="min-w-0 flex-1 basis-56">
            <p className="truncate text-sm font-medium text-ink">{g.name}</p>
            <p className="truncate text-xs text-ink-soft">
              {g.ownerNames.length ? `Owned by ${g.ownerNames.join(", ")}` : "No owner"}
            </p>
          </div>
          <p className="text-xs text-ink-soft">
            {plural(g.memberCount, "member")} · created {formatDate(g.createdAt)}
          </p>
        </li>
      ))}
    </ul>
  );
}
