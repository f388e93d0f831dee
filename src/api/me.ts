/** The signed-in user's role-specific overview for the home pages (GET /api/me/summary). */
import { queryOptions, useQuery } from "@tanstack/react-query";
import { meSummarySchema, type MeSummary } from "@shared/api/me";
import { api, ApiError } from "./client";

export const meQueryKeys = {
  all: ["me"] as const,
  summary: () => ["me", "summary"] as const,
};

export async function fetchMeSummary(signal?: AbortSignal): Promise<MeSummary> {
  const body = await api.get<unknown>("/api/me/summary", signal);
  // Check the shape: a server and client from different versions should fail loudly, not render nonsense.
  const parsed = meSummarySchema.safeParse(body);
  if (!parsed.success) throw new ApiError(200, "unexpected_response", "The server sent a summary this page does not understand.");
  return parsed.data;
}

export const meSummaryQueryOptions = () =>
  queryOptions({
    queryKey: meQueryKeys.summary(),
    queryFn: ({ signal }) => fetchMeSummary(signal),
  });

export function useMeSummary() {
  return useQuery(meSummaryQueryOptions());
}
