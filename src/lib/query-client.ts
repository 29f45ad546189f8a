import { MutationCache, QueryCache, QueryClient } from "@tanstack/react-query";
import { isApiError } from "./api-client";

/**
 * Defaults for every query. A 4xx will not change on retry, so only network and 5xx failures
 * are retried (twice). onUnauthorized lets the app drop the session when any query meets a 401
 * (an expired session), without lib/ knowing about the auth feature.
 */
export function createQueryClient(options: { onUnauthorized?: (client: QueryClient) => void } = {}) {
  const client: QueryClient = new QueryClient({
    queryCache: new QueryCache({
      onError: (error, query) => {
        if (isApiError(error) && error.status === 401 && !query.meta?.ignoreUnauthorized) {
          options.onUnauthorized?.(client);
        }
      },
    }),
    mutationCache: new MutationCache(),
    defaultOptions: {
      queries: {
        staleTime: 30_000,
        retry: (failureCount, error) =>
          failureCount < 2 && !(isApiError(error) && error.status >= 400 && error.status < 500),
        refetchOnWindowFocus: false,
      },
      mutations: { retry: false },
    },
  });
  return client;
}
