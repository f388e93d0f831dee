/**
 * The forge notebook's routes (features/notebook and features/notebook-review), registered in
 * router.tsx with one line. Any signed-in user keeps a notebook; reviews are for instructors and
 * admins. The API enforces who may see which entry.
 */
import type { QueryClient } from "@tanstack/react-query";
import type { RouteObject } from "react-router";
import { paths, routePatterns } from "@/config/paths";
import { requireUser } from "./guards";

export function notebookRoutes(queryClient: QueryClient): RouteObject[] {
  const signedIn = requireUser(queryClient);
  return [
    { path: paths.notebook, loader: signedIn, lazy: () => import("@/features/notebook/list-page") },
    { path: paths.notebookNew, loader: signedIn, lazy: () => import("@/features/notebook/entry-form-page") },
    { path: routePatterns.notebookEntry, loader: signedIn, lazy: () => import("./routes/notebook-entry") },
    { path: routePatterns.notebookEdit, loader: signedIn, lazy: () => import("@/features/notebook/entry-form-page") },
    { path: paths.notebookReview, loader: requireUser(queryClient, ["instructor", "admin"]), lazy: () => import("@/features/notebook-review/review-queue-page") },
  ];
}
