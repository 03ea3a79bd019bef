import { queryOptions } from "@tanstack/react-query";
import { apiPaths, type User } from "../../../../shared/schemas";
import { api, isApiError } from "../../../lib/api-client";

export const authKeys = {
  all: ["auth"] as const,
  me: () => [...authKeys.all, "me"] as const,
};

/** The signed-in account, or null when nobody is signed in (the server answers 401). */
async function fetchMe(signal?: AbortSignal): Promise<User | null> {
  try {
    return await api.get<User>(apiPaths.auth.me, { signal });
  } catch (error) {
    if (isApiError(error) && error.status === 401) return null;
    throw error;
  }
}

export const authQueries = {
  me: () =>
    queryOptions({
      queryKey: authKeys.me(),
      queryFn: ({ signal }) => fetchMe(signal),
      staleTime: 5 * 60_000,
    }),
};
