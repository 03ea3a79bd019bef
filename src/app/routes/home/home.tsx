import type { QueryClient } from "@tanstack/react-query";
import { useQuery } from "@tanstack/react-query";
import { Link, useSearchParams, type LoaderFunctionArgs } from "react-router-dom";
import { buttonClass } from "../../../components/ui/button";
import { controlClass } from "../../../components/ui/field";
import { SearchBox } from "../../../components/ui/search-box";
import { cn } from "../../../lib/cn";
import { mapQueries, type MapListFilters } from "../../../features/maps/api/map-queries";
import { MapList } from "../../../features/maps/components/map-list";
import { Card, CardBody, CardHeader } from "../../../components/ui/card";
import { LoadingBlock } from "../../../components/ui/spinner";
import { useSignedInUser } from "../../../features/auth/hooks/use-current-user";
import { groupQueries } from "../../../features/groups/api/group-queries";
import { RoleBadge } from "../../../features/groups/components/role-badge";
import { PageHeader } from "../../../components/ui/page-header";

/** Home waits for the map list it shows first; the groups panel loads alongside. */
export const homeLoader =
  (queryClient: QueryClient) =>
  async ({ request }: LoaderFunctionArgs) => {
    void queryClient.prefetchQuery(groupQueries.list());
    await queryClient.ensureQueryData(mapQueries.list(readFilters(new URL(request.url).searchParams)));
    return null;
  };

const EXPLAINERS = [
  {
    title: "A grid over μ and τ",
    text: "Pick an ensemble, the size N and ranges of relaxation rate μ and asymmetry τ. Each cell is computed once on the server and kept, so nobody computes it twice.",
  },
  {
    title: "Verified fixed points",
    text: "Per cell, many random networks are integrated from many starts. Endpoints are refined by Newton's method, checked, and classified by the Jacobian's spectrum.",
  },
  {
    title: "Set against theory",
    text: "Stable and total counts sit beside the Kac–Rice prediction: finite-N where it can be evaluated, large-N where only the asymptotic result is known, labelled as such.",
  },
];

const SCOPES: { id: MapListFilters["scope"]; label: string }[] = [
  { id: "all", label: "All" },
  { id: "mine", label: "Mine" },
  { id: "group", label: "My groups'" },
  { id: "shared", label: "Shared with me" },
];

function readFilters(search: URLSearchParams): MapListFilters {
  const scope = SCOPES.find((s) => s.id === search.get("scope"))?.id ?? "all";
  const sort = (["newest", "oldest", "title"] as const).find((s) => s === search.get("sort")) ?? "newest";
  return { scope, sort, q: search.get("q")?.trim() || undefined };
}

function MapsPanel() {
  const user = useSignedInUser();
  const [search, setSearch] = useSearchParams();
  const filters = readFilters(search);
  const change = (next: Partial<MapListFilters>) => {
    const f = { ...filters, ...next };
    const params = new URLSearchParams();
    if (f.scope !== "all") params.set("scope", f.scope);
    if (f.sort !== "newest") params.set("sort", f.sort);
    if (f.q) params.set("q", f.q);
    setSearch(params, { replace: true });
  };
  return (
    <Card className="lg:col-span-2">
      <CardHeader title="Maps" description="Maps you made, your groups' maps, and maps shared with you." actions={<><Link to="/maps/import" className={buttonClass("secondary", "sm")}>Import manifest</Link><Link to="/maps/new" className={buttonClass("primary", "sm")}>New map</Link></>} />
      <div className="flex flex-wrap items-center justify-between gap-3 border-b border-line px-5 py-3">
        <div role="tablist" aria-label="Which maps" className="flex flex-wrap gap-1">
          {SCOPES.map((s) => (
            <button
              key={s.id}
              type="button"
              role="tab"
              aria-selected={filters.scope === s.id}
              onClick={() => change({ scope: s.id })}
              className={cn("rounded-full px-3 py-1 text-sm", filters.scope === s.id ? "bg-well-700 text-white" : "text-ink-soft hover:bg-well-50")}
            >
              {s.label}
            </button>
          ))}
        </div>
        <div className="flex w-full gap-2 sm:w-auto">
          <div className="min-w-0 flex-1 sm:w-56 sm:flex-none">
            <SearchBox value={filters.q ?? ""} onSearch={(q) => change({ q: q || undefined })} label="Search maps" placeholder="Search maps" className="sm:w-full" />
          </div>
          <div className="w-32 shrink-0">
            <select aria-label="Sort maps" value={filters.sort} onChange={(e) => change({ sort: e.target.value as MapListFilters["sort"] })} className={cn(controlClass(false), "pr-8")}>
              <option value="newest">Newest</option>
              <option value="oldest">Oldest</option>
              <option value="title">By title</option>
            </select>
          </div>
        </div>
      </div>
      <CardBody>
        <MapList filters={filters} myId={user.id} />
      </CardBody>
    </Card>
  );
}

function GroupsPanel() {
  const groups = useQuery(groupQueries.list());
  return (
    <Card>
      <CardHeader title="Your groups" actions={<Link to="/groups" className="text-sm font-medium text-well-600 hover:underline">All groups</Link>} />
      {groups.isPending ? (
        <LoadingBlock className="py-8" />
      ) : groups.isError ? (
        <CardBody className="text-sm text-rose-700">Could not load your groups: {groups.error.message}</CardBody>
      ) : groups.data.items.length === 0 ? (
        <CardBody className="text-sm text-ink-soft">
          You are not in a group yet. <Link to="/groups" className="font-medium text-well-600 hover:underline">Create one</Link> or
          accept an invitation from a colleague.
        </CardBody>
      ) : (
        <ul className="divide-y divide-line">
          {groups.data.items.slice(0, 5).map((g) => (
            <li key={g.id}>
              <Link to={`/groups/${g.id}`} className="flex items-center justify-between gap-3 px-5 py-3 text-sm hover:bg-well-50">
                <span className="min-w-0 truncate font-medium text-ink">{g.name}</span>
                <RoleBadge role={g.myRole} />
              </Link>
            </li>
          ))}
        </ul>
      )}
    </Card>
  );
}

export function HomePage() {
  const user = useSignedInUser();
  const firstName = user.name.split(/\s+/)[0] || user.name;
  return (
    <>
      <PageHeader
        eyebrow="Maps"
        title={`Welcome, ${firstName}`}
        description="Equilibrist maps where random networks keep a single stable state, where equilibria multiply, and where stable ones become scarce."
      />
      <div className="grid grid-cols-1 items-start gap-6 lg:grid-cols-3">
        <MapsPanel />
        <GroupsPanel />
      </div>
      <section aria-labelledby="what-a-map-shows" className="mt-10">
        <h2 id="what-a-map-shows" className="text-sm font-semibold tracking-[0.12em] text-well-500 uppercase">
          What a map shows
        </h2>
        <div className="mt-4 grid grid-cols-1 gap-4 md:grid-cols-3">
          {EXPLAINERS.map((e, i) => (
            <div key={e.title} className="rounded-[var(--radius-card)] border border-line p-5">
              <p className="font-mono text-xs text-ember-500">0{i + 1}</p>
              <h3 className="mt-1 text-[0.95rem] font-semibold text-ink">{e.title}</h3>
              <p className="mt-1.5 text-sm leading-relaxed text-ink-soft">{e.text}</p>
            </div>
          ))}
        </div>
        <p className="mt-4 text-xs text-ink-faint">Every estimate carries its sample size and confidence interval.</p>
      </section>
    </>
  );
}
