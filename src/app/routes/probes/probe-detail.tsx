import { useQuery, type QueryClient } from "@tanstack/react-query";
import { useRef, type ReactNode } from "react";
import { Link, useNavigate, useParams, type LoaderFunctionArgs } from "react-router-dom";
import { Card, CardBody, CardHeader } from "../../../components/ui/card";
import { ConfirmButton } from "../../../components/ui/confirm-button";
import { FormMessage } from "../../../components/ui/field";
import { PageHeader } from "../../../components/ui/page-header";
import { LoadingBlock } from "../../../components/ui/spinner";
import { useSignedInUser } from "../../../features/auth/hooks/use-current-user";
import { RunClasses } from "../../../features/maps/components/cell-detail/run-classes";
import { TracePlot } from "../../../features/maps/components/cell-detail/trace-plot";
import { useElementWidth } from "../../../features/maps/hooks/use-element-width";
import { useDeleteProbe } from "../../../features/probe/api/probe-mutations";
import { probeQueries } from "../../../features/probe/api/probe-queries";
import { ComparisonTable } from "../../../features/probe/components/comparison-table";
import { EigenPlot } from "../../../features/probe/components/eigen-plot";
import { EquilibriaTable } from "../../../features/probe/components/equilibria-table";
import { MatrixFacts } from "../../../features/probe/components/matrix-facts";
import { ProbeStatusBadge } from "../../../features/probe/components/probe-status";
import { SearchForm, SearchProgress } from "../../../features/probe/components/search-panel";
import { duration } from "../../../features/probe/lib/format";
import type { ProbeView } from "../../../../shared/schemas/probes";
import { MapPlacement } from "./map-placement";

export const probeDetailLoader =
  (queryClient: QueryClient) =>
  async ({ params }: LoaderFunctionArgs) => {
    await queryClient.ensureQueryData(probeQueries.detail(params.probeId ?? ""));
    return null;
  };

function Measured({ children }: { children: (width: number) => ReactNode }) {
  const box = useRef<HTMLDivElement>(null);
  const width = useElementWidth(box);
  return (
    <div ref={box} className="w-full min-w-0">
      {children(width)}
    </div>
  );
}

function SearchResults({ probe }: { probe: ProbeView }) {
  const r = probe.result;
  if (!r) return null;
  return (
    <div className="flex flex-col gap-6">
      <EquilibriaTable probeId={probe.id} result={r} />
      <div className="grid grid-cols-1 gap-6 lg:grid-cols-2">
        <section aria-label="How the runs ended">
          <h3 className="mb-2 text-sm font-semibold text-ink">How the {r.starts} runs ended</h3>
          <RunClasses runs={r.runs} />
        </section>
        <section aria-label="Trajectories">
          <h3 className="mb-2 text-sm font-semibold text-ink">Trajectories</h3>
          <Measured>{(w) => <TracePlot traces={r.traces} width={w} />}</Measured>
        </section>
      </div>
      <p className="text-xs text-ink-faint">
        {r.counters.steps.toLocaleString("en")} integrator steps, {r.counters.evaluations.toLocaleString("en")} right-hand-side evaluations, {r.counters.newtonIterations.toLocaleString("en")} Newton iterations; {duration(r.wallSeconds)} of wall time.
      </p>
    </div>
  );
}

/** /probes/:probeId: what the matrix is, where it sits on a map, its equilibria, the ensemble beside it. */
export function ProbeDetailPage() {
  const id = useParams().probeId ?? "";
  const navigate = useNavigate();
  const user = useSignedInUser();
  const probe = useQuery(probeQueries.detail(id));
  const remove = useDeleteProbe(id);
  if (probe.isPending) return <LoadingBlock label="Loading the matrix…" />;
  if (probe.isError) throw probe.error;
  const p = probe.data;
  return (
    <>
      <nav aria-label="Breadcrumb" className="mb-3 text-sm">
        <Link to="/probes" className="text-well-600 hover:underline">
          Probe
        </Link>
        <span className="mx-1.5 text-ink-faint">/</span>
        <span className="text-ink-soft">{p.title}</span>
      </nav>
      <PageHeader
        title={p.title}
        description={`${p.fileName} · N = ${p.n} · dx/dt = −μx + J ${p.nonlinearity}(x) + I · by ${p.ownerName}${p.groupName ? ` · shared with ${p.groupName}` : ""}`}
        actions={
          <>
            <ProbeStatusBadge status={p.status} />
            {p.access === "owner" && (
              <ConfirmButton question="Delete this matrix and its results?" confirmLabel="Delete" busy={remove.isPending} onConfirm={() => remove.mutate(undefined, { onSuccess: () => navigate("/probes", { replace: true }) })}>
                Delete
              </ConfirmButton>
            )}
          </>
        }
      />
      <div className="flex flex-col gap-6">
        <Card>
          <CardHeader title="The matrix" description="Entry statistics and the rate-ensemble parameters they imply." />
          <CardBody>
            <MatrixFacts probe={p} />
          </CardBody>
        </Card>
        <Card>
          <CardHeader title="Spectrum" description="Eigenvalues of J against the elliptic law of the estimated ĝ and τ̂." />
          <CardBody>
            <Measured>{(w) => <EigenPlot probe={p} width={w} />}</Measured>
          </CardBody>
        </Card>
        <Card>
          <CardHeader title="On a map" description="Where (μ/ĝ, τ̂) falls on a rate-network map, and that cell's numbers." />
          <CardBody>
            <MapPlacement probe={p} />
          </CardBody>
        </Card>
        <Card>
          <CardHeader title="Equilibria" description="Many random starts integrated in the worker pool; still endpoints refined by Newton and classified." />
          <CardBody className="flex flex-col gap-6">
            {p.status === "failed" && <FormMessage message={`The last search failed: ${p.failure ?? "unknown error"}`} />}
            {p.status === "searching" ? <SearchProgress probe={p} /> : <SearchForm probe={p} siteRole={user.siteRole} />}
            <SearchResults probe={p} />
          </CardBody>
        </Card>
        {(p.comparison || p.search?.skippedComparison) && p.result && (
          <Card>
            <CardHeader title="Beside the ensemble" description="The same search on random rate networks with the matrix's ĝ and τ̂." />
            <CardBody>{p.comparison ? <ComparisonTable result={p.result} comparison={p.comparison} /> : <p className="text-sm text-ink-soft">{p.search?.skippedComparison}</p>}</CardBody>
          </Card>
        )}
      </div>
    </>
  );
}
