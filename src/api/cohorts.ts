/** Cohorts and the instructor dashboard: queries and mutations (server: server/routes/cohorts.ts, gradebook.ts). */
import { queryOptions, useMutation, useQuery, useQueryClient } from "@tanstack/react-query";
import type {
  CohortDetail,
  CohortListItem,
  CohortListResponse,
  CreateCohortRequest,
  TeachingOverview,
  UpdateCohortRequest,
} from "@shared/api/cohorts";
import { api } from "./client";

/** Every teaching query lives under this root, so one invalidation refreshes them all after a change. */
export const teachingQueryKeys = {
  all: ["teaching"] as const,
  cohorts: () => ["teaching", "cohorts"] as const,
  cohort: (id: number) => ["teaching", "cohort", id] as const,
  overview: () => ["teaching", "overview"] as const,
};

export function useInvalidateTeaching() {
  const queryClient = useQueryClient();
  return () => queryClient.invalidateQueries({ queryKey: teachingQueryKeys.all });
}

export const cohortsQueryOptions = () =>
  queryOptions({
    queryKey: teachingQueryKeys.cohorts(),
    queryFn: ({ signal }) => api.get<CohortListResponse>("/api/cohorts", signal),
  });

export function useCohorts() {
  return useQuery(cohortsQueryOptions());
}

export const cohortQueryOptions = (id: number) =>
  queryOptions({
    queryKey: teachingQueryKeys.cohort(id),
    queryFn: ({ signal }) => api.get<CohortDetail>(`/api/cohorts/${id}`, signal),
  });

export function useCohort(id: number) {
  return useQuery(cohortQueryOptions(id));
}

export const teachingOverviewQueryOptions = () =>
  queryOptions({
    queryKey: teachingQueryKeys.overview(),
    queryFn: ({ signal }) => api.get<TeachingOverview>("/api/teaching/overview", signal),
  });

export function useTeachingOverview() {
  return useQuery(teachingOverviewQueryOptions());
}

export function useCreateCohort() {
  const invalidate = useInvalidateTeaching();
  return useMutation({
    mutationFn: (request: CreateCohortRequest) => api.post<{ cohort: CohortListItem }>("/api/cohorts", request),
    onSuccess: invalidate,
  });
}

export function useUpdateCohort(id: number) {
  const invalidate = useInvalidateTeaching();
  return useMutation({
    mutationFn: (request: UpdateCohortRequest) => api.patch<{ cohort: CohortListItem }>(`/api/cohorts/${id}`, request),
    onSuccess: invalidate,
  });
}

export function useRemoveStudent(cohortId: number) {
  const invalidate = useInvalidateTeaching();
  return useMutation({
    mutationFn: (studentId: number) => api.delete<void>(`/api/cohorts/${cohortId}/students/${studentId}`),
    onSuccess: invalidate,
  });
}

export function useMoveStudent(cohortId: number) {
  const invalidate = useInvalidateTeaching();
  return useMutation({
    mutationFn: ({ studentId, toCohortId }: { studentId: number; toCohortId: number }) =>
      api.post<void>(`/api/cohorts/${cohortId}/students/${studentId}/move`, { toCohortId }),
    onSuccess: invalidate,
  });
}
