import { useMutation, useQueryClient } from "@tanstack/react-query";
import {
  apiPaths,
  type CreateGroup,
  type Group,
  type GroupRole,
  type Invite,
} from "../../../../shared/schemas";
import { api } from "../../../lib/api-client";
import { groupKeys } from "./group-queries";

export function useCreateGroup() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (input: CreateGroup) => api.post<Group>(apiPaths.groups.list, input),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: groupKeys.lists() }),
    meta: { inlineErrors: true, successMessage: "Group created." },
  });
}

/** Mutations on one group refresh that group and the list (member counts and roles change). */
function useGroupInvalidation(groupId: string) {
  const queryClient = useQueryClient();
  return () =>
    Promise.all([
      queryClient.invalidateQueries({ queryKey: groupKeys.detail(groupId) }),
      queryClient.invalidateQueries({ queryKey: groupKeys.lists() }),
    ]);
}

export function useInviteMember(groupId: string) {
  const invalidate = useGroupInvalidation(groupId);
  return useMutation({
    mutationFn: (input: Invite) => api.post<unknown>(apiPaths.groups.invites(groupId), input),
    onSuccess: invalidate,
    meta: { inlineErrors: true },
  });
}

export function useRevokeInvite(groupId: string) {
  const invalidate = useGroupInvalidation(groupId);
  return useMutation({
    mutationFn: (inviteId: string) => api.delete<unknown>(apiPaths.groups.invite(groupId, inviteId)),
    onSuccess: invalidate,
    meta: { successMessage: "Invitation withdrawn." },
  });
}

export function useChangeMemberRole(groupId: string) {
  const invalidate = useGroupInvalidation(groupId);
  return useMutation({
    mutationFn: ({ userId, role }: { userId: string; role: GroupRole }) =>
      api.patch<unknown>(apiPaths.groups.member(groupId, userId), { role }),
    onSuccess: invalidate,
    meta: { successMessage: "Role changed." },
  });
}

export function useRemoveMember(groupId: string) {
  const invalidate = useGroupInvalidation(groupId);
  return useMutation({
    mutationFn: (userId: string) => api.delete<unknown>(apiPaths.groups.member(groupId, userId)),
    onSuccess: invalidate,
    meta: { successMessage: "Member removed." },
  });
}

/**
 * After leaving, the group's detail is only marked stale (not refetched: it would answer 404
 * while the page is still on screen); its loader refetches stale data before showing it.
 */
export function useLeaveGroup(groupId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: () => api.post<unknown>(apiPaths.groups.leave(groupId)),
    onSuccess: () =>
      Promise.all([
        queryClient.invalidateQueries({ queryKey: groupKeys.detail(groupId), refetchType: "none" }),
        queryClient.invalidateQueries({ queryKey: groupKeys.lists() }),
      ]),
    meta: { successMessage: "You left the group." },
  });
}

export function useAcceptInvitation(token: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: () => api.post<Group>(apiPaths.invites.accept(token)),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: groupKeys.all }),
    meta: { successMessage: "Invitation accepted." },
  });
}
