import type { QueryClient } from "@tanstack/react-query";
import { useQuery } from "@tanstack/react-query";
import { Link } from "react-router-dom";
import { GridSketch } from "../../../components/brand/grid-sketch";
import { buttonClass } from "../../../components/ui/button";
import { Card, CardBody, CardHeader } from "../../../components/ui/card";
import { LoadingBlock } from "../../../components/ui/spinner";
import { useSignedInUser } from "../../../features/auth/hooks/use-current-user";
import { groupQueries } from "../../../features/groups/api/group-queries";
import { RoleBadge } from "../../../features/groups/components/role-badge";
import { PageHeader } from "../../../components/ui/page-header";

/** Home starts fetching the groups panel without holding the page back. */
export const homeLoader = (queryClient: QueryClient) => () => {
  void queryClient.prefetchQuery(groupQueries.list());
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

function MapsPanel() {
  return (
    <Card className="lg:col-span-2">
      <CardHeader title="Your maps" description="Maps you made, your groups' maps, and maps shared with you." />
      <CardBody className="grid grid-cols-1 items-center gap-6 py-8 sm:grid-cols-[minmax(0,1fr)_minmax(0,15rem)]">
        <div>
          <h3 className="text-base font-semibold text-ink">No maps yet</h3>
          <p className="mt-1.5 text-sm leading-relaxed text-ink-soft">
            Building maps arrives in the next release. Once it does, each map appears here with its status, progress and a
            thumbnail of its heatmap.
          </p>
          <p className="mt-3 text-sm text-ink-soft">Meanwhile, set up a group so your colleagues can share maps with you from day one.</p>
          <Link to="/groups" className={buttonClass("secondary", "sm", "mt-4")}>
            Set up a group
          </Link>
        </div>
        <figure className="rounded-xl bg-paper p-3 ring-1 ring-line">
          <GridSketch />
          <figcaption className="mt-1 text-center text-[0.7rem] text-ink-faint">Illustration, not computed data</figcaption>
        </figure>
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
          What a map will show
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
        <p className="mt-4 text-xs text-ink-faint">Every estimate will carry its sample size and confidence interval.</p>
      </section>
    </>
  );
}
