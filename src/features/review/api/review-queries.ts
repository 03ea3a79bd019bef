import { queryOptions } from "@tanstack/react-query";
import { apiPaths } from "../../../../shared/schemas/api-paths";
import type { About, MapBoundary, MapComparison, MapReport } from "../../../../shared/schemas/review";
import { api } from "../../../lib/api-client";

/** A read path with the share link's token of a reader who came through one. */
function withShare(path: string, share?: string): string {
  return share ? `${path}?share=${encodeURIComponent(share)}` : path;
}

export const reviewKeys = {
  all: ["review"] as const,
  map: (id: string) => [...reviewKeys.all, "map", id] as const,
  compare: (id: string, otherId: string) => [...reviewKeys.map(id), "compare", otherId] as const,
  boundary: (id: string) => [...reviewKeys.map(id), "boundary"] as const,
  report: (id: string) => [...reviewKeys.map(id), "report"] as const,
  about: () => [...reviewKeys.all, "about"] as const,
};

/**
 * Queries of the review area. Everything of one map hangs under reviewKeys.map(id), so a map
 * that changes (more cells done) refreshes its comparison, boundary and report together.
 */
export const reviewQueries = {
  compare: (id: string, otherId: string) =>
    queryOptions({
      queryKey: reviewKeys.compare(id, otherId),
      queryFn: ({ signal }) => api.get<MapComparison>(apiPaths.review.compare(id, otherId), { signal }),
    }),
  boundary: (id: string, share?: string) =>
    queryOptions({
      queryKey: reviewKeys.boundary(id),
      queryFn: ({ signal }) => api.get<MapBoundary>(withShare(apiPaths.review.boundary(id), share), { signal }),
    }),
  report: (id: string, share?: string) =>
    queryOptions({
      queryKey: reviewKeys.report(id),
      queryFn: ({ signal }) => api.get<MapReport>(withShare(apiPaths.review.report(id), share), { signal }),
    }),
  about: () =>
    queryOptions({
      queryKey: reviewKeys.about(),
      queryFn: ({ signal }) => api.get<About>(apiPaths.review.about, { signal }),
      staleTime: Infinity,
    }),
};
