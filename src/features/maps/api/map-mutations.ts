import { useMutation, useQueryClient } from "@tanstack/react-query";
import { apiPaths } from "../../../../shared/schemas/api-paths";
import type { CreateMap, MapEstimate, MapShare, MapView, UpdateMap } from "../../../../shared/schemas/maps";
import { api } from "../../../lib/api-client";
import { mapKeys } from "./map-queries";

/** Launches a map; the answer is the new map with its estimate. Errors show on the form. */
export function useCreateMap() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (body: CreateMap) => api.post<MapView & MapEstimate>(apiPaths.maps.list, { ...body, estimateOnly: false }),
    onSuccess: (map) => {
      queryClient.setQueryData(mapKeys.detail(map.id), map);
      return queryClient.invalidateQueries({ queryKey: mapKeys.lists() });
    },
    meta: { inlineErrors: true, successMessage: "Map launched." },
  });
}

/** A changed map replaces its cached detail and refreshes the lists. */
function useMapWrite<V>(id: string, run: (v: V) => Promise<MapView>, successMessage?: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: run,
    onSuccess: (map) => {
      queryClient.setQueryData(mapKeys.detail(id), map);
      return queryClient.invalidateQueries({ queryKey: mapKeys.lists() });
    },
    meta: { successMessage },
  });
}

export function useUpdateMap(id: string) {
  return useMapWrite(id, (body: UpdateMap) => api.patch<MapView>(apiPaths.maps.detail(id), body), "Map updated.");
}

/** Cancelling also changes the pending cells' state, so the grid is refetched too. */
export function useCancelMap(id: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: () => api.post<MapView>(apiPaths.maps.cancel(id)),
    onSuccess: (map) => {
      queryClient.setQueryData(mapKeys.detail(id), map);
      return Promise.all([queryClient.invalidateQueries({ queryKey: mapKeys.grid(id) }), queryClient.invalidateQueries({ queryKey: mapKeys.lists() })]);
    },
    meta: { successMessage: "Map cancelled; finished cells are kept." },
  });
}

/** Creates (or returns) the read-only link; the map's detail then carries the token. */
export function useShareLink(id: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: () => api.post<MapShare>(apiPaths.maps.share(id)),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: mapKeys.detail(id), exact: true }),
  });
}

export function useRevokeShareLink(id: string) {
  return useMapWrite(id, () => api.delete<MapView>(apiPaths.maps.share(id)), "Link revoked: it no longer opens the map.");
}

export function useDeleteMap(id: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: () => api.delete<unknown>(apiPaths.maps.detail(id)),
    onSuccess: () => {
      queryClient.removeQueries({ queryKey: mapKeys.detail(id) });
      return queryClient.invalidateQueries({ queryKey: mapKeys.lists() });
    },
    meta: { successMessage: "Map deleted. Its cells stay in the shared cache." },
  });
}
