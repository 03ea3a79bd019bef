import { useMutation, useQueryClient } from "@tanstack/react-query";
import { apiPaths } from "../../../../shared/schemas/api-paths";
import type { Preferences, UpdatePreferences } from "../../../../shared/schemas/account";
import { api } from "../../../lib/api-client";
import { accountKeys } from "./account-queries";

/** Saves preferences; the answer replaces the cached ones. */
export function useUpdatePreferences() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (patch: UpdatePreferences) => api.patch<Preferences>(apiPaths.account.preferences, patch),
    onSuccess: (prefs) => queryClient.setQueryData(accountKeys.preferences(), prefs),
    meta: { successMessage: "Preferences saved." },
  });
}
