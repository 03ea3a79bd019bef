import { keepPreviousData, queryOptions } from "@tanstack/react-query";
import { apiPaths } from "../../../../shared/schemas/api-paths";
import type { CreateMap, MapCellDetail, MapEstimate, MapGrid, MapView } from "../../../../shared/schemas/maps";
import { api } from "../../../lib/api-client";

/** GET /api/maps filters (shared/schemas/maps.ts mapListQuerySchema). */
export type MapListFilters = { scope: "mine" | "group" | "shared" | "all"; q?: string; sort: "newest" | "oldest" | "title" };

/** A read path with the share link's token when the reader came through one. */
export function withShare(path: string, share?: string, extra: Record<string, string> = {}): string {
  const params = new URLSearchParams(extra);
  if (share) params.set("share", share);
  const qs = params.toString();
  return qs ? `${path}?${qs}` : path;
}

function listPath(f: MapListFilters): string {
  const params = new URLSearchParams({ scope: f.scope, sort: f.sort });
  if (f.q) params.set("q", f.q);
  return `${apiPaths.maps.list}?${params}`;
}

export const mapKeys = {
  all: ["maps"] as const,
  lists: () => [...mapKeys.all, "list"] as const,
  list: (f: MapListFilters) => [...mapKeys.lists(), f] as const,
  details: () => [...mapKeys.all, "detail"] as const,
  detail: (id: string) => [...mapKeys.details(), id] as const,
  grid: (id: string) => [...mapKeys.detail(id), "grid"] as const,
  cell: (id: string, i: number, j: number) => [...mapKeys.detail(id), "cell", i, j] as const,
  shared: (token: string) => [...mapKeys.all, "shared", token] as const,
  estimate: (body: CreateMap) => [...mapKeys.all, "estimate", body] as const,
};

/**
 * Queries of maps. Grid and cell reads hang under the map's detail key, so invalidating a map
 * refreshes everything shown of it. `share` is the read-only link's token of a signed-out reader.
 */
export const mapQueries = {
  list: (f: MapListFilters) =>
    queryOptions({
      queryKey: mapKeys.list(f),
      queryFn: ({ signal }) => api.get<{ items: MapView[] }>(listPath(f), { signal }),
      placeholderData: keepPreviousData,
    }),
  detail: (id: string, share?: string) =>
    queryOptions({
      queryKey: mapKeys.detail(id),
      queryFn: ({ signal }) => api.get<MapView>(withShare(apiPaths.maps.detail(id), share), { signal }),
    }),
  /** Every position's summary; the client colours any layer from it, so one fetch serves all layers. */
  grid: (id: string, share?: string) =>
    queryOptions({
      queryKey: mapKeys.grid(id),
      queryFn: ({ signal }) => api.get<MapGrid>(withShare(apiPaths.maps.grid(id), share, { layer: "stable-found" }), { signal }),
    }),
  cell: (id: string, i: number, j: number, share?: string) =>
    queryOptions({
      queryKey: mapKeys.cell(id, i, j),
      queryFn: ({ signal }) => api.get<MapCellDetail>(withShare(apiPaths.maps.cell(id, i, j), share), { signal }),
    }),
  /** The map a share link opens. */
  shared: (token: string) =>
    queryOptions({
      queryKey: mapKeys.shared(token),
      queryFn: ({ signal }) => api.get<MapView>(apiPaths.maps.shared(token), { signal }),
    }),
  /** POST /api/maps with estimateOnly: cells, cached cells and estimated seconds, nothing stored. */
  estimate: (body: CreateMap) =>
    queryOptions({
      queryKey: mapKeys.estimate(body),
      queryFn: ({ signal }) => api.post<MapEstimate>(apiPaths.maps.list, { ...body, estimateOnly: true }, { signal }),
      staleTime: 15_000,
      placeholderData: keepPreviousData,
      retry: false,
    }),
};
