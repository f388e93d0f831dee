/** Saved alloys of the signed-in user and the alloys attached to a lesson: queries and mutations. */
import { queryOptions, useMutation, useQuery, useQueryClient } from "@tanstack/react-query";
import type {
  AttachAlloyRequest,
  AttachedAlloyListResponse,
  AttachedAlloyResponse,
  CreateSavedAlloyRequest,
  SavedAlloyListResponse,
  SavedAlloyResponse,
} from "@shared/api/alloys";
import { api } from "./client";

export const alloyQueryKeys = {
  all: ["alloys"] as const,
  saved: () => ["alloys", "saved"] as const,
  attached: (lessonSlug: string) => ["alloys", "attached", lessonSlug] as const,
};

export const savedAlloysQueryOptions = () =>
  queryOptions({
    queryKey: alloyQueryKeys.saved(),
    queryFn: ({ signal }) => api.get<SavedAlloyListResponse>("/api/alloys", signal),
    select: (body) => body.alloys,
  });

/** The signed-in user's saved alloys; pass `enabled: false` when nobody is signed in. */
export function useSavedAlloys(enabled = true) {
  return useQuery({ ...savedAlloysQueryOptions(), enabled });
}

export function useSaveAlloy() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (request: CreateSavedAlloyRequest) => api.post<SavedAlloyResponse>("/api/alloys", request),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: alloyQueryKeys.saved() }),
  });
}

export function useRenameAlloy() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: ({ id, name }: { id: number; name: string }) => api.patch<SavedAlloyResponse>(`/api/alloys/${id}`, { name }),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: alloyQueryKeys.saved() }),
  });
}

export function useDeleteAlloy() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (id: number) => api.delete<void>(`/api/alloys/${id}`),
    // Attachments of a deleted alloy disappear with it.
    onSuccess: () => queryClient.invalidateQueries({ queryKey: alloyQueryKeys.all }),
  });
}

export function useAttachAlloy() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: ({ id, ...body }: { id: number } & AttachAlloyRequest) => api.post<AttachedAlloyResponse>(`/api/alloys/${id}/attach`, body),
    onSuccess: ({ attachment }) => queryClient.invalidateQueries({ queryKey: alloyQueryKeys.attached(attachment.lessonSlug) }),
  });
}

export function useDetachAlloy() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: ({ alloyId, lessonSlug }: { alloyId: number; lessonSlug: string }) =>
      api.delete<void>(`/api/alloys/${alloyId}/attach/${encodeURIComponent(lessonSlug)}`),
    onSuccess: (_void, { lessonSlug }) => queryClient.invalidateQueries({ queryKey: alloyQueryKeys.attached(lessonSlug) }),
  });
}

export const attachedAlloysQueryOptions = (lessonSlug: string) =>
  queryOptions({
    queryKey: alloyQueryKeys.attached(lessonSlug),
    queryFn: ({ signal }) => api.get<AttachedAlloyListResponse>(`/api/lessons/${encodeURIComponent(lessonSlug)}/attached-alloys`, signal),
    select: (body) => body.attachments,
  });

/** Alloys instructors attached to a lesson (for the lesson page). */
export function useAttachedAlloys(lessonSlug: string, enabled = true) {
  return useQuery({ ...attachedAlloysQueryOptions(lessonSlug), enabled });
}
