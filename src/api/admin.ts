/** School admin: accounts, outbox, jobs and the audit log (server: server/routes/admin.ts, audit-log.ts). */
import { keepPreviousData, queryOptions, useInfiniteQuery, useMutation, useQuery, useQueryClient } from "@tanstack/react-query";
import type { AdminUsersQuery, AdminUsersResponse, JobsRunResult, OutboxMessageDetail, OutboxResponse, UpdateUserRequest, UpdateUserResponse } from "@shared/api/admin";
import type { AuditLogResponse } from "@shared/api/audit";
import { api } from "./client";

export const adminQueryKeys = {
  all: ["admin"] as const,
  users: (query: Partial<AdminUsersQuery>) => ["admin", "users", query] as const,
  outbox: () => ["admin", "outbox"] as const,
  message: (id: number) => ["admin", "outbox", id] as const,
  audit: () => ["admin", "audit"] as const,
};

function usersPath(query: Partial<AdminUsersQuery>): string {
  const params = new URLSearchParams();
  for (const [key, value] of Object.entries(query)) if (value !== undefined && value !== "") params.set(key, String(value));
  const qs = params.toString();
  return `/api/admin/users${qs ? `?${qs}` : ""}`;
}

export const adminUsersQueryOptions = (query: Partial<AdminUsersQuery>) =>
  queryOptions({
    queryKey: adminQueryKeys.users(query),
    queryFn: ({ signal }) => api.get<AdminUsersResponse>(usersPath(query), signal),
    placeholderData: keepPreviousData,
  });

export function useAdminUsers(query: Partial<AdminUsersQuery>, enabled = true) {
  return useQuery({ ...adminUsersQueryOptions(query), enabled });
}

export function useUpdateUser() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: ({ id, ...change }: UpdateUserRequest & { id: number }) => api.patch<UpdateUserResponse>(`/api/admin/users/${id}`, change),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: adminQueryKeys.all }),
  });
}

export function useEndSessions() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (id: number) => api.delete<{ sessionsEnded: number }>(`/api/admin/users/${id}/sessions`),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: adminQueryKeys.audit() }),
  });
}

export function useOutbox() {
  return useQuery({
    queryKey: adminQueryKeys.outbox(),
    queryFn: ({ signal }) => api.get<OutboxResponse>("/api/admin/outbox?limit=100", signal),
  });
}

export function useOutboxMessage(id: number | null) {
  return useQuery({
    queryKey: adminQueryKeys.message(id ?? 0),
    queryFn: ({ signal }) => api.get<OutboxMessageDetail>(`/api/admin/outbox/${id}`, signal),
    enabled: id !== null,
  });
}

export function useRunJobs() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: () => api.post<JobsRunResult>("/api/admin/jobs/run"),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: adminQueryKeys.all }),
  });
}

export function useAuditLog() {
  return useInfiniteQuery({
    queryKey: adminQueryKeys.audit(),
    queryFn: ({ pageParam, signal }) => api.get<AuditLogResponse>(`/api/audit-log?limit=50${pageParam ? `&before=${pageParam}` : ""}`, signal),
    initialPageParam: 0,
    getNextPageParam: (last) => last.nextBefore ?? undefined,
  });
}
