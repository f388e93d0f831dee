/** Session, sign-in, sign-out and password change: the auth resource's queries and mutations. */
import { queryOptions, useMutation, useQuery, useQueryClient, type QueryClient } from "@tanstack/react-query";
import type { LoginRequest, PasswordChangeRequest, PublicUser, SessionResponse } from "@shared/api/auth";
import { api, isApiError, refreshCsrfToken, resetCsrfToken } from "./client";

export const authQueryKeys = {
  all: ["auth"] as const,
  me: () => ["auth", "me"] as const,
};

/** The signed-in user, or null when signed out (the server's 401 is an answer, not an error). */
export async function fetchMe(signal?: AbortSignal): Promise<PublicUser | null> {
  try {
    const body = await api.get<SessionResponse>("/api/auth/me", signal);
    return body.user;
  } catch (error) {
    if (isApiError(error) && error.status === 401) return null;
    throw error;
  }
}

export const meQueryOptions = () =>
  queryOptions({
    queryKey: authQueryKeys.me(),
    queryFn: ({ signal }) => fetchMe(signal),
    staleTime: 60_000,
  });

/**
 * Forget every cached server answer and record who is signed in now. The session query itself is
 * updated in place rather than removed, so every mounted component sees the change at once.
 */
export function resetCacheForUser(queryClient: QueryClient, user: PublicUser | null): void {
  const meKey = authQueryKeys.me();
  const others = { predicate: (query: { queryKey: readonly unknown[] }) => !isSameKey(query.queryKey, meKey) };
  void queryClient.cancelQueries(others);
  queryClient.removeQueries(others);
  queryClient.setQueryData(meKey, user);
}

function isSameKey(a: readonly unknown[], b: readonly unknown[]): boolean {
  return a.length === b.length && a.every((part, i) => part === b[i]);
}

export function useMe() {
  return useQuery(meQueryOptions());
}

export function useLogin() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (credentials: LoginRequest) => api.post<SessionResponse>("/api/auth/login", credentials),
    onSuccess: async ({ user }) => {
      // A different person may be signing in on this device: nothing cached may carry over.
      resetCacheForUser(queryClient, user);
      // The session id changed at sign-in, and the CSRF token is bound to the session.
      await refreshCsrfToken().catch(() => resetCsrfToken());
    },
  });
}

export function useLogout() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: () => api.post<void>("/api/auth/logout"),
    onSettled: async () => {
      // Nothing another person could see on this device may survive sign-out.
      resetCacheForUser(queryClient, null);
      await refreshCsrfToken().catch(() => resetCsrfToken());
    },
  });
}

export function useChangePassword() {
  return useMutation({
    mutationFn: (request: PasswordChangeRequest) => api.post<void>("/api/auth/password", request),
    // Servers commonly regenerate the session after a password change; stay in step.
    onSuccess: () => refreshCsrfToken().catch(() => resetCsrfToken()),
  });
}
