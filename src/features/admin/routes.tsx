/**
 * The school admin screens under /admin, with a section navigation bar above each page. The
 * overview page itself is the app's (src/app/routes/admin.tsx), passed in by the router.
 */
import type { QueryClient } from "@tanstack/react-query";
import type { LazyRouteFunction, LoaderFunction, RouteObject } from "react-router";
import { requireUser } from "@/app/guards";
import { AdminSection } from "./admin-section";

export function adminRoutes(
  queryClient: QueryClient,
  overview: { lazy: LazyRouteFunction<RouteObject>; loader?: LoaderFunction },
): RouteObject[] {
  const admin = requireUser(queryClient, ["admin"]);
  return [
    {
      path: "/admin",
      Component: AdminSection,
      children: [
        { index: true, loader: overview.loader ?? admin, lazy: overview.lazy },
        { path: "users", loader: admin, lazy: () => import("./users-page") },
        { path: "audit", loader: admin, lazy: () => import("./audit-page") },
        { path: "outbox", loader: admin, lazy: () => import("./outbox-page") },
      ],
    },
  ];
}
