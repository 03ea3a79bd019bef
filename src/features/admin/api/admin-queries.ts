import { keepPreviousData, queryOptions } from "@tanstack/react-query";
import { apiPaths, type AdminGroupList, type AdminUserList, type OutboxList } from "../../../../shared/schemas";
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
};

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
};
