import type { QueryClient } from "@tanstack/react-query";
import { redirect, type LoaderFunctionArgs } from "react-router-dom";
import type { User } from "../../../../shared/schemas";
import { authQueries } from "../../../features/auth/api/auth-queries";
import { safeNext, withNext } from "../../../lib/safe-next";

/** Loader for the signed-in area: no account → sign in, then come back here. */
export const requireUser =
  (queryClient: QueryClient) =>
  async ({ request }: LoaderFunctionArgs): Promise<User> => {
    const user = await queryClient.ensureQueryData(authQueries.me());
    if (!user) {
      const url = new URL(request.url);
      throw redirect(withNext("/sign-in", url.pathname + url.search));
    }
    return user;
  };

/** Loader for admin pages: members get a 403 page, not a silent redirect. */
export const requireAdmin =
  (queryClient: QueryClient) =>
  async (args: LoaderFunctionArgs): Promise<User> => {
    const user = await requireUser(queryClient)(args);
    if (user.siteRole !== "admin") throw new Response("Admins only", { status: 403 });
    return user;
  };

/** Loader for sign-in and register: someone already signed in goes where they were heading. */
export const signedOutOnly =
  (queryClient: QueryClient) =>
  async ({ request }: LoaderFunctionArgs): Promise<null> => {
    const user = await queryClient.ensureQueryData(authQueries.me());
    if (user) throw redirect(safeNext(new URL(request.url).searchParams));
    return null;
  };
