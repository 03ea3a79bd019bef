import { queryOptions } from "@tanstack/react-query";
import { apiPaths, type GroupDetail, type GroupList, type Invitation } from "../../../../shared/schemas";
import { api } from "../../../lib/api-client";

export const groupKeys = {
  all: ["groups"] as const,
  lists: () => [...groupKeys.all, "list"] as const,
  details: () => [...groupKeys.all, "detail"] as const,
  detail: (groupId: string) => [...groupKeys.details(), groupId] as const,
  invitation: (token: string) => [...groupKeys.all, "invitation", token] as const,
};

export const groupQueries = {
  list: () =>
    queryOptions({
      queryKey: groupKeys.lists(),
      queryFn: ({ signal }) => api.get<GroupList>(apiPaths.groups.list, { signal }),
    }),
  detail: (groupId: string) =>
    queryOptions({
      queryKey: groupKeys.detail(groupId),
      queryFn: ({ signal }) => api.get<GroupDetail>(apiPaths.groups.detail(groupId), { signal }),
    }),
  /** What an invitation link offers; readable signed in or not. */
  invitation: (token: string) =>
    queryOptions({
      queryKey: groupKeys.invitation(token),
      queryFn: ({ signal }) => api.get<Invitation>(apiPaths.invites.detail(token), { signal }),
      staleTime: 0,
    }),
};
