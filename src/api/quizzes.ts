/** Quizzes: the open attempt's questions, submission with an idempotency key, and history. */
import { queryOptions, useMutation, useQuery, useQueryClient } from "@tanstack/react-query";
import type { AttemptHistory, AttemptResult, QuizView, SubmitAttemptRequest } from "@shared/api/quizzes";
import { api, isApiError } from "./client";
import { lessonQueryKeys } from "./lessons";

export const quizQueryKeys = {
  all: ["quizzes"] as const,
  view: (id: string) => ["quizzes", id, "view"] as const,
  attempts: (id: string) => ["quizzes", id, "attempts"] as const,
};

export const quizQueryOptions = (id: string) =>
  queryOptions({
    queryKey: quizQueryKeys.view(id),
    queryFn: ({ signal }) => api.get<QuizView>(`/api/quizzes/${encodeURIComponent(id)}`, signal),
    // The drawn numbers are fixed until the attempt is submitted; no need to refetch behind the learner's back.
    staleTime: Infinity,
  });

export function useQuiz(id: string) {
  return useQuery(quizQueryOptions(id));
}

export const quizAttemptsQueryOptions = (id: string) =>
  queryOptions({
    queryKey: quizQueryKeys.attempts(id),
    queryFn: ({ signal }) => api.get<AttemptHistory>(`/api/quizzes/${encodeURIComponent(id)}/attempts`, signal),
  });

export function useQuizAttempts(id: string) {
  return useQuery(quizAttemptsQueryOptions(id));
}

/** A new key for one submission; re-sent unchanged on every retry of that submission. */
export function newIdempotencyKey(): string {
  // getRandomValues works on plain-HTTP deployments too, where randomUUID is unavailable.
  const bytes = crypto.getRandomValues(new Uint8Array(16));
  return Array.from(bytes, (b) => b.toString(16).padStart(2, "0")).join("");
}

/** Retry only what may not have reached the server (network failures, 5xx), with the same key. */
export function shouldRetrySubmission(failureCount: number, error: unknown): boolean {
  if (!isApiError(error)) return false;
  return failureCount < 3 && (error.status === 0 || error.status >= 500);
}

export function useSubmitAttempt(id: string) {
  const queryClient = useQueryClient();
  return useMutation<AttemptResult, Error, SubmitAttemptRequest>({
    mutationFn: (request) => api.post<AttemptResult>(`/api/quizzes/${encodeURIComponent(id)}/attempts`, request),
    retry: shouldRetrySubmission,
    retryDelay: (attempt) => 500 * 2 ** attempt,
    onSuccess: (attempt) => {
      queryClient.setQueryData<AttemptHistory>(quizQueryKeys.attempts(id), (old) =>
        old && !old.attempts.some((a) => a.id === attempt.id)
          ? { ...old, attempts: [attempt, ...old.attempts], allowance: { ...old.allowance, used: old.allowance.used + 1, remaining: old.allowance.remaining === null ? null : Math.max(0, old.allowance.remaining - 1) } }
          : old,
      );
      void queryClient.invalidateQueries({ queryKey: quizQueryKeys.attempts(id) });
      // The next attempt has new numbers and one attempt fewer left: fetch it while the result is read.
      void queryClient.invalidateQueries({ queryKey: quizQueryKeys.view(id) });
      void queryClient.invalidateQueries({ queryKey: lessonQueryKeys.modules() });
    },
  });
}

/** After a result has been read: fetch the next attempt's questions (new numbers). */
export function useStartNextAttempt(id: string) {
  const queryClient = useQueryClient();
  return () => queryClient.invalidateQueries({ queryKey: quizQueryKeys.view(id) });
}
