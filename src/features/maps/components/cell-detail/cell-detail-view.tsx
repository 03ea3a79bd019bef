import { useRef, useState } from "react";
import type { MapCellDetail, MapView } from "../../../../../shared/schemas/maps";
import { Button } from "../../../../components/ui/button";
import { Card, CardBody, CardHeader } from "../../../../components/ui/card";
import { SelectField } from "../../../../components/ui/field";
import { useElementWidth } from "../../hooks/use-element-width";
import { downloadBlob, fileSlug } from "../../lib/export-figure";
import { CellReadout } from "../cell-readout";
import { EquilibriaTable } from "./equilibria-table";
import { RunClasses } from "./run-classes";
import { SettleHistogram } from "./settle-histogram";
import { ellipseGain, SpectrumPlot } from "./spectrum-plot";
import { TracePlot } from "./trace-plot";

type Result = NonNullable<MapCellDetail["result"]>;

function NetworksCard({ result }: { result: Result }) {
  // Start on the first network that reached any equilibrium: an empty table says little.
  const [k, setK] = useState(() => Math.max(0, result.networks.findIndex((n) => n.stable.length + n.unstable.length > 0)));
  const net = result.networks[Math.min(k, result.networks.length - 1)];
  const options = result.networks.map((n) => ({ value: String(n.k), label: `Network ${n.k} · ${n.stable.length} stable · ${n.unstable.length} unstable` }));
  return (
    <Card>
      <CardHeader
        title="Equilibria per network"
        description="Every distinct fixed point the runs of one network reached, refined and verified by Newton's method. Found ones only: a lower bound."
      />
      <CardBody className="border-b border-line">
        <SelectField label="Network" className="max-w-sm" value={String(net.k)} onChange={(e) => setK(Number(e.target.value))} options={options} />
      </CardBody>
      <EquilibriaTable network={net} />
      <CardBody className="border-t border-line text-xs text-ink-soft">
        Chao1 estimate for this network: {net.chao1.estimate.toFixed(2)} stable states ({net.chao1.observed} found, {net.chao1.f1} seen once, {net.chao1.f2} seen twice)
        {net.maxLyapunov !== null && ` · largest finite-time Lyapunov estimate ${net.maxLyapunov.toFixed(3)}`}.
      </CardBody>
    </Card>
  );
}

/** Everything stored for one cell: its numbers, networks, traces, spectrum, settle times and run classes. */
export function CellDetailView({ map, detail }: { map: MapView; detail: MapCellDetail }) {
  const box = useRef<HTMLDivElement>(null);
  const width = Math.min(useElementWidth(box, 560), 960);
  const r = detail.result;
  const saveJson = () =>
    downloadBlob(new Blob([JSON.stringify({ map: { id: map.id, title: map.title }, ...detail }, null, 2)], { type: "application/json" }), `${fileSlug(map.title)}-cell-${detail.summary.i}-${detail.summary.j}.json`);
  return (
    <div className="flex flex-col gap-6">
      <div className="grid grid-cols-1 items-start gap-6 lg:grid-cols-[minmax(0,1fr)_19rem]">
        <div ref={box} className="flex min-w-0 flex-col gap-6">
          {r ? (
            <>
              <Card>
                <CardHeader title="Trajectories" description="A few units of network 0 from its first starts, as the solver integrated them." />
                <CardBody>
                  <TracePlot traces={r.traces} width={width - 40} />
                </CardBody>
              </Card>
              <Card>
                <CardHeader title="Spectrum at an equilibrium" description="Eigenvalues of the Jacobian at the equilibrium of network 0 chosen for display." />
                <CardBody>
                  {r.spectrum ? <SpectrumPlot spectrum={r.spectrum} mu={r.mu} tau={r.tau} gain={ellipseGain(map.ensemble, map.settings)} width={width - 40} /> : <p className="text-sm text-ink-soft">Network 0 reached no equilibrium, so there is no spectrum to show.</p>}
                </CardBody>
              </Card>
            </>
          ) : (
            <Card>
              <CardBody className="text-sm text-ink-soft">This cell is {detail.summary.state}; its networks appear here once it is computed.</CardBody>
            </Card>
          )}
        </div>
        <Card>
          <CardBody className="flex flex-col gap-4">
            <CellReadout cell={detail.summary} muCritical={map.muCritical} />
            <div className="flex flex-col gap-2 border-t border-line pt-3">
              <Button variant="secondary" size="sm" onClick={saveJson}>
                Download cell JSON
              </Button>
              <p className="font-mono text-[0.65rem] break-all text-ink-faint" title="Cache key: hash of everything that determines this cell">
                key {detail.cellKey}
              </p>
            </div>
          </CardBody>
        </Card>
      </div>
      {r && (
        <>
          <NetworksCard result={r} />
          <div className="grid grid-cols-1 gap-6 lg:grid-cols-2">
            <Card>
              <CardHeader title="Settle times" description="Time each settled run took to come to rest, all networks." />
              <CardBody>
                <SettleHistogram histogram={r.aggregate.settleHistogram} width={Math.min(width, 520) - 40} />
              </CardBody>
            </Card>
            <Card>
              <CardHeader title="What the runs did" description={`${r.budget.networks} networks × ${r.budget.starts} starts, t ≤ ${r.budget.tMax}.`} />
              <CardBody>
                <RunClasses runs={r.aggregate.runs} />
              </CardBody>
            </Card>
          </div>
        </>
      )}
    </div>
  );
}
