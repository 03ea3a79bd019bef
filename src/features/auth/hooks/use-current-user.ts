import { useQuery } from "@tanstack/react-query";
import type { User } from "../../../../shared/schemas";
import { authQueries } from "../api/auth-queries";

/** The signed-in account (null when signed out, undefined while the first answer is on its way). */
export function useCurrentUser(): User | null | undefined {
  return useQuery(authQueries.me()).data;
}

/**
 * The signed-in account inside pages behind the sign-in guard, whose loader has already
 * fetched it. Throws if used elsewhere, which is a programming error.
 */
export function useSignedInUser(): User {
  const user = useCurrentUser();
  if (!user) throw new Error("useSignedInUser used outside the signed-in area");
  return user;
}
