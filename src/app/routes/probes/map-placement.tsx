import { useQuery } from "@tanstack/react-query";
import { useLayoutEffect, useMemo, useRef, useState } from "react";
import { Link } from "react-router-dom";
import { layersFor, type LayerId } from "../../../../shared/maps/layers";
import type { MapGrid, MapView } from "../../../../shared/schemas/maps";
import type { ProbeView } from "../../../../shared/schemas/probes";
import { SelectField } from "../../../components/ui/field";
import { LoadingBlock } from "../../../components/ui/spinner";
import { mapQueries } from "../../../features/maps/api/map-queries";
import { CellReadout } from "../../../features/maps/components/cell-readout";
import { MapFigure } from "../../../features/maps/components/heatmap/map-figure";
import { LayerPicker } from "../../../features/maps/components/layer-picker";
import { useElementWidth } from "../../../features/maps/hooks/use-element-width";
import { buildGrid } from "../../../features/maps/lib/grid-model";
import { formatNumber } from "../../../lib/format-number";
import { placeOnMap, type Placement } from "../../../features/probe/lib/placement";

const NO_CRITERIA: never[] = [];
const NO_CURVES = new Set<never>();

interface MarkerBox {
  x: number;
  y: number;
  width: number;
  height: number;
}

/** Fraction of the way from the first axis point to the last (in log space on a log axis). */
function along(axis: MapView["mu"], v: number): number {
  if (axis.steps <= 1 || axis.max === axis.min) return 0;
  const f = (t: number) => (axis.scale === "log" ? Math.log(t) : t);
  return (f(v) - f(axis.min)) / (f(axis.max) - f(axis.min));
}

/**
 * Where the marker goes, read from the drawn figure itself: the centres of the first and the
 * last cell are the first and last axis points (the figure's bands are centred on them), so
 * the probe's (μ, τ) interpolates between them; clamped to the plot.
 */
function measureMarker(box: HTMLElement, map: MapView, placement: Placement): MarkerBox | null {
  const last = map.mu.steps - 1 + (map.tau.steps - 1) * map.mu.steps;
  const a = box.querySelector(`[data-k="0"]`)?.getBoundingClientRect();
  const b = box.querySelector(`[data-k="${last}"]`)?.getBoundingClientRect();
  const o = box.getBoundingClientRect();
  if (!a || !b || a.width === 0) return null;
  const [ax, ay, bx, by] = [a.left + a.width / 2 - o.left, a.top + a.height / 2 - o.top, b.left + b.width / 2 - o.left, b.top + b.height / 2 - o.top];
  const clamp = (v: number, lo: number, hi: number) => Math.min(Math.max(v, Math.min(lo, hi)), Math.max(lo, hi));
  return {
    x: clamp(ax + along(map.mu, placement.mu) * (bx - ax), ax - a.width / 2, bx + b.width / 2),
    y: clamp(ay + along(map.tau, placement.tau) * (by - ay), ay + a.height / 2, by - b.height / 2),
    width: o.width,
    height: o.height,
  };
}

/** The map's own heatmap figure with the probe's point drawn over it. */
function FigureWithMarker({ map, grid, layer, placement }: { map: MapView; grid: MapGrid; layer: LayerId; placement: Placement }) {
  const box = useRef<HTMLDivElement>(null);
  const width = useElementWidth(box);
  const model = useMemo(() => buildGrid(map, grid.cells), [map, grid.cells]);
  const [marker, setMarker] = useState<MarkerBox | null>(null);
  useLayoutEffect(() => {
    if (box.current) setMarker(measureMarker(box.current, map, placement));
  }, [width, map, placement, layer, model]);
  const inside = placement.insideMu && placement.insideTau;
  const label = `The probe at μ/g = ${formatNumber(placement.mu / Number(map.settings.g))}, τ = ${formatNumber(placement.tau)}`;
  return (
    <div ref={box} className="relative w-full">
      <MapFigure map={map} grid={model} layerId={layer} criteria={NO_CRITERIA} curves={NO_CURVES} width={width} />
      {marker && (
        <svg className="pointer-events-none absolute top-0 left-0" width={marker.width} height={marker.height} role="img" aria-label={label} data-testid="probe-marker">
          <circle cx={marker.x} cy={marker.y} r={9} fill="none" stroke="#ffffff" strokeWidth={4} />
          <circle cx={marker.x} cy={marker.y} r={9} fill="none" stroke="#16202a" strokeWidth={2} strokeDasharray={inside ? undefined : "3 2"} />
          <line x1={marker.x - 14} x2={marker.x + 14} y1={marker.y} y2={marker.y} stroke="#16202a" strokeWidth={1.2} />
          <line x1={marker.x} x2={marker.x} y1={marker.y - 14} y2={marker.y + 14} stroke="#16202a" strokeWidth={1.2} />
          <text x={marker.x + 12} y={marker.y - 12} fontSize={12} fontWeight={600} fill="#16202a" stroke="#ffffff" strokeWidth={3} paintOrder="stroke">
            this matrix
          </text>
        </svg>
      )}
    </div>
  );
}

function Placed({ probe, map }: { probe: ProbeView; map: MapView }) {
  const grid = useQuery(mapQueries.grid(map.id));
  const [layer, setLayer] = useState<LayerId>("stable-found");
  const placement = useMemo(
    () => placeOnMap({ mu: probe.mu, g: probe.stats.g?.estimate ?? null, tau: probe.stats.tau?.estimate ?? null }, { mu: map.mu, tau: map.tau, g: Number(map.settings.g) }),
    [probe.mu, probe.stats, map.mu, map.tau, map.settings.g],
  );
  if (!placement) return <p className="text-sm text-ink-soft">ĝ or τ̂ is undefined for this matrix, so it has no place on a map.</p>;
  if (grid.isPending) return <LoadingBlock label="Loading the map…" />;
  if (grid.isError) return <p className="text-sm text-rose-700">Could not load the map: {grid.error.message}</p>;
  const cell = buildGrid(map, grid.data.cells).cells[placement.i + placement.j * map.mu.steps];
  const notes = [
    Number(map.settings.N) !== probe.n ? `The map has N = ${String(map.settings.N)}, the matrix N = ${probe.n}: finite-size effects differ.` : null,
    !placement.insideMu || !placement.insideTau ? "The point lies outside the map's ranges (dashed marker at the edge); the nearest edge cell is shown." : null,
    Number(map.settings.input ?? 0) !== 0 || probe.input ? "The inputs differ from I = 0 on one side." : null,
  ].filter((n): n is string => n !== null);
  return (
    <div className="grid grid-cols-1 items-start gap-4 lg:grid-cols-[minmax(0,1fr)_18rem]">
      <div className="flex min-w-0 flex-col gap-2">
        <div className="overflow-hidden rounded-lg ring-1 ring-line">
          <FigureWithMarker map={map} grid={grid.data} layer={layer} placement={placement} />
        </div>
        <p className="text-xs text-ink-soft">
          μ/ĝ = {formatNumber(probe.mu / probe.stats.g!.estimate)} and τ̂ = {formatNumber(placement.tau)} put the matrix at μ = {formatNumber(placement.mu)} on this map (g = {String(map.settings.g)}): the rate network depends on μ and g only through μ/g.
        </p>
        {notes.map((n) => (
          <p key={n} className="text-xs text-ember-700">{n}</p>
        ))}
      </div>
      <div className="flex flex-col gap-4">
        <LayerPicker ensemble="rate" value={layersFor("rate").some((l) => l.id === layer) ? layer : "stable-found"} onChange={setLayer} />
        <div aria-label="Nearest cell">
          <h3 className="mb-1 text-sm font-semibold text-ink">
            Nearest cell ({placement.i}, {placement.j})
          </h3>
          <CellReadout cell={cell} muCritical={map.muCritical} />
          <Link to={`/maps/${map.id}/cells/${placement.i}/${placement.j}`} className="mt-2 inline-block text-sm text-well-700 hover:underline">
            Open the cell
          </Link>
        </div>
      </div>
    </div>
  );
}

/** Placement of the probe's (μ/ĝ, τ̂) on a chosen rate-network map. */
export function MapPlacement({ probe }: { probe: ProbeView }) {
  // Always refetched on opening: a map made a moment ago elsewhere must be on offer.
  const list = useQuery({ ...mapQueries.list({ scope: "all", sort: "newest" }), refetchOnMount: "always" });
  const rateMaps = (list.data?.items ?? []).filter((m) => m.ensemble === "rate");
  const [chosen, setChosen] = useState<string>("");
  const mapId = chosen || rateMaps[0]?.id || "";
  const map = useQuery({ ...mapQueries.detail(mapId), enabled: Boolean(mapId) });
  if (list.isPending) return <LoadingBlock label="Loading your maps…" />;
  if (list.isError) return <p className="text-sm text-rose-700">Could not load your maps: {list.error.message}</p>;
  if (rateMaps.length === 0) {
    return (
      <p className="text-sm text-ink-soft">
        No rate-network map to place it on yet. <Link to="/maps/new" className="text-well-700 hover:underline">Create one</Link> over μ and τ around μ/g = {probe.stats.g ? formatNumber(probe.mu / probe.stats.g.estimate) : "—"}.
      </p>
    );
  }
  return (
    <div className="flex flex-col gap-4">
      <SelectField label="Rate-network map" value={mapId} onChange={(e) => setChosen(e.target.value)} options={rateMaps.map((m) => ({ value: m.id, label: `${m.title} (N = ${String(m.settings.N)}, g = ${String(m.settings.g)}, ${m.status})` }))} className="max-w-md" />
      {map.isPending ? <LoadingBlock label="Loading the map…" /> : map.isError ? <p className="text-sm text-rose-700">{map.error.message}</p> : <Placed probe={probe} map={map.data} />}
    </div>
  );
}
