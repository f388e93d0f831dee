/** Self-study pass: the offer, the purchase and the renewal (server: server/routes/billing.ts). */
import { queryOptions, useMutation, useQuery, useQueryClient } from "@tanstack/react-query";
import type { SessionResponse } from "@shared/api/auth";
import type { PassOffer, PurchasePassRequest, RenewPassRequest, RenewPassResponse } from "@shared/api/billing";
import { authQueryKeys } from "./auth";
import { api, refreshCsrfToken, resetCsrfToken } from "./client";
import { meQueryKeys } from "./me";

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

/** Renew the signed-in self-learner's pass; the home summary (pass end date) is refetched. */
export function useRenewPass() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (request: RenewPassRequest) => api.post<RenewPassResponse>("/api/billing/renew", request),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: meQueryKeys.all }),
  });
}
