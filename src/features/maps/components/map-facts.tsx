import type { MapView } from "../../../../shared/schemas/maps";
import { formatDateTime } from "../../../lib/format";
import { formatNumber } from "../../../lib/format-number";
import { ENSEMBLE_LABELS, settingsParts } from "../lib/map-settings";

const VISIBILITY: Record<MapView["visibility"], string> = { private: "Private", group: "Group", link: "Read-only link" };

function Fact({ label, children }: { label: string; children: React.ReactNode }) {
  return (
    <div className="flex flex-col gap-0.5">
      <dt className="text-xs text-ink-faint">{label}</dt>
      <dd className="text-sm text-ink">{children}</dd>
    </div>
  );
}

/** Every setting of the map in a compact list (what a reviewer needs to reproduce it). */
export function MapFacts({ map }: { map: MapView }) {
  const b = map.budget;
  const axis = (a: MapView["mu"]) => `${formatNumber(a.min, 4)} to ${formatNumber(a.max, 4)}, ${a.steps} ${a.scale} steps`;
  return (
    <dl className="grid grid-cols-2 gap-x-6 gap-y-3 sm:grid-cols-3 lg:grid-cols-4">
      <Fact label="Ensemble">
        {ENSEMBLE_LABELS[map.ensemble] ?? map.ensemble} <span className="font-mono text-xs text-ink-faint">{map.ensembleVersion}</span>
      </Fact>
      <Fact label="Settings">{settingsParts(map).join(" · ")}</Fact>
      <Fact label="μ axis">{axis(map.mu)}</Fact>
      <Fact label="τ axis">{axis(map.tau)}</Fact>
      <Fact label="Per cell">
        {b.networks} networks × {b.starts} starts{b.exhaustive ? ", exhaustive search" : ""}
      </Fact>
      <Fact label="Integration">
        t ≤ {formatNumber(b.tMax)}, rtol {formatNumber(b.rtol)}, atol {formatNumber(b.atol)}
      </Fact>
      <Fact label="Base seed">{map.seed}</Fact>
      <Fact label="μ_c">{map.muCritical !== null ? formatNumber(map.muCritical, 4) : "—"}</Fact>
      <Fact label="Owner">{map.ownerName}</Fact>
      <Fact label="Visible to">
        {VISIBILITY[map.visibility]}
        {map.groupName ? ` · ${map.groupName}` : ""}
      </Fact>
      <Fact label="Created">{formatDateTime(map.createdAt)}</Fact>
      <Fact label="Finished">{map.finishedAt ? formatDateTime(map.finishedAt) : "—"}</Fact>
    </dl>
  );
}
