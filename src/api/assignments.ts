/** Assignments of a cohort, and the signed-in student's own (server: server/routes/assignments.ts). */
import { queryOptions, useMutation, useQuery } from "@tanstack/react-query";
import type {
  CohortAssignmentsResponse,
  CreateAssignmentRequest,
  MyAssignmentsResponse,
  UpdateAssignmentRequest,
} from "@shared/api/assignments";
import { api } from "./client";
import { teachingQueryKeys, useInvalidateTeaching } from "./cohorts";

export const cohortAssignmentsQueryOptions = (cohortId: number) =>
  queryOptions({
    queryKey: [...teachingQueryKeys.all, "assignments", cohortId] as const,
    queryFn: ({ signal }) => api.get<CohortAssignmentsResponse>(`/api/cohorts/${cohortId}/assignments`, signal),
  });

export function useCohortAssignments(cohortId: number) {
  return useQuery(cohortAssignmentsQueryOptions(cohortId));
}

export function useCreateAssignment(cohortId: number) {
  const invalidate = useInvalidateTeaching();
  return useMutation({
    mutationFn: (request: CreateAssignmentRequest) => api.post<{ id: number }>(`/api/cohorts/${cohortId}/assignments`, request),
    onSuccess: invalidate,
  });
}

export function useUpdateAssignment(cohortId: number) {
  const invalidate = useInvalidateTeaching();
  return useMutation({
    mutationFn: ({ id, ...change }: UpdateAssignmentRequest & { id: number }) => api.patch<void>(`/api/cohorts/${cohortId}/assignments/${id}`, change),
    onSuccess: invalidate,
  });
}

export function useDeleteAssignment(cohortId: number) {
  const invalidate = useInvalidateTeaching();
  return useMutation({
    mutationFn: (id: number) => api.delete<void>(`/api/cohorts/${cohortId}/assignments/${id}`),
    onSuccess: invalidate,
  });
}

export const myAssignmentsQueryOptions = () =>
  queryOptions({
    queryKey: ["assignments", "mine"] as const,
    queryFn: ({ signal }) => api.get<MyAssignmentsResponse>("/api/assignments", signal),
  });

export function useMyAssignments() {
  return useQuery(myAssignmentsQueryOptions());
}
