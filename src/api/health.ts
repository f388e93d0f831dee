/** Server and database liveness (GET /api/health). */
import { queryOptions, useQuery } from "@tanstack/react-query";
import { api } from "./client";

export interface HealthResponse {
  ok: boolean;
}

export const healthQueryOptions = () =>
  queryOptions({
    queryKey: ["health"] as const,
    queryFn: ({ signal }) => api.get<HealthResponse>("/api/health", signal),
    staleTime: 10_000,
  });

export function useHealth() {
  return useQuery(healthQueryOptions());
}
