import { QueryClientProvider } from "@tanstack/react-query";
import { useState, type ReactNode } from "react";
import { ErrorBoundary } from "../components/errors/error-boundary";
import { authKeys } from "../features/auth/api/auth-keys";
import { createQueryClient } from "../lib/query-client";

/**
 * App-wide providers. When any query meets a 401 the session has ended on the server: writing
 * "signed out" into the Me query lets the guard send the user to sign in, keeping ?next.
 */
export function AppProvider({ children }: { children: ReactNode }) {
  const [queryClient] = useState(() =>
    createQueryClient({ onUnauthorized: (client) => client.setQueryData(authKeys.me(), null) }),
  );
  return (
    <ErrorBoundary>
      <QueryClientProvider client={queryClient}>{children}</QueryClientProvider>
    </ErrorBoundary>
  );
}
