import { useQuery, type QueryClient } from "@tanstack/react-query";
import { Link, useNavigate, useParams, type LoaderFunctionArgs } from "react-router-dom";
import { groupRoleRank } from "../../../../shared/schemas";
import { Card, CardBody, CardHeader } from "../../../components/ui/card";
import { ConfirmButton } from "../../../components/ui/confirm-button";
import { PageHeader } from "../../../components/ui/page-header";
import { LoadingBlock } from "../../../components/ui/spinner";
import { useSignedInUser } from "../../../features/auth/hooks/use-current-user";
import { useLeaveGroup } from "../../../features/groups/api/group-mutations";
import { groupQueries } from "../../../features/groups/api/group-queries";
import { InviteForm } from "../../../features/groups/components/invite-form";
import { MemberList } from "../../../features/groups/components/member-list";
import { PendingInvites } from "../../../features/groups/components/pending-invites";
import { RoleBadge } from "../../../features/groups/components/role-badge";
import { formatDate, plural } from "../../../lib/format";

/** fetchQuery, not ensureQueryData: a stale detail (say, of a group just left) is refetched, not shown. */
export const groupDetailLoader =
  (queryClient: QueryClient) =>
  async ({ params }: LoaderFunctionArgs) => {
    await queryClient.fetchQuery(groupQueries.detail(params.groupId ?? ""));
    return null;
  };

export function GroupDetailPage() {
  const groupId = useParams().groupId ?? "";
  const me = useSignedInUser();
  const navigate = useNavigate();
  const group = useQuery(groupQueries.detail(groupId));
  const leave = useLeaveGroup(groupId);

  if (group.isPending) return <LoadingBlock />;
  if (group.isError) throw group.error;
  const g = group.data;
  const canInvite = groupRoleRank[g.myRole] >= groupRoleRank.editor;

  return (
    <>
      <nav aria-label="Breadcrumb" className="mb-3 text-sm">
        <Link to="/groups" className="text-well-600 hover:underline">
          Groups
        </Link>
        <span className="mx-1.5 text-ink-faint">/</span>
        <span className="text-ink-soft">{g.name}</span>
      </nav>
      <PageHeader
        title={g.name}
        description={
          <span className="flex flex-wrap items-center gap-x-4 gap-y-1">
            <span className="inline-flex items-center gap-1.5">
              Your role <RoleBadge role={g.myRole} />
            </span>
            <span>
              {plural(g.memberCount, "member")} · created {formatDate(g.createdAt)}
            </span>
          </span>
        }
        actions={
          <ConfirmButton
            variant="secondary"
            question="Leave this group?"
            confirmLabel="Leave"
            busy={leave.isPending}
            onConfirm={() => leave.mutate(undefined, { onSuccess: () => navigate("/groups", { replace: true }) })}
          >
            Leave group
          </ConfirmButton>
        }
      />
      <div className="grid grid-cols-1 items-start gap-6 lg:grid-cols-[minmax(0,1fr)_24rem]">
        <Card>
          <CardHeader title="Members" description={g.myRole === "owner" ? "As owner you can change roles and remove members." : undefined} />
          <MemberList group={g} myUserId={me.id} />
        </Card>
        {canInvite ? (
          <div className="flex flex-col gap-6">
            <Card>
              <CardHeader title="Invite someone" description="They get an e-mail with a link to join." />
              <CardBody>
                <InviteForm groupId={g.id} myRole={g.myRole} />
              </CardBody>
            </Card>
            <Card>
              <CardHeader title="Pending invitations" />
              <PendingInvites groupId={g.id} invites={g.invites} />
            </Card>
          </div>
        ) : (
          <Card>
            <CardBody className="text-sm text-ink-soft">
              Viewers read the group's maps. Ask an owner or editor if you need to invite someone.
            </CardBody>
          </Card>
        )}
      </div>
    </>
  );
}
