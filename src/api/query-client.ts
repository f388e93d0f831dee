import { QueryCache, QueryClient } from "@tanstack/react-query";
import { isApiError } from "./client";
import { authQueryKeys } from "./auth";

/** Retrying a 4xx cannot help (bad input, signed out, forbidden); a flaky network or a 5xx may. */
export function shouldRetry(failureCount: number, error: unknown): boolean {
  if (isApiError(error) && error.status >= 400 && error.status < 500) return false;
  return failureCount < 1;
}

export function createQueryClient(): QueryClient {
  const queryClient: QueryClient = new QueryClient({
    queryCache: new QueryCache({
      onError(error, query) {
        // Any 401 means the session is gone: make the whole UI agree that nobody is signed in.
        if (isApiError(error) && error.status === 401 && query.queryKey[0] !== authQueryKeys.all[0]) {
          queryClient.setQueryData(authQueryKeys.me(), null);
        }
      },
    }),
    defaultOptions: {
      queries: { staleTime: 30_000, retry: shouldRetry, refetchOnWindowFocus: false },
      mutations: { retry: false },
    },
  });
  return queryClient;
}
