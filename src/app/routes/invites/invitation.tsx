import { useQuery, type QueryClient } from "@tanstack/react-query";
import { Link, useNavigate, useParams, type LoaderFunctionArgs } from "react-router-dom";
import type { Invitation, User } from "../../../../shared/schemas";
import { Button, buttonClass } from "../../../components/ui/button";
import { FormMessage } from "../../../components/ui/field";
import { LoadingBlock } from "../../../components/ui/spinner";
import { useSignOut } from "../../../features/auth/api/auth-mutations";
import { authQueries } from "../../../features/auth/api/auth-queries";
import { useCurrentUser } from "../../../features/auth/hooks/use-current-user";
import { useAcceptInvitation } from "../../../features/groups/api/group-mutations";
import { groupQueries } from "../../../features/groups/api/group-queries";
import { InvitationSummary } from "../../../features/groups/components/invitation-summary";
import { withNext } from "../../../lib/safe-next";
import { AuthLayout } from "../../layout/auth-layout";

export const invitationLoader =
  (queryClient: QueryClient) =>
  async ({ params }: LoaderFunctionArgs) => {
    await Promise.all([
      queryClient.ensureQueryData(authQueries.me()),
      queryClient.ensureQueryData(groupQueries.invitation(params.token ?? "")),
    ]);
    return null;
  };

function authLink(path: string, token: string, email: string) {
  return withNext(path, `/invites/${token}`, email);
}

function SignedOutActions({ token, invitation }: { token: string; invitation: Invitation }) {
  return (
    <div className="flex flex-col gap-3">
      <p className="text-sm text-ink-soft">
        Sign in as <span className="font-medium text-ink">{invitation.email}</span> to accept, or create an account with that
        address. You come back here afterwards.
      </p>
      <Link to={authLink("/sign-in", token, invitation.email)} className={buttonClass("primary", "md", "w-full")}>
        Sign in to accept
      </Link>
      <Link to={authLink("/register", token, invitation.email)} className={buttonClass("secondary", "md", "w-full")}>
        Create an account
      </Link>
    </div>
  );
}

function SignedInActions({ token, invitation, user }: { token: string; invitation: Invitation; user: User }) {
  const accept = useAcceptInvitation(token);
  const signOut = useSignOut();
  const navigate = useNavigate();
  const otherAddress = user.email !== invitation.email;
  const switchAccount = () =>
    signOut.mutate(undefined, { onSuccess: () => navigate(authLink("/sign-in", token, invitation.email), { replace: true }) });
  return (
    <div className="flex flex-col gap-3">
      <p className="text-sm text-ink-soft">
        Signed in as <span className="font-medium text-ink">{user.email}</span>.
      </p>
      {otherAddress && (
        <FormMessage message={`This invitation was sent to ${invitation.email}. Sign in with that address to accept it.`} />
      )}
      <Button
        busy={accept.isPending}
        className="w-full"
        onClick={() => accept.mutate(undefined, { onSuccess: (group) => navigate(`/groups/${group.id}`, { replace: true }) })}
      >
        Accept and join {invitation.groupName}
      </Button>
      {otherAddress && (
        <Button variant="secondary" className="w-full" busy={signOut.isPending} onClick={switchAccount}>
          Switch account
        </Button>
      )}
      <Link to="/" className="self-center text-sm text-well-600 hover:underline">
        Not now, go to Equilibrist
      </Link>
    </div>
  );
}

/** The page an invitation e-mail links to: /invites/:token */
export function InvitationPage() {
  const token = useParams().token ?? "";
  const user = useCurrentUser();
  const invitation = useQuery(groupQueries.invitation(token));

  if (invitation.isPending) return <LoadingBlock className="min-h-screen" />;
  if (invitation.isError) throw invitation.error;
  const inv = invitation.data;

  return (
    <AuthLayout title="You are invited" subtitle={`${inv.invitedByName ?? "Someone"} invited you to share maps on Equilibrist.`}>
      <InvitationSummary invitation={inv} />
      <div className="mt-6">
        {inv.status === "pending" ? (
          user ? (
            <SignedInActions token={token} invitation={inv} user={user} />
          ) : (
            <SignedOutActions token={token} invitation={inv} />
          )
        ) : inv.status === "accepted" ? (
          <Link to={user ? `/groups/${inv.groupId}` : "/sign-in"} className={buttonClass("secondary", "md", "w-full")}>
            {user ? "Open the group" : "Sign in"}
          </Link>
        ) : (
          <p className="text-sm text-ink-soft">This link has expired. Ask whoever invited you to send a new one.</p>
        )}
      </div>
    </AuthLayout>
  );
}
