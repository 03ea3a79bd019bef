import { MutationCache, QueryCache, QueryClient } from "@tanstack/react-query";
import { isApiError } from "./api-client";
import { toast } from "./toast-store";

/** What a mutation may ask of the shared cache: a success toast, or no error toast (forms show their own). */
export type AppMutationMeta = { successMessage?: string; inlineErrors?: boolean };

declare module "@tanstack/react-query" {
  interface Register {
    mutationMeta: AppMutationMeta;
  }
}

function errorMessage(error: unknown): string {
  if (error instanceof Error && error.message) return error.message;
  return "Something went wrong.";
}

type QueryClientOptions = {
  /** Retry failed queries (server errors and network failures only). Tests turn it off. */
  retry?: boolean;
  /** Called when any request answers 401: the session is gone, so the app forgets the user. */
  onUnauthenticated?: () => void;
};

const isUnauthenticated = (error: unknown) => isApiError(error) && error.status === 401;

/**
 * The app's QueryClient. Client errors (4xx) are never retried: they will not fix themselves.
 * Mutation toasts are raised here and nowhere else.
 */
export function createQueryClient({ retry = true, onUnauthenticated }: QueryClientOptions = {}): QueryClient {
  return new QueryClient({
    queryCache: new QueryCache({
      onError: (error) => {
        if (isUnauthenticated(error)) onUnauthenticated?.();
      },
    }),
    mutationCache: new MutationCache({
      onSuccess: (_data, _vars, _ctx, mutation) => {
        const message = mutation.meta?.successMessage;
        if (message) toast.success(message);
      },
      onError: (error, _vars, _ctx, mutation) => {
        if (isUnauthenticated(error)) onUnauthenticated?.();
        if (mutation.meta?.inlineErrors) return;
        toast.error(errorMessage(error));
      },
    }),
    defaultOptions: {
      queries: {
        staleTime: 30_000,
        refetchOnWindowFocus: false,
        retry: retry
          ? (failures, error) => !(isApiError(error) && error.status >= 400 && error.status < 500) && failures < 2
          : false,
      },
      mutations: { retry: false },
    },
  });
}
