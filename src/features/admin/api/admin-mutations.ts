import { useMutation, useQueryClient } from "@tanstack/react-query";
import { apiPaths, type SiteRole } from "../../../../shared/schemas";
import { api } from "../../../lib/api-client";
import { adminKeys } from "./admin-queries";

export function useChangeSiteRole() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: ({ userId, siteRole }: { userId: string; siteRole: SiteRole }) =>
      api.patch<unknown>(apiPaths.admin.user(userId), { siteRole }),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: adminKeys.users() }),
    meta: { successMessage: "Site role changed." },
  });
}
