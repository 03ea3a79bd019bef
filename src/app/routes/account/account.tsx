import { useQuery, type QueryClient } from "@tanstack/react-query";
import { useRouteLoaderData } from "react-router-dom";
import type { User } from "../../../../shared/schemas";
import { Card, CardBody, CardHeader } from "../../../components/ui/card";
import { PageHeader } from "../../../components/ui/page-header";
import { LoadingBlock } from "../../../components/ui/spinner";
import { useUpdatePreferences } from "../../../features/account/api/account-mutations";
import { accountQueries } from "../../../features/account/api/account-queries";
import { PreferencesForm } from "../../../features/account/components/preferences-form";
import { formatDate } from "../../../lib/format";

export const accountLoader = (queryClient: QueryClient) => async () => {
  await queryClient.ensureQueryData(accountQueries.preferences());
  return null;
};

/** Who the account is, and its e-mail preferences. */
export function AccountPage() {
  const user = useRouteLoaderData("signed-in") as User;
  const prefs = useQuery(accountQueries.preferences());
  const update = useUpdatePreferences();
  return (
    <>
      <PageHeader title="Your account" description="Your details and what Equilibrist may e-mail you." />
      <div className="grid max-w-3xl gap-6">
        <Card>
          <CardHeader title="Details" />
          <CardBody>
            <dl className="grid grid-cols-[6rem_minmax(0,1fr)] gap-y-2 text-sm [&_dd]:[overflow-wrap:anywhere]">
              <dt className="text-ink-soft">Name</dt><dd className="text-ink">{user.name}</dd>
              <dt className="text-ink-soft">E-mail</dt><dd className="text-ink">{user.email}</dd>
              <dt className="text-ink-soft">Role</dt><dd className="text-ink">{user.siteRole === "admin" ? "Site admin" : "Member"}</dd>
              <dt className="text-ink-soft">Since</dt><dd className="text-ink">{formatDate(user.createdAt)}</dd>
            </dl>
          </CardBody>
        </Card>
        <Card>
          <CardHeader title="E-mail" description="Messages go to the address above." />
          <CardBody>
            {prefs.isPending ? (
              <LoadingBlock label="Loading preferences…" />
            ) : prefs.isError ? (
              <p className="text-sm text-rose-600">{prefs.error.message}</p>
            ) : (
              <PreferencesForm preferences={prefs.data} busy={update.isPending} onChange={(patch) => update.mutate(patch)} />
            )}
          </CardBody>
        </Card>
      </div>
    </>
  );
}
