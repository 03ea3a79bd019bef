import { useQuery, type QueryClient } from "@tanstack/react-query";
import { useSearchParams, type LoaderFunctionArgs } from "react-router-dom";
import { Card, CardHeader } from "../../../components/ui/card";
import { EmptyState } from "../../../components/ui/empty-state";
import { Pager } from "../../../components/ui/pager";
import { SearchBox } from "../../../components/ui/search-box";
import { LoadingBlock } from "../../../components/ui/spinner";
import { adminQueries } from "../../../features/admin/api/admin-queries";
import { UserTable } from "../../../features/admin/components/user-table";
import { useSignedInUser } from "../../../features/auth/hooks/use-current-user";
import { readListParams, writeListParams } from "../../../lib/list-params";

const LIMIT = 25;

export const adminUsersLoader =
  (queryClient: QueryClient) =>
  async ({ request }: LoaderFunctionArgs) => {
    await queryClient.ensureQueryData(adminQueries.users(readListParams(new URL(request.url).searchParams, LIMIT)));
    return null;
  };

export function AdminUsersPage() {
  const me = useSignedInUser();
  const [search, setSearch] = useSearchParams();
  const params = readListParams(search, LIMIT);
  const users = useQuery(adminQueries.users(params));

  return (
    <Card>
      <CardHeader
        title="Users"
        description="Admins see this area and manage site roles. The last admin cannot be demoted."
        actions={
          <SearchBox
            key={params.q ?? ""}
            label="Search users"
            placeholder="Name or e-mail"
            value={params.q ?? ""}
            onSearch={(q) => setSearch(writeListParams({ q }))}
          />
        }
      />
      {users.isPending ? (
        <LoadingBlock />
      ) : users.isError ? (
        <p className="px-5 py-4 text-sm text-rose-700">Could not load users: {users.error.message}</p>
      ) : users.data.items.length === 0 ? (
        <EmptyState title={params.q ? `No account matches “${params.q}”` : "No accounts yet"} />
      ) : (
        <div className={users.isPlaceholderData ? "opacity-60 transition-opacity" : undefined}>
          <UserTable users={users.data.items} myUserId={me.id} />
          <div className="border-t border-line">
            <Pager
              noun="account"
              offset={params.offset ?? 0}
              limit={LIMIT}
              total={users.data.total}
              onOffset={(offset) => setSearch(writeListParams({ q: params.q, offset }))}
            />
          </div>
        </div>
      )}
    </Card>
  );
}
