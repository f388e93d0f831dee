/** Forge notebook: entries, files (uploaded with progress), and instructors' reviews. */
import { queryOptions, useMutation, useQuery, useQueryClient } from "@tanstack/react-query";
import type { ApiErrorBody } from "@shared/api/errors";
import type {
  NotebookEntryInput,
  NotebookEntryResponse,
  NotebookFileResponse,
  NotebookListResponse,
  ReviewListQuery,
  ReviewListResponse,
  ReviewRequest,
  ReviewResponse,
  StorageUsage,
} from "@shared/api/notebook";
import { ApiError, api, getCsrfToken, refreshCsrfToken } from "./client";

export const notebookQueryKeys = {
  all: ["notebook"] as const,
  list: () => ["notebook", "list"] as const,
  entry: (id: number) => ["notebook", "entry", id] as const,
  review: (status: ReviewListQuery["status"]) => ["notebook", "review", status] as const,
};

export const notebookListQueryOptions = () =>
  queryOptions({
    queryKey: notebookQueryKeys.list(),
    queryFn: ({ signal }) => api.get<NotebookListResponse>("/api/notebook/entries", signal),
  });

export function useNotebookList(enabled = true) {
  return useQuery({ ...notebookListQueryOptions(), enabled });
}

export const notebookEntryQueryOptions = (id: number) =>
  queryOptions({
    queryKey: notebookQueryKeys.entry(id),
    queryFn: ({ signal }) => api.get<NotebookEntryResponse>(`/api/notebook/entries/${id}`, signal),
  });

export function useNotebookEntry(id: number) {
  return useQuery(notebookEntryQueryOptions(id));
}

export const reviewQueueQueryOptions = (status: ReviewListQuery["status"]) =>
  queryOptions({
    queryKey: notebookQueryKeys.review(status),
    queryFn: ({ signal }) => api.get<ReviewListResponse>(`/api/notebook/review?status=${encodeURIComponent(status)}`, signal),
  });

export function useReviewQueue(status: ReviewListQuery["status"]) {
  return useQuery(reviewQueueQueryOptions(status));
}

export function useSaveEntry(id?: number) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (input: NotebookEntryInput) =>
      id === undefined ? api.post<NotebookEntryResponse>("/api/notebook/entries", input) : api.put<NotebookEntryResponse>(`/api/notebook/entries/${id}`, input),
    onSuccess: (body) => {
      queryClient.setQueryData(notebookQueryKeys.entry(body.entry.id), body);
      void queryClient.invalidateQueries({ queryKey: notebookQueryKeys.list() });
      void queryClient.invalidateQueries({ queryKey: ["notebook", "review"] });
    },
  });
}

export function useDeleteEntry() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (id: number) => api.delete<void>(`/api/notebook/entries/${id}`),
    onSuccess: (_body, id) => {
      queryClient.removeQueries({ queryKey: notebookQueryKeys.entry(id) });
      void queryClient.invalidateQueries({ queryKey: notebookQueryKeys.list() });
    },
  });
}

export function useDeleteFile(entryId: number) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (fileId: number) => api.delete<{ storage: StorageUsage }>(`/api/notebook/files/${fileId}`),
    onSuccess: () => {
      void queryClient.invalidateQueries({ queryKey: notebookQueryKeys.entry(entryId) });
      void queryClient.invalidateQueries({ queryKey: notebookQueryKeys.list() });
    },
  });
}

export function useReviewEntry(entryId: number) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (request: ReviewRequest) => api.post<ReviewResponse>(`/api/notebook/entries/${entryId}/review`, request),
    onSuccess: () => {
      void queryClient.invalidateQueries({ queryKey: notebookQueryKeys.entry(entryId) });
      void queryClient.invalidateQueries({ queryKey: ["notebook", "review"] });
    },
  });
}

// ---- upload with progress ---------------------------------------------------------------------

export interface UploadHandle {
  promise: Promise<NotebookFileResponse>;
  abort(): void;
}

/**
 * Upload one file with XMLHttpRequest, because fetch reports no upload progress. Same rules as
 * the fetch client: same-origin cookie, the CSRF header, a typed ApiError on failure, and one
 * retry with a fresh token after `403 csrf_failed`.
 */
export function uploadNotebookFile(entryId: number, file: File, onProgress: (fraction: number) => void): UploadHandle {
  let xhr: XMLHttpRequest | null = null;
  let aborted = false;

  const sendOnce = (token: string) =>
    new Promise<NotebookFileResponse>((resolve, reject) => {
      const request = new XMLHttpRequest();
      xhr = request;
      request.open("POST", `/api/notebook/entries/${entryId}/files`);
      request.withCredentials = true;
      request.responseType = "text";
      request.setRequestHeader("Accept", "application/json");
      request.setRequestHeader("x-csrf-token", token);
      request.upload.onprogress = (event) => {
        if (event.lengthComputable && event.total > 0) onProgress(event.loaded / event.total);
      };
      request.onload = () => {
        let body: unknown;
        try {
          body = request.responseText ? JSON.parse(request.responseText) : undefined;
        } catch {
          body = undefined;
        }
        if (request.status >= 200 && request.status < 300) return resolve(body as NotebookFileResponse);
        const error = (body as Partial<ApiErrorBody> | undefined)?.error;
        reject(
          error && typeof error.code === "string"
            ? new ApiError(request.status, error.code, error.message, error.fields)
            : new ApiError(request.status, request.status >= 500 ? "internal_error" : "unknown_error", `The server answered ${request.status}.`),
        );
      };
      request.onerror = () => reject(new ApiError(0, "network_error", "The upload did not reach the server. Check your connection and try again."));
      request.onabort = () => reject(new DOMException("The upload was cancelled.", "AbortError"));
      const form = new FormData();
      form.append("file", file, file.name);
      request.send(form);
    });

  const promise = (async () => {
    const token = await getCsrfToken();
    if (aborted) throw new DOMException("The upload was cancelled.", "AbortError");
    try {
      return await sendOnce(token);
    } catch (error) {
      if (error instanceof ApiError && error.status === 403 && error.code === "csrf_failed" && !aborted) {
        onProgress(0);
        return sendOnce(await refreshCsrfToken());
      }
      throw error;
    }
  })();

  return {
    promise,
    abort() {
      aborted = true;
      (xhr as XMLHttpRequest | null)?.abort();
    },
  };
}
