import { useQuery, type QueryClient } from "@tanstack/react-query";
import { Link, useParams, useSearchParams, type LoaderFunctionArgs } from "react-router-dom";
import { Card, CardHeader } from "../../../components/ui/card";
import { EmptyState } from "../../../components/ui/empty-state";
import { Pager } from "../../../components/ui/pager";
import { SearchBox } from "../../../components/ui/search-box";
import { LoadingBlock } from "../../../components/ui/spinner";
import { adminQueries } from "../../../features/admin/api/admin-queries";
import { OutboxList } from "../../../features/admin/components/outbox-list";
import { OutboxMessage } from "../../../features/admin/components/outbox-message";
import { cn } from "../../../lib/cn";
import { readListParams, writeListParams } from "../../../lib/list-params";

const LIMIT = 50;

export const adminOutboxLoader =
  (queryClient: QueryClient) =>
  async ({ request }: LoaderFunctionArgs) => {
    await queryClient.ensureQueryData(adminQueries.outbox(readListParams(new URL(request.url).searchParams, LIMIT)));
    return null;
  };

/**
 * The local outbox: every e-mail the site sent through the SMTP fake, newest first. A message
 * opens beside the list (/admin/outbox/:messageId) from the page already loaded.
 */
export function AdminOutboxPage() {
  const { messageId } = useParams();
  const [search, setSearch] = useSearchParams();
  const params = readListParams(search, LIMIT);
  const outbox = useQuery(adminQueries.outbox(params));
  const query = search.toString() ? `?${search.toString()}` : "";
  const linkFor = (id: string) => `/admin/outbox/${id}${query}`;

  if (outbox.isPending) return <LoadingBlock />;
  if (outbox.isError) return <p className="text-sm text-rose-700">Could not load the outbox: {outbox.error.message}</p>;
  const { items, total } = outbox.data;
  const open = messageId ? items.find((m) => m.id === messageId) : undefined;

  return (
    <div className="grid grid-cols-1 items-start gap-6 lg:grid-cols-[minmax(0,23rem)_minmax(0,1fr)]">
      <Card className={cn(messageId && "hidden lg:block")}>
        <CardHeader
          title="Outbox"
          description="Mail caught on this machine; nothing leaves it."
          actions={
            <SearchBox
              key={params.q ?? ""}
              className="sm:w-full"
              label="Search the outbox"
              placeholder="Recipient or subject"
              value={params.q ?? ""}
              onSearch={(q) => setSearch(writeListParams({ q }))}
            />
          }
        />
        {items.length === 0 ? (
          <EmptyState title={params.q ? `No e-mail matches “${params.q}”` : "No e-mail sent yet"}>
            Invitations and password resets appear here as soon as they are sent.
          </EmptyState>
        ) : (
          <>
            <OutboxList messages={items} openId={messageId} linkFor={linkFor} />
            <div className="border-t border-line">
              <Pager
                noun="e-mail"
                offset={params.offset ?? 0}
                limit={LIMIT}
                total={total}
                onOffset={(offset) => setSearch(writeListParams({ q: params.q, offset }))}
              />
            </div>
          </>
        )}
      </Card>
      <div className={cn(!messageId && "hidden lg:block")}>
        {messageId && (
          <Link to={`/admin/outbox${query}`} className="mb-3 inline-block text-sm text-well-600 hover:underline lg:hidden">
            ← All e-mail
          </Link>
        )}
        <Card>
          {open ? (
            <OutboxMessage message={open} />
          ) : messageId ? (
            <EmptyState title="This e-mail is not on the current page">Go back to the list and open it from there.</EmptyState>
          ) : (
            <EmptyState title="Pick an e-mail to read it">Links inside open right here in the app.</EmptyState>
          )}
        </Card>
      </div>
    </div>
  );
}
