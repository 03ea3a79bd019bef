import { useQueryClient } from "@tanstack/react-query";
import { useEffect, useState } from "react";
import type { CellSummary } from "../../../../shared/maps/cell-summary";
import { layerValue } from "../../../../shared/maps/layers";
import type { MapProgress, MapStatusEvent } from "../../../../shared/maps/map-events";
import { apiPaths } from "../../../../shared/schemas/api-paths";
import type { MapGrid, MapStatus, MapView } from "../../../../shared/schemas/maps";
import { upsertCell } from "../lib/grid-model";
import { mapKeys, withShare } from "../api/map-queries";

const FILLING: readonly MapStatus[] = ["queued", "running"];

/** The grid with one position's summary replaced (and its value in the grid's own layer). */
export function applyCellEvent(grid: MapGrid | undefined, cell: CellSummary): MapGrid | undefined {
  if (!grid) return grid;
  const values = grid.values.map((row, j) => (j === cell.j ? row.map((v, i) => (i === cell.i ? layerValue(grid.layer, cell) : v)) : row));
  return { ...grid, values, cells: upsertCell(grid.cells, cell) };
}

/** The map view with the counters of a progress event. */
export function applyProgressEvent(map: MapView | undefined, p: MapProgress): MapView | undefined {
  if (!map) return map;
  const { mapId: _id, ...counters } = p;
  return { ...map, ...counters };
}

/**
 * Live fill-in: while the map is queued or running, listens to GET /api/maps/:id/events and
 * writes each finished cell into the cached grid and each progress/status event into the cached
 * detail, so the heatmap and progress bar update without polling. Closes once the map stops;
 * then refetches the map once for its final state. Returns whether the stream is open.
 */
export function useMapEvents(id: string, status: MapStatus | undefined, share?: string): boolean {
  const queryClient = useQueryClient();
  const [open, setOpen] = useState(false);
  const filling = status !== undefined && FILLING.includes(status);

  useEffect(() => {
    if (!filling || typeof EventSource === "undefined") return;
    const source = new EventSource(withShare(apiPaths.maps.events(id), share));
    const read = <T,>(e: Event): T | null => {
      try {
        return JSON.parse((e as MessageEvent<string>).data) as T;
      } catch {
        return null;
      }
    };
    // The browser reconnects by itself after a drop; cells that finished meanwhile sent no
    // event to us, so a reopened stream refetches the grid once.
    let opened = false;
    source.onopen = () => {
      if (opened) void queryClient.invalidateQueries({ queryKey: mapKeys.grid(id) });
      opened = true;
      setOpen(true);
    };
    source.onerror = () => setOpen(source.readyState === EventSource.OPEN);
    source.addEventListener("cell", (e) => {
      const cell = read<CellSummary>(e);
      if (cell) queryClient.setQueryData<MapGrid>(mapKeys.grid(id), (g) => applyCellEvent(g, cell));
    });
    source.addEventListener("progress", (e) => {
      const p = read<MapProgress>(e);
      if (p) queryClient.setQueryData<MapView>(mapKeys.detail(id), (m) => applyProgressEvent(m, p));
    });
    source.addEventListener("status", (e) => {
      const s = read<MapStatusEvent>(e);
      if (!s) return;
      queryClient.setQueryData<MapView>(mapKeys.detail(id), (m) => (m ? { ...m, status: s.status, failure: s.failure } : m));
      if (!FILLING.includes(s.status)) void queryClient.invalidateQueries({ queryKey: mapKeys.detail(id) });
    });
    return () => {
      source.close();
      setOpen(false);
    };
  }, [id, share, filling, queryClient]);

  return open && filling;
}
