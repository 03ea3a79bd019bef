import { useQuery, type QueryClient } from "@tanstack/react-query";
import { Link, useNavigate } from "react-router-dom";
import { PageHeader } from "../../../components/ui/page-header";
import { useSignedInUser } from "../../../features/auth/hooks/use-current-user";
import { groupQueries } from "../../../features/groups/api/group-queries";
import { NewMapForm } from "../../../features/maps/components/new-map/new-map-form";

export const newMapLoader = (queryClient: QueryClient) => () => {
  void queryClient.prefetchQuery(groupQueries.list());
  return null;
};

export function NewMapPage() {
  const user = useSignedInUser();
  const navigate = useNavigate();
  const groups = useQuery(groupQueries.list());
  return (
    <>
      <nav aria-label="Breadcrumb" className="mb-3 text-sm">
        <Link to="/" className="text-well-600 hover:underline">
          Maps
        </Link>
        <span className="mx-1.5 text-ink-faint">/</span>
        <span className="text-ink-soft">New map</span>
      </nav>
      <PageHeader
        title="New map"
        description="Choose a network, a grid over relaxation rate μ and asymmetry τ, and how hard to search each cell. The estimate updates as you type."
      />
      <NewMapForm role={user.siteRole} groups={(groups.data?.items ?? []).map((g) => ({ id: g.id, name: g.name }))} onLaunched={(m) => navigate(`/maps/${m.id}`)} />
    </>
  );
}
