/**
 * The teaching screens' routes, registered in src/app/router.tsx with one line. Instructors and
 * admins may open them; the API decides which cohorts each may see.
 */
import type { QueryClient } from "@tanstack/react-query";
import type { RouteObject } from "react-router";
import { requireUser } from "@/app/guards";

export function teachRoutes(queryClient: QueryClient): RouteObject[] {
  const staff = requireUser(queryClient, ["instructor", "admin"]);
  return [
    { path: "/teach", loader: staff, lazy: () => import("./dashboard-page") },
    { path: "/teach/cohorts/:cohortId", loader: staff, lazy: () => import("./cohort-page") },
    { path: "/teach/cohorts/:cohortId/gradebook", loader: staff, lazy: () => import("./gradebook-page") },
    { path: "/teach/cohorts/:cohortId/students/:studentId", loader: staff, lazy: () => import("./student-page") },
  ];
}
