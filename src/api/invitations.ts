/** Invitations, roster import, and accepting an invitation link (server: server/routes/invitations.ts). */
import { queryOptions, useMutation, useQuery, useQueryClient } from "@tanstack/react-query";
import type { SessionResponse } from "@shared/api/auth";
import type {
  AcceptInvitationRequest,
  CreateInvitationsRequest,
  InvitationListResponse,
  InvitationLookup,
  InvitationView,
  InviteResponse,
  RosterPreview,
} from "@shared/api/invitations";
import { authQueryKeys } from "./auth";
import { api, refreshCsrfToken, resetCsrfToken } from "./client";
import { teachingQueryKeys, useInvalidateTeaching } from "./cohorts";

export const invitationsQueryOptions = (cohortId: number) =>
  queryOptions({
    queryKey: [...teachingQueryKeys.all, "invitations", cohortId] as const,
    queryFn: ({ signal }) => api.get<InvitationListResponse>(`/api/cohorts/${cohortId}/invitations`, signal),
    // Sending happens in the background: while any invitation is still pending, look again shortly.
    refetchInterval: (query) => (query.state.data?.invitations.some((i) => i.state === "pending") ? 3000 : false),
  });

export function useInvitations(cohortId: number) {
  return useQuery(invitationsQueryOptions(cohortId));
}

export function useInvite(cohortId: number) {
  const invalidate = useInvalidateTeaching();
  return useMutation({
    mutationFn: (request: CreateInvitationsRequest) => api.post<InviteResponse>(`/api/cohorts/${cohortId}/invitations`, request),
    onSuccess: invalidate,
  });
}

export function useResendInvitation(cohortId: number) {
  const invalidate = useInvalidateTeaching();
  return useMutation({
    mutationFn: (invitationId: number) => api.post<{ invitation: InvitationView }>(`/api/cohorts/${cohortId}/invitations/${invitationId}/resend`),
    onSuccess: invalidate,
  });
}

export function useRevokeInvitation(cohortId: number) {
  const invalidate = useInvalidateTeaching();
  return useMutation({
    mutationFn: (invitationId: number) => api.delete<{ invitation: InvitationView }>(`/api/cohorts/${cohortId}/invitations/${invitationId}`),
    onSuccess: invalidate,
  });
}

/** The server checks every row against the cohort; nothing is stored. */
export function useRosterPreview(cohortId: number) {
  return useMutation({
    mutationFn: (csv: string) => api.post<RosterPreview>(`/api/cohorts/${cohortId}/roster/preview`, { csv }),
  });
}

export function useRosterImport(cohortId: number) {
  const invalidate = useInvalidateTeaching();
  return useMutation({
    mutationFn: (csv: string) => api.post<InviteResponse>(`/api/cohorts/${cohortId}/roster/import`, { csv }),
    onSuccess: invalidate,
  });
}

/** What an invitation link is for (POST, so the token never sits in an API URL). */
export function useInvitationLookup(token: string) {
  return useQuery({
    queryKey: ["invitation", "lookup", token],
    queryFn: () => api.post<InvitationLookup>("/api/invitations/lookup", { token }),
    staleTime: Infinity,
  });
}

export function useAcceptInvitation() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (request: AcceptInvitationRequest) => api.post<SessionResponse>("/api/invitations/accept", request),
    onSuccess: async ({ user }) => {
      // Signed in as the new student: a new session, so a new CSRF token and a clean cache.
      queryClient.clear();
      queryClient.setQueryData(authQueryKeys.me(), user);
      await refreshCsrfToken().catch(() => resetCsrfToken());
    },
  });
}
