/** Self-study pass: the offer and the purchase (server: server/routes/billing.ts). */
import { queryOptions, useMutation, useQuery, useQueryClient } from "@tanstack/react-query";
import type { SessionResponse } from "@shared/api/auth";
import type { PassOffer, PurchasePassRequest } from "@shared/api/billing";
import { authQueryKeys } from "./auth";
import { api, refreshCsrfToken, resetCsrfToken } from "./client";

export const passOfferQueryOptions = () =>
  queryOptions({
    queryKey: ["billing", "offer"] as const,
    queryFn: ({ signal }) => api.get<PassOffer>("/api/billing/offer", signal),
    staleTime: 5 * 60_000,
  });

export function usePassOffer() {
  return useQuery(passOfferQueryOptions());
}

export function usePurchasePass() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (request: PurchasePassRequest) => api.post<SessionResponse>("/api/billing/purchase", request),
    onSuccess: async ({ user }) => {
      // Signed in as the new self-learner: a new session, so a new CSRF token and a clean cache.
      queryClient.clear();
      queryClient.setQueryData(authQueryKeys.me(), user);
      await refreshCsrfToken().catch(() => resetCsrfToken());
    },
  });
}
