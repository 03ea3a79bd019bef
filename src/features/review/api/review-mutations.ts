import { useMutation, useQueryClient } from "@tanstack/react-query";
import { apiPaths } from "../../../../shared/schemas/api-paths";
import type { MapEstimate, MapView } from "../../../../shared/schemas/maps";
import type { ReplicateBody } from "../../../../shared/schemas/review";
import { api } from "../../../lib/api-client";
import { reviewKeys } from "./review-queries";

type CreatedMap = MapView & MapEstimate;

/**
 * Re-runs a map with a new seed. The original's review data gains a replicate; `onCreated` lets
 * the page refresh what it shows of maps (lists) and move to the new map.
 */
export function useReplicateMap(id: string, onCreated?: (map: CreatedMap) => unknown) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (body: ReplicateBody) => api.post<CreatedMap>(apiPaths.review.replicate(id), body),
    onSuccess: async (map) => {
      await queryClient.invalidateQueries({ queryKey: reviewKeys.map(id) });
      await onCreated?.(map);
    },
    meta: { inlineErrors: true, successMessage: "Replicate launched with a new seed." },
  });
}

/** Creates a map from an export's manifest. */
export function useImportMap(onCreated?: (map: CreatedMap) => unknown) {
  return useMutation({
    mutationFn: (body: { manifest: unknown; title?: string }) => api.post<CreatedMap>(apiPaths.review.import, body),
    onSuccess: async (map) => {
      await onCreated?.(map);
    },
    meta: { inlineErrors: true, successMessage: "Map created from the manifest." },
  });
}
