/** The course outline and per-lesson progress: queries and the progress mutation. */
import { queryOptions, useMutation, useQuery, useQueryClient } from "@tanstack/react-query";
import type { LessonProgress, LessonProgressUpdate, ModulesResponse } from "@shared/api/lessons";
import { api } from "./client";

export const lessonQueryKeys = {
  all: ["lessons"] as const,
  modules: () => ["lessons", "modules"] as const,
  progress: (slug: string) => ["lessons", "progress", slug] as const,
};

export const modulesQueryOptions = () =>
  queryOptions({
    queryKey: lessonQueryKeys.modules(),
    queryFn: ({ signal }) => api.get<ModulesResponse>("/api/modules", signal),
  });

export function useModules() {
  return useQuery(modulesQueryOptions());
}

export const lessonProgressQueryOptions = (slug: string) =>
  queryOptions({
    queryKey: lessonQueryKeys.progress(slug),
    queryFn: ({ signal }) => api.get<LessonProgress>(`/api/lessons/${encodeURIComponent(slug)}/progress`, signal),
    // Progress changes only through this client; refetching on mount would fight the optimistic state.
    staleTime: 5 * 60_000,
  });

export function useLessonProgress(slug: string) {
  return useQuery(lessonProgressQueryOptions(slug));
}

/**
 * Save progress. The server merges (sections are added, checks set per id), so updates
 * may be sent often and in any order; the stored result replaces the cached one.
 */
export function useUpdateLessonProgress(slug: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (update: LessonProgressUpdate) => api.put<LessonProgress>(`/api/lessons/${encodeURIComponent(slug)}/progress`, update),
    // A flaky connection should not lose a reading position; the update is idempotent.
    retry: (count, error) => count < 2 && (error as { status?: number }).status === 0,
    onSuccess: (progress) => {
      queryClient.setQueryData(lessonQueryKeys.progress(slug), progress);
      void queryClient.invalidateQueries({ queryKey: lessonQueryKeys.modules() });
    },
  });
}
