import { useMutation, useQueryClient, type QueryClient } from "@tanstack/react-query";
import {
  apiPaths,
  type ForgotPassword,
  type Login,
  type Register,
  type ResetPassword,
  type User,
} from "../../../../shared/schemas";
import { api } from "../../../lib/api-client";
import { authKeys } from "./auth-queries";

/** A new identity owns the cache: drop everything the previous one could see, then remember who we are. */
function becomeUser(queryClient: QueryClient, user: User | null) {
  queryClient.removeQueries({ predicate: (q) => q.queryKey[0] !== authKeys.all[0] });
  queryClient.setQueryData(authKeys.me(), user);
}

export function useSignIn() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (input: Login) => api.post<User>(apiPaths.auth.login, input),
    onSuccess: (user) => becomeUser(queryClient, user),
    meta: { inlineErrors: true },
  });
}

export function useRegister() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (input: Register) => api.post<User>(apiPaths.auth.register, input),
    onSuccess: (user) => becomeUser(queryClient, user),
    meta: { inlineErrors: true },
  });
}

export function useSignOut() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: () => api.post<unknown>(apiPaths.auth.logout),
    onSuccess: () => becomeUser(queryClient, null),
    meta: { successMessage: "Signed out." },
  });
}

export function useForgotPassword() {
  return useMutation({
    mutationFn: (input: ForgotPassword) => api.post<unknown>(apiPaths.auth.forgot, input),
    meta: { inlineErrors: true },
  });
}

export function useResetPassword() {
  return useMutation({
    mutationFn: (input: ResetPassword) => api.post<unknown>(apiPaths.auth.reset, input),
    meta: { inlineErrors: true, successMessage: "Password changed. Sign in with the new one." },
  });
}
