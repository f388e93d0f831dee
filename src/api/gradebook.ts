/** Gradebook, a student's attempts and cohort analytics (server: server/routes/gradebook.ts). */
import { queryOptions, useQuery } from "@tanstack/react-query";
import type { CohortAnalytics, Gradebook, StudentAttempts } from "@shared/api/gradebook";
import { api } from "./client";
import { teachingQueryKeys } from "./cohorts";

export const gradebookQueryOptions = (cohortId: number) =>
  queryOptions({
    queryKey: [...teachingQueryKeys.all, "gradebook", cohortId] as const,
    queryFn: ({ signal }) => api.get<Gradebook>(`/api/cohorts/${cohortId}/gradebook`, signal),
  });

export function useGradebook(cohortId: number) {
  return useQuery(gradebookQueryOptions(cohortId));
}

export function useStudentAttempts(cohortId: number, studentId: number) {
  return useQuery({
    queryKey: [...teachingQueryKeys.all, "attempts", cohortId, studentId] as const,
    queryFn: ({ signal }) => api.get<StudentAttempts>(`/api/cohorts/${cohortId}/students/${studentId}/attempts`, signal),
  });
}

export function useCohortAnalytics(cohortId: number) {
  return useQuery({
    queryKey: [...teachingQueryKeys.all, "analytics", cohortId] as const,
    queryFn: ({ signal }) => api.get<CohortAnalytics>(`/api/cohorts/${cohortId}/analytics`, signal),
  });
}

/** The CSV export is a plain download link (same-origin GET with the session cookie). */
export const gradebookCsvUrl = (cohortId: number) => `/api/cohorts/${cohortId}/gradebook.csv`;
