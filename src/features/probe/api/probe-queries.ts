import { queryOptions } from "@tanstack/react-query";
import { apiPaths } from "../../../../shared/schemas/api-paths";
import type { ProbeSummary, ProbeView } from "../../../../shared/schemas/probes";
import { api } from "../../../lib/api-client";

export const probeKeys = {
  all: ["probes"] as const,
  lists: () => [...probeKeys.all, "list"] as const,
  details: () => [...probeKeys.all, "detail"] as const,
  detail: (id: string) => [...probeKeys.details(), id] as const,
};

/** Seconds between polls of a probe whose search is running. */
export const SEARCH_POLL_MS = 1500;

/** Queries of probes. A probe's detail polls only while its search is running. */
export const probeQueries = {
  list: () =>
    queryOptions({
      queryKey: probeKeys.lists(),
      queryFn: ({ signal }) => api.get<{ items: ProbeSummary[] }>(apiPaths.probes.list, { signal }),
    }),
  detail: (id: string) =>
    queryOptions({
      queryKey: probeKeys.detail(id),
      queryFn: ({ signal }) => api.get<ProbeView>(apiPaths.probes.detail(id), { signal }),
      refetchInterval: (query) => (query.state.data?.status === "searching" ? SEARCH_POLL_MS : false),
    }),
};
