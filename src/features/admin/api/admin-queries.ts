import { keepPreviousData, queryOptions } from "@tanstack/react-query";
import { apiPaths, type AdminGroupList, type AdminQueue, type AdminUserList, type OutboxList } from "../../../../shared/schemas";
import { api } from "../../../lib/api-client";

export type AdminListFilters = { q?: string; limit?: number; offset?: number };

function withQuery(path: string, filters: AdminListFilters): string {
  const params = new URLSearchParams();
  if (filters.q) params.set("q", filters.q);
  if (filters.limit !== undefined) params.set("limit", String(filters.limit));
  if (filters.offset) params.set("offset", String(filters.offset));
  const query = params.toString();
  return query ? `${path}?${query}` : path;
}

export const adminKeys = {
  all: ["admin"] as const,
  users: () => [...adminKeys.all, "users"] as const,
  userList: (filters: AdminListFilters) => [...adminKeys.users(), filters] as const,
  groups: () => [...adminKeys.all, "groups"] as const,
  groupList: (filters: AdminListFilters) => [...adminKeys.groups(), filters] as const,
  outbox: () => [...adminKeys.all, "outbox"] as const,
  outboxList: (filters: AdminListFilters) => [...adminKeys.outbox(), filters] as const,
  queue: () => [...adminKeys.all, "queue"] as const,
};

/** Milliseconds between refreshes of the queue view while anything waits or runs. */
export const QUEUE_POLL_MS = 5000;

/** Whether anything is waiting or running: a job not yet finished, or a map still filling. */
export function isQueueBusy(view: AdminQueue | undefined): boolean {
  if (!view) return false;
  return view.inFlightMaps.length > 0 || view.activeJobs.length > 0 || view.queues.some((q) => q.created + q.retry + q.active > 0);
}

export const adminQueries = {
  users: (filters: AdminListFilters = {}) =>
    queryOptions({
      queryKey: adminKeys.userList(filters),
      queryFn: ({ signal }) => api.get<AdminUserList>(withQuery(apiPaths.admin.users, filters), { signal }),
      placeholderData: keepPreviousData,
    }),
  groups: (filters: AdminListFilters = {}) =>
    queryOptions({
      queryKey: adminKeys.groupList(filters),
      queryFn: ({ signal }) => api.get<AdminGroupList>(withQuery(apiPaths.admin.groups, filters), { signal }),
      placeholderData: keepPreviousData,
    }),
  outbox: (filters: AdminListFilters = {}) =>
    queryOptions({
      queryKey: adminKeys.outboxList(filters),
      queryFn: ({ signal }) => api.get<OutboxList>(withQuery(apiPaths.admin.outbox, filters), { signal }),
      placeholderData: keepPreviousData,
      staleTime: 0,
    }),
  /** Refreshes every QUEUE_POLL_MS while the queue is busy, and not at all while it is idle. */
  queue: () =>
    queryOptions({
      queryKey: adminKeys.queue(),
      queryFn: ({ signal }) => api.get<AdminQueue>(apiPaths.admin.queue, { signal }),
      staleTime: 0,
      refetchInterval: (query) => (isQueueBusy(query.state.data) ? QUEUE_POLL_MS : false),
    }),
};
