import { useQuery, type QueryClient } from "@tanstack/react-query";
import { Card, CardBody, CardHeader } from "../../../components/ui/card";
import { EmptyState } from "../../../components/ui/empty-state";
import { PageHeader } from "../../../components/ui/page-header";
import { LoadingBlock } from "../../../components/ui/spinner";
import { groupQueries } from "../../../features/groups/api/group-queries";
import { CreateGroupForm } from "../../../features/groups/components/create-group-form";
import { GroupCard } from "../../../features/groups/components/group-card";

export const groupsListLoader = (queryClient: QueryClient) => async () => {
  await queryClient.ensureQueryData(groupQueries.list());
  return null;
};

export function GroupsListPage() {
  const groups = useQuery(groupQueries.list());
  return (
    <>
      <PageHeader
        eyebrow="Groups"
        title="Your groups"
        description="People who share maps. Owners manage members, editors create maps and invite, viewers read."
      />
      <div className="grid grid-cols-1 items-start gap-6 lg:grid-cols-[minmax(0,1fr)_22rem]">
        <section aria-label="Groups you belong to">
          {groups.isPending ? (
            <LoadingBlock />
          ) : groups.isError ? (
            <Card>
              <CardBody className="text-sm text-rose-700">Could not load your groups: {groups.error.message}</CardBody>
            </Card>
          ) : groups.data.items.length === 0 ? (
            <Card>
              <EmptyState title="No groups yet">
                Create the first one for your lab or course, or open an invitation link a colleague sent you.
              </EmptyState>
            </Card>
          ) : (
            <div className="grid grid-cols-1 gap-4 sm:grid-cols-2">
              {groups.data.items.map((g) => (
                <GroupCard key={g.id} group={g} />
              ))}
            </div>
          )}
        </section>
        <Card>
          <CardHeader title="New group" />
          <CardBody>
            <CreateGroupForm />
          </CardBody>
        </Card>
      </div>
    </>
  );
}
