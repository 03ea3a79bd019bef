import { QueryClientProvider, type QueryClient } from "@tanstack/react-query";
import { useState, type ReactNode } from "react";
import { Toaster } from "../components/ui/toaster";
import { authKeys } from "../features/auth/api/auth-queries";
import { createQueryClient } from "../lib/query-client";

/** The app's QueryClient: a 401 anywhere means the session is gone, so forget the user. */
export function createAppQueryClient(options: { retry?: boolean } = {}): QueryClient {
  const queryClient: QueryClient = createQueryClient({
    ...options,
    onUnauthenticated: () => queryClient.setQueryData(authKeys.me(), null),
  });
  return queryClient;
}

type AppProviderProps = { children: ReactNode; queryClient?: QueryClient };

export function AppProvider({ children, queryClient }: AppProviderProps) {
  const [client] = useState(() => queryClient ?? createAppQueryClient());
  return (
    <QueryClientProvider client={client}>
      {children}
      <Toaster />
    </QueryClientProvider>
  );
}
