import { useQuery, type QueryClient } from "@tanstack/react-query";
import { useNavigate } from "react-router-dom";
import { probeLimits } from "../../../../shared/schemas/probes";
import { Card, CardBody, CardHeader } from "../../../components/ui/card";
import { EmptyState } from "../../../components/ui/empty-state";
import { PageHeader } from "../../../components/ui/page-header";
import { LoadingBlock } from "../../../components/ui/spinner";
import { groupQueries } from "../../../features/groups/api/group-queries";
import { probeQueries } from "../../../features/probe/api/probe-queries";
import { ProbeList } from "../../../features/probe/components/probe-list";
import { UploadForm } from "../../../features/probe/components/upload-form";

export const probesListLoader = (queryClient: QueryClient) => async () => {
  void queryClient.prefetchQuery(groupQueries.list());
  await queryClient.ensureQueryData(probeQueries.list());
  return null;
};

/** /probes: your and your groups' uploaded matrices, and the upload form. */
export function ProbesListPage() {
  const navigate = useNavigate();
  const probes = useQuery(probeQueries.list());
  const groups = useQuery(groupQueries.list());
  const writable = (groups.data?.items ?? []).filter((g) => g.myRole === "owner" || g.myRole === "editor");
  return (
    <>
      <PageHeader
        eyebrow="Probe"
        title="Your own coupling matrix"
        description={`Upload a trained or hand-built J (N ≤ ${probeLimits.maxN}, up to ${probeLimits.maxFileBytes / 2 ** 20} MB): see its estimated g and τ, its spectrum against the elliptic law, where it sits on a map, and which equilibria it has.`}
      />
      <div className="grid grid-cols-1 items-start gap-6 lg:grid-cols-[minmax(0,1fr)_26rem]">
        <Card>
          <CardHeader title="Uploaded matrices" description="Yours and your groups'." />
          {probes.isPending ? (
            <LoadingBlock />
          ) : probes.isError ? (
            <CardBody className="text-sm text-rose-700">Could not load the matrices: {probes.error.message}</CardBody>
          ) : probes.data.items.length === 0 ? (
            <EmptyState title="No matrices yet">Upload one with the form: its estimates and spectrum open as soon as the file is read.</EmptyState>
          ) : (
            <ProbeList probes={probes.data.items} />
          )}
        </Card>
        <Card>
          <CardHeader title="Upload a matrix" />
          <CardBody>
            <UploadForm groups={writable.map((g) => ({ id: g.id, name: g.name }))} onUploaded={(id) => navigate(`/probes/${id}`)} />
          </CardBody>
        </Card>
      </div>
    </>
  );
}
