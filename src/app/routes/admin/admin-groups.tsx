import { useQuery, type QueryClient } from "@tanstack/react-query";
import { useSearchParams, type LoaderFunctionArgs } from "react-router-dom";
import { Card, CardHeader } from "../../../components/ui/card";
import { EmptyState } from "../../../components/ui/empty-state";
import { Pager } from "../../../components/ui/pager";
import { SearchBox } from "../../../components/ui/search-box";
import { LoadingBlock } from "../../../components/ui/spinner";
import { adminQueries } from "../../../features/admin/api/admin-queries";
import { GroupTable } from "../../../features/admin/components/group-table";
import { readListParams, writeListParams } from "../../../lib/list-params";

const LIMIT = 25;

export const adminGroupsLoader =
  (queryClient: QueryClient) =>
  async ({ request }: LoaderFunctionArgs) => {
    await queryClient.ensureQueryData(adminQueries.groups(readListParams(new URL(request.url).searchParams, LIMIT)));
    return null;
  };

export function AdminGroupsPage() {
  const [search, setSearch] = useSearchParams();
  const params = readListParams(search, LIMIT);
  const groups = useQuery(adminQueries.groups(params));

  return (
    <Card>
      <CardHeader
        title="Groups"
        description="Every group on the site. Membership is managed by each group's owners."
        actions={
          <SearchBox
            key={params.q ?? ""}
            label="Search groups"
            placeholder="Group name"
            value={params.q ?? ""}
            onSearch={(q) => setSearch(writeListParams({ q }))}
          />
        }
      />
      {groups.isPending ? (
        <LoadingBlock />
      ) : groups.isError ? (
        <p className="px-5 py-4 text-sm text-rose-700">Could not load groups: {groups.error.message}</p>
      ) : groups.data.items.length === 0 ? (
        <EmptyState title={params.q ? `No group matches “${params.q}”` : "No groups yet"} />
      ) : (
        <div className={groups.isPlaceholderData ? "opacity-60 transition-opacity" : undefined}>
          <GroupTable groups={groups.data.items} />
          <div className="border-t border-line">
            <Pager
              noun="group"
              offset={params.offset ?? 0}
              limit={LIMIT}
              total={groups.data.total}
              onOffset={(offset) => setSearch(writeListParams({ q: params.q, offset }))}
            />
          </div>
        </div>
      )}
    </Card>
  );
}
