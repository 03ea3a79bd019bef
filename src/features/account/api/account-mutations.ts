import { useMutation, useQueryClient } from "@tanstack/react-query";
import { apiPaths } from "../../../../shared/schemas/api-paths";
import type { Preferences, UpdatePreferences } from "../../../../shared/schemas/account";
import { api } from "../../../lib/api-client";
import { accountKeys } from "./account-queries";

/**
 * Saves preferences. The switch moves at once (optimistic), the server's answer then replaces
 * the cached preferences, and a refusal puts the old ones back.
 */
export function useUpdatePreferences() {
  const queryClient = useQueryClient();
  const key = accountKeys.preferences();
  return useMutation({
    mutationFn: (patch: UpdatePreferences) => api.patch<Preferences>(apiPaths.account.preferences, patch),
    onMutate: async (patch) => {
      await queryClient.cancelQueries({ queryKey: key });
      const before = queryClient.getQueryData<Preferences>(key);
      if (before) queryClient.setQueryData<Preferences>(key, { ...before, ...patch });
      return { before };
    },
    onError: (_err, _patch, context) => {
      if (context?.before) queryClient.setQueryData(key, context.before);
    },
    onSuccess: (prefs) => queryClient.setQueryData(key, prefs),
    meta: { successMessage: "Preferences saved." },
  });
}
