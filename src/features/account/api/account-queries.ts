import { queryOptions } from "@tanstack/react-query";
import { apiPaths } from "../../../../shared/schemas/api-paths";
import type { Preferences } from "../../../../shared/schemas/account";
import { api } from "../../../lib/api-client";

export const accountKeys = {
  all: ["account"] as const,
  preferences: () => [...accountKeys.all, "preferences"] as const,
};

export const accountQueries = {
  preferences: () =>
    queryOptions({
      queryKey: accountKeys.preferences(),
      queryFn: ({ signal }) => api.get<Preferences>(apiPaths.account.preferences, { signal }),
    }),
};
